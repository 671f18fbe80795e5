import { markup, type SafeHtml } from './safe-html';

// Plain HTML with inline styles (mail clients drop <style> blocks), neutral greys only, no
// images, a single column that reads on a phone. Tables for layout because many clients still
// ignore CSS layout.
const font = "Georgia, 'Times New Roman', serif";
const colours = {
  page: '#e8e8e8',
  card: '#ffffff',
  border: '#d2d2d2',
  text: '#2b2b2b',
  muted: '#666666',
  action: '#3a3a3a',
  quote: '#f3f3f3',
};

/** A paragraph of body text. */
export function paragraph(content: SafeHtml | string): SafeHtml {
  return markup`<p style="margin:0 0 16px 0;">${content}</p>`;
}

/** A smaller, quieter paragraph (expiry notes, "if this was not you"). */
export function note(content: SafeHtml | string): SafeHtml {
  return markup`<p style="margin:0 0 16px 0;font-size:14px;color:${colours.muted};">${content}</p>`;
}

/**
 * The one action of a mail as a button-like link, with the address written out beneath it
 * for clients that do not show links well.
 */
export function actionLink(url: string, label: string): SafeHtml {
  return markup`<p style="margin:24px 0 8px 0;"><a href="${url}" style="display:inline-block;padding:11px 20px;background-color:${colours.action};color:#ffffff;text-decoration:none;border-radius:4px;font-family:${font};font-size:16px;">${label}</a></p>
<p style="margin:0 0 20px 0;font-size:13px;color:${colours.muted};word-break:break-all;">Or copy this address into your browser: <a href="${url}" style="color:${colours.text};">${url}</a></p>`;
}

/** A bulleted list, one item per line of feedback. */
export function bulletList(items: string[]): SafeHtml {
  return markup`<ul style="margin:0 0 16px 0;padding-left:22px;">${items.map(
    (item) => markup`<li style="margin:0 0 6px 0;">${item}</li>`,
  )}</ul>`;
}

/** A quoted comment, its line breaks kept. */
export function quotation(text: string): SafeHtml {
  const lines = text
    .split(/\r?\n/)
    .map((line, index) => (index === 0 ? markup`${line}` : markup`<br>${line}`));
  return markup`<blockquote style="margin:0 0 16px 0;padding:12px 16px;background-color:${colours.quote};border-left:3px solid ${colours.border};">${lines}</blockquote>`;
}

/** Label / value rows, for the figures of a summary. */
export function figures(rows: Array<[label: string, value: string]>): SafeHtml {
  return markup`<table role="presentation" cellpadding="0" cellspacing="0" style="margin:0 0 16px 0;border-collapse:collapse;">${rows.map(
    ([label, value]) =>
      markup`<tr><td style="padding:4px 16px 4px 0;color:${colours.muted};vertical-align:top;">${label}</td><td style="padding:4px 0;vertical-align:top;">${value}</td></tr>`,
  )}</table>`;
}

/**
 * Wraps a mail's body in the common page: the Mixmark name, a heading, the body, and a footer
 * line saying why the reader got it.
 * @returns a complete HTML document
 */
export function renderMailLayout(parts: {
  title: string;
  heading: string;
  body: SafeHtml[];
  footer: string;
}): string {
  return markup`<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${parts.title}</title>
</head>
<body style="margin:0;padding:0;background-color:${colours.page};">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="background-color:${colours.page};">
<tr><td align="center" style="padding:24px 12px;">
<table role="presentation" width="100%" cellpadding="0" cellspacing="0" style="max-width:560px;background-color:${colours.card};border:1px solid ${colours.border};">
<tr><td style="padding:22px 28px 0 28px;font-family:${font};font-size:13px;letter-spacing:1px;color:${colours.muted};">MIXMARK</td></tr>
<tr><td style="padding:8px 28px 12px 28px;font-family:${font};font-size:16px;line-height:1.55;color:${colours.text};">
<h1 style="margin:0 0 18px 0;font-size:22px;font-weight:normal;line-height:1.3;">${parts.heading}</h1>
${parts.body}
</td></tr>
</table>
<p style="max-width:560px;margin:14px auto 0 auto;font-family:${font};font-size:12px;line-height:1.5;color:${colours.muted};">${parts.footer}</p>
</td></tr>
</table>
</body>
</html>
`.value;
}
