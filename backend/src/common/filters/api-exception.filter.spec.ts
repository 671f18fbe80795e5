import { describe, expect, it, jest } from '@jest/globals';
import { BadRequestException, NotFoundException, PayloadTooLargeException, type ArgumentsHost } from '@nestjs/common';
import { ApiExceptionFilter } from './api-exception.filter';

function hostCapturing() {
  const sent: { status?: number; body?: unknown } = {};
  const response = {
    headersSent: false,
    status: jest.fn((status: number) => {
      sent.status = status;
      return response;
    }),
    json: jest.fn((body: unknown) => {
      sent.body = body;
      return response;
    }),
  };
  const host = { switchToHttp: () => ({ getResponse: () => response }) } as unknown as ArgumentsHost;
  return { host, sent };
}

describe('ApiExceptionFilter', () => {
  const filter = new ApiExceptionFilter();

  it('should give a Nest exception its status, a code from the status, and its message', () => {
    const { host, sent } = hostCapturing();
    filter.catch(new NotFoundException('There is no drill with this id.'), host);
    expect(sent).toEqual({ status: 404, body: { statusCode: 404, code: 'not_found', message: 'There is no drill with this id.' } });
  });

  it('should keep the code and details a service put in the exception body', () => {
    const { host, sent } = hostCapturing();
    filter.catch(
      new BadRequestException({ code: 'validation_failed', message: 'email must be a valid email', details: { email: 'email' } }),
      host,
    );
    expect(sent.body).toEqual({ statusCode: 400, code: 'validation_failed', message: 'email must be a valid email', details: { email: 'email' } });
  });

  it('should map 413 to payload_too_large', () => {
    const { host, sent } = hostCapturing();
    filter.catch(new PayloadTooLargeException('The photo is larger than 20 MB.'), host);
    expect(sent.body).toMatchObject({ statusCode: 413, code: 'payload_too_large' });
  });

  it('should keep the status of a parser error that is not a Nest exception', () => {
    const { host, sent } = hostCapturing();
    filter.catch(Object.assign(new Error('request entity too large'), { status: 413 }), host);
    expect(sent.body).toEqual({ statusCode: 413, code: 'payload_too_large', message: 'request entity too large' });
  });

  it('should hide the inside of an unexpected error behind a 500', () => {
    const { host, sent } = hostCapturing();
    jest.spyOn(console, 'error').mockImplementation(() => {});
    (filter as unknown as { logger: { error: () => void } }).logger.error = () => {};
    filter.catch(new Error('connection string postgres://secret@db leaked?'), host);
    expect(sent.status).toBe(500);
    expect(JSON.stringify(sent.body)).not.toContain('secret');
    expect(sent.body).toMatchObject({ statusCode: 500, code: 'internal_error' });
  });

  it('should answer 503 database_unavailable when the database cannot be reached, also through TypeORM', () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    const shutdown = Object.assign(new Error('terminating connection due to administrator command'), { code: '57P01' });
    const wrapped = Object.assign(new Error('Query failed'), { name: 'QueryFailedError', driverError: shutdown });
    for (const error of [refused, wrapped, new Error('Connection terminated unexpectedly')]) {
      const { host, sent } = hostCapturing();
      jest.spyOn((filter as unknown as { logger: { error: () => void } }).logger, 'error').mockImplementation(() => undefined);
      filter.catch(error, host);
      expect(sent).toEqual({
        status: 503,
        body: { statusCode: 503, code: 'database_unavailable', message: 'Mixmark cannot reach its database just now. Please try again in a moment.' },
      });
    }
  });

  it('should still answer 500 for a query that failed for another reason', () => {
    const { host, sent } = hostCapturing();
    jest.spyOn((filter as unknown as { logger: { error: () => void } }).logger, 'error').mockImplementation(() => undefined);
    filter.catch(Object.assign(new Error('duplicate key'), { name: 'QueryFailedError', driverError: { code: '23505', message: 'duplicate key' } }), host);
    expect(sent.status).toBe(500);
  });
});
