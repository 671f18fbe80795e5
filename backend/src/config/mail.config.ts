import { existsSync, readFileSync } from 'node:fs';
import { dirname, isAbsolute, join, resolve } from 'node:path';
import { registerAs } from '@nestjs/config';
import { object, string } from 'yup';
import { validateConfig } from './validate-config';
import type { MailConfig } from './config.type';

/** "Name <address>" or a bare address, with one @ and no spaces in the address. */
const mailboxPattern = /^(?:[^<>]*<[^<>@\s]+@[^<>@\s]+>|[^<>@\s]+@[^<>@\s]+)$/;

const schema = object({
  SMTP_URL: string()
    .matches(
      /^smtps?:\/\/[^/\s]+/,
      'SMTP_URL must be an smtp:// or smtps:// URL, e.g. smtp://127.0.0.1:2525',
    )
    .default('smtp://127.0.0.1:2525'),
  MAIL_FROM: string()
    .matches(
      mailboxPattern,
      'MAIL_FROM must be an address such as "Mixmark <no-reply@mixmark.test>"',
    )
    .default('Mixmark <no-reply@mixmark.test>'),
  OUTBOX_DIR: string().optional(),
  // When the weekly progress digest goes out: five cron fields in UTC, or "off".
  DIGEST_CRON: string()
    .trim()
    .matches(
      /^(off|(\S+\s+){4}\S+)$/,
      'DIGEST_CRON must be five cron fields in UTC such as "0 7 * * 1" (Mondays 07:00), or "off"',
    )
    .default('0 7 * * 1'),
});

/**
 * The repository root: the nearest folder up from `start` whose package.json declares
 * workspaces. Found from the working directory (not the module's own path), so it works the
 * same from `npm start` at the root, from `backend/`, and under jest's ESM mode.
 */
function findRepoRoot(start: string): string {
  for (let dir = resolve(start); ; dir = dirname(dir)) {
    const manifest = join(dir, 'package.json');
    if (existsSync(manifest)) {
      try {
        if ((JSON.parse(readFileSync(manifest, 'utf8')) as { workspaces?: unknown }).workspaces)
          return dir;
      } catch {
        // An unreadable package.json is not the root; keep looking up.
      }
    }
    if (dirname(dir) === dir) return resolve(start);
  }
}

/**
 * Reads the mail settings from the environment: where to hand mail over (`SMTP_URL`, with
 * credentials in the URL if the server needs them), the sender (`MAIL_FROM`), and the folder the
 * fake SMTP server keeps messages in (`OUTBOX_DIR`, relative paths from the repository root).
 * @example readMailConfig({ SMTP_URL: 'smtp://127.0.0.1:2525' }).from // 'Mixmark <no-reply@mixmark.test>'
 */
export function readMailConfig(
  env: Record<string, string | undefined> = process.env,
  cwd = process.cwd(),
): MailConfig {
  const parsed = validateConfig(schema, env);
  const outboxDir = parsed.OUTBOX_DIR || join('.data', 'outbox');
  return {
    smtpUrl: parsed.SMTP_URL,
    from: parsed.MAIL_FROM,
    outboxDir: isAbsolute(outboxDir) ? outboxDir : join(findRepoRoot(cwd), outboxDir),
    digestCron: parsed.DIGEST_CRON === 'off' ? null : parsed.DIGEST_CRON,
  };
}

export default registerAs('mail', (): MailConfig => readMailConfig());
