import type { DrillKind } from '../types/drill.js';
import type { FeedbackLine, Mark, MarkCheck, TargetMark } from '../types/mark.js';

const severityOrder = { fix: 0, praise: 1, tip: 2 } as const;

/**
 * Puts a mark together: the score is the mean of the component scores, rounded; the
 * attempt passes when every check passes. Feedback is ordered fixes first, then praise,
 * then tips, keeping each group's order.
 */
export function summarise(
  kind: DrillKind,
  targets: TargetMark[],
  checks: MarkCheck[],
  feedback: FeedbackLine[],
): Mark {
  const scores = checks.map((c) => c.score);
  const score = scores.length === 0 ? 0 : scores.reduce((s, v) => s + v, 0) / scores.length;
  const pass = checks.length > 0 && checks.every((c) => c.pass);
  const ordered = feedback
    .map((line, k) => ({ line, k }))
    .sort((x, y) => severityOrder[x.line.severity] - severityOrder[y.line.severity] || x.k - y.k)
    .map(({ line }) => line);
  return { kind, score: Math.round(score), pass, targets, checks, feedback: ordered };
}
