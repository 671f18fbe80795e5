import { screen } from '@testing-library/react';
import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { healthyReply } from '@/testing/mocks/handlers';
import { server } from '@/testing/mocks/server';
import { renderApp } from '@/testing/test-utils';
import { HealthStatus } from './health-status';

describe('HealthStatus', () => {
  it('should say the database is connected when the server reports it up', async () => {
    renderApp(<HealthStatus />);
    expect(await screen.findByText(/database connected \(PostgreSQL 15\.18, answered in 1\.4 ms\)/)).toBeInTheDocument();
  });

  it('should say the database is not answering when the server replies 503', async () => {
    server.use(
      http.get('*/api/health', () =>
        HttpResponse.json(
          { ...healthyReply, status: 'degraded', database: { up: false, latencyMs: null, serverVersion: null, migrationsPending: null } },
          { status: 503 },
        ),
      ),
    );
    renderApp(<HealthStatus />);
    expect(await screen.findByText('Server 0.1.0 is up, but the database is not answering.')).toBeInTheDocument();
  });

  it('should tell the person when the server cannot be reached at all', async () => {
    server.use(http.get('*/api/health', () => HttpResponse.error()));
    renderApp(<HealthStatus />);
    expect(await screen.findByText(/Mixmark cannot reach its server/)).toBeInTheDocument();
  });

  it('should mention pending migrations', async () => {
    server.use(http.get('*/api/health', () => HttpResponse.json({ ...healthyReply, database: { ...healthyReply.database, migrationsPending: 2 } })));
    renderApp(<HealthStatus />);
    expect(await screen.findByText(/2 migrations pending/)).toBeInTheDocument();
  });
});
