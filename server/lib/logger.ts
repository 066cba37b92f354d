import { pino, type Logger } from 'pino';
import type { Config } from '../config/env';

export function createLogger(config: Pick<Config, 'logLevel'>): Logger {
  return pino({
    level: config.logLevel,
    timestamp: pino.stdTimeFunctions.isoTime, // UTC
    redact: { paths: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'password', '*.password', 'token'], remove: true },
  });
}
