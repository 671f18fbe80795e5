/**
 * The accuracy suite's scenes for any seed set, rendered once to a folder and measured in
 * this process (the suite itself measures through the CLI; the code is the same):
 *   node dist/measurement/testing/accuracy-seeds.js render <folder> [seedBase]
 *   node dist/measurement/testing/accuracy-seeds.js measure <folder>
 * `measure` prints median, 95th percentile and largest ΔE00 and every reading, so a change
 * can be checked on seed sets other than the suite's (seedBase 1000) before it is kept.
 */
import { deltaE2000, type Lab } from '@mixmark/common';
import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import sharp from 'sharp';
import { measurePhoto } from '../measure-photo';
import { quantile } from '../robust-statistics';
import { accuracyScene, accuracySceneCount, accuracySceneSize } from './accuracy-scenes';
import { renderScene } from './photo-scene';

async function render(folder: string, seedBase: number): Promise<void> {
  await mkdir(folder, { recursive: true });
  for (let i = 0; i < accuracySceneCount; i++) {
    const options = accuracyScene(i, accuracySceneSize(i), seedBase);
    // A quality override draws the same scene saved at another JPEG quality (for diagnosis).
    if (process.env.SCENE_QUALITY) options.jpegQuality = Number(process.env.SCENE_QUALITY);
    const { jpeg, truth } = await renderScene(options);
    const name = String(i).padStart(2, '0');
    await writeFile(join(folder, `${name}.jpg`), jpeg);
    await writeFile(join(folder, `${name}.json`), JSON.stringify({ options, truth }));
  }
}

const fmt = (l: Lab): string => [l.L, l.a, l.b].map((v) => v.toFixed(1)).join('/');

async function measure(folder: string): Promise<void> {
  sharp.concurrency(1);
  const names = (await readdir(folder)).filter((n) => n.endsWith('.jpg')).sort();
  const errors: number[] = [];
  const lines: string[] = [];
  const missed: string[] = [];
  for (const name of names) {
    const { options, truth } = JSON.parse(
      await readFile(join(folder, name.replace('.jpg', '.json')), 'utf8'),
    ) as { options: ReturnType<typeof accuracyScene>; truth: Lab[] };
    const { result } = await measurePhoto(await readFile(join(folder, name)));
    if (!result.ok) {
      missed.push(`${name} ${result.errors.map((e) => e.code).join(',')}`);
      continue;
    }
    for (const r of result.readings) {
      const dE = deltaE2000(truth[r.window], r.lab);
      errors.push(dE);
      lines.push(
        `${name} ${options.kind} w${r.window} ${options.cast} ev${options.ev.toFixed(2)} q${options.jpegQuality} ΔE00 ${dE.toFixed(2)} ` +
          `truth ${fmt(truth[r.window])} read ${fmt(r.lab)} ppm ${result.card?.pixelsPerMm}`,
      );
    }
  }
  console.log(lines.join('\n'));
  console.log(`not measured: ${missed.join('; ') || 'none'}`);
  console.log(
    `${errors.length} readings: median ΔE00 ${quantile(errors, 0.5).toFixed(3)}, p95 ${quantile(errors, 0.95).toFixed(3)}, max ${Math.max(...errors).toFixed(2)}`,
  );
}

const [mode, folder, base] = process.argv.slice(2);
(mode === 'render' ? render(folder, Number(base ?? 1000)) : measure(folder)).catch(
  (error: unknown) => {
    console.error(error);
    process.exit(1);
  },
);
