// A local SMTP server that keeps every message it is given, for `npm start`, `npm test` and
// manual use. Nothing leaves the machine: each message becomes `<dir>/<timestamp>-<id>.eml`
// (the raw RFC 5322 text) and a `.json` sidecar that the app's dev outbox and the tests read.
import { randomBytes } from 'node:crypto';
import { mkdir, readdir, readFile, rename, writeFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { SMTPServer } from 'smtp-server';
import { SetupError } from './errors.mjs';
import { parseMail } from './parse-mail.mjs';

/** Largest message the fake accepts (a generous ceiling for mails with inline images). */
const maxMessageBytes = 25 * 1024 * 1024;

/**
 * The file name stem of a message: a sortable UTC timestamp, then the id.
 * @param {Date} receivedAt
 * @param {string} id
 */
function fileStem(receivedAt, id) {
  return `${receivedAt.toISOString().replace(/[:.]/g, '-')}-${id}`;
}

/**
 * Reads an SMTP DATA stream to the end.
 * @param {import('node:stream').Readable} stream
 * @returns {Promise<Buffer>}
 */
async function readStream(stream) {
  const chunks = [];
  for await (const chunk of stream) chunks.push(chunk);
  return Buffer.concat(chunks);
}

/**
 * Writes one received message and its sidecar. The sidecar goes last, through a rename, so a
 * reader that lists `*.json` never sees a half-written message.
 * @param {string} dir
 * @param {Buffer} raw
 * @param {{ mailFrom: false | { address: string }, rcptTo: { address: string }[] }} envelope
 * @returns {Promise<object>} the sidecar record
 */
async function keepMessage(dir, raw, envelope) {
  const id = randomBytes(6).toString('hex');
  const receivedAt = new Date();
  const stem = fileStem(receivedAt, id);
  const parsed = parseMail(raw);
  const envelopeFrom = envelope.mailFrom ? envelope.mailFrom.address : '';
  const record = {
    id,
    receivedAt: receivedAt.toISOString(),
    from: parsed.from || envelopeFrom,
    to: envelope.rcptTo.map((recipient) => recipient.address),
    subject: parsed.subject,
    text: parsed.text,
    html: parsed.html,
    messageId: parsed.messageId,
    envelope: { from: envelopeFrom, to: envelope.rcptTo.map((recipient) => recipient.address) },
  };
  await writeFile(join(dir, `${stem}.eml`), raw);
  const sidecar = join(dir, `${stem}.json`);
  await writeFile(`${sidecar}.partial`, `${JSON.stringify(record, null, 2)}\n`);
  await rename(`${sidecar}.partial`, sidecar);
  return record;
}

/**
 * Starts a local SMTP server on `host:port` that keeps every message in `dir`. It offers no
 * STARTTLS and takes any sign-in or none, so nodemailer talks to it with `ignoreTLS: true`.
 * A client's send resolves only after the files are written, so a test can read the message
 * straight after `sendMail` returns.
 *
 * @param {{ host?: string, port?: number, dir: string, onMessage?: (record: object) => void }} options
 *   `port` 0 (the default) picks a free port; `dir` is created if missing.
 * @returns {Promise<{ host: string, port: number, dir: string, close: () => Promise<void> }>}
 * @example
 * const smtp = await startFakeSmtp({ port: 0, dir: '.data/outbox' });
 * // … send through smtp://127.0.0.1:${smtp.port} …
 * await smtp.close();
 */
export async function startFakeSmtp({ host = '127.0.0.1', port = 0, dir, onMessage } = {}) {
  if (!dir)
    throw new SetupError('startFakeSmtp needs a folder to keep messages in (the dir option)');
  const outboxDir = resolve(dir);
  try {
    await mkdir(outboxDir, { recursive: true });
  } catch (error) {
    throw new SetupError(
      `cannot create the fake SMTP outbox folder ${outboxDir}: ${error.message}`,
    );
  }
  const server = new SMTPServer({
    name: 'mixmark-fake-smtp',
    banner: 'Mixmark fake SMTP: messages are kept locally, nothing is delivered',
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    size: maxMessageBytes,
    logger: false,
    // Open connections get this long to finish when closing, then are cut.
    closeTimeout: 2000,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'fake' });
    },
    onData(stream, session, callback) {
      readStream(stream)
        .then(async (raw) => {
          if (stream.sizeExceeded) {
            const error = new Error(`The message is larger than ${maxMessageBytes} bytes`);
            error.responseCode = 552;
            throw error;
          }
          const record = await keepMessage(outboxDir, raw, session.envelope);
          onMessage?.(record);
          callback(null, `Kept as ${record.id}`);
        })
        .catch((error) => {
          if (!error.responseCode) error.responseCode = 451;
          callback(error);
        });
    },
  });
  // smtp-server logs client errors (resets, timeouts) as events; a fake must not crash on them.
  server.on('error', () => {});

  await new Promise((resolvePromise, reject) => {
    const onListenError = (error) => {
      reject(
        error.code === 'EADDRINUSE'
          ? new SetupError(
              `port ${port} on ${host} (for the fake SMTP server) is already in use by another program: ` +
                'stop that program, or choose another port',
            )
          : new SetupError(
              `the fake SMTP server could not listen on ${host}:${port}: ${error.message}`,
            ),
      );
    };
    server.server.once('error', onListenError);
    server.listen(port, host, () => {
      server.server.off('error', onListenError);
      resolvePromise();
    });
  });

  return {
    host,
    port: server.server.address().port,
    dir: outboxDir,
    close: () => new Promise((resolvePromise) => server.close(() => resolvePromise())),
  };
}

/**
 * Lists the kept messages in `dir`, newest first, as their sidecar records (an absent folder
 * is an empty outbox). For tests that want to find "the mail to x@y.test".
 * @param {string} dir
 * @returns {Promise<object[]>}
 * @example
 * const [latest] = await listMessages(smtp.dir);
 */
export async function listMessages(dir) {
  let names;
  try {
    names = await readdir(dir);
  } catch (error) {
    if (error.code === 'ENOENT') return [];
    throw error;
  }
  const sidecars = names
    .filter((name) => name.endsWith('.json'))
    .sort()
    .reverse();
  return Promise.all(
    sidecars.map(async (name) => JSON.parse(await readFile(join(dir, name), 'utf8'))),
  );
}
