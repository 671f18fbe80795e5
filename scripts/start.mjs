// `npm start`: sets up everything on a fresh clone and runs Mixmark with its demo data.
// `npm start -- --dev` (or `npm run dev`): the same, with Vite's dev server and the API in watch mode.
import { ensureDependencies } from './lib/bootstrap.mjs';
import { runMain } from './lib/errors.mjs';
import { rootDir } from './lib/project.mjs';

const dev = process.argv.includes('--dev');

runMain(async () => {
  const started = Date.now();
  await ensureDependencies(rootDir);
  // Loaded only now: these may use what was just installed.
  const { Stack } = await import('./lib/stack.mjs');
  const stack = new Stack({ dev });

  let stopping = false;
  const stop = async (reason, code) => {
    if (stopping) return;
    stopping = true;
    console.log(`\nStopping Mixmark (${reason})...`);
    await stack.stop();
    console.log('Stopped. Your data stays in the cluster for the next start.');
    process.exit(code);
  };
  for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(signal, () => stop(signal, 0));
  stack.onExit((name, exitCode) => {
    if (!stopping) {
      console.error(`mixmark: the ${name} stopped unexpectedly (exit ${exitCode}).`);
      stop(`${name} exited`, 1);
    }
  });

  try {
    await stack.start();
  } catch (error) {
    // A Ctrl-C during start-up also makes the step in progress fail: let the signal's stop finish.
    if (stopping) return new Promise(() => {});
    stopping = true;
    await stack.stop();
    throw error;
  }
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  console.log(stack.banner(seconds));
});

