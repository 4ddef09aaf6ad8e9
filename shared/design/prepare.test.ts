/**
 * Design spec input: schema problems, unknown grades and catalogues, bad sections, thickness ranges
 * and design groups all come back as issues with the path of the offending value.
 */
import { describe, expect, it } from 'vitest';
import { prepareDesign } from './prepare';
import { createSizer } from './size';

const base = { code: 'aisc360-16-lrfd', material: 'a500-c-round', catalogue: 'chs' };
const paths = (issues: { path: string }[]) => issues.map((i) => i.path);

describe('prepareDesign', () => {
  it('defaults: K = 1.0, Ae/Ag = 0.85, limits 200 and 300, LRFD φ 0.90/0.75/0.90 (AISC 360-16 §D2, §E1)', () => {
    const { design, issues } = prepareDesign(base);
    expect(issues).toEqual([]);
    const r = design!.rules;
    expect([r.K, r.netAreaFactor, r.limitCompression, r.limitTension]).toEqual([1, 0.85, 200, 300]);
    expect([r.yieldFactor, r.ruptureFactor, r.bucklingFactor]).toEqual([0.9, 0.75, 0.9]);
    expect(design!.selfWeight).toBe(true);
    // EN 1993-1-1 §6.1 recommended γM0 = γM1 = 1.0, γM2 = 1.25: rupture factor 0.9/1.25 = 0.72
    const en = prepareDesign({ ...base, code: 'en1993-1-1', material: 's355' }).design!.rules;
    expect([en.yieldFactor, en.bucklingFactor, en.sectionFactor]).toEqual([1, 1, 1]);
    expect(en.ruptureFactor).toBeCloseTo(0.72, 15);
  });

  it('A500 HSS and A53 pipe under AISC take a design wall of 0.93 t (AISC 360-16 §B4.2(a), from memory); weight keeps t', () => {
    const find = (spec: object) => prepareDesign({ ...base, ...spec }).design!.catalogue.sections.find((s) => s.id === 'CHS114.3x6')!;
    // t = 0.93 × 6.0 = 5.58 mm: A = π(114.3² − 103.14²)/4 = π(13064.49 − 10637.86)/4 = 1905.87 mm²
    const a500 = find({});
    expect(a500.A * 1e6).toBeCloseTo(1905.87, 2);
    // weight from the nominal wall: π(114.3² − 102.3²)/4 = 2041.41 mm²
    expect(a500.massArea * 1e6).toBeCloseTo(2041.41, 2);
    expect(prepareDesign(base).design!.wallFactor).toBe(0.93);
    expect(find({ wallFactor: 1 }).A * 1e6).toBeCloseTo(2041.41, 2);
    expect(find({ code: 'en1993-1-1', material: 's355j2h' }).A * 1e6).toBeCloseTo(2041.41, 2);
    expect(find({ material: 'a53-b' }).A * 1e6).toBeCloseTo(1905.87, 2);
    expect(find({ material: 'a992' }).A * 1e6).toBeCloseTo(2041.41, 2);
  });

  it('schema problems name the key', () => {
    const r = prepareDesign({ ...base, code: 'aisc', Kfactor: 1, netAreaFactor: 1.2, slenderness: { compression: -1 } });
    expect(r.design).toBeUndefined();
    expect(paths(r.issues).sort()).toEqual(['Kfactor', 'code', 'netAreaFactor', 'slenderness.compression']);
    expect(r.issues.find((i) => i.path === 'code')!.message).toBe('must be one of "aisc360-16-lrfd", "aisc360-16-asd", "en1993-1-1"');
    expect(r.issues.find((i) => i.path === 'netAreaFactor')!.message).toBe('must be at most 1');
  });

  it('an unknown grade or catalogue', () => {
    const r = prepareDesign({ ...base, material: 'S420', catalogue: 'ipe' });
    expect(paths(r.issues)).toEqual(['material', 'catalogue']);
    expect(r.issues[0].message).toMatch(/^no material grade "S420"; known grades: /);
    expect(r.issues[1].message).toMatch(/^no section catalogue "ipe"; known catalogues: "chs"/);
  });

  it('a material given in full, with a unit the reader rejects', () => {
    const r = prepareDesign({ ...base, material: { id: 'm', Fy: '50 furlongs', Fu: '65 ksi', E: '29000 ksi', density: '490 lb/ft^3' } });
    expect(r.issues).toEqual([expect.objectContaining({ path: 'material.Fy' })]);
    const ok = prepareDesign({ ...base, material: { id: 'm', Fy: '50 ksi', Fu: '65 ksi', E: '29000 ksi', density: '490 lb/ft^3' } });
    // 490 lb/ft³ = 7849.0 kg/m³ (1 lb = 0.45359237 kg, 1 ft = 0.3048 m), × g = 76.97 kN/m³
    expect(ok.design!.material.unitWeight).toBeCloseTo((490 * 0.45359237 / 0.3048 ** 3) * 9.80665 / 1000, 9);
  });

  it('bad sections of a catalogue given in full point at the dimension', () => {
    const catalogue = {
      id: 'mine',
      sections: [
        { id: 'a', shape: 'chs', D: 60.3, t: 4 },
        { id: 'b', shape: 'chs', D: 60.3, t: 31 },
        { id: 'c', shape: 'shs', B: 0, t: 4 },
        { id: 'd', shape: 'tube', D: 10 },
      ],
    };
    const r = prepareDesign({ ...base, catalogue });
    expect(paths(r.issues)).toEqual(['catalogue.sections[3].shape']);
    const r2 = prepareDesign({ ...base, catalogue: { ...catalogue, sections: catalogue.sections.slice(0, 3) } });
    expect(paths(r2.issues)).toEqual(['catalogue.sections[1].t', 'catalogue.sections[2].B']);
    expect(r2.issues[0].message).toBe('wall thickness t = 31 mm must be less than D/2 = 30.15 mm');
  });

  it('sections thicker than the grade\'s range are left out with a warning; none left is an error', () => {
    const catalogue = { id: 'bars', sections: [{ id: 'R30', shape: 'rod', D: 30 }, { id: 'R50', shape: 'rod', D: 50 }] };
    const r = prepareDesign({ ...base, code: 'en1993-1-1', material: 's355', catalogue });
    expect(r.design!.catalogue.sections.map((s) => s.id)).toEqual(['R30']);
    expect(r.warnings[0].message).toBe('Rod 50 is left out: its thickness 50 mm is above the 40 mm the strengths of S355 hold for');
    const none = prepareDesign({ ...base, code: 'en1993-1-1', material: 's355', catalogue: { id: 'x', sections: [catalogue.sections[1]] } });
    expect(none.issues[0].message).toBe('no section of the catalogue is within the thickness range of S355');
  });
});

