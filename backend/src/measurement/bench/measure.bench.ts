/**
 * Speed and memory of the photo measurement (issue 4), beside sharp's own decode-and-shrink
 * of the same file to the same working size, measured in the same run as the floor:
 *   npm run bench:measure -w backend
 * The photos are made here with sharp (the card PNG, turned and placed on a noisy table);
 * the test scene generator lives under testing/ and is not part of the build.
 */
import { execFile } from 'node:child_process';
import { mkdtemp, readFile, writeFile } from 'node:fs/promises';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { buildCardLayout } from '../../cards/card-layout';
import { renderCardPng } from '../../cards/render-card-png';
import { measurePhoto } from '../measure-photo';

async function photo(width: number, height: number): Promise<Buffer> {
  const { png } = await renderCardPng(buildCardLayout({ kind: 'value-ladder', steps: 5 }), 300);
  const card = await sharp(
    await sharp(png)
      .resize(Math.round(0.55 * width))
      .toBuffer(),
  )
    .flatten({ background: '#8a5a40' })
    .rotate(17, { background: '#50453a' })
    .toBuffer();
  const meta = await sharp(card).metadata();
  const noise = await sharp({
    create: {
      width,
      height,
      channels: 3,
      background: '#000',
      noise: { type: 'gaussian', mean: 90, sigma: 12 },
    },
  })
    .png()
    .toBuffer();
  return sharp(noise)
    .composite([
      {
        input: card,
        left: Math.round((width - meta.width!) / 2),
        top: Math.round((height - meta.height!) / 2),
      },
    ])
    .linear(0.85, 12)
    .jpeg({ quality: 90 })
    .toBuffer();
}

const cpuMs = (u: NodeJS.CpuUsage): number => (u.user + u.system) / 1000;

const median = (values: number[]): number =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function bench(
  label: string,
  width: number,
  height: number,
  warmUps: number,
  runs: number,
): Promise<void> {
  const jpeg = await photo(width, height);
  const floors: number[] = [];
  // CPU time of this process (all its threads) beside the wall time: on cores shared with
  // other work the wall time also counts waiting for a core, the CPU time much less so.
  const floorCpus: number[] = [];
  const totalCpus: number[] = [];
  const totals: number[] = [];
  const stages = {
    decode: [] as number[],
    detect: [] as number[],
    fit: [] as number[],
    sample: [] as number[],
  };
  let ok = true;
  // Warm-up runs first, timed apart: V8 compiles and re-optimises the measurement over its
  // first few photos (at 12 MP the first takes about twice the steady time and detection
  // settles after about five), which a grading worker pays once at start. The median below
  // is a warm worker's; the warm-up figures are printed beside it, and the two-process
  // figure further down includes start-up and warm-up in full.
  const warm: number[] = [];
  for (let i = -warmUps; i < runs; i++) {
    // No forced collection between runs: a full collection per photo is what the service flag
    // avoids (see serviceFlags), and forcing one here would measure the recompiling it causes.
    let factor = 1;
    while (Math.max(width, height) / factor > 2048) factor *= 2;
    let t = performance.now();
    let cpu = process.cpuUsage();
    await sharp(jpeg)
      .resize(Math.round(width / factor), Math.round(height / factor), {
        fit: 'fill',
        kernel: 'linear',
      })
      .raw()
      .toBuffer();
    const floorMs = performance.now() - t;
    const floorCpu = cpuMs(process.cpuUsage(cpu));
    t = performance.now();
    cpu = process.cpuUsage();
    const { result, timings } = await measurePhoto(jpeg);
    const totalMs = performance.now() - t;
    const totalCpu = cpuMs(process.cpuUsage(cpu));
    ok &&= result.ok;
    if (i < 0) {
      warm.push(totalMs);
      continue;
    }
    floors.push(floorMs);
    floorCpus.push(floorCpu);
    totalCpus.push(totalCpu);
    totals.push(totalMs);
    for (const key of Object.keys(stages) as (keyof typeof stages)[])
      stages[key].push(timings[key]);
  }
  const total = median(totals);
  const floor = median(floors);
  const shares = {
    decode: median(stages.decode),
    detect: median(stages.detect),
    fit: median(stages.fit),
    sample: median(stages.sample),
  };
  const sum = shares.decode + shares.detect + shares.fit + shares.sample;
  const pct = (v: number): string => `${Math.round((100 * v) / sum)} %`;
  console.log(
    `${label} (${width}×${height}, ${(jpeg.length / 1e6).toFixed(1)} MB JPEG, measured ${ok ? 'ok' : 'WITH ERRORS'}): ` +
      `median ${total.toFixed(0)} ms end to end; floor (sharp decode + shrink) ${floor.toFixed(0)} ms; ratio ${(total / floor).toFixed(2)}×; ` +
      `CPU time ${median(totalCpus).toFixed(0)} ms against the floor's ${median(floorCpus).toFixed(0)} ms (${(median(totalCpus) / median(floorCpus)).toFixed(2)}×); ` +
      `shares (stage medians): decode ${pct(shares.decode)}, detect ${pct(shares.detect)}, fit ${pct(shares.fit)}, sample ${pct(shares.sample)} ` +
      `(${shares.decode.toFixed(0)} / ${shares.detect.toFixed(0)} / ${shares.fit.toFixed(0)} / ${shares.sample.toFixed(0)} ms; ` +
      `median of ${runs} runs after ${warmUps} warm-up runs of ${warm.map((v) => v.toFixed(0)).join(', ')} ms)`,
  );
}

/** Child mode: measures one photo file `runs` times in a fresh process and prints the wall
 * time and the process's peak RSS (so the figure is the measurement's own, not the bench's). */
