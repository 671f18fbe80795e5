import PDFDocument from 'pdfkit';
import type { CardLayout } from './card-layout.types';
import { cardPrimitives } from './card-drawing';

/** Paper sizes the PDF comes in. */
export type PaperSize = 'A4' | 'LETTER';

const pt = 72 / 25.4;

/**
 * The card as a one-page PDF at true size (1 mm on paper = 1 mm on the card), centred on
 * A4 or US Letter, vector throughout, with a note above it on how to print it.
 *
 * @param layout - the card layout
 * @param paper - 'A4' (default) or 'LETTER'
 * @returns the PDF bytes
 * @example
 * const pdf = await renderCardPdf(buildCardLayout({ kind: 'match' }), 'LETTER');
 */
export function renderCardPdf(layout: CardLayout, paper: PaperSize = 'A4'): Promise<Buffer> {
  // A fixed date keeps the same card byte-identical from one run to the next.
  const doc = new PDFDocument({
    size: paper,
    margin: 0,
    info: { Title: `Mixmark reference card ${layout.id}`, CreationDate: new Date(0) },
  });
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve) =>
    doc.on('end', () => resolve(Buffer.concat(chunks))),
  );
  const left = (doc.page.width / pt - layout.width) / 2;
  const top = 30;
  const X = (mm: number): number => (left + mm) * pt;
  const Y = (mm: number): number => (top + mm) * pt;
  doc
    .font('Helvetica-Bold')
    .fontSize(14)
    .fillColor('#000')
    .text('Mixmark reference card', X(0), 12 * pt, { lineBreak: false });
  doc
    .font('Helvetica')
    .fontSize(10)
    .text(
      'Print at 100 %, no scaling, matte paper. Then cut along the outer line and the dashed windows.',
      X(0),
      19 * pt,
      { lineBreak: false },
    );
  for (const p of cardPrimitives(layout)) {
    if (p.type === 'rect') {
      const g = p.grey.toString(16).padStart(2, '0');
      doc.rect(X(p.rect.x), Y(p.rect.y), p.rect.w * pt, p.rect.h * pt).fill(`#${g}${g}${g}`);
    } else if (p.type === 'modules') {
      const m = p.rect.w / p.size;
      for (let r = 0; r < p.size; r++) {
        for (let c = 0; c < p.size; c++) {
          if (p.dark[r * p.size + c])
            doc.rect(X(p.rect.x + c * m), Y(p.rect.y + r * m), m * pt, m * pt);
        }
      }
      doc.fill('#000');
    } else if (p.type === 'cut') {
      doc.lineWidth(0.25 * pt).strokeColor('#777');
      if (p.dashed) doc.dash(1.5 * pt, { space: 1 * pt });
      doc.rect(X(p.rect.x), Y(p.rect.y), p.rect.w * pt, p.rect.h * pt).stroke();
      doc.undash();
    } else if (p.type === 'bar') {
      const { x, y, w, h } = p.rect;
      doc.rect(X(x), Y(y), w * pt, h * pt).fill('#000');
      for (let k = 0; k <= 5; k++)
        doc.rect(X(x + k * 10 - 0.1), Y(y - 1), 0.2 * pt, 1 * pt).fill('#000');
    } else {
      // pdfkit places text by its top; the layout gives baselines (about 0.8 of the size below).
      doc
        .font('Helvetica')
        .fontSize(p.size * pt)
        .fillColor('#222')
        .text(p.text, X(p.x), Y(p.y - p.size * 0.8), { lineBreak: false });
    }
  }
  doc.end();
  return done;
}
