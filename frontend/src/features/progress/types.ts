/** One ISO week of practice (Monday, UTC); the error means are null in a week with nothing graded. */
export type WeekProgress = {
  week: string;
  attempts: number;
  graded: number;
  passRate: number | null;
  meanDeltaE: number | null;
  /** |ΔL*| */
  meanValueError: number | null;
  /** |ΔWC|, warm–cool index units */
  meanTemperatureError: number | null;
  /** |ΔH′| */
  meanHueError: number | null;
  /** |ΔC′| */
  meanChromaError: number | null;
};

export type Progress = {
  weeks: WeekProgress[];
  totals: { attempts: number; graded: number; passed: number };
  streakDays: number;
  student?: { id: string; displayName: string };
};
