/**
 * `analyze --design`: members sized from a catalogue, forces of the sized frame, weight and checks
 * in the report and the JSON; a bad design spec is refused with its file and path.
 */
import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { example, runCli } from './run-cli';

const model = example('depot-roof-r3.json');
const spec = example('depot-roof-r3.design.json');

describe('analyze --design', () => {
  it('sizes every group so every member passes, and reports weight and the governing checks', async () => {
    const r = await runCli('analyze', model, '--design', spec, '--json');
    expect(r.code, r.err).toBe(0);
    const doc = JSON.parse(r.out);
    const d = doc.design;
    expect(d.status).toBe('sized');
    expect(d.members).toHaveLength(25);
    for (const m of d.members) expect(m.utilisation).toBeLessThanOrEqual(1);
    expect(d.maxUtilisation).toBe(Math.max(...d.members.map((m: { utilisation: number }) => m.utilisation)));
    // Weight = Σ L × A × γ over the members, with A = π(D² − (D − 2t)²)/4 of each chosen CHS (nominal wall)
    // and γ = 7850 kg/m³ × 9.80665 m/s² (ASTM A500 density from memory; standard gravity).
    const at = Object.fromEntries((await import(model, { with: { type: 'json' } })).default.nodes.map((n: { id: string; x: number; y: number }) => [n.id, n]));
    const members = (await import(model, { with: { type: 'json' } })).default.members as { id: string; from: string; to: string }[];
    let w = 0;
    for (const m of d.members) {
      const [, D, t] = /CHS ([\d.]+)×([\d.]+)/.exec(m.sectionName)!.map(Number);
      const mm = members.find((x) => x.id === m.id)!;
      const A = (Math.PI * ((D / 1000) ** 2 - ((D - 2 * t) / 1000) ** 2)) / 4;
      w += Math.hypot(at[mm.to].x - at[mm.from].x, at[mm.to].y - at[mm.from].y) * A * (7850 * 9.80665) / 1000;
    }
    expect(d.weightKN).toBeCloseTo(w, 6);
    expect(d.members.some((m: { check: string }) => /AISC 360-16 §E3/.test(m.check))).toBe(true);
    expect(d.selfWeightCase).toBe('D');
    const text = await runCli('analyze', model, '--design', spec);
    expect(text.out).toMatch(/MEMBER DESIGN/);
    expect(text.out).toMatch(/licensed engineer/);
  });

  it('refuses an unknown grade and a wall as thick as the radius, with the file and path', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'pp-design-'));
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({ code: 'aisc360-16-lrfd', material: 'no-such-grade', catalogue: { id: 'x', sections: [{ id: 's', shape: 'chs', D: 60, t: 30 }] } }, null, 2));
    const r = await runCli('analyze', model, '--design', bad);
    expect(r.code).toBe(2);
    expect(r.err).toContain(bad);
    expect(r.err).toMatch(/material/);
    expect(r.err).toMatch(/catalogue\.sections\[0\]\.t/);
  });
});
