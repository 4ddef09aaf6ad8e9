/**
 * Redaction for logs: passwords, tokens, secrets, cookies and authorization headers never
 * reach a log line, whether they sit under a telling key or inside a string.
 */

const SECRET_KEY = /pass(word)?|secret|token|authorization|cookie|hash|credential/i;
const API_TOKEN = /pp_[0-9a-f]{6,}_[A-Za-z0-9_-]+/g;
const JWT = /eyJ[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+/g;
const URL_TOKEN = /([?&](?:token|password|secret)=)[^&\s"]+/gi;

export const REDACTED = '[redacted]';

/** A string with API tokens, JWTs and `?token=` values replaced. */
export function redactText(text: string): string {
  return text.replace(API_TOKEN, 'pp_' + REDACTED).replace(JWT, REDACTED).replace(URL_TOKEN, `$1${REDACTED}`);
}

/** A deep copy of `value` fit for a log: secret-looking keys hidden, strings scrubbed. */
export function redact(value: unknown, depth = 0): unknown {
  if (typeof value === 'string') return redactText(value);
  if (value === null || typeof value !== 'object') return value;
  if (depth > 8) return '[deep]';
  if (value instanceof Date) return value.toISOString();
  if (value instanceof Error) return { name: value.name, message: redactText(value.message), stack: value.stack && redactText(value.stack) };
  if (Array.isArray(value)) return value.map((v) => redact(v, depth + 1));
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(value)) out[k] = SECRET_KEY.test(k) ? REDACTED : redact(v, depth + 1);
  return out;
}
