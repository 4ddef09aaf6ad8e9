/**
 * `panelpoint families` (the registry as tables and JSON, one family with its id scheme) and
 * `panelpoint new` (a starter study that is valid, sweeps, and is not written over by accident).
 */
import { afterAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { families, getFamily, withDefaults } from '../../shared/families/registry';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { passes, variantAt } from '../../shared/sweep/space';
import { idScheme } from '../../cli/commands/families';
import { starterStudy, STUDY_SCHEMA_URL } from '../../cli/commands/new';
import { runCli } from './run-cli';
import { readLines, tempDir } from './sweep-helpers';

const tmp = tempDir('families-new');
afterAll(() => tmp.done());

const pratt = getFamily('pratt')!;
const prattPanels = pratt.params.find((p) => p.name === 'panels')!.default as number;

describe('panelpoint families', () => {
  it('lists every family with its parameters as tables', async () => {
    const r = await runCli('families');
    expect(r.code, r.err).toBe(0);
    for (const f of families) {
      expect(r.out).toContain(`${f.id} — ${f.name} (${f.category})`);
      for (const p of f.params) expect(r.out).toMatch(new RegExp(`^  ${p.name} +${p.unit}`, 'm'));
    }
    expect(r.out).toMatch(/parameter +unit +default +min–max +options +description/);
  });

  it('gives the same registry as JSON', async () => {
    const r = await runCli('families', '--json');
    expect(r.code, r.err).toBe(0);
    const doc = JSON.parse(r.out) as { families: { id: string; category: string; name: string; summary: string; params: unknown[] }[] };
    expect(doc.families.map((f) => f.id)).toEqual(families.map((f) => f.id));
    for (const [k, f] of families.entries()) {
      expect(doc.families[k]).toEqual({ id: f.id, category: f.category, name: f.name, summary: f.summary, params: JSON.parse(JSON.stringify(f.params)) });
    }
  });

  it('shows one family with the joint and member ids of its default topology', async () => {
    const r = await runCli('families', 'pratt');
    expect(r.code, r.err).toBe(0);
    // the Pratt summary: joints B0..Bn (bottom), T0..Tn (top); members by group TC, BC, V, D
    expect(r.out).toContain(`joints B0..B${prattPanels}, T0..T${prattPanels}; members TC, BC, V, D`);
    expect(r.out).toContain(`D1..D${prattPanels}`);
    const j = await runCli('families', 'pratt', '--json');
    const t = (JSON.parse(j.out) as { topology: { joints: number; members: number; supports: { joint: string; type: string }[] } }).topology;
    // a Pratt with verticals at every panel point: j = 2(n + 1), m = 4n + 1
    expect([t.joints, t.members]).toEqual([2 * (prattPanels + 1), 4 * prattPanels + 1]);
    expect(t.supports.map((s) => `${s.joint} ${s.type}`)).toEqual(['B0 pin', `B${prattPanels} roller`]);
  });

  it('compresses ids into ranges by prefix', () => {
    expect(idScheme(['B0', 'T0', 'B1', 'T1', 'B2', 'T2', 'M3', 'M4', 'C', 'TIP', 'B10'])).toBe('B0..B2, B10, T0..T2, M3, M4, C, TIP');
    expect(idScheme([])).toBe('');
  });

  it('refuses an unknown family with exit 2, listing the known ones', async () => {
    const r = await runCli('families', 'prat');
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/unknown family 'prat'; did you mean 'pratt'\?/);
    for (const f of families) expect(r.err).toContain(f.id);
  });
});

describe('panelpoint new', () => {
  it('prints a starter study with the schema, the defaults, two varied parameters, a filter, roof loads and a preset', async () => {
    const r = await runCli('new', 'pratt');
    expect(r.code, r.err).toBe(0);
    const s = JSON.parse(r.out) as ReturnType<typeof starterStudy>;
    expect(resolveStudy(s).issues).toEqual([]);
    expect(s.$schema).toBe(STUDY_SCHEMA_URL);
    expect(s.family).toBe('pratt');
    const varied = Object.keys(s.vary ?? {});
    expect(varied).toHaveLength(2);
    const defaults = withDefaults(pratt, {});
    expect({ ...s.fixed }).toEqual(Object.fromEntries(pratt.params.filter((p) => !varied.includes(p.name)).map((p) => [p.name, defaults[p.name]])));
    expect(s.where?.length).toBeGreaterThan(0);
    expect((s.loads ?? []).filter((l) => l.kind === 'area').map((l) => [l.case, l.kind === 'area' && l.chord])).toEqual([['D', 'top'], ['S', 'top'], ['W', 'top']]);
    expect(s.combinations).toEqual({ preset: 'asce7-lrfd' });
    expect(s.objective).toBeDefined();
  });

  it.each(families.map((f) => [f.id]))('%s: the starter study resolves, its filter drops some variants, and none fails', (id) => {
    const r = resolveStudy(starterStudy(getFamily(id)!));
    expect(r.issues).toEqual([]);
    const setup = r.setup!;
    const ev = new VariantEvaluator(setup);
    const statuses: string[] = [];
    let dropped = 0;
    for (let i = 0; i < setup.plan.size; i++) {
      if (!passes(setup.plan, variantAt(setup.plan, i))) dropped++;
      const rec = ev.evaluate(i);
      if (rec) statuses.push(rec.status === 'error' ? `error: ${rec.reason}` : rec.status);
    }
    expect(dropped).toBeGreaterThan(0);
    expect(statuses.length).toBeGreaterThan(0);
    expect(statuses.filter((s) => s.startsWith('error'))).toEqual([]);
    expect(statuses.some((s) => s === 'determinate' || s === 'indeterminate')).toBe(true);
  });

  it('writes --out, refuses to overwrite it without --force, and the study sweeps', async () => {
    const file = join(tmp.path, 'starter.json');
    const w = await runCli('new', 'pratt', '--out', file);
    expect(w.code, w.err).toBe(0);
    expect(w.out).toBe('');
    const text = readFileSync(file, 'utf8');
    writeFileSync(file, text.replace('"name": "Pratt starter study"', '"name": "edited by hand"'));
    const edited = readFileSync(file, 'utf8');
    const again = await runCli('new', 'pratt', '--out', file);
    expect(again.code).toBe(2);
    expect(again.err).toMatch(/exists; add --force/);
    expect(readFileSync(file, 'utf8')).toBe(edited);
    const forced = await runCli('new', 'pratt', '--out', file, '--force');
    expect(forced.code, forced.err).toBe(0);
    expect(readFileSync(file, 'utf8')).toBe(text);
    const out = join(tmp.path, 'starter-run');
    const sweep = await runCli('sweep', file, '--out', out, '--workers', '1', '-q');
    expect(sweep.code, sweep.err).toBe(0);
    expect(readLines(out).length).toBeGreaterThan(0);
  });

  it('refuses an unknown family with exit 2, listing the known ones, and writes nothing', async () => {
    const file = join(tmp.path, 'unknown.json');
    const r = await runCli('new', 'wareen', '--out', file);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/did you mean 'warren'/);
    for (const f of families) expect(r.err).toContain(f.id);
    expect(existsSync(file)).toBe(false);
  });
});
