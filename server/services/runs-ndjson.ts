/**
 * Lines of an NDJSON request body, read as they arrive: the body is never held whole, and the
 * next chunk is read only when the caller asks for the next line (backpressure on the upload).
 * Lines stay bytes: the fast path of a push reads them as such (runs-push-fast.ts), and only the
 * lines it leaves are decoded to text for JSON.parse.
 */
import { HttpError } from '../http/http-error';

/** One line of the body: its 1-based number and bytes (without the newline). */
export interface NdjsonLine {
  n: number;
  bytes: Buffer;
}

/** Longest line accepted, bytes (a line of 2,000 records is ≈ 1 MB). */
export const MAX_LINE_BYTES = 32 * 1024 * 1024;

const tooLong = (n: number) =>
  new HttpError(413, 'line-too-large', `Line ${n} of the push is longer than ${MAX_LINE_BYTES / 1024 / 1024} MB.`, [{ path: `line ${n}`, message: 'is too long' }]);

/** The body's chunks; a body that breaks off (the client went away) is a 400, not a server fault. */
async function* chunksOf(body: AsyncIterable<Buffer | string>): AsyncGenerator<Buffer | string> {
  try {
    for await (const c of body) yield c;
  } catch (e) {
    throw new HttpError(400, 'push-cut-off', 'The push broke off before its end; nothing was stored.', [{ path: '', message: (e as Error).message ?? String(e) }]);
  }
}

/** Whether a line holds only white space (as String#trim sees it), when it does not start with `{`. */
const blank = (line: Buffer) => line.length === 0 || (line[0] !== 0x7b && line.toString('utf8').trim() === '');

/**
 * Split a byte stream at newlines (UTF-8 never has a 0x0A byte inside a character); blank lines
 * are skipped but counted.
 */
export async function* ndjsonLines(body: AsyncIterable<Buffer | string>, maxLine = MAX_LINE_BYTES): AsyncGenerator<NdjsonLine> {
  let parts: Buffer[] = [];
  let held = 0;
  let n = 0;
  for await (const raw of chunksOf(body)) {
    const chunk = typeof raw === 'string' ? Buffer.from(raw) : raw;
    let from = 0;
    for (let at = chunk.indexOf(10, from); at >= 0; at = chunk.indexOf(10, from)) {
      n++;
      const piece = chunk.subarray(from, at);
      const line = held ? Buffer.concat([...parts, piece], held + piece.length) : piece;
      parts = [];
      held = 0;
      from = at + 1;
      if (line.length > maxLine) throw tooLong(n);
      if (!blank(line)) yield { n, bytes: line };
    }
    if (from < chunk.length) {
      parts.push(chunk.subarray(from));
      held += chunk.length - from;
      if (held > maxLine) throw tooLong(n + 1);
    }
  }
  if (held) {
    const line = Buffer.concat(parts, held);
    if (!blank(line)) yield { n: n + 1, bytes: line };
  }
}

/** Parse one line as JSON; 400 naming the line when it is not JSON. */
export function parseLine(line: NdjsonLine): unknown {
  try {
    return JSON.parse(line.bytes.toString('utf8').trimEnd());
  } catch (e) {
    const why = e instanceof Error ? e.message : String(e);
    throw new HttpError(400, 'invalid-ndjson', `Line ${line.n} of the push is not valid JSON; nothing was stored.`, [{ path: `line ${line.n}`, message: why }]);
  }
}
