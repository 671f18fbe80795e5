import { describe, expect, it } from '@jest/globals';
import { assignmentStatus, statusFromSummary, type AttemptFacts } from './assignment-status';

const due = new Date('2026-12-10T18:00:00Z');
const before = new Date('2026-12-09T12:00:00Z');
const after = new Date('2026-12-11T12:00:00Z');
const attempt = (state: AttemptFacts['state'], pass: boolean | null = null): AttemptFacts => ({
  state,
  pass,
  createdAt: before,
});

describe('assignmentStatus', () => {
  it('should be not started, then late, when nothing was handed in', () => {
    expect(assignmentStatus([], due, before)).toBe('not-started');
    expect(assignmentStatus([], due, after)).toBe('late');
  });

  it('should keep a pass from any attempt even when a later one failed', () => {
    expect(assignmentStatus([attempt('graded', false), attempt('graded', true)], due, after)).toBe(
      'passed',
    );
  });

  it('should say submitted while the newest photo is still being measured', () => {
    expect(assignmentStatus([attempt('measuring'), attempt('graded', false)], due, before)).toBe(
      'submitted',
    );
  });

  it('should ask for a retake when the newest photo could not be measured', () => {
    expect(assignmentStatus([attempt('needs-retake')], due, before)).toBe('needs-retake');
    expect(assignmentStatus([attempt('needs-retake')], due, after)).toBe('late');
  });

  it('should count a teacher\'s pass on a photo sent back for a retake, and not the machine\'s own', () => {
    const passedByTeacher: AttemptFacts = { ...attempt('needs-retake', true), overridden: true };
    expect(assignmentStatus([passedByTeacher], due, after)).toBe('passed');
    expect(assignmentStatus([attempt('needs-retake'), passedByTeacher], due, before)).toBe('passed');
    // Without the override the same pass value on a retake counts for nothing.
    expect(assignmentStatus([attempt('needs-retake', true)], due, before)).toBe('needs-retake');
  });

  it('should say failed when the newest graded attempt did not pass', () => {
    expect(assignmentStatus([attempt('graded', false)], due, before)).toBe('failed');
  });

  it('should give the same status from the summary PostgreSQL reduces the attempts to, for every list of up to three', () => {
    const states: AttemptFacts['state'][] = [
      'queued',
      'measuring',
      'graded',
      'needs-retake',
      'failed',
    ];
    const one = states.flatMap((state) =>
      state === 'graded'
        ? [attempt(state, true), attempt(state, false), attempt(state, null)]
        : state === 'needs-retake'
          ? [attempt(state), { ...attempt(state, true), overridden: true }, { ...attempt(state, false), overridden: true }]
          : [attempt(state)],
    );
    const lists: AttemptFacts[][] = [[]];
    for (let n = 0; n < 3; n += 1)
      for (const list of [...lists])
        if (list.length === n) for (const a of one) lists.push([...list, a]);
    for (const list of lists) {
      const summary = list.length
        ? {
            passed: list.some((a) => a.pass === true && (a.overridden === true || a.state === 'graded')),
            latestState: list[0].state,
          }
        : undefined;
      for (const now of [before, after])
        expect(statusFromSummary(summary, due, now)).toBe(assignmentStatus(list, due, now));
    }
  });
});
