// A small reader for the messages our own app sends (nodemailer output): headers with RFC 2047
// encoded words, multipart bodies, quoted-printable and base64 parts. Enough for the fake SMTP's
// outbox; not a general MIME parser (mailparser is not installed, and we need only this much).

/**
 * Decodes bytes in a named charset, falling back to UTF-8 for labels Node does not know.
 * @param {Buffer} bytes
 * @param {string | undefined} charset
 * @returns {string}
 */
function decodeCharset(bytes, charset) {
  try {
    return new TextDecoder(charset || 'utf-8').decode(bytes);
  } catch {
    return new TextDecoder('utf-8').decode(bytes);
  }
}

/**
 * Turns quoted-printable text (RFC 2045 §6.7) into bytes.
 * @param {string} input
 * @returns {Buffer}
 */
function decodeQuotedPrintable(input) {
  const softBreaksRemoved = input.replace(/=\r?\n/g, '');
  const bytes = [];
  for (let i = 0; i < softBreaksRemoved.length; i += 1) {
    const char = softBreaksRemoved[i];
    const hex = softBreaksRemoved.slice(i + 1, i + 3);
    if (char === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(softBreaksRemoved.charCodeAt(i) & 0xff);
    }
  }
  return Buffer.from(bytes);
}

/**
 * Decodes RFC 2047 encoded words (`=?UTF-8?Q?...?=`, `=?UTF-8?B?...?=`) in a header value.
 * Whitespace between two adjacent encoded words is dropped, as the RFC says (§6.2).
 * @param {string} value
 * @returns {string}
 */
export function decodeHeaderValue(value) {
  const word = /=\?([^?]+)\?([QqBb])\?([^?]*)\?=/g;
  const joined = value.replace(/(=\?[^?]+\?[QqBb]\?[^?]*\?=)\s+(?==\?)/g, '$1');
  return joined.replace(word, (_match, charset, encoding, text) => {
    const bytes =
      encoding.toUpperCase() === 'B'
        ? Buffer.from(text, 'base64')
        : decodeQuotedPrintable(text.replace(/_/g, ' '));
    return decodeCharset(bytes, charset.replace(/\*.*$/, ''));
  });
}

/**
 * Splits a raw header block into lower-cased names and unfolded, decoded values.
 * @param {string} block raw header lines (bytes as latin1)
 * @returns {Map<string, string[]>}
 */
function parseHeaders(block) {
  const headers = new Map();
  const unfolded = block.replace(/\r?\n(?=[ \t])/g, '');
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    // Raw 8-bit headers (SMTPUTF8) arrive as UTF-8 bytes.
    const raw = Buffer.from(line.slice(colon + 1).trim(), 'latin1').toString('utf8');
    headers.set(name, [...(headers.get(name) ?? []), decodeHeaderValue(raw)]);
  }
  return headers;
}

/**
 * Reads `type/subtype; name=value; name="quoted value"` into its parts.
 * @param {string | undefined} value
 * @returns {{ type: string, params: Record<string, string> }}
 */
function parseStructuredHeader(value) {
  const [head, ...rest] = (value ?? '').split(';');
  const params = {};
  for (const part of rest) {
    const match = /^\s*([^=\s]+)\s*=\s*(?:"((?:[^"\\]|\\.)*)"|([^;\s]*))/.exec(part);
    if (match) params[match[1].toLowerCase()] = match[2]?.replace(/\\(.)/g, '$1') ?? match[3];
  }
  return { type: head.trim().toLowerCase(), params };
}

/**
 * Splits a message or body part into its header block and its body.
 * @param {string} raw
 * @returns {{ headers: Map<string, string[]>, body: string }}
 */
function splitPart(raw) {
  const match = /\r?\n\r?\n/.exec(raw);
  if (!match) return { headers: parseHeaders(raw), body: '' };
  return {
    headers: parseHeaders(raw.slice(0, match.index)),
    body: raw.slice(match.index + match[0].length),
  };
}

/**
 * Collects the text and HTML bodies of a part, descending into multiparts.
 * @param {string} raw
 * @param {{ text?: string, html?: string }} found
 */
function collectBodies(raw, found) {
  const { headers, body } = splitPart(raw);
  const contentType = parseStructuredHeader(headers.get('content-type')?.[0] ?? 'text/plain');
  const disposition = parseStructuredHeader(headers.get('content-disposition')?.[0]);
  if (contentType.type.startsWith('multipart/') && contentType.params.boundary) {
    const delimiter = `--${contentType.params.boundary}`;
    const sections = body.split(new RegExp(`(?:^|\\r?\\n)${escapeRegExp(delimiter)}`));
    // sections[0] is the preamble; a section starting with "--" is the closing delimiter.
    for (const section of sections.slice(1)) {
      if (section.startsWith('--')) break;
      collectBodies(section.replace(/^[ \t]*\r?\n/, ''), found);
    }
    return;
  }
  if (disposition.type === 'attachment') return;
  const key =
    contentType.type === 'text/html' ? 'html' : contentType.type === 'text/plain' ? 'text' : null;
  if (!key || found[key] !== undefined) return;
  const encoding = (headers.get('content-transfer-encoding')?.[0] ?? '7bit').toLowerCase();
  const bytes =
    encoding === 'base64'
      ? Buffer.from(body.replace(/\s+/g, ''), 'base64')
      : encoding === 'quoted-printable'
        ? decodeQuotedPrintable(body)
        : Buffer.from(body, 'latin1');
  found[key] = decodeCharset(bytes, contentType.params.charset).replace(/\r\n/g, '\n');
}

/** @param {string} text */
function escapeRegExp(text) {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * Reads what a person would see of a message: sender, the To header, subject, text and HTML body.
 * @param {Buffer | string} source the raw RFC 5322 message
 * @returns {{ from: string, toHeader: string, subject: string, messageId: string | null, text: string, html: string }}
 * @example
 * parseMail('From: a@x.test\r\nTo: b@x.test\r\nSubject: Hi\r\n\r\nHello').subject; // 'Hi'
 */
export function parseMail(source) {
  const raw = Buffer.isBuffer(source)
    ? source.toString('latin1')
    : Buffer.from(source, 'utf8').toString('latin1');
  const { headers } = splitPart(raw);
  const found = {};
  collectBodies(raw, found);
  return {
    from: headers.get('from')?.[0] ?? '',
    toHeader: (headers.get('to') ?? []).join(', '),
    subject: headers.get('subject')?.[0] ?? '',
    messageId: headers.get('message-id')?.[0] ?? null,
    text: found.text ?? '',
    html: found.html ?? '',
  };
}
