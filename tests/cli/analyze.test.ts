/**
 * `panelpoint analyze` end to end: the JSON contract, forces against hand statics, units,
 * unstable and indeterminate frames, method of sections, --combination, --out, the text report.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CAUTIONS } from '../../shared/cautions';
import { example, readJson, runCli, runProcess } from './run-cli';

interface ModelFile {
  name: string;
  nodes: { id: string; x: number; y: number }[];
  members: { id: string; from: string; to: string; section?: string }[];
  sections: { id: string; A: number; E: number }[];
  supports: { node: string; type: string }[];
  loads: { case: string; node: string; fx?: number; fy?: number }[];
  combinations: { id: string; factors: Record<string, number> }[];
  units: Record<string, string>;
}
interface ResultJson {
  memberForces: Record<string, number>;
  reactions: Record<string, { rx: number; ry: number }>;
  displacements: Record<string, { ux: number; uy: number }>;
  peak: { tension: { member: string; force: number }; compression: { member: string; force: number }; maxDisplacement: { node: string; value: number } };
  checks: { equilibriumResidual: number; staticsDifference?: number };
}
interface Finding { code: string; joints?: string[]; members?: string[] }
interface Doc {
  units: { length: string; force: string };
  classification: Record<string, number | boolean | string> & { findings: Finding[]; mechanismModes: { displacements: Record<string, { ux: number; uy: number }> }[]; selfStressStates: { members: Record<string, number> }[] };
  results: Record<string, ResultJson>;
  sections: { loading: string; members: string[]; freeBody: string[]; error?: string; forces?: Record<string, number>; stiffness?: Record<string, number> }[];
}

const DEPOT = example('depot-roof-r3.json');
const UNSTABLE = example('depot-roof-r3-missing-diagonal.json');
const PIN_PIN = example('depot-roof-r3-pin-pin.json');
const CANOPY = example('harrow-lane-canopy-c1.json');
const BRIDGE = example('kestrel-brook-footbridge.json');
const depot = readJson<ModelFile>(DEPOT);
const dir = mkdtempSync(join(tmpdir(), 'panelpoint-analyze-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function analyzeJson(file: string, ...more: string[]): Promise<Doc> {
  const r = await runCli('analyze', file, '--json', ...more);
  expect(r.code, r.err).toBe(0);
  return JSON.parse(r.out) as Doc;
}
const maxAbs = (v: Record<string, number>) => Math.max(...Object.values(v).map(Math.abs));

/**
 * Hand statics of the depot roof, a simply supported parallel-chord Pratt truss (pin at B0,
 * vertical roller at B6), by the method of sections through each panel p (cut TCp, Dp, BCp,
 * free body left of the cut): with M the sagging moment of the left-hand forces about the
 * point where the other two cut members meet, and V their vertical resultant (the panel shear),
 * bottom chord = +M/h, top chord = −M/h, diagonal = ±V/sin θ (+ when it falls to the right).
 */
function handForces(m: ModelFile, combination: string): { forces: Record<string, number>; pin: [number, number]; roller: number } {
  const at = new Map(m.nodes.map((n) => [n.id, n]));
  const factors = m.combinations.find((c) => c.id === combination)!.factors;
  const loads = m.loads.map((l) => ({ ...at.get(l.node)!, fx: (l.fx ?? 0) * (factors[l.case] ?? 0), fy: (l.fy ?? 0) * (factors[l.case] ?? 0) }));
  const [pin, roller] = m.supports.map((s) => at.get(s.node)!);
  // Reactions: ΣM about the pin = 0 gives the roller; ΣFx = ΣFy = 0 give the pin.
  const momentAboutPin = loads.reduce((s, f) => s + (f.x - pin.x) * f.fy - (f.y - pin.y) * f.fx, 0);
  const Rr = -momentAboutPin / (roller.x - pin.x);
  const R = { ...pin, fx: -loads.reduce((s, f) => s + f.fx, 0), fy: -loads.reduce((s, f) => s + f.fy, 0) - Rr };
  const h = at.get('T0')!.y - at.get('B0')!.y;
  const forces: Record<string, number> = {};
  for (let p = 1; p <= 6; p++) {
    const cut = (at.get(`B${p - 1}`)!.x + at.get(`B${p}`)!.x) / 2;
    const left = [R, ...loads.filter((f) => f.x < cut)];
    const M = (P: { x: number; y: number }) => left.reduce((s, f) => s + (P.x - f.x) * f.fy + (f.y - P.y) * f.fx, 0);
    const V = left.reduce((s, f) => s + f.fy, 0);
    const d = m.members.find((e) => e.id === `D${p}`)!;
    const [a, b] = [at.get(d.from)!, at.get(d.to)!];
    const [top, bottom] = a.y > b.y ? [a, b] : [b, a];
    const sin = h / Math.hypot(b.x - a.x, b.y - a.y);
    forces[`BC${p}`] = M(top) / h;
    forces[`TC${p}`] = -M(bottom) / h;
    forces[`D${p}`] = (top.x < bottom.x ? 1 : -1) * (V / sin);
  }
  return { forces, pin: [R.fx, R.fy], roller: Rr };
}

