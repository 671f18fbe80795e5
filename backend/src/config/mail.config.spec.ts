import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from '@jest/globals';
import { readMailConfig } from './mail.config';

describe('mail configuration', () => {
  it('should default to the fake SMTP server and the outbox under the repository root', () => {
    const root = mkdtempSync(join(tmpdir(), 'mixmark-root-'));
    try {
      writeFileSync(join(root, 'package.json'), JSON.stringify({ workspaces: ['backend'] }));
      mkdirSync(join(root, 'backend'));
      expect(readMailConfig({}, join(root, 'backend'))).toEqual({
        smtpUrl: 'smtp://127.0.0.1:2525',
        from: 'Mixmark <no-reply@mixmark.test>',
        outboxDir: join(root, '.data', 'outbox'),
        digestCron: '0 7 * * 1',
      });
    } finally {
      rmSync(root, { recursive: true, force: true });
    }
  });

  it('should keep an absolute OUTBOX_DIR as given', () => {
    expect(readMailConfig({ OUTBOX_DIR: '/var/tmp/outbox' }).outboxDir).toBe('/var/tmp/outbox');
  });

  it('should take the digest schedule as five cron fields or "off"', () => {
    expect(readMailConfig({ DIGEST_CRON: '30 6 * * 1' }).digestCron).toBe('30 6 * * 1');
    expect(readMailConfig({ DIGEST_CRON: 'off' }).digestCron).toBeNull();
    expect(() => readMailConfig({ DIGEST_CRON: 'mondays' })).toThrow('DIGEST_CRON must be five cron fields in UTC');
  });

  it('should list every bad variable in one error', () => {
    expect(() => readMailConfig({ SMTP_URL: 'http://mail.test', MAIL_FROM: 'nobody' })).toThrow(
      /Invalid configuration:\n {2}- SMTP_URL must be an smtp:\/\/ or smtps:\/\/ URL, e\.g\. smtp:\/\/127\.0\.0\.1:2525\n {2}- MAIL_FROM must be an address such as "Mixmark <no-reply@mixmark\.test>"/,
    );
  });
});
