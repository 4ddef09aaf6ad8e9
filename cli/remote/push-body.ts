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
 * a torn last line is left out, and the server then refuses the count).
 * @param rowsPerLine - records per `variants` line
 */
export async function* pushChunks(run: RunLine, jsonlPath: string, rowsPerLine = ROWS_PER_LINE): AsyncGenerator<Buffer> {
  yield Buffer.from(JSON.stringify(run) + '\n');
  let batch: Buffer[] = [OPEN];
  let rows = 0;
  let carry: Buffer | undefined;
  const flush = () => {
    batch.push(CLOSE);
    const out = Buffer.concat(batch);
    batch = [OPEN];
    rows = 0;
    return out;
  };
  for await (const raw of createReadStream(jsonlPath, { highWaterMark: 1 << 20 })) {
    const chunk = carry ? Buffer.concat([carry, raw as Buffer]) : (raw as Buffer);
    let from = 0;
    for (let nl = chunk.indexOf(10); nl >= 0; nl = chunk.indexOf(10, from)) {
      let end = nl;
      if (end > from && chunk[end - 1] === 13) end--;
      if (end > from) {
        if (rows) batch.push(COMMA);
        batch.push(chunk.subarray(from, end));
        if (++rows === rowsPerLine) yield flush();
      }
      from = nl + 1;
    }
    carry = from < chunk.length ? Buffer.from(chunk.subarray(from)) : undefined;
  }
  if (rows) yield flush();
}

/** Bytes the push will send, about (the JSONL plus its wrapping), for progress. */
export function pushSize(runLineBytes: number, jsonlBytes: number, lines: number, rowsPerLine = ROWS_PER_LINE): number {
  const batches = Math.ceil(lines / rowsPerLine);
  return runLineBytes + jsonlBytes + batches * (OPEN.length + CLOSE.length);
}
