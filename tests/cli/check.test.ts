/**
 * `panelpoint check` and `panelpoint freeze` end to end: the example reference cases, tolerance
 * edges, drift (a changed status, a missing member), invalid cases, JUnit XML, freezing a model
 * file and a sweep variant. Hand values come from the cantilever wall bracket of
 * examples/reference/cantilever-wall-bracket.json (method of joints, worked in its `derivation`).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { compileSchema } from '../../shared/schemas/validate';
import { ReferenceCase } from '../../shared/schemas/reference-case';
import { ROOT, example, readJson, runCli, runProcess } from './run-cli';

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const REF = `${ROOT}examples/reference`;
const BRACKET = readJson<Json>(`${REF}/cantilever-wall-bracket.json`);
const tmp = mkdtempSync(join(tmpdir(), 'panelpoint-check-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

let n = 0;
/** A fresh folder under the temporary one. */
const folder = () => {
  const d = join(tmp, `d${n++}`);
  mkdirSync(d, { recursive: true });
  return d;
};
const write = (path: string, data: unknown) => {
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, typeof data === 'string' ? data : JSON.stringify(data, null, 2));
  return path;
};
/** The bracket case, edited. */
const bracket = (edit: (c: Json) => void = () => {}): Json => {
  const c = structuredClone(BRACKET);
  edit(c);
  return c;
};
const loose = { absolute: { force: 0.01, displacement: 1e-6 }, relative: 1e-3 };

describe('the example reference cases', () => {
  it('all pass, from the default folder and named', async () => {
    const r = await runCli('check');
    expect(r.code, r.out + r.err).toBe(0);
    expect(r.out).toMatch(/reference cases: 8 passed, 0 drifted, 0 invalid, 0 failed to recompute \(of 8\)/);
    expect((await runCli('check', REF)).code).toBe(0);
  });

  it('are valid against the full JSON Schema and name their source; hand cases show their working', () => {
    const check = compileSchema(ReferenceCase);
    const files = readdirSync(REF).filter((f) => f.endsWith('.json') && !f.endsWith('.model.json'));
    expect(files.length).toBe(8);
    for (const f of files) {
      const c = readJson<Json>(join(REF, f));
      expect(check(c), f).toEqual([]);
      expect(c.source.citation.length, f).toBeGreaterThan(20);
      if (c.source.kind !== 'demo') expect(c.derivation?.length, f).toBeGreaterThan(0);
    }
    expect(files.filter((f) => readJson<Json>(join(REF, f)).source.kind === 'demo').sort()).toEqual(['depot-roof-r3.json', 'kestrel-brook-footbridge.json']);
  });
});

describe('drift', () => {
  it('passes a figure just inside its tolerance and reports one just outside with its amounts (exit 0, then 3)', async () => {
    const d = folder();
    // CE = +20 kN by the method of joints at E; allowed = 0.01 + 1e-3·|want|
    const inside = write(join(d, 'inside.json'), bracket((c) => ((c.tolerance = loose), (c.expected.results.P.memberForces.CE = 20.025))));
    const a = await runCli('check', inside);
    expect(a.code, a.out).toBe(0);
    const outside = write(join(d, 'outside.json'), bracket((c) => ((c.tolerance = loose), (c.expected.results.P.memberForces.CE = 20.035))));
    const b = await runCli('check', outside);
    expect(b.code, b.out).toBe(3);
    expect(b.out).toMatch(/DRIFT\s+results\.P\.memberForces\.CE\s+20\.035 kN\s+20 kN\s+3\.50e-2 kN\s+3\.00e-2 kN/);
    expect(b.out).toContain('1 of 19 figures out of tolerance');
    expect(b.err).toMatch(/1 reference case\(s\) drifted/);
  });

  it('reports a changed status when a member is taken out of the model', async () => {
    const f = write(join(folder(), 'status.json'), bracket((c) => (c.model.members = c.model.members.filter((m: Json) => m.id !== 'DE'))));
    const r = await runCli('check', f);
    expect(r.code).toBe(3);
    expect(r.out).toMatch(/classification\.status\s+determinate\s+unstable/);
    expect(r.out).toMatch(/classification\.members\s+6\s+5/);
    expect(r.out).toContain("loading 'P' missing in the recomputation (no results: the frame is unstable)");
  });

  it('names a member the recomputation no longer has', async () => {
    const f = write(join(folder(), 'renamed.json'), bracket((c) => (c.model.members.find((m: Json) => m.id === 'CE').id = 'CE2')));
    const r = await runCli('check', f);
    expect(r.code).toBe(3);
    expect(r.out).toMatch(/results\.P\.memberForces\.CE\s+20 kN\s+missing\s+—\s+\S+ kN\s+no member 'CE' in the recomputation/);
  });

  it('lists at most 20 figures of a drifted case', async () => {
    const f = write(join(folder(), 'many.json'), bracket((c) => {
      c.model.loads = c.model.loads.map((l: Json) => ({ ...l, fy: 2 * l.fy }));
    }));
    const r = await runCli('check', f, '--json');
    expect(r.code).toBe(3);
    const doc = JSON.parse(r.out) as Json;
    expect(doc.summary).toEqual({ cases: 1, passed: 0, drifted: 1, invalid: 0, failed: 0 });
    expect(doc.cases[0].comparison.failures.length).toBeGreaterThan(8);
    const text = await runCli('check', write(join(folder(), 'wide.json'), bracket((c) => {
      c.expected.results.P.memberForces = Object.fromEntries(Array.from({ length: 25 }, (_, i) => [`X${i}`, 1]));
    })));
    expect(text.out).toContain('... and 5 more');
  });
});

