import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { pushChunks, type RunLine } from './push-body';

const dir = mkdtempSync(join(tmpdir(), 'pp-push-body-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const run: RunLine = { kind: 'run', manifest: {}, summary: {}, study: { name: 's', family: 'pratt', hash: '0123456789abcdef', body: {} }, cliVersion: 't', gitCommit: null };

/** The body as the API describes it, built the plain way: complete non-blank lines, CR dropped, `per` to a line. */
function expected(text: string, per: number): string {
  const lines = text.split('\n').slice(0, -1).map((l) => (l.endsWith('\r') ? l.slice(0, -1) : l)).filter((l) => l.length > 0);
  let out = JSON.stringify(run) + '\n';
  for (let i = 0; i < lines.length; i += per) out += `{"kind":"variants","rows":[${lines.slice(i, i + per).join(',')}]}\n`;
  return out;
}

async function body(text: string, per: number, chunkBytes: number): Promise<string> {
  const file = join(dir, 'variants.jsonl');
  writeFileSync(file, text);
  const parts: Buffer[] = [];
  for await (const c of pushChunks(run, file, per, chunkBytes)) parts.push(c);
  return Buffer.concat(parts).toString('utf8');
}

describe('pushChunks', () => {
  it('sends the complete lines, per to a line, whatever the chunk size (blank lines, CRLF, a torn end, ψ)', async () => {
    let seed = 11;
    const rnd = () => (seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0) / 4294967296;
    for (let k = 0; k < 40; k++) {
      const lines = Array.from({ length: 1 + Math.floor(rnd() * 60) }, (_, i) => {
        const r = rnd();
        return r < 0.08 ? '' : r < 0.16 ? `{"index":${i},"x":"crlf"}\r` : r < 0.2 ? '\r' : `{"index":${i},"ψ":"${'a'.repeat(Math.floor(rnd() * 40))}"}`;
      });
      const text = lines.join('\n') + (rnd() < 0.5 ? '\n' : '\n{"index":999,"torn":');
      const per = 1 + Math.floor(rnd() * 7);
      const chunk = 1 + Math.floor(rnd() * 50);
      expect(await body(text, per, chunk)).toBe(expected(text, per));
    }
  });

});
