/** One ISO week of practice (Monday, UTC); the error means are null in a week with nothing graded. */
export interface WeekProgress {
  /** Monday of the ISO week, YYYY-MM-DD (UTC). */
  week: string;
  attempts: number;
  graded: number;
  /** Share of graded attempts that passed (0–1), null with none graded. */
  passRate: number | null;
  /** Mean ΔE00 over every target of the graded attempts. */
  meanDeltaE: number | null;
  /** Value: mean |ΔL*|. */
  meanValueError: number | null;
  /** Temperature: mean |ΔWC| (warm–cool index of Ou et al. 2004). */
  meanTemperatureError: number | null;
  /** Hue: mean |ΔH′|. */
  meanHueError: number | null;
  /** Chroma: mean |ΔC′|. */
  meanChromaError: number | null;
}

/** What the progress routes answer. */
export interface ProgressSummary {
  weeks: WeekProgress[];
  totals: { attempts: number; graded: number; passed: number };
  /** Consecutive days with at least one attempt, ending today or yesterday (UTC). */
  streakDays: number;
  /** Present on a teacher's view of one student. */
  student?: { id: string; displayName: string };
}
