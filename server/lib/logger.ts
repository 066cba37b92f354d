import { pino, type DestinationStream, type Logger } from 'pino';
import type { Config } from '../config/env';

/** Fields of database errors that carry the statement's values (password hashes, token hashes, e-mail addresses). */
const VALUE_FIELDS = ['parameters', 'detail', 'driverError', 'where'];

/** Errors as pino serializes them, minus the values a failed query was given (ASVS 16.2.5). The SQL text stays. */
export function errWithoutValues(err: unknown): unknown {
  const out = pino.stdSerializers.err(err as Error) as unknown as Record<string, unknown>;
  if (out && typeof out === 'object') for (const field of VALUE_FIELDS) delete out[field];
  return out;
}

export function createLogger(config: Pick<Config, 'logLevel'>, destination?: DestinationStream): Logger {
  return pino(
    {
      level: config.logLevel,
      timestamp: pino.stdTimeFunctions.isoTime, // UTC
      redact: {
        paths: [
          'req.headers.cookie',
          'req.headers["x-csrf-token"]',
          'password',
          '*.password',
          'token',
          '*.token',
        ],
        remove: true,
      },
      serializers: { err: errWithoutValues },
    },
    destination,
  );
}
