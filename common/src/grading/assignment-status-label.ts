/** Where a student stands on an assignment (the API's `status` of a gradebook or assignment cell). */
export type AssignmentStatusName = 'not-started' | 'submitted' | 'needs-retake' | 'passed' | 'failed' | 'late';

/**
 * The words a person reads for each status, on the screen and in the gradebook CSV alike
 * (the same words as the app's status chips).
 */
export const assignmentStatusLabels: Readonly<Record<AssignmentStatusName, string>> = {
  'not-started': 'Not started',
  submitted: 'Being measured',
  'needs-retake': 'Retake the photo',
  passed: 'Passed',
  failed: 'Not passed yet',
  late: 'Late',
};

/**
 * The words for a status.
 *
 * @param status - the status code
 * @returns its label, e.g. 'Not started'
 * @example
 * assignmentStatusLabel('needs-retake'); // 'Retake the photo'
 */
export function assignmentStatusLabel(status: AssignmentStatusName): string {
  return assignmentStatusLabels[status];
}