describe('analyze --json: the contract', () => {
  it('has the classification and result keys of the README', async () => {
    const doc = await analyzeJson(DEPOT);
    const c = doc.classification;
    for (const k of ['joints', 'members', 'reactions', 'countRule', 'rank', 'mechanisms', 'selfStress', 'status', 'critical']) expect(c).toHaveProperty(k);
    expect([c.joints, c.members, c.reactions]).toEqual([depot.nodes.length, depot.members.length, 3]);
    // Maxwell (1864): m + r − 2j; Calladine (1978): m + r − 2j = s − k; k = 2j − rank by definition.
    expect(c.countRule).toBe(depot.members.length + 3 - 2 * depot.nodes.length);
    expect(c.countRule).toBe((c.selfStress as number) - (c.mechanisms as number));
    expect(c.rank).toBe(2 * depot.nodes.length - (c.mechanisms as number));
    expect([c.status, c.critical, c.degree]).toEqual(['determinate', false, 0]);
    expect(Object.keys(doc.results)).toEqual(depot.combinations.map((k) => k.id));
    for (const r of Object.values(doc.results)) {
      expect(Object.keys(r.memberForces)).toEqual(depot.members.map((e) => e.id));
      expect(Object.keys(r.reactions)).toEqual(depot.supports.map((s) => s.node));
      for (const v of Object.values(r.reactions)) expect([typeof v.rx, typeof v.ry]).toEqual(['number', 'number']);
      expect(Object.keys(r.displacements)).toEqual(depot.nodes.map((n) => n.id));
      for (const v of Object.values(r.displacements)) expect([typeof v.ux, typeof v.uy]).toEqual(['number', 'number']);
      // The peaks are the extremes of the tables beside them.
      const f = Object.values(r.memberForces);
      expect(r.peak.tension).toEqual({ member: r.peak.tension.member, force: Math.max(...f) });
      expect(r.memberForces[r.peak.tension.member]).toBe(Math.max(...f));
      expect(r.memberForces[r.peak.compression.member]).toBe(Math.min(...f));
      const u = Object.values(r.displacements).map((d) => Math.hypot(d.ux, d.uy));
      expect(r.peak.maxDisplacement.value).toBeCloseTo(Math.max(...u), 12);
      const d = r.displacements[r.peak.maxDisplacement.node];
      expect(Math.hypot(d.ux, d.uy)).toBeCloseTo(Math.max(...u), 12);
    }
  });

  it.each([['depot-roof-r3.json', 'determinate'], ['depot-roof-r3-missing-diagonal.json', 'unstable'], ['depot-roof-r3-pin-pin.json', 'indeterminate'],
    ['kestrel-brook-footbridge.json', 'determinate'], ['harrow-lane-canopy-c1.json', 'determinate']])('%s is %s', async (name, status) => {
    const c = (await analyzeJson(example(name))).classification;
    expect(c.status).toBe(status);
    // Calladine (1978): m + r − 2j = s − k; a critical form passes the count yet has k > 0.
    expect(c.countRule).toBe((c.selfStress as number) - (c.mechanisms as number));
    expect(c.critical).toBe((c.countRule as number) >= 0 && (c.mechanisms as number) > 0);
  });

  it.each(depot.combinations.map((k) => k.id))('depot roof %s: chords M/h, diagonals V/sin θ, reactions by statics', async (id) => {
    const r = (await analyzeJson(DEPOT)).results[id];
    const hand = handForces(depot, id);
    const tol = 1e-9 * maxAbs(r.memberForces);
    for (const [member, N] of Object.entries(hand.forces)) expect(Math.abs(r.memberForces[member] - N), member).toBeLessThan(tol); // method of sections (statics)
    expect(Math.abs(r.reactions.B0.rx - hand.pin[0])).toBeLessThan(tol); // ΣFx = 0
    expect(Math.abs(r.reactions.B0.ry - hand.pin[1])).toBeLessThan(tol); // ΣFy = 0
    expect(Math.abs(r.reactions.B6.ry - hand.roller)).toBeLessThan(tol); // ΣM about B0 = 0
    expect(r.checks.staticsDifference).toBeLessThan(tol); // determinate: stiffness = statics (ENGINEERING.md §3)
  });
});

