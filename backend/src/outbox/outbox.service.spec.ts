import { existsSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from '@jest/globals';
import { NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { OutboxService } from './outbox.service';

function keep(dir: string, id: string, receivedAt: string, subject: string): void {
  const stem = `${receivedAt.replace(/[:.]/g, '-')}-${id}`;
  writeFileSync(join(dir, `${stem}.eml`), `Subject: ${subject}\r\n\r\nbody\r\n`);
  writeFileSync(
    join(dir, `${stem}.json`),
    JSON.stringify({
      id,
      receivedAt,
      from: 'Mixmark <no-reply@mixmark.test>',
      to: ['maren@studio.test'],
      subject,
      text: `${subject} (text)`,
      html: `<p>${subject}</p>`,
    }),
  );
}

async function serviceFor(dir: string): Promise<OutboxService> {
  const moduleRef = await Test.createTestingModule({
    providers: [OutboxService, { provide: ConfigService, useValue: { getOrThrow: () => dir } }],
  }).compile();
  return moduleRef.get(OutboxService);
}

describe('OutboxService', () => {
  let dir: string;
  let outboxService: OutboxService;

  beforeEach(async () => {
    dir = mkdtempSync(join(tmpdir(), 'mixmark-outbox-'));
    keep(dir, 'aaa111', '2031-03-04T09:00:00.000Z', 'Older');
    keep(dir, 'bbb222', '2031-03-04T10:00:00.000Z', 'Newer');
    outboxService = await serviceFor(dir);
  });

  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('should list messages newest first without their bodies', async () => {
    await expect(outboxService.findAll()).resolves.toEqual([
      {
        id: 'bbb222',
        receivedAt: '2031-03-04T10:00:00.000Z',
        from: 'Mixmark <no-reply@mixmark.test>',
        to: ['maren@studio.test'],
        subject: 'Newer',
      },
      {
        id: 'aaa111',
        receivedAt: '2031-03-04T09:00:00.000Z',
        from: 'Mixmark <no-reply@mixmark.test>',
        to: ['maren@studio.test'],
        subject: 'Older',
      },
    ]);
  });

  it('should read one message with its text and HTML', async () => {
    await expect(outboxService.findOne('aaa111')).resolves.toMatchObject({
      id: 'aaa111',
      subject: 'Older',
      text: 'Older (text)',
      html: '<p>Older</p>',
    });
  });

  it('should answer 404 with one sentence for an unknown or malformed id', async () => {
    for (const id of ['zzz999', '../etc/passwd', '']) {
      const finding = outboxService.findOne(id);
      await expect(finding).rejects.toBeInstanceOf(NotFoundException);
      await expect(finding).rejects.toThrow('There is no message with this id in the outbox.');
    }
  });

  it('should clear the messages and leave other files alone', async () => {
    writeFileSync(join(dir, 'README.txt'), 'not a message');
    await expect(outboxService.removeAll()).resolves.toEqual({ removed: 2 });
    expect(readdirSync(dir)).toEqual(['README.txt']);
    await expect(outboxService.findAll()).resolves.toEqual([]);
  });

  it('should skip a sidecar it cannot read instead of failing the list', async () => {
    writeFileSync(join(dir, '2031-03-04T11-00-00-000Z-ccc333.json'), '{ half a mess');
    await expect(outboxService.findAll()).resolves.toHaveLength(2);
  });

  it('should treat an outbox folder that does not exist yet as empty', async () => {
    const missing = join(dir, 'not-yet');
    const service = await serviceFor(missing);
    await expect(service.findAll()).resolves.toEqual([]);
    await expect(service.removeAll()).resolves.toEqual({ removed: 0 });
    expect(existsSync(missing)).toBe(false);
  });
});
