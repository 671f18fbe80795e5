/**
 * A Date that already knows its JSON: the ISO 8601 text PostgreSQL formatted (UTC, milliseconds,
 * the same text `Date.prototype.toJSON` gives). The list routes hand out many dates, and
 * `toISOString` on each, at serialisation time, and parsing each timestamp pg returns, were a
 * tenth of the assignments list's server time. It is a Date for every other purpose.
 */
export class IsoDate extends Date {
  constructor(
    ms: number,
    private readonly iso: string,
  ) {
    super(ms);
  }

  override toJSON(): string {
    return this.iso;
  }
}

/** The SQL for a timestamptz as the ISO 8601 text `Date.prototype.toJSON` gives (UTC, milliseconds). */
export function isoDateText(expression: string): string {
  return `to_char(${expression} AT TIME ZONE 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;
}
