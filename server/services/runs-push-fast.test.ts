import { describe, expect, it } from 'vitest';
import { emptyDesign, type DesignFigures } from '../../shared/sweep/evaluate-design';
import type { VariantRecord } from '../../shared/sweep/evaluate';
import { formatRecord } from '../../shared/sweep/record-format';
import type { ParamColumns } from '../db/models/run.model';
import { HttpError } from '../http/http-error';
import { rowValues } from './runs-insert';
import { fastLineReader } from './runs-push-fast';
import { rowsOfLine, type RowContext } from './runs-push-rows';

/** A small deterministic generator (LCG constants of Numerical Recipes), for repeatable cases. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296;
}

const NAMES = ['span', 'depth', 'panels', 'supports', 'rollerAngle'];
const COLUMNS: ParamColumns = { span: 'p1', depth: 'p2', panels: 'p3', rollerAngle: 'p4' };
const SIZED: DesignFigures = {
  status: 'sized', weight: 12.345, mass: 1258.6, maxUtilisation: 0.9321, maxUtilisationMember: 'TC3', governingCheck: 'buckling "6.3"',
  governingCombination: 'C2', deflectionOk: true, sections: 'chords=SHS 100x5; web=SHS 60x3', reason: '',
};

/** Records as the sweep writes them: every status, sized or not, figures from 1e-9 to 1e6. */
function records(n: number, seed: number, start = 0): string[] {
  const rnd = lcg(seed);
  const out: string[] = [];
  for (let i = 0; i < n; i++) {
    const status = (['determinate', 'indeterminate', 'unstable', 'error'] as const)[Math.floor(rnd() * 4)];
    const stable = status === 'determinate' || status === 'indeterminate';
    const size = 10 ** (rnd() * 15 - 9);
    const r: VariantRecord = {
      index: start + i, id: Math.floor(rnd() * 2 ** 52).toString(16).padStart(16, '0').slice(0, 16),
      params: { span: 24, depth: 0.8 + (i * 3.2) / 9999, panels: 8 + 2 * Math.floor(rnd() * 5), supports: rnd() < 0.5 ? 'pin-roller' : 'roller-roller', rollerAngle: 60 },
      status, joints: 18, members: 33, reactions: 3, k: stable ? 0 : 1, s: status === 'indeterminate' ? 1 : 0, critical: rnd() < 0.1,
      peakTension: size * 1e3 * rnd(), peakTensionMember: rnd() < 0.05 ? '' : `BC${i % 9}`, peakTensionCombination: 'C2',
      peakCompression: -size * 1e3 * rnd(), peakCompressionMember: 'TC4', peakCompressionCombination: 'C1',
      maxDisplacement: size * rnd(), maxDisplacementNode: 'T4', maxDisplacementCombination: 'C2', spanOverDeflection: rnd() < 0.1 ? NaN : 1 / (size * rnd()),
      reason: stable ? '' : `Maxwell's count is short: m + r − 2j = −${i % 3}; "quoted" \\ and ψ`,
      design: rnd() < 0.3 ? emptyDesign() : { ...SIZED, weight: 10 * rnd(), maxUtilisation: rnd() },
    };
    out.push(formatRecord(r, NAMES, { json: '', csv: '' }, i % 3 !== 0).json.trimEnd());
  }
  return out;
}

const line = (recs: string[]) => Buffer.from(`{"kind":"variants","rows":[${recs.join(',')}]}`);
const ctxOf = (): RowContext => ({ runPk: 7, paramColumns: COLUMNS, range: { start: 0, end: 1_000_000 }, lastIndex: -1 });

/** What the general path makes of a line: values, or its error. */
function general(bytes: Buffer, ctx: RowContext, keepAfter: number): { values: unknown[][]; records: number } | string {
  try {
    const { rows, records } = rowsOfLine(JSON.parse(bytes.toString('utf8')), 2, ctx, keepAfter);
    return { values: rows.map(rowValues), records };
  } catch (e) {
    return e instanceof HttpError ? e.code : 'invalid-json';
  }
}