describe('createSizer: design groups and unbraced lengths', () => {
  const design = prepareDesign({ ...base, groups: { webs: ['vertical', 'diagonal', 'X9'], posts: ['V1'] }, unbraced: { outOfPlane: { chords: 6 } } }).design!;
  const members = { ids: ['TC1', 'BC1', 'V1', 'V2', 'D1'], groups: ['top', 'bottom', 'vertical', 'vertical', 'diagonal'] };

  it('unknown entries, a member in two groups and unknown out-of-plane keys', () => {
    const r = createSizer(design, members);
    expect(r.sizer).toBeUndefined();
    expect(r.issues.map((i) => [i.path, i.message])).toEqual([
      ['groups.webs[2]', '"X9" is neither a member group of this truss nor a member id'],
      ['groups.posts[0]', 'member "V1" is in design group "webs" and in "posts"'],
      ['unbraced.outOfPlane.chords', '"chords" is neither a member group of this truss nor a member id'],
    ]);
  });

  it('members outside user groups keep their member group; out-of-plane lengths by member group', () => {
    const d = prepareDesign({ ...base, groups: { webs: ['vertical', 'D1'] }, unbraced: { inPlane: 'member', outOfPlane: { top: 6, webs: 1.5 } } }).design!;
    const { sizer } = createSizer(d, members);
    expect(sizer!.plan.names).toEqual(['top', 'bottom', 'webs']);
    expect([...sizer!.plan.groupOf]).toEqual([0, 1, 2, 2, 2]);
    expect([...sizer!.plan.outOfPlane]).toEqual([6, NaN, 1.5, 1.5, 1.5]);
  });
});
