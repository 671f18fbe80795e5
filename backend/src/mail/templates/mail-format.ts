/**
 * Formatting shared by the mail templates: dates, links and subject lines.
 */

const dateTimeFormat = new Intl.DateTimeFormat('en-GB', {
  dateStyle: 'long',
  timeStyle: 'short',
  timeZone: 'UTC',
});

const dateFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeZone: 'UTC' });

/**
 * A moment as people read it in a mail. The server does not know the reader's time zone,
 * so the zone is always named.
 * @example formatMailDateTime(new Date('2031-03-04T17:30:00Z')) // '4 March 2031 at 17:30 UTC'
 */
export function formatMailDateTime(moment: Date): string {
  assertValidDate('a date in the mail', moment);
  return `${dateTimeFormat.format(moment)} UTC`;
}

/**
 * A calendar day as people read it in a mail (UTC).
 * @example formatMailDate(new Date('2031-03-03T00:00:00Z')) // '3 March 2031'
 */
export function formatMailDate(day: Date): string {
  assertValidDate('a date in the mail', day);
  return dateFormat.format(day);
}

/**
 * Checks that a link put into a mail is an absolute http(s) address, so that a mistake in the
 * caller can never produce a `javascript:` or relative link.
 * @throws Error naming the field when it is not
 */
export function assertWebUrl(field: string, url: string): void {
  let parsed: URL | undefined;
  try {
    parsed = new URL(url);
  } catch {
    parsed = undefined;
  }
  if (!parsed || (parsed.protocol !== 'http:' && parsed.protocol !== 'https:')) {
    throw new Error(`${field} must be an absolute http(s) address, but is "${url}"`);
  }
}

/** Collapses line breaks and runs of spaces, so a subject is always one header line. */
export function oneLine(text: string): string {
  return text.replace(/\s+/g, ' ').trim();
}

function assertValidDate(what: string, value: Date): void {
  if (!(value instanceof Date) || Number.isNaN(value.getTime())) {
    throw new Error(`${what} must be a valid Date, but is ${String(value)}`);
  }
}