describe('fastLineReader', () => {
  const reader = fastLineReader(NAMES, COLUMNS)!;

  it('reads what the sweep writes into the values of the general path (every status, sized or not)', () => {
    const recs = records(2000, 1);
    const a = ctxOf();
    const b = ctxOf();
    const fast = reader(line(recs), a, -1);
    expect(fast).toBeDefined();
    expect(fast).toEqual(general(line(recs), b, -1));
    expect(a.lastIndex).toBe(b.lastIndex);
    expect(fast!.values[3][3]).toBe(JSON.stringify(JSON.parse(recs[3]).params));
  });

  it('reads 20,000 random figures exactly as JSON.parse does', () => {
    for (let seed = 2; seed < 12; seed++) {
      const recs = records(2000, seed);
      expect(reader(line(recs), ctxOf(), -1)).toEqual(general(line(recs), ctxOf(), -1));
    }
  });

  it('skips rows a resumed shard already holds, and keeps the index order across lines', () => {
    const ctx = ctxOf();
    const first = reader(line(records(10, 3)), ctx, 4);
    expect([first?.records, first?.values.map((v) => v[1])]).toEqual([10, [5, 6, 7, 8, 9]]);
    expect(reader(line(records(10, 3, 5)), ctx, 4)).toBeUndefined(); // indices 5.. again: not above 9
    expect(ctx.lastIndex).toBe(9);
  });

  it('hands back any line it does not read, and the general path then agrees or gives the error', () => {
    const recs3 = records(3, 4);
    const base = [recs3[0].slice(0, -1) + ',"design":null}', recs3[1], recs3[2]];
    const read: string[] = [];
    const edits: [string, string][] = [
      ['"status":"determinate"', '"status":"wobbly"'], ['"joints":18', '"joints":18.0'], ['"joints":18', '"joints": 18'], ['"critical":false', '"critical":0'],
      ['"id":"', '"id":"A'], ['"depth":0.8,', '"depth":8e-1,'], ['"depth":0.8,', '"depth":0.80,'], ['"span":24', '"sp\\u0061n":24'],
      ['"supports":"pin-roller"', '"supports":"pin\\u002droller"'], ['"supports":"pin-roller"', '"supports":"pin\\/roller"'], ['"span":24', '"span":-0'],
      ['"member":"TC4"', `"member":"${'x'.repeat(65)}"`], ['"reason":null', '"reason":7'], ['"reason":null', '"reason":null,"weight":3'],
      ['"design":null', '"design":{"weight":1,"weight":2}'], ['"design":null', '"design":{"w\\u0065ight":2}'], ['"design":null', '"design":{"weight":null}'],
      ['"design":null', '"design":{"a":[1,{"b":"\\n"}],"maxUtilisation":0.5}'], ['"index":0', '"index":-0'], ['"index":0', '"index":1e0'],
      ['"combination":"C2"', '"combination":"C\\"2"'], ['"value":', '"value":1,"x":'], ['"params":{', '"params":{"extra":1,'], ['}', ' }'],
    ];
    for (const [from, to] of edits) {
      const recs = base.map((r) => r.replace(from, to));
      if (recs.join() === base.join()) continue;
      const bytes = line(recs);
      const fast = reader(bytes, ctxOf(), -1);
      const slow = general(bytes, ctxOf(), -1);
      if (fast) expect({ edit: to, got: fast }).toEqual({ edit: to, got: slow });
      if (fast) read.push(to);
    }
    // Valid lines in the CLI's layout with unusual content are read; everything else is handed back.
    expect(read).toEqual(['"design":{"w\\u0065ight":2}', '"design":{"a":[1,{"b":"\\n"}],"maxUtilisation":0.5}', '"combination":"C\\"2"']);
    // Broken lines and envelopes are never read.
    for (const text of [`{"kind":"variants","rows":[]}`, `{"kind":"variants","rows":[${base[0]}]} `, `{"kind":"variants","rows":[${base[0]}],"x":1}`, `{"kind":"variants","rows":[${base[0].slice(0, 40)}`]) {
      expect(reader(Buffer.from(text), ctxOf(), -1)).toBeUndefined();
    }
  });

  it('reads each byte cut of a line as the general path does, or hands it back', () => {
    const recs = records(2, 5);
    const text = line(recs).toString();
    for (let at = 1; at < text.length; at++) {
      const bytes = Buffer.from(text.slice(0, at) + text.slice(at + 1));
      const fast = reader(bytes, ctxOf(), -1);
      if (fast) expect(fast).toEqual(general(bytes, ctxOf(), -1));
    }
  });

  it('is not offered when parameter names would not be plain keys', () => {
    expect(fastLineReader(['a"b'], {})).toBeUndefined();
    expect(fastLineReader(['2', 'span'], {})).toBeUndefined();
    expect(fastLineReader(['span', 'span'], {})).toBeUndefined();
  });
});
