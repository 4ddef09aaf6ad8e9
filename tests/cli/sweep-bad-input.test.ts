/**
 * `panelpoint sweep` refuses bad studies before any work: exit 2, the file, the JSON path (and
 * the line or the place in an expression) on stderr, nothing on stdout, and no output folder
 * created, or an existing one left as it was.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { families } from '../../shared/families/registry';
import { runCli } from './run-cli';
import { cli, snapshot, study, tempDir, writeStudy } from './sweep-helpers';

const tmp = tempDir('sweep-bad');
afterAll(() => tmp.done());

const SMALL = study({ vary: { panels: [6, 8], depth: [2, 2.5, 3], supports: ['pin-roller', 'pin-pin'] } });
const SMALL_SIZE = 2 * 3 * 2;

let n = 0;
/** Write the study, sweep it into a fresh --out, and check that the run was refused and left nothing. */
async function refused(data: unknown, ...more: string[]): Promise<{ file: string; err: string }> {
  const file = writeStudy(tmp.path, `bad-${++n}.json`, data);
  const out = join(tmp.path, `out-${n}`);
  const r = await runCli('sweep', file, '--out', out, '--workers', '1', '-q', ...more);
  expect(r.code, r.err).toBe(2);
  expect(r.out).toBe('');
  expect(r.err).toContain(file);
  expect(existsSync(out), 'the output folder was created').toBe(false);
  return { file, err: r.err };
}

describe('sweep refuses bad input with exit 2 and writes nothing', () => {
  it('malformed JSON: names the line', async () => {
    const text = JSON.stringify(SMALL, null, 2).replace('"family": "pratt",', '"family": "pratt"');
    const line = text.slice(0, text.indexOf('"family"')).split('\n').length;
    const { file, err } = await refused(text);
    // the missing comma is noticed at the next key, on the line after "family"
    expect(err).toMatch(new RegExp(`${file.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}:${line + 1}:\\d+`));
    expect(err).toMatch(/expected a comma/);
  });

  it('an unknown family: lists the known ones', async () => {
    const { err } = await refused({ ...SMALL, family: 'prat' });
    expect(err).toMatch(/family: unknown family 'prat'/);
    for (const f of families) expect(err).toContain(f.id);
  });

  it('an expression that does not parse: its path and the place in it', async () => {
    const { err } = await refused({ ...SMALL, where: ['depth >'] });
    expect(err).toMatch(/where\[0\]: .*character \d+/);
  });

  it('an expression with an unknown name: did you mean', async () => {
    const { err } = await refused({ ...SMALL, where: ['span / dept <= 20'] });
    expect(err).toMatch(/where\[0\]: .*'dept'.*did you mean 'depth'/);
  });

  it('an empty parameter space', async () => {
    const { err } = await refused({ ...SMALL, vary: { panels: [] } });
    expect(err).toMatch(/vary\.panels: .*empty/);
  });

  it('a space larger than --max-variants: says how large', async () => {
    const { err } = await refused(SMALL, '--max-variants', String(SMALL_SIZE - 1));
    expect(err).toMatch(new RegExp(`${SMALL_SIZE} variants, over --max-variants ${SMALL_SIZE - 1}`));
  });

  it('an existing run folder without --resume: left unchanged', async () => {
    const file = writeStudy(tmp.path, 'small.json', SMALL);
    const out = join(tmp.path, 'existing');
    const first = await runCli('sweep', file, '--out', out, '--workers', '1', '-q');
    expect(first.code, first.err).toBe(0);
    const before = snapshot(out);
    const again = await runCli('sweep', file, '--out', out, '--workers', '1', '-q');
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/already holds a run.*--resume/);
    expect(snapshot(out)).toEqual(before);
  });

  it('exits 2 as a real process too', async () => {
    const file = writeStudy(tmp.path, 'process.json', { ...SMALL, family: 'nope' });
    const out = join(tmp.path, 'process-out');
    const r = await cli('sweep', file, '--out', out, '-q');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/unknown family 'nope'/);
    expect(existsSync(out)).toBe(false);
  });
});
