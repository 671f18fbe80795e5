import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import nodemailer from 'nodemailer';
import request from 'supertest';
import { startFakeSmtp, type FakeSmtp } from '../../../scripts/lib/fake-smtp.mjs';
import { ApiExceptionFilter } from '../common/filters/api-exception.filter';
import { OutboxModule } from './outbox.module';

async function appFor(nodeEnv: string, outboxDir: string): Promise<INestApplication> {
  const moduleRef = await Test.createTestingModule({
    imports: [
      ConfigModule.forRoot({
        isGlobal: true,
        ignoreEnvFile: true,
        load: [() => ({ mail: { outboxDir } })],
      }),
      OutboxModule.register(nodeEnv),
    ],
  }).compile();
  const app = moduleRef.createNestApplication({ logger: false });
  app.setGlobalPrefix('api');
  app.useGlobalFilters(new ApiExceptionFilter());
  return app.init();
}

describe('OutboxController over HTTP', () => {
  let dir: string;
  let smtp: FakeSmtp;
  let app: INestApplication;

  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'mixmark-outbox-http-'));
    smtp = await startFakeSmtp({ port: 0, dir });
    app = await appFor('test', dir);
  });

  afterAll(async () => {
    await app.close();
    await smtp.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('should list, read and clear what the fake SMTP server received', async () => {
    const transport = nodemailer.createTransport({
      host: '127.0.0.1',
      port: smtp.port,
      ignoreTLS: true,
    });
    await transport.sendMail({
      from: 'Mixmark <no-reply@mixmark.test>',
      to: 'maren@studio.test',
      subject: 'An invitation to Thursday watercolour',
      text: 'Open https://mixmark.test/invitations/accept?token=t0k3n',
      html: '<a href="https://mixmark.test/invitations/accept?token=t0k3n">Join</a>',
    });
    transport.close();

    const list = await request(app.getHttpServer()).get('/api/dev/outbox').expect(200);
    expect(list.body).toHaveLength(1);
    expect(list.body[0]).toEqual({
      id: expect.any(String),
      receivedAt: expect.any(String),
      from: 'Mixmark <no-reply@mixmark.test>',
      to: ['maren@studio.test'],
      subject: 'An invitation to Thursday watercolour',
    });

    const one = await request(app.getHttpServer())
      .get(`/api/dev/outbox/${list.body[0].id}`)
      .expect(200);
    expect(one.body.text).toContain('token=t0k3n');
    expect(one.body.html).toContain('href="https://mixmark.test/invitations/accept?token=t0k3n"');

    await request(app.getHttpServer()).delete('/api/dev/outbox').expect(204);
    await request(app.getHttpServer()).get('/api/dev/outbox').expect(200, []);
  });

  it('should answer an unknown id with the one error shape', async () => {
    const response = await request(app.getHttpServer())
      .get('/api/dev/outbox/nothing-like-it')
      .expect(404);
    expect(response.body).toEqual({
      statusCode: 404,
      code: 'not_found',
      message: 'There is no message with this id in the outbox.',
    });
  });

  it('should not exist in production', async () => {
    const production = await appFor('production', dir);
    try {
      await request(production.getHttpServer()).get('/api/dev/outbox').expect(404);
      await request(production.getHttpServer()).delete('/api/dev/outbox').expect(404);
    } finally {
      await production.close();
    }
  });
});
