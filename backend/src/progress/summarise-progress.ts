import { warmCoolIndex, type Mark, type ProgressSummary, type WeekProgress } from '@mixmark/common';

/** What progress needs of one attempt. */
export interface ProgressAttempt {
  createdAt: Date;
  state: string;
  /** Effective pass (override first), null when not graded. */
  pass: boolean | null;
  mark: Mark | null;
}

export type { ProgressSummary, WeekProgress };

const day = (date: Date) => date.toISOString().slice(0, 10);

/** Monday (UTC) of the ISO week holding `date`. */
export function weekStart(date: Date): string {
  const d = new Date(Date.UTC(date.getUTCFullYear(), date.getUTCMonth(), date.getUTCDate()));
  const weekday = (d.getUTCDay() + 6) % 7; // Monday 0 … Sunday 6
  d.setUTCDate(d.getUTCDate() - weekday);
  return day(d);
}

const mean = (values: number[]) => (values.length ? values.reduce((s, v) => s + v, 0) / values.length : null);
const round = (value: number | null, places = 2) => (value === null ? null : Math.round(value * 10 ** places) / 10 ** places);

/**
 * Per-week progress of the skills a drill trains: overall ΔE00, value (|ΔL*|), temperature
 * (|ΔWC|) and hue (|ΔH′|), chroma (|ΔC′|), pass rate; and the streak of practice days.
 *
 * @param attempts - one student's (or a class's) attempts, any order
 * @param now - today, for the streak
 */
export function summariseProgress(attempts: ProgressAttempt[], now = new Date()): ProgressSummary {
  const byWeek = new Map<string, ProgressAttempt[]>();
  for (const attempt of attempts) {
    const key = weekStart(attempt.createdAt);
    byWeek.set(key, [...(byWeek.get(key) ?? []), attempt]);
  }
  const weeks = [...byWeek.entries()]
    .sort(([x], [y]) => x.localeCompare(y))
    .map(([week, list]): WeekProgress => {
      const graded = list.filter((a) => a.state === 'graded' && a.mark);
      const targets = graded.flatMap((a) => a.mark!.targets);
      return {
        week,
        attempts: list.length,
        graded: graded.length,
        passRate: graded.length ? round(graded.filter((a) => a.pass).length / graded.length, 3) : null,
        meanDeltaE: round(mean(targets.map((t) => t.deltaE))),
        meanValueError: round(mean(targets.map((t) => Math.abs(t.parts.deltaLPrime)))),
        meanTemperatureError: round(mean(targets.map((t) => Math.abs(warmCoolIndex(t.reading) - warmCoolIndex(t.target)))), 3),
        meanHueError: round(mean(targets.map((t) => Math.abs(t.parts.deltaHPrime)))),
        meanChromaError: round(mean(targets.map((t) => Math.abs(t.parts.deltaCPrime)))),
      };
    });
  const days = new Set(attempts.map((a) => day(a.createdAt)));
  const cursor = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  if (!days.has(day(cursor))) cursor.setUTCDate(cursor.getUTCDate() - 1);
  let streakDays = 0;
  while (days.has(day(cursor))) {
    streakDays += 1;
    cursor.setUTCDate(cursor.getUTCDate() - 1);
  }
  return {
    weeks,
    totals: {
      attempts: attempts.length,
      graded: attempts.filter((a) => a.state === 'graded').length,
      passed: attempts.filter((a) => a.state === 'graded' && a.pass).length,
    },
    streakDays,
  };
}
