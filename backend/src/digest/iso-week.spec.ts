import { describe, expect, it } from '@jest/globals';
import { isoWeekOf, parseIsoWeek, previousIsoWeek } from './iso-week';

// Reference dates from the ISO 8601 week-date rules (week 1 holds the year's first Thursday).
const cases: Array<[string, string]> = [
  ['2021-01-03T23:59:59Z', '2020-W53'], // a Sunday still in 2020's week 53
  ['2021-01-04T00:00:00Z', '2021-W01'],
  ['2024-12-30T08:00:00Z', '2025-W01'], // a Monday of December in the next year's week 1
  ['2026-12-02T04:00:00Z', '2026-W49'],
  ['2026-12-31T12:00:00Z', '2026-W53'],
  ['2027-01-01T12:00:00Z', '2026-W53'],
];

describe('ISO weeks', () => {
  it.each(cases)('should put %s in %s', (moment, key) => {
    expect(isoWeekOf(new Date(moment)).key).toBe(key);
  });

  it('should give Monday 00:00 UTC to the next Monday for a parsed week', () => {
    const week = parseIsoWeek('2025-W01');
    expect(week.start.toISOString()).toBe('2024-12-30T00:00:00.000Z');
    expect(week.end.toISOString()).toBe('2025-01-06T00:00:00.000Z');
  });

  it('should sum up the week before on a Monday morning', () => {
    expect(previousIsoWeek(new Date('2031-03-10T07:00:00Z')).key).toBe('2031-W10');
    expect(previousIsoWeek(new Date('2021-01-04T07:00:00Z')).key).toBe('2020-W53');
  });

  it.each(['2025-W00', '2025-W53', '2025-10', 'week 3'])('should refuse %s with the expected form', (text) => {
    expect(() => parseIsoWeek(text)).toThrow(`Expected an ISO week such as 2031-W10 (year, "W", week 01–53) but received "${text}"`);
  });
});
