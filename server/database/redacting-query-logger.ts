import type { Logger } from 'typeorm';
import { describeError } from './describe-error';

/**
 * TypeORM's logger for the data source. Only failed queries are logged (as before, with
 * `logging: ['error']`), but without their parameter values: TypeORM's own logger printed every
 * one, and they include token hashes, password hashes and request bodies. The SQL text and the
 * number of parameters are enough to find the query; the values are in the request that sent them.
 */
export class RedactingQueryLogger implements Logger {
  logQueryError(error: string | Error, query: string, parameters?: unknown[] | object): void {
    const count = Array.isArray(parameters) ? parameters.length : parameters ? Object.keys(parameters).length : 0;
    const reason = describeError(error);
    console.error(
      `[sheetkeeper] query failed: ${query.replace(/\s+/g, ' ').trim()} -- ${count} parameter(s), values not logged\n${reason}`,
    );
  }

  logQuery(): void {}
  logQuerySlow(): void {}
  logSchemaBuild(): void {}
  logMigration(): void {}
  log(): void {}
}
