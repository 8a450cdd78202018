import { pino, type Logger } from 'pino';

/** One JSON line per event; `silent` in tests keeps their output readable. */
export function createLogger(level: string): Logger {
  return pino({ level });
}
