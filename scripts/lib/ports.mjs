import net from 'node:net';
import { SetupError } from './errors.mjs';

/** Resolves true when nothing listens on host:port (we could bind it ourselves). */
export function isPortFree(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen({ port, host, exclusive: true }, () => server.close(() => resolve(true)));
  });
}

/** Throws a one-line SetupError when host:port is taken, naming the variable that moves it. */
export async function assertPortFree(port, { host = '127.0.0.1', what, envName }) {
  if (await isPortFree(port, host)) return;
  throw new SetupError(
    `port ${port} on ${host} (for ${what}) is already in use by another program: stop that program, ` +
      `or choose another port with ${envName}=<port>`,
  );
}

/** A port the OS reports free right now (for throwaway test servers). */
export function freePort(host = '127.0.0.1') {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen({ port: 0, host }, () => {
      const { port } = server.address();
      server.close(() => resolve(port));
    });
  });
}

/** Parses a port from the environment, with a clear message for nonsense. */
export function portFromEnv(envName, fallback, env = process.env) {
  const raw = env[envName];
  if (raw === undefined || raw === '') return fallback;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new SetupError(`${envName} must be a port number between 1 and 65535 but is "${raw}"`);
  }
  return port;
}
