import { describe, expect, it } from 'vitest';
import { assignmentStatusLabel, assignmentStatusLabels } from './assignment-status-label.js';

describe('assignmentStatusLabel', () => {
  it('should give the words of the app’s status chips for every status', () => {
    // The same words as frontend/src/features/assignments/components/assignment-status-chip.tsx.
    expect(assignmentStatusLabels).toEqual({
      'not-started': 'Not started',
      submitted: 'Being measured',
      'needs-retake': 'Retake the photo',
      passed: 'Passed',
      failed: 'Not passed yet',
      late: 'Late',
    });
    expect(assignmentStatusLabel('late')).toBe('Late');
  });
});
