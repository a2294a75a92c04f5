import pino from 'pino';
import { config } from '../config.ts';

// JSON lines to stdout; ids and sizes only, never request bodies (they hold
// e-mails, comments and passwords).
export const logger = pino({
  level: process.env.NODE_ENV === 'test' ? 'silent' : config().log.level,
  redact: ['req.headers.cookie', 'req.headers["x-csrf-token"]', 'password', 'token'],
});
export type Logger = typeof logger;
