/** "3 Mar" for the Monday a week starts on (the API's dates are UTC days). */
export function weekLabel(week: string): string {
  return new Date(`${week}T00:00:00Z`).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });
}

/** A mean for a table cell: one decimal, or a dash when the week had nothing graded. */
export function formatMean(value: number | null): string {
  return value === null ? '–' : value.toFixed(1);
}

export function formatPassRate(value: number | null): string {
  return value === null ? '–' : `${Math.round(value * 100)} %`;
}
