// The body of a push, as NDJSON chunks made on the fly from a run folder: the run line, then the
// lines of variants.jsonl 2,000 at a time wrapped as {"kind":"variants","rows":[...]}. The JSONL
// lines are copied as bytes, never parsed: the server checks every record.
import { createReadStream } from 'node:fs';

/** Records per `variants` line (the server's limit). */
export const ROWS_PER_LINE = 2000;

const OPEN = Buffer.from('{"kind":"variants","rows":[');
const CLOSE = Buffer.from(']}\n');
const COMMA = Buffer.from(',');

/** The run line of a push (what the server reads first). */
export interface RunLine {
  kind: 'run';
  manifest: unknown;
  summary: unknown;
  study: { name: string; family: string; hash: string; body: unknown };
  cliVersion: string;
  gitCommit: string | null;
}

/**
 * The chunks of one push. Only complete lines of the JSONL are sent (a sweep appends whole lines;
 * a torn last line is left out, and the server then refuses the count). The lines are never copied
 * one by one: in each chunk read from the file the newline after a line becomes the comma before
 * the next, so a run of lines goes out as one slice of that chunk (the chunk is this function's
 * own buffer). Blank lines are skipped and a CR before the newline dropped.
 * @param rowsPerLine - records per `variants` line
 * @param chunkBytes - bytes read from the file at a time
 */
export async function* pushChunks(run: RunLine, jsonlPath: string, rowsPerLine = ROWS_PER_LINE, chunkBytes = 1 << 20): AsyncGenerator<Buffer> {
  yield Buffer.from(JSON.stringify(run) + '\n');
  let parts: Buffer[] = [OPEN];
  let rows = 0;
  let carry: Buffer | undefined;
  /** Add `n` lines already joined by commas. */
  const add = (lines: Buffer, n: number) => {
    if (rows) parts.push(COMMA);
    parts.push(lines);
    rows += n;
  };
  const flush = () => {
    parts.push(CLOSE);
    const out = Buffer.concat(parts);
    parts = [OPEN];
    rows = 0;
    return out;
  };
  for await (const raw of createReadStream(jsonlPath, { highWaterMark: chunkBytes })) {
    const chunk = carry ? Buffer.concat([carry, raw as Buffer]) : (raw as Buffer);
    let from = 0; // first byte of the lines not yet added
    let at = 0; // first byte of the next line
    let joined = 0; // lines in chunk[from, at), each newline turned into a comma
    for (let nl = chunk.indexOf(10, at); nl >= 0; nl = chunk.indexOf(10, at)) {
      if (nl > at && chunk[nl - 1] !== 13) {
        chunk[nl] = 0x2c;
        joined++;
      } else {
        // A blank line, or one ending in CR: add the lines before it, then this one on its own.
        if (joined) add(chunk.subarray(from, at - 1), joined);
        if (nl - 1 > at) add(chunk.subarray(at, nl - 1), 1);
        joined = 0;
        from = nl + 1;
      }
      at = nl + 1;
      if (rows + joined === rowsPerLine) {
        if (joined) add(chunk.subarray(from, at - 1), joined);
        joined = 0;
        from = at;
        yield flush();
      }
    }
    if (joined) add(chunk.subarray(from, at - 1), joined);
    carry = at < chunk.length ? Buffer.from(chunk.subarray(at)) : undefined;
  }
  if (rows) yield flush();
}

/** Bytes the push will send, about (the JSONL plus its wrapping), for progress. */
export function pushSize(runLineBytes: number, jsonlBytes: number, lines: number, rowsPerLine = ROWS_PER_LINE): number {
  const batches = Math.ceil(lines / rowsPerLine);
  return runLineBytes + jsonlBytes + batches * (OPEN.length + CLOSE.length);
}
