import {
  ArgumentsHost,
  Catch,
  HttpException,
  HttpStatus,
  Logger,
  type ExceptionFilter,
} from '@nestjs/common';
import type { ApiError } from '@mixmark/common';
import type { Response } from 'express';

/** The stable code for each HTTP status when a thrown exception carries none of its own. */
const codeByStatus: Record<number, string> = {
  400: 'validation_failed',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  429: 'too_many_requests',
  503: 'service_unavailable',
};

/**
 * Socket errors and PostgreSQL's "connection exception" (08…) and "operator intervention" (57P…)
 * classes: the database is down, restarting or out of reach, which a retry in a moment may cure.
 * https://www.postgresql.org/docs/15/errcodes-appendix.html
 */
const unreachableCodes = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND']);
const unreachableMessages = /Connection terminated|connection timeout|timeout exceeded when trying to connect|Client has encountered a connection error|the database system is (starting up|shutting down|in recovery mode)|terminating connection/i;

/** True when `error` (or the driver error TypeORM wraps) says the database cannot be reached. */
export function isDatabaseUnavailable(error: unknown): boolean {
  for (let e = error as { code?: unknown; message?: unknown; driverError?: unknown } | undefined, depth = 0; e && depth < 3; e = e.driverError as typeof e, depth += 1) {
    const code = typeof e.code === 'string' ? e.code : '';
    if (unreachableCodes.has(code) || /^(08|57P0)/.test(code)) return true;
    if (typeof e.message === 'string' && unreachableMessages.test(e.message)) return true;
  }
  return false;
}

/**
 * Turns every error into the one JSON shape `{ statusCode, code, message, details? }`.
 * Services throw Nest's exceptions, optionally with `{ code, message, details }` as the body;
 * a database that cannot be reached is a 503 `database_unavailable` (a retry may work); anything
 * else is logged and answered as a 500 that tells nothing about the inside.
 */
@Catch()
export class ApiExceptionFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const response = host.switchToHttp().getResponse<Response>();
    const body = this.toApiError(exception);
    if (body.statusCode >= 500) {
      this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : String(exception));
    }
    if (response.headersSent) return;
    response.status(body.statusCode).json(body);
  }

  private toApiError(exception: unknown): ApiError {
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const raw = exception.getResponse();
      const fields = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
      const message = Array.isArray(fields.message)
        ? fields.message.join('; ')
        : typeof fields.message === 'string'
          ? fields.message
          : typeof raw === 'string'
            ? raw
            : exception.message;
      const error: ApiError = {
        statusCode,
        code: typeof fields.code === 'string' ? fields.code : (codeByStatus[statusCode] ?? 'error'),
        message,
      };
      if (fields.details && typeof fields.details === 'object') {
        error.details = fields.details as Record<string, string>;
      }
      return error;
    }
    // Errors from body-parser / multer carry a status of their own (e.g. 413 for a large body).
    const status = (exception as { status?: unknown; statusCode?: unknown } | null)?.status;
    if (typeof status === 'number' && status >= 400 && status < 500) {
      return {
        statusCode: status,
        code: codeByStatus[status] ?? 'bad_request',
        message: (exception as Error).message || 'The request could not be read.',
      };
    }
    if (isDatabaseUnavailable(exception)) {
      return {
        statusCode: HttpStatus.SERVICE_UNAVAILABLE,
        code: 'database_unavailable',
        message: 'Mixmark cannot reach its database just now. Please try again in a moment.',
      };
    }
    return {
      statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
      code: 'internal_error',
      message: 'Something went wrong on our side. Please try again; if it keeps happening, tell us.',
    };
  }
}
