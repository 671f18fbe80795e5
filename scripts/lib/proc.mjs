import { spawn } from 'node:child_process';
import { SetupError } from './errors.mjs';

/**
 * Runs a command to completion. Output is inherited unless `capture` is set, in which case
 * stdout and stderr are returned. Rejects with a SetupError naming the command on failure.
 *
 * @param {string} command
 * @param {string[]} args
 * @param {{ cwd?: string, env?: NodeJS.ProcessEnv, capture?: boolean, allowFailure?: boolean, label?: string, detached?: boolean }} [options]
 * @returns {Promise<{ code: number | null, signal: NodeJS.Signals | null, stdout: string, stderr: string }>}
 */
export function run(
  command,
  args,
  { cwd, env, capture = false, allowFailure = false, label, detached = false } = {},
) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, {
      cwd,
      env: env ?? process.env,
      detached,
      stdio: capture ? ['ignore', 'pipe', 'pipe'] : ['ignore', 'inherit', 'inherit'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout?.on('data', (chunk) => (stdout += chunk));
    child.stderr?.on('data', (chunk) => (stderr += chunk));
    child.on('error', (error) =>
      reject(new SetupError(`could not run ${label ?? command}: ${error.message}`)),
    );
    child.on('close', (code, signal) => {
      if (code === 0 || allowFailure) {
        resolve({ code, signal, stdout, stderr });
        return;
      }
      const tail = (stderr || stdout).trim().split('\n').slice(-3).join(' | ');
      reject(
        new SetupError(
          `${label ?? [command, ...args].join(' ')} failed (exit ${code ?? signal})${tail ? `: ${tail}` : ''}`,
        ),
      );
    });
  });
}

/** True when `command` can be found on PATH. */
export async function onPath(command) {
  const { code } = await run('sh', ['-c', `command -v ${command}`], {
    capture: true,
    allowFailure: true,
  });
  return code === 0;
}

/** True when this process runs as root (where initdb must be run as another user). */
export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}
