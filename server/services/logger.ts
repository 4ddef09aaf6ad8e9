/** A small structured logger: one JSON line per event, every field passed through `redact`. */
import { redact, redactText } from './redact';

export type LogLevel = 'debug' | 'info' | 'warn' | 'error';

export interface Logger {
  debug(msg: string, fields?: Record<string, unknown>): void;
  info(msg: string, fields?: Record<string, unknown>): void;
  warn(msg: string, fields?: Record<string, unknown>): void;
  error(msg: string, fields?: Record<string, unknown>): void;
}

const ORDER: Record<LogLevel, number> = { debug: 10, info: 20, warn: 30, error: 40 };

export interface LoggerOptions {
  level?: LogLevel;
  /** Where lines go; stderr by default. */
  sink?: (line: string) => void;
}

export function createLogger(options: LoggerOptions = {}): Logger {
  const min = ORDER[options.level ?? 'info'];
  const sink = options.sink ?? ((line: string) => process.stderr.write(line + '\n'));
  const log = (level: LogLevel) => (msg: string, fields: Record<string, unknown> = {}) => {
    if (ORDER[level] < min) return;
    const safe = redact(fields) as Record<string, unknown>;
    sink(JSON.stringify({ time: new Date().toISOString(), level, msg: redactText(msg), ...safe }));
  };
  return { debug: log('debug'), info: log('info'), warn: log('warn'), error: log('error') };
}
