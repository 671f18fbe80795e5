// `node scripts/fake-smtp.mjs [--host 127.0.0.1] [--port 2525] [--dir .data/outbox]`: the fake
// SMTP server on its own, for trying mails by hand. Each message is kept as .eml + .json.
import { join, resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { SetupError, runMain } from './lib/errors.mjs';
import { startFakeSmtp } from './lib/fake-smtp.mjs';
import { rootDir } from './lib/project.mjs';

runMain(async () => {
  let values;
  try {
    ({ values } = parseArgs({
      options: {
        host: { type: 'string', default: '127.0.0.1' },
        port: { type: 'string', default: '2525' },
        dir: { type: 'string', default: join(rootDir, '.data', 'outbox') },
      },
    }));
  } catch (error) {
    throw new SetupError(
      `${error.message}; usage: node scripts/fake-smtp.mjs --port 2525 --dir .data/outbox`,
    );
  }
  const port = Number(values.port);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new SetupError(
      `--port must be a port number between 0 and 65535 but is "${values.port}"`,
    );
  }
  const smtp = await startFakeSmtp({
    host: values.host,
    port,
    dir: resolve(values.dir),
    onMessage: (message) =>
      console.log(`${message.receivedAt}  ${message.to.join(', ')}  ${message.subject}`),
  });
  console.log(
    `Fake SMTP on smtp://${smtp.host}:${smtp.port}, keeping messages in ${smtp.dir} (Ctrl+C stops it)`,
  );
  const stop = () => smtp.close().then(() => process.exit(0));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
});
