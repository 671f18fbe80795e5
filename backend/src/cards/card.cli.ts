/**
 * Writes a reference card:
 *   npm run -s card -w backend -- --kind <kind> [--steps N] --out <file.pdf|file.png> [--dpi N]
 *     [--paper a4|letter] [--id XXXXXXXX]
 * A PNG also gets `<file>.layout.json` (windows and patches in pixels of that PNG).
 * Messages go to stderr; exit 0 when written, 2 on a bad option.
 */
import { writeFile } from 'node:fs/promises';
import { parseArgs } from 'node:util';
import { buildCardLayout } from './card-layout';
import { cardKinds, isCardKind } from './card-kinds';
import { renderCardPdf } from './render-card-pdf';
import { renderCardPng } from './render-card-png';

const usage =
  'usage: card --kind <kind> [--steps N] --out <file.pdf|file.png> [--dpi N] [--paper a4|letter] [--id ID]';

function integerOption(name: string, value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  if (!/^-?\d+$/.test(value)) throw new Error(`Expected integer for ${name} but received ${value}`);
  return Number(value);
}

async function main(): Promise<void> {
  const { values } = parseArgs({
    options: {
      kind: { type: 'string' },
      steps: { type: 'string' },
      out: { type: 'string' },
      dpi: { type: 'string' },
      paper: { type: 'string' },
      id: { type: 'string' },
    },
    strict: true,
  });
  if (!values.kind || !values.out) throw new Error(usage);
  if (!isCardKind(values.kind)) {
    throw new Error(`Expected one of ${cardKinds.join(', ')} for kind but received ${values.kind}`);
  }
  const layout = buildCardLayout({
    kind: values.kind,
    steps: integerOption('steps', values.steps),
    id: values.id,
  });
  const out = values.out;
  if (/\.pdf$/i.test(out)) {
    if (values.dpi !== undefined)
      throw new Error('Expected no dpi for a PDF (it is vector, true size)');
    const paper = (values.paper ?? 'a4').toUpperCase();
    if (paper !== 'A4' && paper !== 'LETTER') {
      throw new Error(`Expected one of a4, letter for paper but received ${values.paper}`);
    }
    await writeFile(out, await renderCardPdf(layout, paper));
    console.error(
      `card: wrote ${out} (${layout.kind}, ${layout.steps} window(s), ${paper}, id ${layout.id})`,
    );
  } else if (/\.png$/i.test(out)) {
    const { png, layout: px } = await renderCardPng(
      layout,
      integerOption('dpi', values.dpi) ?? 300,
    );
    await writeFile(out, png);
    await writeFile(`${out}.layout.json`, `${JSON.stringify(px, null, 2)}\n`);
    console.error(
      `card: wrote ${out} and ${out}.layout.json (${px.width} × ${px.height} px at ${px.dpi} dpi)`,
    );
  } else {
    throw new Error(`Expected a file name ending in .pdf or .png for out but received ${out}`);
  }
}

main().catch((error: unknown) => {
  console.error(`card: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(2);
});
