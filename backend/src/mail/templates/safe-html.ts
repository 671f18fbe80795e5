import { escapeHtml } from './escape-html';

/** A piece of HTML built by {@link markup}: its interpolated values are already escaped. */
export class SafeHtml {
  constructor(readonly value: string) {}

  toString(): string {
    return this.value;
  }
}

function render(value: unknown): string {
  if (value instanceof SafeHtml) return value.value;
  if (Array.isArray(value)) return value.map(render).join('');
  if (value === undefined || value === null || value === false) return '';
  return escapeHtml(value);
}

/**
 * Tagged template for mail HTML: every interpolated value is escaped unless it is itself a
 * `SafeHtml` (a fragment built with this tag); arrays are joined; `undefined`, `null` and `false`
 * render nothing. This is how the templates escape every value without remembering to.
 * (Named `markup`, not `html`, so that Prettier leaves the mails' whitespace alone.)
 * @example markup`<p>${'<script>'}</p>`.value // '<p>&lt;script&gt;</p>'
 */
export function markup(strings: TemplateStringsArray, ...values: unknown[]): SafeHtml {
  let out = strings[0];
  values.forEach((value, index) => {
    out += render(value) + strings[index + 1];
  });
  return new SafeHtml(out);
}
