import type { Health } from '@mixmark/common';
import { http, HttpResponse } from 'msw';

/** A healthy server, as `GET /api/health` answers it. */
export const healthyReply: Health = {
  status: 'ok',
  version: '0.1.0',
  uptimeSeconds: 12,
  database: { up: true, latencyMs: 1.4, serverVersion: '15.18', migrationsPending: 0 },
};

export const handlers = [
  http.get('*/api/health', () => HttpResponse.json(healthyReply)),
  // As in production: no development outbox (tests of the outbox page answer it themselves).
  http.get('*/api/dev/outbox', () =>
    HttpResponse.json({ statusCode: 404, code: 'not_found', message: 'Cannot GET /api/dev/outbox' }, { status: 404 }),
  ),
];
