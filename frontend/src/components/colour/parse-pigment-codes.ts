/**
 * Colour Index codes from what a painter types: "PR 209", "pr209", "PR209, PB29", "PB 29 PY 35",
 * "PG7;PW6" all read as the codes written the standard way ("PR209"). A space between the
 * letters and the number belongs to the code; commas, semicolons and other spaces separate codes.
 * Anything that does not look like a code is kept as typed (upper-cased) so the schema can
 * say what is wrong with it.
 * @example parsePigmentCodes('pr 209, PB29') // ['PR209', 'PB29']
 */
export function parsePigmentCodes(text: string): string[] {
  return text
    .toUpperCase()
    .replace(/\b(P(?:BK|BR|B|G|O|R|V|W|Y))[\s.-]*(\d{1,3})(?:\s*:\s*(\d))?/g, (_m, prefix: string, n: string, sub?: string) =>
      sub ? `${prefix}${n}:${sub}` : `${prefix}${n}`,
    )
    .split(/[\s,;]+/)
    .map((code) => code.trim())
    .filter(Boolean);
}