async function child(file: string, runs: number): Promise<void> {
  sharp.concurrency(1);
  const bytes = await readFile(file);
  const t = performance.now();
  let ok = true;
  // Per-photo time after the first five (start-up and V8's warm-up), timed inside the process.
  const warmUps = Math.min(5, Math.floor(runs / 2));
  let warm = t;
  for (let i = 0; i < runs; i++) {
    if (i === warmUps) warm = performance.now();
    ok &&= (await measurePhoto(bytes)).result.ok;
  }
  const ms = performance.now() - t;
  const steadyMs = runs > warmUps ? (performance.now() - warm) / (runs - warmUps) : 0;
  // VmHWM is this process's own peak (Linux); getrusage's maxRSS is not used here because
  // Linux carries the forking parent's peak over into the child's.
  const status = await readFile('/proc/self/status', 'utf8').catch(() => '');
  const hwm = /VmHWM:\s+(\d+) kB/.exec(status);
  const maxRssMb = (hwm ? Number(hwm[1]) : process.resourceUsage().maxRSS) / 1024;
  process.stdout.write(JSON.stringify({ ms, steadyMs, ok, maxRssMb }) + '\n');
}

type ChildReport = { ms: number; steadyMs: number; ok: boolean; maxRssMb: number };

/** The V8 flag the server and the workers run with (package.json, scripts/lib/node-flags.mjs):
 * a larger first old-generation limit. Without it V8 settles, in a process this small, into a
 * full collection for nearly every photo, and each one drops the optimised code of the
 * closures jsQR and array callbacks make per call, which are then compiled again on a
 * background thread (docs/measurement.md, "Two processes at once"). */
const serviceFlags = ['--initial-old-space-size=64'];

function runChild(file: string, runs: number, flags: string[]): Promise<ChildReport> {
  return new Promise((done, fail) => {
    execFile(
      process.execPath,
      [...flags, __filename, '--child', file, String(runs)],
      (error, stdout) => (error ? fail(error) : done(JSON.parse(stdout) as ChildReport)),
    );
  });
}

/** Peak memory of one photo in its own process, and the throughput of one process against
 * two at once (two cores): photos per second, each process measuring `runs` photos; with the
 * service's V8 flag and with Node's defaults, side by side. */
async function processes(label: string, width: number, height: number, runs: number) {
  const folder = await mkdtemp(join(tmpdir(), 'mixmark-bench-'));
  const file = join(folder, 'photo.jpg');
  await writeFile(file, await photo(width, height));
  for (const [name, flags] of [
    [serviceFlags.join(' '), serviceFlags],
    ["Node's defaults", []],
  ] as const) {
    const empty = await runChild(file, 0, [...flags]);
    const one = await runChild(file, 1, [...flags]);
    // Both figures are wall time in this process around whole child processes (start-up
    // included on both sides; the first version timed the single child from inside it and
    // the pair from outside, which made the pair look slower than it is).
    let t = performance.now();
    const single = await runChild(file, runs, [...flags]);
    const singleMs = performance.now() - t;
    t = performance.now();
    const pair = await Promise.all([
      runChild(file, runs, [...flags]),
      runChild(file, runs, [...flags]),
    ]);
    const pairMs = performance.now() - t;
    // Two processes can only double the throughput on two idle cores: the load average (1, 5
    // and 15 min) is printed beside the figure so that a run on busy cores is read as such.
    const load = loadavg()
      .map((v) => v.toFixed(1))
      .join(' / ');
    const perSecond = (photos: number, ms: number): number => (1000 * photos) / ms;
    const alone = perSecond(runs, singleMs);
    const together = perSecond(2 * runs, pairMs);
    // Warm: each process's own time per photo after its first five, summed over the pair.
    const warmAlone = 1000 / single.steadyMs;
    const warmTogether = pair.reduce((sum, r) => sum + 1000 / r.steadyMs, 0);
    console.log(
      `${label}, ${name}: peak RSS of a process measuring one photo ${one.maxRssMb.toFixed(0)} MB ` +
        `(${(one.maxRssMb - empty.maxRssMb).toFixed(0)} MB above the same process measuring none, ${empty.maxRssMb.toFixed(0)} MB); ` +
        `throughput one process ${alone.toFixed(2)} photos/s, two processes at once ${together.toFixed(2)} photos/s ` +
        `(${(together / alone).toFixed(2)}×; ${runs} photos each, start-up included); ` +
        `warm (after five photos) ${warmAlone.toFixed(2)} against ${warmTogether.toFixed(2)} photos/s (${(warmTogether / warmAlone).toFixed(2)}×; load average ${load} on ${availableParallelism()} cores)${[one, single, ...pair].every((r) => r.ok) ? '' : ' WITH ERRORS'}`,
    );
  }
}

async function main(): Promise<void> {
  sharp.concurrency(1);
  const before = process.memoryUsage().rss;
  await bench('12 MP', 4032, 3024, 5, 15);
  await bench('48 MP', 8064, 6048, 3, 5);
  console.log(
    `load average ${loadavg()
      .map((v) => v.toFixed(1))
      .join(
        ' / ',
      )}; peak RSS of the bench process ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB (started at ${(before / 1048576).toFixed(0)} MB; includes making the test photos); one libvips thread; V8 flags of the bench process: ${process.execArgv.join(' ') || 'none'}`,
  );
  await processes('12 MP', 4032, 3024, 24);
  await processes('48 MP', 8064, 6048, 8);
}

const argv = process.argv.slice(2);
(argv[0] === '--child' ? child(argv[1], Number(argv[2])) : main()).catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
