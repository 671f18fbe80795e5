// Tests of the fake SMTP server: a real message sent through nodemailer, read back from disk.
import assert from 'node:assert/strict';
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import net from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { after, before, describe, it } from 'node:test';
import nodemailer from 'nodemailer';
import { SetupError } from './errors.mjs';
import { listMessages, startFakeSmtp } from './fake-smtp.mjs';
import { parseMail } from './parse-mail.mjs';

describe('fake SMTP server', () => {
  let dir;
  let smtp;
  let transport;

  before(async () => {
    dir = mkdtempSync(join(tmpdir(), 'mixmark-outbox-'));
    smtp = await startFakeSmtp({ host: '127.0.0.1', port: 0, dir });
    transport = nodemailer.createTransport({ host: '127.0.0.1', port: smtp.port, ignoreTLS: true });
  });

  after(async () => {
    transport.close();
    await smtp.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('should listen on a free port when asked for port 0', () => {
    assert.ok(Number.isInteger(smtp.port) && smtp.port > 0);
  });

  it('should keep a sent message as .eml and .json with its text and HTML', async () => {
    await transport.sendMail({
      from: 'Mixmark <no-reply@mixmark.test>',
      to: 'Maren Quill <maren@studio.test>',
      bcc: 'archive@studio.test',
      subject: 'Your value ladder is marked: 82 — passed',
      text: 'Hello Maren,\nstep 3 is a little light: less water, a touch more paint.\n',
      html: '<p>Hello Maren,</p><p>Step 3 is a little <em>light</em>.</p>',
    });
    const names = readdirSync(dir).sort();
    assert.equal(names.length, 2);
    assert.match(names[0], /^\d{4}-\d\d-\d\dT\d\d-\d\d-\d\d-\d{3}Z-[0-9a-f]{12}\.eml$/);
    assert.equal(names[1], names[0].replace(/\.eml$/, '.json'));

    const record = JSON.parse(readFileSync(join(dir, names[1]), 'utf8'));
    assert.equal(record.from, 'Mixmark <no-reply@mixmark.test>');
    assert.deepEqual(record.to, ['maren@studio.test', 'archive@studio.test']);
    assert.equal(record.subject, 'Your value ladder is marked: 82 — passed');
    assert.equal(
      record.text,
      'Hello Maren,\nstep 3 is a little light: less water, a touch more paint.\n',
    );
    assert.equal(record.html, '<p>Hello Maren,</p><p>Step 3 is a little <em>light</em>.</p>');
    assert.ok(!Number.isNaN(Date.parse(record.receivedAt)));
    assert.ok(names[0].endsWith(`-${record.id}.eml`));

    const raw = readFileSync(join(dir, names[0]), 'utf8');
    assert.match(raw, /^Subject: /m);
    assert.doesNotMatch(
      raw,
      /^Bcc:/im,
      'the raw message is what the recipients get: no Bcc header',
    );
  });

  it('should list kept messages newest first', async () => {
    await transport.sendMail({
      from: 'a@mixmark.test',
      to: 'b@studio.test',
      subject: 'Second',
      text: '2',
    });
    const messages = await listMessages(dir);
    assert.deepEqual(
      messages.map((message) => message.subject),
      ['Second', 'Your value ladder is marked: 82 — passed'],
    );
  });

  it('should treat a missing folder as an empty outbox', async () => {
    assert.deepEqual(await listMessages(join(dir, 'nothing-here')), []);
  });

  it('should say in one line when the port is taken', async () => {
    const blocker = await new Promise((resolve) => {
      const server = net.createServer().listen(0, '127.0.0.1', () => resolve(server));
    });
    const { port } = blocker.address();
    try {
      await assert.rejects(startFakeSmtp({ port, dir }), (error) => {
        assert.ok(error instanceof SetupError);
        assert.match(
          error.message,
          new RegExp(
            `^port ${port} on 127\\.0\\.0\\.1 \\(for the fake SMTP server\\) is already in use`,
          ),
        );
        assert.doesNotMatch(error.message, /\n/);
        return true;
      });
    } finally {
      blocker.close();
    }
  });

  it('should refuse to start without a folder', async () => {
    await assert.rejects(startFakeSmtp({ port: 0 }), /needs a folder to keep messages in/);
  });
});

describe('parseMail', () => {
  it('should decode encoded-word subjects and quoted-printable, base64 bodies', () => {
    const raw = [
      'From: =?UTF-8?Q?Ren=C3=A9e?= <renee@studio.test>',
      'To: pupil@studio.test',
      'Subject: =?UTF-8?B?R3JpcyBjaGF1ZA==?=',
      '  =?UTF-8?Q?_et_fr=C3=B4le?=',
      'Content-Type: multipart/alternative; boundary="--b1"',
      '',
      'preamble',
      '----b1',
      'Content-Type: text/plain; charset=utf-8',
      'Content-Transfer-Encoding: quoted-printable',
      '',
      'Un gris l=C3=A9g=',
      '=C3=A8rement chaud',
      '----b1',
      'Content-Type: text/html; charset=utf-8',
      'Content-Transfer-Encoding: base64',
      '',
      Buffer.from('<p>Gris léger</p>').toString('base64'),
      '----b1--',
      '',
    ].join('\r\n');
    const mail = parseMail(raw);
    assert.equal(mail.from, 'Renée <renee@studio.test>');
    assert.equal(mail.subject, 'Gris chaud et frôle');
    assert.equal(mail.text, 'Un gris légèrement chaud');
    assert.equal(mail.html, '<p>Gris léger</p>');
  });

  it('should read a single-part plain message', () => {
    const mail = parseMail('From: a@x.test\r\nTo: b@x.test\r\nSubject: Hi\r\n\r\nHello\r\n');
    assert.equal(mail.subject, 'Hi');
    assert.equal(mail.text, 'Hello\n');
    assert.equal(mail.html, '');
  });
});
