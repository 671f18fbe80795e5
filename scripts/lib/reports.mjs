import { existsSync, readFileSync } from 'node:fs';

/** Counts from a suite's report; a missing or unreadable report counts as one failure. */
export function countReport({ kind, file }) {
  if (!existsSync(file)) return undefined;
  const text = readFileSync(file, 'utf8');
  if (kind === 'tap') {
    const pick = (key) => Number(text.match(new RegExp(`^# ${key} (\\d+)$`, 'm'))?.[1] ?? NaN);
    const counts = { passed: pick('pass'), failed: pick('fail') + pick('cancelled'), skipped: pick('skipped') + pick('todo') };
    return Number.isNaN(counts.passed) ? undefined : counts;
  }
  try {
    const json = JSON.parse(text);
    return {
      passed: json.numPassedTests,
      failed: json.numFailedTests + (json.numRuntimeErrorTestSuites ?? 0),
      skipped: (json.numPendingTests ?? 0) + (json.numTodoTests ?? 0),
    };
  } catch {
    return undefined;
  }
}
