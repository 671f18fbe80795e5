import type { CardLayout } from './card-layout.types';
import { cardPrimitives } from './card-drawing';

const escapeXml = (text: string): string =>
  text.replace(/[<>&"]/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;' })[c]!);

const n = (v: number): string => Number(v.toFixed(3)).toString();

/**
 * The card as an SVG document in millimetre user units (viewBox = card size), on white.
 * Windows are drawn as paper here; the PNG renderer makes them transparent.
 *
 * @param layout - the card layout
 * @returns SVG text
 * @example
 * renderCardSvg(buildCardLayout({ kind: 'match' })).startsWith('<svg'); // true
 */
export function renderCardSvg(layout: CardLayout): string {
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${layout.width}mm" height="${layout.height}mm" viewBox="0 0 ${layout.width} ${layout.height}">`,
    `<rect x="0" y="0" width="${layout.width}" height="${layout.height}" fill="#fff"/>`,
  ];
  for (const p of cardPrimitives(layout)) {
    if (p.type === 'rect') {
      const { x, y, w, h } = p.rect;
      parts.push(
        `<rect x="${n(x)}" y="${n(y)}" width="${n(w)}" height="${n(h)}" fill="rgb(${p.grey},${p.grey},${p.grey})"/>`,
      );
    } else if (p.type === 'modules') {
      const m = p.rect.w / p.size;
      let d = '';
      for (let r = 0; r < p.size; r++) {
        for (let c = 0; c < p.size; c++) {
          if (p.dark[r * p.size + c])
            d += `M${n(p.rect.x + c * m)} ${n(p.rect.y + r * m)}h${n(m)}v${n(m)}h${n(-m)}z`;
        }
      }
      parts.push(`<path d="${d}" fill="#000" shape-rendering="crispEdges"/>`);
    } else if (p.type === 'cut') {
      const { x, y, w, h } = p.rect;
      const dash = p.dashed ? ' stroke-dasharray="1.5 1"' : '';
      parts.push(
        `<rect x="${n(x)}" y="${n(y)}" width="${n(w)}" height="${n(h)}" fill="none" stroke="#777" stroke-width="0.25"${dash}/>`,
      );
    } else if (p.type === 'bar') {
      const { x, y, w, h } = p.rect;
      parts.push(`<rect x="${n(x)}" y="${n(y)}" width="${n(w)}" height="${n(h)}" fill="#000"/>`);
      for (let k = 0; k <= 5; k++) {
        parts.push(
          `<rect x="${n(x + k * 10 - 0.1)}" y="${n(y - 1)}" width="0.2" height="1" fill="#000"/>`,
        );
      }
    } else {
      parts.push(
        `<text x="${n(p.x)}" y="${n(p.y)}" font-family="DejaVu Sans, sans-serif" font-size="${p.size}" fill="#222">${escapeXml(p.text)}</text>`,
      );
    }
  }
  parts.push('</svg>');
  return parts.join('\n');
}
