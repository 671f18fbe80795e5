import { Logger } from '@nestjs/common';
import { isDatabaseUnavailable } from '../filters/api-exception.filter';

/**
 * Keeps a server or worker process alive through a database restart.
 *
 * pg-boss 10.4.2 records a job's outcome without awaiting it (`this.complete(…)` /
 * `this.fail(…)` in `Manager.watch`), so when PostgreSQL goes away just as a job ends, the
 * rejected promise is unhandled, and Node 20 ends the process for it. Nothing is lost by staying up:
 * the job stays active, expires (GRADING_EXPIRE_SECONDS) and runs again, and the grading claim makes
 * the second run a no-op when the first one had written its mark. So a rejection that says the
 * database is unreachable is logged; any other unhandled rejection still ends the process as before.
 * (Checked by `e2e/grading-process-faults.e2e-spec.ts`, which restarts PostgreSQL under a server.)
 */
export function guardAgainstDatabaseOutages(logger = new Logger('Process')): void {
  process.on('unhandledRejection', (reason) => {
    if (isDatabaseUnavailable(reason)) {
      logger.warn(`the database was unreachable while a background task ran; it will be retried: ${(reason as Error).message}`);
      return;
    }
    throw reason;
  });
}
