// JSON requests to the team server for `check --push`: a bearer token, retries with backoff
// while the server answers 503 or cannot be reached (it may be restarting), and errors that say
// what went wrong in words.
import type { Credentials } from './credentials';

/** A push that did not succeed (the message is printed as is). */
export class PushError extends Error {
  override readonly name = 'PushError';
}

export interface RetryOptions {
  /** Attempts in all (default 4). */
  attempts?: number;
  /** First wait, ms; doubled after each failed attempt (default 500). */
  baseDelayMs?: number;
}

interface ErrorBody { error?: { code?: string; message?: string; details?: { path: string; message: string }[] } }

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function describe(status: number, body: ErrorBody, what: string, creds: Credentials): string {
  const e = body.error;
  const said = e?.message ? `: ${e.message}` : '';
  const details = (e?.details ?? []).slice(0, 5).map((d) => `\n  ${d.path || '(body)'}: ${d.message}`).join('');
  if (status === 401) return `${what}: the server ${creds.server} does not accept the token (401)${said} — run panelpoint login again`;
  if (status === 403) return `${what}: not allowed (403)${said}`;
  if (status === 404) return `${what}: not found (404)${said}`;
  return `${what}: the server answered ${status}${said}${details}`;
}

/** Waiting time before the next attempt: Retry-After when given (seconds, at most 10), else the backoff. */
function delayFor(res: Response | undefined, backoff: number): number {
  const after = Number(res?.headers.get('retry-after'));
  return Number.isFinite(after) && after > 0 ? Math.min(after, 10) * 1000 : backoff;
}

/**
 * Send one request; returns the parsed JSON answer of a 2xx.
 * @param accept - statuses that are an answer rather than an error (e.g. 409 for "exists already")
 */
export async function requestJson(
  creds: Credentials, method: 'GET' | 'POST', path: string, body: unknown, what: string,
  options: RetryOptions & { accept?: number[] } = {},
): Promise<{ status: number; body: unknown }> {
  const attempts = options.attempts ?? 4;
  let backoff = options.baseDelayMs ?? 500;
  let lastProblem = '';
  for (let attempt = 1; attempt <= attempts; attempt++) {
    let res: Response | undefined;
    try {
      res = await fetch(`${creds.server}/api${path}`, {
        method,
        headers: { authorization: `Bearer ${creds.token}`, accept: 'application/json', ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
        ...(body === undefined ? {} : { body: JSON.stringify(body) }),
        signal: AbortSignal.timeout(30_000),
      });
    } catch (e) {
      const cause = (e as { cause?: { code?: string; message?: string } }).cause;
      lastProblem = `cannot reach ${creds.server} (${cause?.code ?? cause?.message ?? (e instanceof Error ? e.message : String(e))})`;
    }
    if (res) {
      const parsed = (await res.json().catch(() => ({}))) as unknown;
      if (res.ok || options.accept?.includes(res.status)) return { status: res.status, body: parsed };
      if (res.status !== 503) throw new PushError(describe(res.status, parsed as ErrorBody, what, creds));
      lastProblem = describe(503, parsed as ErrorBody, what, creds);
    }
    if (attempt < attempts) {
      await sleep(delayFor(res, backoff));
      backoff *= 2;
    }
  }
  throw new PushError(`${lastProblem.startsWith(what) ? lastProblem : `${what}: ${lastProblem}`} (gave up after ${attempts} attempts)`);
}
