import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { CreateBucketCommand, HeadObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { INestApplication } from '@nestjs/common';
import S3rver from 's3rver';
import request from 'supertest';
import { renderScene } from '../src/measurement/testing/photo-scene';
import { PhotoStorage } from '../src/storage/photo-storage';
import { S3PhotoStorage } from '../src/storage/s3-photo-storage';
import { createTestApp } from './create-test-app';
import { registerAccount, withEnv } from './helpers';
import { migratedTestDatabase } from './throwaway-cluster.mjs';

/** The whole upload → grade → show path with photos in an S3-compatible bucket (s3rver). */
describe('photos in an S3-compatible bucket (e2e, real PostgreSQL and a local S3 server)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'mixmark-s3-e2e-'));
  let server: S3rver;
  let client: S3Client;
  let app: INestApplication;

  beforeAll(async () => {
    server = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: dir });
    const { port } = await server.run();
    const endpoint = `http://127.0.0.1:${port}`;
    client = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials: { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' } });
    await client.send(new CreateBucketCommand({ Bucket: 'e2e-photos' }));
    // A database of its own: another file's server working the shared queue would look for these
    // photos in the local folder.
    const databaseUrl = await migratedTestDatabase('mixmark_s3_e2e');
    app = await withEnv(
      { DATABASE_URL: databaseUrl, STORAGE_DRIVER: 's3', S3_ENDPOINT: endpoint, S3_BUCKET: 'e2e-photos', S3_FORCE_PATH_STYLE: 'true', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' },
      () => createTestApp(),
    );
  }, 60_000);
  afterAll(async () => {
    await app?.close();
    client.destroy();
    await server.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('should store the upload in the bucket, grade it from there, draw its overlay there on first view and serve both back', async () => {
    expect(app.get(PhotoStorage)).toBeInstanceOf(S3PhotoStorage);
    const http = app.getHttpServer();
    const teacher = await registerAccount(app, 'teacher');
    const student = await registerAccount(app, 'student');
    const drill = await request(http).post('/api/drills').set(teacher.auth).send({ title: 'Bucket grey', kind: 'neutral', visibility: 'public', targets: [{ lab: { L: 55, a: 0, b: 0 } }] }).expect(201);
    const { jpeg } = await renderScene({
      kind: 'neutral', swatches: [{ L: 56, a: 0, b: 1 }], width: 1200, height: 900, cardFraction: 0.55, rotation: 3, tiltX: 2, tiltY: -2,
      ev: 0, cast: 'neutral', crossTalk: 0.01, flare: 0.01, vignetting: 0.1, noise: 1.5, jpegQuality: 88, seed: 5,
    });
    const created = await request(http).post('/api/attempts').set(student.auth).field('drillId', drill.body.id).attach('photo', jpeg, 'grey.jpg').expect(202);
    const id = created.body.id as string;
    let state = created.body.state as string;
    for (let i = 0; i < 240 && (state === 'queued' || state === 'measuring'); i += 1) {
      await new Promise((r) => setTimeout(r, 250));
      state = (await request(http).get(`/api/attempts/${id}`).set(student.auth).expect(200)).body.state;
    }
    expect(state).toBe('graded');
    const photo = await client.send(new HeadObjectCommand({ Bucket: 'e2e-photos', Key: `attempts/${id}/photo.jpg` }));
    expect(photo.ContentType).toBe('image/jpeg');
    // The overlay is drawn when first opened, from the photo in the bucket, and then kept there.
    await expect(client.send(new HeadObjectCommand({ Bucket: 'e2e-photos', Key: `attempts/${id}/overlay.jpg` }))).rejects.toMatchObject({ $metadata: { httpStatusCode: 404 } });
    const drawn = await request(http).get(`/api/attempts/${id}/overlay`).set(student.auth).expect(200);
    expect(drawn.headers['content-type']).toBe('image/jpeg');
    const overlay = await client.send(new HeadObjectCommand({ Bucket: 'e2e-photos', Key: `attempts/${id}/overlay.jpg` }));
    expect(overlay.ContentType).toBe('image/jpeg');
    expect(overlay.ContentLength).toBe(drawn.body.length);
    const served = await request(http).get(`/api/attempts/${id}/photo`).set(student.auth).expect(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(Number(served.headers['content-length'])).toBe(photo.ContentLength);
  }, 120_000);
});
