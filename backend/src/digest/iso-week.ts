/** An ISO 8601 week (weeks start on Monday; week 1 holds the year's first Thursday), in UTC. */
export interface IsoWeek {
  /** `YYYY-Www`, e.g. `2031-W10`. */
  key: string;
  /** Monday 00:00 UTC. */
  start: Date;
  /** The next Monday 00:00 UTC (exclusive). */
  end: Date;
}

const dayMs = 86_400_000;

/** Monday 00:00 UTC of ISO week 1 of `year` (the week holding 4 January). */
function firstMonday(year: number): number {
  const jan4 = Date.UTC(year, 0, 4);
  return jan4 - ((new Date(jan4).getUTCDay() + 6) % 7) * dayMs;
}

function make(year: number, week: number): IsoWeek {
  const start = firstMonday(year) + (week - 1) * 7 * dayMs;
  return { key: `${year}-W${String(week).padStart(2, '0')}`, start: new Date(start), end: new Date(start + 7 * dayMs) };
}

/**
 * The ISO week holding `moment` (UTC).
 * @example isoWeekOf(new Date('2031-03-05T12:00:00Z')).key // '2031-W10'
 */
export function isoWeekOf(moment: Date): IsoWeek {
  const day = Date.UTC(moment.getUTCFullYear(), moment.getUTCMonth(), moment.getUTCDate());
  const monday = day - ((new Date(day).getUTCDay() + 6) % 7) * dayMs;
  // The week belongs to the year of its Thursday.
  const year = new Date(monday + 3 * dayMs).getUTCFullYear();
  return make(year, Math.round((monday - firstMonday(year)) / (7 * dayMs)) + 1);
}

/** The week before the one holding `moment`: the week a Monday-morning digest sums up. */
export function previousIsoWeek(moment: Date): IsoWeek {
  return isoWeekOf(new Date(isoWeekOf(moment).start.getTime() - dayMs));
}

/**
 * Reads `YYYY-Www`.
 * @throws Error naming the expected form when the text is not a week that exists
 * @example parseIsoWeek('2026-W53').start // 2026-12-28T00:00:00Z
 */
export function parseIsoWeek(text: string): IsoWeek {
  const match = /^(\d{4})-W(\d{2})$/.exec(text.trim());
  const week = match ? make(Number(match[1]), Number(match[2])) : undefined;
  // A week number past the year's last week would roll into the next year: refuse it.
  if (!match || Number(match[2]) < 1 || isoWeekOf(week!.start).key !== week!.key) {
    throw new Error(`Expected an ISO week such as 2031-W10 (year, "W", week 01–53) but received "${text}"`);
  }
  return week!;
}
