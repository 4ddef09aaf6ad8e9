/**
 * `panelpoint analyze` on bad input: each file is the depot roof model with one change. Every one
 * exits 2, names the file, the line and the JSON path on stderr, prints nothing on stdout and
 * leaves no `--out` file (nor a temporary one) behind.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { example, runCli, runProcess } from './run-cli';

const dir = mkdtempSync(join(tmpdir(), 'panelpoint-bad-input-'));
const outDir = mkdtempSync(join(tmpdir(), 'panelpoint-bad-output-'));
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
  rmSync(outDir, { recursive: true, force: true });
});

const DEPOT = readFileSync(example('depot-roof-r3.json'), 'utf8');

/** The depot roof text with one replacement; fails loudly if the text to replace is not there exactly once. */
function edit(from: string, to: string): string {
  expect(DEPOT.split(from)).toHaveLength(2);
  return DEPOT.replace(from, to);
}

/** 1-based line of the first occurrence of `marker` in `text`. */
function lineOf(text: string, marker: string): number {
  const at = text.indexOf(marker);
  expect(at, marker).toBeGreaterThanOrEqual(0);
  return text.slice(0, at).split('\n').length;
}

const EMPTY_MODEL = '{\n  "name": "Empty",\n  "nodes": [],\n  "members": [],\n  "supports": []\n}\n';

/** What is wrong, the file text, then the issues expected: JSON path, a marker on the line, words of the message. */
const cases: [string, string, [string, string, string][]][] = [
  ['malformed JSON (a missing comma)', edit('(6 panels, Pratt)",', '(6 panels, Pratt)"'), [['', '"description"', 'expected a comma']]],
  ['an unknown key', edit('{ "id": "B2", "x": 6, "y": 0 }', '{ "id": "B2", "x": 6, "y": 0, "z": 0 }'), [['nodes[2].z', '"z": 0', 'unknown key "z"']]],
  ['a duplicate node id', edit('{ "id": "T6", "x": 18, "y": 1.8 }', '{ "id": "T6", "x": 18, "y": 1.8 }, { "id": "T5", "x": 21, "y": 1.8 }'),
    [['nodes[14].id', '"x": 21', 'duplicate node id "T5" (first at nodes[12])']]],
  ['a member to a missing node', edit('"from": "B3", "to": "B4"', '"from": "B3", "to": "B9"'), [['members[3].to', '"to": "B9"', 'no node has id "B9"']]],
  ['a member that starts and ends at one node', edit('"from": "B2", "to": "B3"', '"from": "B2", "to": "B2"'),
    [['members[2].to', '"from": "B2", "to": "B2"', 'starts and ends at node "B2"']]],
  ['a zero-length member between coincident joints',
    edit('{ "id": "T6", "x": 18, "y": 1.8 }\n', '{ "id": "T6", "x": 18, "y": 1.8 }, { "id": "X", "x": 9, "y": 0 }\n')
      .replace('{ "id": "D6", "from": "B5", "to": "T6", "section": "web", "group": "diagonal" }\n', '{ "id": "D6", "from": "B5", "to": "T6", "section": "web", "group": "diagonal" },\n    { "id": "Z", "from": "B3", "to": "X" }\n'),
    [['nodes[14]', '"id": "X"', 'node "X" is at the same place as node "B3" (nodes[3])'], ['members[25]', '"id": "Z"', 'zero length: nodes "B3" and "X"']]],
  ['coincident joints', edit('{ "id": "T6", "x": 18, "y": 1.8 }', '{ "id": "T6", "x": 18, "y": 1.8 }, { "id": "X", "x": 9.0, "y": 1.8 }'),
    [['nodes[14]', '"id": "X"', 'node "X" is at the same place as node "T3" (nodes[10])']]],
  ['a number too large for a double (1e999)', edit('{ "id": "B2", "x": 6,', '{ "id": "B2", "x": 1e999,'), [['nodes[2].x', '1e999', 'must be a finite number, not Infinity']]],
  ['a load on a missing node', edit('{ "case": "D", "node": "T0", "fy": -6.3 }', '{ "case": "D", "node": "T9", "fy": -6.3 }'), [['loads[0].node', '"T9"', 'no node has id "T9"']]],
  ['a combination naming a missing case', edit('"D": 1.2, "S": 1.6', '"D": 1.2, "L": 1.6'), [['combinations[1].factors.L', '"L": 1.6', 'no load has case "L"']]],
  ['no supports', DEPOT.replace(/"supports": \[[^\]]*\]/, '"supports": []'), [['supports', '"supports": []', 'the model has no supports']]],
  ['an empty model', EMPTY_MODEL, [['nodes', '"nodes"', 'the model has no nodes'], ['members', '"members"', 'the model has no members'], ['supports', '"supports"', 'no supports']]],
  ['an empty file', '', [['', '', 'the file is empty']]],
];

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

describe('analyze: bad input is refused with file, line and path', () => {
  it.each(cases)('%s', async (what, text, expected) => {
    const file = join(dir, `${what.replace(/\W+/g, '-')}.json`);
    writeFileSync(file, text);
    const out = join(outDir, 'result.json');
    const r = await runCli('analyze', file, '--json', '--out', out);
    expect(r.code).toBe(2);
    expect(r.out).toBe('');
    const lines = r.err.trimEnd().split('\n');
    expect(lines[0]).toBe('error: invalid input');
    expect(lines).toHaveLength(1 + expected.length);
    expected.forEach(([path, marker, words], k) => {
      const line = marker ? lineOf(text, marker) : 1;
      const where = path ? `:${line}:\\d+ ${escape(path)}: ` : `:${line}:\\d+: `;
      expect(lines[1 + k]).toMatch(new RegExp(`^${escape(file)}${where}.*${escape(words)}`));
    });
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(outDir)).toEqual([]);
  });

  it('a missing file, in process and as a real process', async () => {
    const file = join(dir, 'no-such-model.json');
    const out = join(outDir, 'result.json');
    const expected = [2, '', `error: invalid input\n${file}: file not found\n`];
    const r = await runCli('analyze', file, '--out', out);
    expect([r.code, r.out, r.err]).toEqual(expected);
    const p = runProcess('analyze', file, '--out', out);
    expect([p.code, p.out, p.err]).toEqual(expected);
    expect(readdirSync(outDir)).toEqual([]);
  });

  it('an --out place that cannot be written: exit 2, nothing on stdout', async () => {
    const out = join(outDir, 'no-such-dir', 'result.json');
    const r = await runCli('analyze', example('depot-roof-r3.json'), '--json', '--out', out);
    expect([r.code, r.out]).toEqual([2, '']);
    expect(r.err).toContain(`${out}: cannot write the file: the directory does not exist`);
    expect(readdirSync(outDir)).toEqual([]);
  });

  it('an --out file from an earlier run is left as it was', async () => {
    const out = join(outDir, 'kept.json');
    writeFileSync(out, 'earlier result\n');
    const file = join(dir, 'bad-for-kept.json');
    writeFileSync(file, edit('"from": "B3", "to": "B4"', '"from": "B3", "to": "B9"'));
    expect((await runCli('analyze', file, '--out', out)).code).toBe(2);
    expect(readFileSync(out, 'utf8')).toBe('earlier result\n');
    expect(readdirSync(outDir)).toEqual(['kept.json']);
    rmSync(out);
  });
});
