import { afterAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadModelFile, readJsonFile } from '../../cli/io/read-json';
import { writeFileAtomic } from '../../cli/io/write-atomic';
import { InputError } from '../../shared/errors';

const dir = mkdtempSync(join(tmpdir(), 'panelpoint-read-json-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

let count = 0;
function file(text: string): string {
  const path = join(dir, `f${++count}.json`);
  writeFileSync(path, text);
  return path;
}

function inputError(run: () => unknown): InputError {
  try {
    run();
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('expected an InputError');
}

const MODEL = `{
  "name": "Triangle",
  "nodes": [
    { "id": "A", "x": 0, "y": 0 },
    { "id": "B", "x": 4, "y": 0 },
    { "id": "C", "x": 2, "y": 3 }
  ],
  "members": [
    { "id": "AB", "from": "A", "to": "B" },
    { "id": "BC", "from": "B", "to": "C" },
    { "id": "CA", "from": "C", "to": "A" }
  ],
  "supports": [{ "node": "A", "type": "pin" }, { "node": "B", "type": "roller" }],
  "loads": [{ "case": "D", "node": "C", "fy": -10 }]
}
`;

describe('readJsonFile: malformed JSON', () => {
  it.each([
    ['a missing comma', '{\n  "a": 1\n  "b": 2\n}', 3, 3, 'expected a comma'],
    ['a trailing comma', '{\n  "a": [1, 2],\n  "b": 2,\n}', 3, 9, 'trailing comma'],
    ['a comment', '{\n  // note\n  "a": 1\n}', 2, 3, 'comments are not allowed'],
    ['single quotes', "{\n  'a': 1\n}", 2, 3, 'double quotes'],
    ['an unclosed object', '{\n  "a": 1\n', 3, 1, "expected '}'"],
    ['an empty file', '', 1, 1, 'the file is empty'],
    ['a bare word', '{\n  "a": NaN\n}', 2, 8, 'unexpected "NaN"'],
  ])('%s', (_what, text, line, column, words) => {
    const path = file(text);
    const e = inputError(() => readJsonFile(path));
    expect(e.file).toBe(path);
    expect(e.issues).toHaveLength(1);
    expect(e.issues[0]).toMatchObject({ code: 'json-syntax', line, column });
    expect(e.issues[0].message).toContain(words);
    expect(e.message).toBe(`${path}:${line}:${column}: ${e.issues[0].message}`);
  });

  it('reports duplicate keys with both lines', () => {
    const path = file('{\n  "nodes": [{ "id": "A",\n    "x": 0, "y": 0,\n    "x": 1 }]\n}');
    const e = inputError(() => readJsonFile(path));
    expect(e.issues).toEqual([
      { path: 'nodes[0].x', code: 'json-duplicate-key', message: 'duplicate key "x" (first at line 3)', line: 4, column: 5 },
    ]);
  });

  it('says "file not found" for a missing file', () => {
    const path = join(dir, 'nope.json');
    const e = inputError(() => readJsonFile(path));
    expect(e.issues[0].code).toBe('file-not-found');
    expect(e.message).toBe(`${path}: file not found`);
  });

  it('says when the path is a directory', () => {
    expect(inputError(() => readJsonFile(dir)).issues[0].code).toBe('file-unreadable');
  });
});

describe('readJsonFile: data and positions', () => {
  const doc = readJsonFile(file(MODEL));

  it('parses like JSON.parse', () => {
    expect(doc.data).toEqual(JSON.parse(MODEL));
  });

  it('locates keys and array elements', () => {
    expect(doc.locate('members[1].to')).toEqual({ line: 10, column: 32 });
    expect(doc.locate('nodes[2]')).toEqual({ line: 6, column: 5 });
    expect(doc.locate('')).toEqual({ line: 1, column: 1 });
  });

  it('falls back to the nearest ancestor that exists', () => {
    expect(doc.locate('members[1].section')).toEqual({ line: 10, column: 5 });
    expect(doc.locate('members[7]')).toEqual({ line: 8, column: 3 });
  });

  it('locates a key that needs quotes in a path', () => {
    const d = readJsonFile(file('{\n  "factors": {\n    "wind x": 1\n  }\n}'));
    expect(d.locate('factors["wind x"]')).toEqual({ line: 3, column: 5 });
  });

  it('keeps 1e999 as Infinity and accepts a byte-order mark', () => {
    expect(readJsonFile(file('\uFEFF{ "a": 1e999 }')).data).toEqual({ a: Infinity });
  });
});

describe('loadModelFile', () => {
  it('builds the structure of a valid model', () => {
    const { structure, model, units } = loadModelFile(file(MODEL));
    expect(structure.nodeIds).toEqual(['A', 'B', 'C']);
    expect(model.name).toBe('Triangle');
    expect(units.lengthFactor).toBe(1);
  });

  it('gives every issue its line and column, in file order', () => {
    const text = MODEL.replace('"to": "C"', '"to": "Z"').replace('"y": 3 }', '"y": 3, "z": 1 }').replace('"x": 4', '"x": 1e999');
    const path = file(text);
    const e = inputError(() => loadModelFile(path));
    expect(e.issues.map((i) => [i.path, i.line])).toEqual([
      ['nodes[1].x', 5],
      ['nodes[2].z', 6],
    ]); // schema issues come first; the unknown node is reported once they are fixed
    expect(e.message).toContain(`${path}:5:18 nodes[1].x: must be a finite number, not Infinity`);
    expect(e.message).toContain(`${path}:6:34 nodes[2].z: unknown key "z"`);
    const e2 = inputError(() => loadModelFile(file(MODEL.replace('"to": "C"', '"to": "Z"'))));
    expect(e2.issues).toEqual([
      { path: 'members[1].to', code: 'unknown-node', message: 'no node has id "Z"', line: 10, column: 32 },
    ]);
  });

  it('locates a missing key at its object and a bad unit at its key', () => {
    const e = inputError(() => loadModelFile(file(MODEL.replace('"name": "Triangle",', '"units": { "length": "kg" },'))));
    expect(e.issues).toEqual([
      { path: '', code: 'schema-missing-key', message: 'missing key "name"', line: 1, column: 1 },
      { path: 'units.length', code: 'wrong-dimension', message: "'kg' is not a length", line: 2, column: 14 },
    ]);
  });
});

describe('writeFileAtomic', () => {
  const out = join(dir, 'out');
  mkdirSync(out);

  it('writes, replaces, and leaves no temporary file behind', () => {
    const target = join(out, 'result.csv');
    writeFileAtomic(target, 'a,b\n1,2\n');
    writeFileAtomic(target, 'a,b\n3,4\n');
    expect(readFileSync(target, 'utf8')).toBe('a,b\n3,4\n');
    expect(readdirSync(out)).toEqual(['result.csv']);
  });

  it('throws InputError for a directory that does not exist', () => {
    const e = inputError(() => writeFileAtomic(join(out, 'missing', 'x.csv'), 'x'));
    expect(e.issues[0]).toMatchObject({ code: 'file-unwritable', message: 'cannot write the file: the directory does not exist' });
  });

  it('removes its temporary file when the rename fails', () => {
    const target = join(out, 'taken');
    mkdirSync(target);
    expect(() => writeFileAtomic(target, 'x')).toThrow(InputError);
    expect(readdirSync(out).sort()).toEqual(['result.csv', 'taken']);
  });
});

describe('InputError', () => {
  it('formats issues with and without a file or position', () => {
    const one = { path: 'members[3].to', code: 'unknown-node', message: 'no node has id "Z"' };
    expect(new InputError(undefined, [one]).message).toBe('members[3].to: no node has id "Z"');
    expect(new InputError('m.json', [one]).message).toBe('m.json members[3].to: no node has id "Z"');
    expect(new InputError('m.json', [{ ...one, line: 4, column: 9 }]).message).toBe('m.json:4:9 members[3].to: no node has id "Z"');
    expect(new InputError('m.json', [{ ...one, path: '' }]).message).toBe('m.json: no node has id "Z"');
  });

  it('lists at most 20 issues in its message but keeps them all', () => {
    const many = Array.from({ length: 25 }, (_, i) => ({ path: `nodes[${i}]`, code: 'x', message: 'bad' }));
    const e = new InputError('m.json', many);
    expect(e.issues).toHaveLength(25);
    expect(e.message.split('\n')).toHaveLength(21);
    expect(e.message).toMatch(/and 5 more$/);
    expect(e.name).toBe('InputError');
  });
});