describe('analyze: units', () => {
  it('mm / N / MPa / mm² and the same model in m / kN give one answer', async () => {
    // SI prefixes: 1 mm = 0.001 m, 1 N = 0.001 kN, 1 mm² = 1e-6 m², 1 MPa = 1000 kN/m².
    const mm = readJson<ModelFile>(CANOPY);
    const si: ModelFile = {
      ...mm, units: { length: 'm', force: 'kN' },
      nodes: mm.nodes.map((n) => ({ ...n, x: n.x * 1e-3, y: n.y * 1e-3 })),
      loads: mm.loads.map((l) => ({ ...l, ...(l.fx !== undefined ? { fx: l.fx * 1e-3 } : {}), ...(l.fy !== undefined ? { fy: l.fy * 1e-3 } : {}) })),
      sections: mm.sections.map((s) => ({ ...s, A: s.A * 1e-6, E: s.E * 1e3 })),
    };
    writeFileSync(join(dir, 'canopy-si.json'), JSON.stringify(si, null, 2));
    const [a, b] = [await analyzeJson(CANOPY), await analyzeJson(join(dir, 'canopy-si.json'))];
    expect([a.units, b.units]).toEqual([{ length: 'mm', force: 'N' }, { length: 'm', force: 'kN' }]);
    const { conditioning: ca, ...restA } = a.classification;
    const { conditioning: cb, ...restB } = b.classification;
    expect(restA).toEqual(restB);
    expect(ca as number).toBeCloseTo(cb as number, 3);
    const same = (x: number, y: number, what: string) => expect(Math.abs(x - y), what).toBeLessThanOrEqual(1e-9 * Math.max(Math.abs(x), Math.abs(y)));
    expect(Object.keys(a.results)).toEqual(mm.combinations.map((k) => k.id));
    for (const [id, ra] of Object.entries(a.results)) {
      const rb = b.results[id];
      for (const [e, N] of Object.entries(ra.memberForces)) same(N * 1e-3, rb.memberForces[e], `${id} ${e}`);
      for (const [n, R] of Object.entries(ra.reactions)) { same(R.rx * 1e-3, rb.reactions[n].rx, n); same(R.ry * 1e-3, rb.reactions[n].ry, n); }
      for (const [n, u] of Object.entries(ra.displacements)) { same(u.ux * 1e-3, rb.displacements[n].ux, n); same(u.uy * 1e-3, rb.displacements[n].uy, n); }
    }
  });
});