describe('invalid cases and paths (exit 2, every case still reported)', () => {
  it('names the file, line and JSON path of a model that no longer validates', async () => {
    const d = folder();
    write(join(d, 'a-good.json'), bracket());
    write(join(d, 'b-bad-inline.json'), bracket((c) => (c.model.members[1].to = 'Z')));
    write(join(d, 'broken.model.json'), { ...BRACKET.model, members: [{ id: 'AC', from: 'A', to: 'Q' }] });
    write(join(d, 'c-bad-file.json'), bracket((c) => (c.model = { file: 'broken.model.json' })));
    write(join(d, 'd-not-json.json'), '{ "name": "half a case",\n  "expected": ');
    const r = await runCli('check', d, join(d, 'nowhere'));
    expect(r.code).toBe(2);
    expect(r.out).toMatch(/Cantilever wall bracket, two panels, method of joints\s+pass/);
    expect(r.out).toMatch(/b-bad-inline\.json: invalid reference case\n\s+\S*b-bad-inline\.json:\d+:\d+ model\.members\[1\]\.to: no node has id "Z"/);
    expect(r.out).toMatch(/c-bad-file\.json:\d+:\d+ model\.file: the model file broken\.model\.json does not load\n\s+\S*broken\.model\.json:\d+:\d+ members\[0\]\.to: no node has id "Q"/);
    expect(r.out).toMatch(/d-not-json\.json:2:\d+: expected a value/);
    expect(r.out).toMatch(/nowhere: path not found/);
    expect(r.out).toMatch(/1 passed, 0 drifted, 3 invalid/);
    expect(r.err).toMatch(/1 path\(s\) not found, 3 invalid reference case\(s\)/);
  });

  it('accepts a case without a figure section only when it keeps the classification', async () => {
    const d = folder();
    const partial = write(join(d, 'forces-only.json'), bracket((c) => {
      delete c.expected.results.P.reactions;
      delete c.expected.results.P.displacements;
    }));
    const bare = write(join(d, 'classification-only.json'), bracket((c) => delete c.expected.results));
    const r = await runCli('check', partial, bare);
    expect(r.code, r.out).toBe(0);
    const none = write(join(d, 'no-classification.json'), bracket((c) => delete c.expected.classification));
    const s = await runCli('check', none);
    expect(s.code).toBe(2);
    expect(s.out).toMatch(/no-classification\.json:\d+:\d+ expected: missing key "classification"/);
  });

  it('notes a weight it does not compare yet', async () => {
    const r = await runCli('check', write(join(folder(), 'weight.json'), bracket((c) => (c.expected.weight = 3.2))));
    expect(r.code).toBe(0);
    expect(r.out).toContain('expected.weight (3.2 kN) not compared: member weight is not yet computed');
  });

  it('refuses a folder with no cases', async () => {
    const d = folder();
    write(join(d, 'model.json'), BRACKET.model);
    const r = await runCli('check', d);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/no reference cases found/);
  });
});

