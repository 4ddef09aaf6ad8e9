// HTTP to the team server: JSON requests, and one streamed upload whose bytes are counted as they
// go. A connection that fails before an answer is a RemoteUnreachable (worth a retry); an answer,
// whatever its status, is returned as it is.
import http, { type IncomingMessage } from 'node:http';
import https from 'node:https';

/** The server's answer: status and parsed JSON body (text when it is not JSON). */
export interface Answer {
  status: number;
  body: unknown;
}

/** No answer came: refused, reset, timed out, or the name did not resolve. */
export class RemoteUnreachable extends Error {
  override readonly name = 'RemoteUnreachable';
  constructor(readonly url: string, reason: unknown) {
    super(`cannot reach ${url}: ${(reason as NodeJS.ErrnoException)?.code ?? (reason as Error)?.message ?? String(reason)}`, { cause: reason });
  }
}

function headers(token: string | undefined, extra: Record<string, string>): Record<string, string> {
  return { accept: 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}), ...extra };
}

async function readAnswer(res: IncomingMessage): Promise<Answer> {
  const parts: Buffer[] = [];
  for await (const c of res) parts.push(c as Buffer);
  const text = Buffer.concat(parts).toString('utf8');
  let body: unknown = text;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    // not JSON: keep the text (a proxy's error page)
  }
  return { status: res.statusCode ?? 0, body };
}

/** A JSON request. */
export async function requestJson(method: string, url: string, token?: string, body?: unknown): Promise<Answer> {
  const payload = body === undefined ? undefined : Buffer.from(JSON.stringify(body));
  const extra: Record<string, string> = payload ? { 'content-type': 'application/json', 'content-length': String(payload.length) } : {};
  return send(url, method, headers(token, extra), async (req) => {
    req.end(payload);
  });
}

/**
 * POST `chunks` as they come (chunked transfer), calling `sent(bytes)` after each. When the server
 * answers before the body is through (a refusal), the upload stops and the answer is returned.
 */
export async function postStream(url: string, token: string | undefined, contentType: string, chunks: () => AsyncIterable<Buffer>, sent: (bytes: number) => void): Promise<Answer> {
  return send(url, 'POST', headers(token, { 'content-type': contentType }), async (req, answered) => {
    for await (const chunk of chunks()) {
      if (answered() || req.destroyed) return;
      if (!req.write(chunk)) await drainedOrClosed(req);
      sent(chunk.length);
    }
    req.end();
  });
}

/**
 * Wait until the request can take more, or is gone. Both listeners go once either fires: a push
 * waits for 'drain' about a hundred times, and listeners left behind by each wait (events.once)
 * piled up to a MaxListenersExceededWarning.
 */
function drainedOrClosed(req: http.ClientRequest): Promise<void> {
  return new Promise((done) => {
    const go = () => {
      req.off('drain', go);
      req.off('close', go);
      done();
    };
    req.on('drain', go);
    req.on('close', go);
  });
}

function send(url: string, method: string, hdrs: Record<string, string>, write: (req: http.ClientRequest, answered: () => boolean) => Promise<void>): Promise<Answer> {
  return new Promise<Answer>((resolve, reject) => {
    const target = new URL(url);
    const lib = target.protocol === 'https:' ? https : http;
    let answered = false;
    const req = lib.request(target, { method, headers: hdrs });
    req.on('response', (res) => {
      answered = true;
      readAnswer(res).then((a) => {
        resolve(a);
        req.destroy(); // an early refusal: do not send the rest
      }, reject);
    });
    req.on('error', (e) => {
      if (!answered) reject(new RemoteUnreachable(url, e));
    });
    write(req, () => answered).catch((e: unknown) => {
      req.destroy();
      reject(e);
    });
  });
}

/** The server's `{ error: { code, message, details } }`, as lines for the terminal. */
export function errorText(a: Answer): string {
  const e = (a.body as { error?: { code?: string; message?: string; details?: { path?: string; message?: string }[] } } | null)?.error;
  if (!e) return `HTTP ${a.status}${typeof a.body === 'string' && a.body ? `: ${a.body.slice(0, 300)}` : ''}`;
  const details = (e.details ?? []).map((d) => `\n  ${d.path ? `${d.path}: ` : ''}${d.message ?? ''}`).join('');
  return `${e.message ?? 'error'} (HTTP ${a.status} ${e.code ?? ''})${details}`.replace(/ \)/, ')');
}
