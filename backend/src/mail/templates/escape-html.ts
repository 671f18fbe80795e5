const replacements: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

/**
 * Escapes a value for HTML text and for quoted attribute values, so that names, titles and
 * comments typed by people can never become markup in a mail.
 * @param value anything; it is turned into a string first
 * @returns the escaped string
 * @example escapeHtml('<b>Wren</b>') // '&lt;b&gt;Wren&lt;/b&gt;'
 */
export function escapeHtml(value: unknown): string {
  return String(value).replace(/[&<>"']/g, (char) => replacements[char]);
}