/** A tiny XML reader: elements with decoded attributes; throws on anything not well formed. */
interface El { name: string; attrs: Record<string, string>; children: El[]; text: string }
function parseXml(xml: string): El {
  const decode = (s: string) => {
    if (/&(?!(amp|lt|gt|quot|apos|#\d+);)/.test(s)) throw new Error(`bad entity in ${s}`);
    return s.replace(/&(amp|lt|gt|quot|apos|#\d+);/g, (_, e: string) =>
      e[0] === '#' ? String.fromCharCode(Number(e.slice(1))) : ({ amp: '&', lt: '<', gt: '>', quot: '"', apos: "'" })[e]!);
  };
  const body = xml.replace(/^<\?xml[^?]*\?>\s*/, '');
  const root: El = { name: '#root', attrs: {}, children: [], text: '' };
  const stack = [root];
  const tag = /<(\/?)([A-Za-z_][\w.-]*)((?:\s+[\w.-]+="[^"<]*")*)\s*(\/?)>|([^<]+)/gy;
  let m: RegExpExecArray | null;
  let at = 0;
  while (at < body.length && (m = tag.exec(body))) {
    at = tag.lastIndex;
    if (m[5] !== undefined) { stack[stack.length - 1].text += decode(m[5]); continue; }
    if (m[1]) {
      if (stack.pop()!.name !== m[2]) throw new Error(`mismatched </${m[2]}>`);
      continue;
    }
    const attrs: Record<string, string> = {};
    for (const a of m[3].matchAll(/([\w.-]+)="([^"]*)"/g)) attrs[a[1]] = decode(a[2]);
    const el: El = { name: m[2], attrs, children: [], text: '' };
    stack[stack.length - 1].children.push(el);
    if (!m[4]) stack.push(el);
  }
  if (at !== body.length || stack.length !== 1) throw new Error(`not well formed at ${at}`);
  return root.children[0];
}

describe('--junit', () => {
  it('writes one suite per folder and one test case per case, with the drift table and escaped text', async () => {
    const d = folder();
    const odd = `Bracket <CE> & "drift" 'nudged'`;
    write(join(d, 'a', 'pass.json'), bracket());
    write(join(d, 'a', 'drift.json'), bracket((c) => ((c.name = odd), (c.tolerance = loose), (c.expected.results.P.memberForces.CE = 20.035))));
    write(join(d, 'b', 'invalid.json'), bracket((c) => ((c.name = 'invalid one'), (c.model.members[0].from = 'nowhere'))));
    const xmlFile = join(d, 'report.xml');
    const r = await runCli('check', d, '--junit', xmlFile);
    expect(r.code).toBe(2);
    const raw = readFileSync(xmlFile, 'utf8');
    expect(raw).toContain('Bracket &lt;CE&gt; &amp; &quot;drift&quot; &apos;nudged&apos;');
    const top = parseXml(raw);
    expect(top.name).toBe('testsuites');
    expect(top.attrs).toMatchObject({ tests: '3', failures: '1', errors: '1' });
    expect(top.children.map((s) => [s.name, s.attrs.tests, s.attrs.failures, s.attrs.errors])).toEqual([
      ['testsuite', '2', '1', '0'],
      ['testsuite', '1', '0', '1'],
    ]);
    const cases = top.children.flatMap((s) => s.children);
    expect(cases.map((c) => c.attrs.name)).toEqual([odd, 'Cantilever wall bracket, two panels, method of joints', 'invalid one']);
    expect(cases[1].children).toEqual([]);
    const failure = cases[0].children[0];
    expect(failure.name).toBe('failure');
    expect(failure.attrs.message).toMatch(/1 figure out of tolerance; worst results\.P\.memberForces\.CE/);
    expect(failure.text).toMatch(/results\.P\.memberForces\.CE\s+20\.035 kN\s+20 kN\s+3\.50e-2 kN\s+3\.00e-2 kN/);
    expect(cases[2].children[0].name).toBe('error');
    expect(cases[2].children[0].text).toMatch(/model\.members\[0\]\.from: no node has id "nowhere"/);
  });
});

describe('freeze', () => {
  it('freezes a model file by relative path, and the frozen case passes', async () => {
    const d = folder();
    const out = join(d, 'canopy.json');
    const r = await runCli('freeze', example('harrow-lane-canopy-c1.json'), '--out', out, '--loadings', 'ULS-1,ULS-3');
    expect(r.code, r.err).toBe(0);
    const c = readJson<Json>(out);
    expect(resolve(d, c.model.file)).toBe(resolve(example('harrow-lane-canopy-c1.json')));
    expect(Object.keys(c.expected.results)).toEqual(['ULS-1', 'ULS-3']);
    expect(c.source.kind).toBe('demo');
    expect(c.tolerance).toEqual({ absolute: { force: 1e-6, displacement: 1e-9 }, relative: 1e-6 });
    expect((await runCli('check', out)).code).toBe(0);
  });

  it('freezes inline with the tolerance asked for, and an unstable model as its classification only', async () => {
    const d = folder();
    const inline = join(d, 'inline.json');
    expect((await runCli('freeze', example('depot-roof-r3.json'), '--out', inline, '--inline', '--name', 'depot', '--tolerance-rel', '1e-4', '--tolerance-force', '0.001')).code).toBe(0);
    const c = readJson<Json>(inline);
    expect(c.model.nodes.length).toBe(14);
    expect(c.tolerance).toEqual({ absolute: { force: 0.001, displacement: 1e-9 }, relative: 1e-4 });
    const unstable = join(d, 'unstable.json');
    expect((await runCli('freeze', example('depot-roof-r3-missing-diagonal.json'), '--out', unstable)).code).toBe(0);
    expect(readJson<Json>(unstable).expected).toEqual({ classification: expect.objectContaining({ status: 'unstable', critical: true }) });
    expect((await runCli('check', d)).code).toBe(0);
  });

  it('refuses bad options and writes nothing', async () => {
    const out = join(folder(), 'x.json');
    const a = await runCli('freeze', example('depot-roof-r3.json'), '--out', out, '--source-kind', 'published');
    expect(a.code).toBe(2);
    expect(a.err).toMatch(/needs --citation/);
    const b = await runCli('freeze', example('depot-roof-r3.json'), '--out', out, '--loadings', 'ULS-9');
    expect(b.code).toBe(2);
    expect(b.err).toMatch(/--loadings ULS-9: the model has ULS-1, ULS-3, ULS-6/);
    expect((await runCli('freeze', example('depot-roof-r3.json'), '--out', out, '--tolerance-rel', '-1')).code).toBe(2);
    expect(existsSync(out)).toBe(false);
  });

  it('freezes a variant of a sweep (RUN:VARIANT, by index and by id); the case and a { study, variant } case pass', async () => {
    const d = folder();
    const study = write(join(d, 'study.json'), {
      name: 'Small Pratt study', family: 'pratt', fixed: { span: 12 }, vary: { panels: [4, 6], depth: [1.5] },
      loads: [{ case: 'D', kind: 'self-weight' }, { case: 'S', kind: 'area', value: '0.75 kPa', spacing: 6, chord: 'top' }],
      combinations: { preset: 'asce7-lrfd' },
    });
    const run = join(d, 'run');
    const s = runProcess('sweep', study, '--out', run, '--workers', '1', '--quiet');
    expect(s.code, s.err).toBe(0);
    const lines = readFileSync(join(run, 'variants.jsonl'), 'utf8').trim().split('\n').map((l) => JSON.parse(l) as Json);
    expect(lines.map((l) => l.index)).toEqual([0, 1]);
    mkdirSync(join(d, 'cases'));
    const byIndex = join(d, 'cases', 'v1.json');
    const f = await runCli('freeze', `${run}:1`, '--out', byIndex);
    expect(f.code, f.err).toBe(0);
    expect(f.err).toBe(''); // the rebuilt variant agrees with what the sweep recorded
    const c = readJson<Json>(byIndex);
    expect(c.model.nodes.length).toBe(14); // 6 panels: 7 bottom and 7 top joints
    expect(c.name).toBe(`Small Pratt study, variant 1 (${lines[1].id})`);
    const peak = Math.max(...Object.values(c.expected.results).flatMap((r) => Object.values((r as Json).memberForces as Record<string, number>)));
    expect(peak).toBeCloseTo(lines[1].peakTension.value, 5);
    const byId = join(d, 'cases', 'v1-id.json');
    expect((await runCli('freeze', `${run}:${lines[1].id}`, '--out', byId)).code).toBe(0);
    expect(readJson<Json>(byId).expected).toEqual(c.expected);
    write(join(d, 'cases', 'v1-study.json'), { ...c, name: 'by study', model: { study: '../study.json', variant: 1 } });
    write(join(d, 'cases', 'v1-inline-study.json'), { ...c, name: 'inline study', model: { study: readJson(study), variant: lines[1].id } });
    const r = await runCli('check', join(d, 'cases'));
    expect(r.code, r.out).toBe(0);
    expect(r.out).toMatch(/4 passed/);
    const wrong = write(join(d, 'wrong-family.json'), { ...c, model: { study: { ...readJson<Json>(study), family: 'nope' }, variant: 0 } });
    const w = await runCli('check', wrong);
    expect(w.code).toBe(2);
    expect(w.out).toMatch(/wrong-family\.json:\d+:\d+ model\.study\.family: unknown family 'nope'/);
    const bad = await runCli('freeze', `${run}:7`, '--out', join(d, 'x.json'));
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/variant 7 is not in this run/);
  });
});