describe('analyze: frames that fail or are redundant', () => {
  it('a bare panel beside a doubly braced one: unstable, exit 0, no results, the mechanism found', async () => {
    const doc = await analyzeJson(UNSTABLE);
    const c = doc.classification;
    expect([c.status, c.critical, c.countRule, c.mechanisms, c.selfStress]).toEqual(['unstable', true, 0, 1, 1]);
    expect(doc.results).toEqual({});
    const mech = c.findings.find((f) => f.code === 'mechanism')!;
    expect(mech.joints).toEqual(expect.arrayContaining(['B1', 'B2', 'T1', 'T2'])); // panel 2 has no diagonal
    expect(c.findings.find((f) => f.code === 'self-stress')!.members).toEqual(expect.arrayContaining(['D5', 'D5X']));
    // The mode stretches no member (Aᵀd = 0, first order) but changes the length of panel 2's missing diagonal T1–B2.
    const u = c.mechanismModes[0].displacements;
    const at = new Map(depot.nodes.map((n) => [n.id, n]));
    const stretch = (p: string, q: string) => {
      const [a, b] = [at.get(p)!, at.get(q)!];
      const [ua, ub] = [u[p] ?? { ux: 0, uy: 0 }, u[q] ?? { ux: 0, uy: 0 }];
      return ((ub.ux - ua.ux) * (b.x - a.x) + (ub.uy - ua.uy) * (b.y - a.y)) / Math.hypot(b.x - a.x, b.y - a.y);
    };
    for (const e of readJson<ModelFile>(UNSTABLE).members) expect(Math.abs(stretch(e.from, e.to)), e.id).toBeLessThan(1e-9);
    expect(Math.abs(stretch('T1', 'B2'))).toBeGreaterThan(0.1);
    const failing = await runCli('analyze', UNSTABLE, '--fail-on', 'unstable');
    expect(failing.code).toBe(1);
    expect(failing.err).toContain('unstable');
    expect(failing.out.split('\n')[3]).toMatch(/^VERDICT\s+UNSTABLE/);
    expect((await runCli('analyze', DEPOT, '--fail-on', 'unstable')).code).toBe(0);
    expect((await runCli('analyze', DEPOT, '--fail-on', 'wobbly')).code).toBe(2);
  });

  it('two pins: indeterminate to degree 1; the force method gives the bottom chord', async () => {
    const doc = await analyzeJson(PIN_PIN);
    const c = doc.classification;
    expect([c.status, c.degree, c.selfStress, c.mechanisms, c.critical]).toEqual(['indeterminate', 1, 1, 0, false]);
    const bottom = depot.members.filter((e) => e.id.startsWith('BC'));
    expect(Object.keys(c.selfStressStates[0].members).sort()).toEqual(bottom.map((e) => e.id).sort());
    const at = new Map(depot.nodes.map((n) => [n.id, n]));
    const EA = new Map(depot.sections.map((s) => [s.id, s.E * s.A]));
    const flex = (e: ModelFile['members'][number]) => Math.hypot(at.get(e.to)!.x - at.get(e.from)!.x, at.get(e.to)!.y - at.get(e.from)!.y) / EA.get(e.section!)!;
    for (const [id, r] of Object.entries(doc.results)) {
      const scale = maxAbs(r.memberForces);
      expect(r.checks.equilibriumResidual).toBeLessThan(1e-9 * scale);
      // Force method (compatibility, unit-load method): release B6 horizontally (the pin–roller truss, forces N0 by
      // hand statics); the redundant X is a unit tension in every bottom chord, X = −Σ N0·L/EA ÷ Σ L/EA.
      const N0 = handForces(depot, id).forces;
      const X = -bottom.reduce((s, e) => s + N0[e.id] * flex(e), 0) / bottom.reduce((s, e) => s + flex(e), 0);
      for (const [e, N] of Object.entries(N0)) expect(Math.abs(r.memberForces[e] - (N + (e.startsWith('BC') ? X : 0))), `${id} ${e}`).toBeLessThan(1e-9 * scale);
    }
  });
});

describe('analyze --section and --combination', () => {
  it('three cut members: statics equals stiffness and the hand calculation', async () => {
    const doc = await analyzeJson(DEPOT, '--section', 'TC2,D2,BC2');
    expect(doc.sections.map((s) => s.loading)).toEqual(depot.combinations.map((k) => k.id));
    for (const s of doc.sections) {
      const hand = handForces(depot, s.loading).forces;
      for (const m of ['TC2', 'D2', 'BC2']) {
        expect(Math.abs(s.forces![m] - s.stiffness![m])).toBeLessThan(1e-9 * maxAbs(s.stiffness!));
        expect(Math.abs(s.forces![m] - hand[m])).toBeLessThan(1e-9 * maxAbs(s.stiffness!)); // method of sections by hand
      }
    }
    const bridge = await analyzeJson(BRIDGE, '--section', 'TC3,D6,BC3', '-c', 'ULS-half');
    expect(bridge.sections).toHaveLength(1);
    const [cut] = bridge.sections;
    for (const m of ['TC3', 'D6', 'BC3']) expect(Math.abs(cut.forces![m] - cut.stiffness![m])).toBeLessThan(1e-9 * maxAbs(cut.stiffness!)); // statics = stiffness (determinate)
  });

  it('a cut that does not split the truss, or meets at a point, is an error entry; an unknown member is exit 2', async () => {
    const doc = await analyzeJson(DEPOT, '--section', 'TC2,BC2', '--section', 'TC1,V0,D1', '-c', 'ULS-1');
    expect(doc.sections).toHaveLength(2);
    expect(doc.sections[0].error).toMatch(/does not split/);
    expect(doc.sections[1].error).toMatch(/meet at one point/);
    for (const s of doc.sections) expect(s).not.toHaveProperty('forces');
    const bad = await runCli('analyze', DEPOT, '--section', 'TC2,XX,BC2');
    expect([bad.code, bad.out]).toEqual([2, '']);
    expect(bad.err).toContain("no member 'XX'");
  });

  it('--combination keeps only the ids asked; an unknown id lists the ids there are', async () => {
    const all = await analyzeJson(DEPOT);
    const one = await analyzeJson(DEPOT, '--combination', 'ULS-3');
    expect(Object.keys(one.results)).toEqual(['ULS-3']);
    expect(one.results['ULS-3']).toEqual(all.results['ULS-3']);
    expect(Object.keys((await analyzeJson(DEPOT, '-c', 'ULS-1,ULS-6')).results)).toEqual(['ULS-1', 'ULS-6']);
    const bad = await runCli('analyze', DEPOT, '-c', 'ULS-9');
    expect([bad.code, bad.out]).toEqual([2, '']);
    expect(bad.err).toContain(depot.combinations.map((k) => k.id).join(', '));
  });
});

describe('analyze --out and the text report', () => {
  it('--out writes the JSON of stdout, atomically, and replaces an old file', async () => {
    const out = join(mkdtempSync(join(dir, 'out-')), 'result.json');
    const r = await runCli('analyze', DEPOT, '--json', '--out', out);
    expect(r.code).toBe(0);
    expect(readFileSync(out, 'utf8')).toBe(r.out);
    const text = await runCli('analyze', PIN_PIN, '-o', out);
    expect(text.out).toMatch(/^Panelpoint /);
    expect(readFileSync(out, 'utf8')).toBe((await runCli('analyze', PIN_PIN, '--json')).out);
    expect(readdirSync(join(out, '..'))).toEqual(['result.json']); // no temporary files left
  });

  it('verdict first, units in the table heads, cautions last', async () => {
    const r = await runCli('analyze', DEPOT);
    const lines = r.out.trimEnd().split('\n');
    expect(lines[0]).toMatch(/^Panelpoint \d+\.\d+\.\d+ · /);
    expect(lines[0]).toContain(DEPOT);
    expect(lines[1]).toBe(`${depot.name}   (lengths m, forces kN)`);
    expect(lines.slice(2, 4)).toEqual(['', 'VERDICT  STABLE — statically determinate']);
    expect(lines).toContain('MEMBER FORCES (kN, tension +, T/C marked)');
    expect(lines).toContain('DISPLACEMENTS (mm)');
    expect(lines.slice(-CAUTIONS.length - 1)).toEqual(['CAUTIONS', ...CAUTIONS.map((t) => `  ${t}`)]);
    const canopy = (await runCli('analyze', CANOPY)).out.split('\n');
    expect(canopy).toContain('MEMBER FORCES (N, tension +, T/C marked)');
    expect((await runCli('analyze', PIN_PIN)).out.split('\n')[3]).toBe('VERDICT  STABLE — statically indeterminate to degree 1');
  });
});

describe('panelpoint as a real process', () => {
  it('--help and analyze --help exit 0', () => {
    const [top, sub] = [runProcess('--help'), runProcess('analyze', '--help')];
    expect([top.code, top.err, sub.code, sub.err]).toEqual([0, '', 0, '']);
    expect(top.out).toContain('analyze');
    for (const o of ['--json', '--combination', '--section', '--fail-on', '--out']) expect(sub.out).toContain(o);
  });

  it('the exit code of --fail-on reaches the shell', () => {
    const r = runProcess('analyze', UNSTABLE, '--fail-on', 'unstable');
    expect([r.code, r.err]).toEqual([1, `${UNSTABLE}: unstable (k = 1); --fail-on unstable\n`]);
  });
});
