import { describe, expect, it } from 'vitest';
import type { Study } from '../schemas/study';
import { planSpace } from './space';
import type { Issue, ParamSpec } from './types';

const PARAMS: ParamSpec[] = [
  { name: 'span', unit: 'm', default: 24, min: 1, max: 200, description: 'Span.' },
  { name: 'depth', unit: 'm', default: 2, min: 0.1, max: 20, description: 'Depth.' },
  { name: 'panels', unit: '', default: 8, min: 2, max: 40, integer: true, description: 'Panels.' },
  { name: 'supports', unit: '', default: 'pin-roller', options: ['pin-roller', 'pin-pin'], description: 'Supports.' },
];

/** The issues of a study that must not plan. */
function issues(extra: Partial<Study>): Issue[] {
  const result = planSpace({ name: 't', family: 'pratt', ...extra } as Study, PARAMS);
  if (!('issues' in result)) throw new Error('expected issues');
  return result.issues;
}

/** The single issue of a study, checked for path and position. */
function only(extra: Partial<Study>, path: string, position?: number): Issue {
  const list = issues(extra);
  expect(list.map((i) => [i.path, i.position])).toEqual([[path, position]]);
  return list[0];
}

describe('names', () => {
  it('a varied name that is no parameter and that nothing reads, with a suggestion', () => {
    expect(only({ vary: { dpeth: [1, 2] } }, 'vary.dpeth').message).toMatch(/did you mean 'depth'/);
    only({ fixed: { colour: 'red' } }, 'fixed.colour');
    only({ derived: { extra: 'depth * 2' } }, 'derived.extra');
  });
  it('a name both fixed and varied, or derived and varied', () => {
    only({ fixed: { span: 24 }, vary: { span: [20, 30] } }, 'vary.span');
    only({ vary: { depth: [1, 2], ratio: [8] }, derived: { depth: 'span / ratio' } }, 'derived.depth');
  });
});

describe('expressions: path and 0-based position of the bad symbol', () => {
  it('an unknown name in a filter', () => {
    const where = ['depth / span >= 1/20', 'depth / spam >= 0.05'];
    const issue = only({ where }, 'where[1]', where[1].indexOf('spam'));
    expect(issue.message).toMatch(/unknown name 'spam'.*did you mean 'span'/);
  });
  it('an unknown name that also occurs inside a string literal is located outside it', () => {
    const text = 'supports == "wide" or wide > 1';
    only({ where: [text] }, 'where[0]', text.lastIndexOf('wide'));
  });
  it('an unknown function', () => {
    const text = 'depth > sqr(span) / 100';
    expect(only({ where: [text] }, 'where[0]', text.indexOf('sqr')).message).toMatch(/unknown function 'sqr'.*'sqrt'/);
  });
  it('a syntax error at the offending character (mathjs counts from 1, we from 0)', () => {
    only({ where: ['depth / >= 2'] }, 'where[0]', 'depth / >= 2'.indexOf('>='));
    only({ where: ['depth +* 2'] }, 'where[0]', 'depth +* 2'.indexOf('*'));
  });
  it('an assignment where a comparison was meant', () => {
    expect(only({ where: ['depth = 3'] }, 'where[0]', 0).message).toMatch(/assignment/);
  });
  it('a units expression: units are not symbols of the study', () => {
    expect(only({ where: ['depth > 2 m'] }, 'where[0]', 'depth > 2 m'.indexOf('m')).message).toMatch(/unit/);
  });
  it('a derived expression reading a name derived further down', () => {
    const issue = only({ vary: { ratio: [10] }, derived: { depth: 'span / k', k: 'ratio' } }, 'derived.depth', 'span / k'.indexOf('k'));
    expect(issue.message).toMatch(/further down/);
  });
  it('a derived expression reading itself', () => {
    expect(only({ derived: { depth: 'span / 10 + depth' } }, 'derived.depth', 'span / 10 + '.length).message).toMatch(/itself/);
  });
  it('a type error shows up on the first variant, before any work', () => {
    const issue = only({ where: ['supports + 1 > 0'] }, 'where[0]');
    expect(issue.message).toMatch(/first variant/);
  });
});

describe('ranges, lists and samples', () => {
  it('step must be positive, from ≤ to, count ≥ 1', () => {
    only({ vary: { depth: { from: 1, to: 3, step: 0 } } }, 'vary.depth.step');
    only({ vary: { depth: { from: 3, to: 1, step: 0.5 } } }, 'vary.depth.to');
    only({ vary: { depth: { from: 1, to: 3, count: 0 } } }, 'vary.depth.count');
    only({ vary: { depth: { from: 1, to: 3, count: 1 } } }, 'vary.depth.count');
    only({ vary: { depth: { from: 1, to: 3 } } as never }, 'vary.depth');
    // a step in the wrong unit (mm for m) would give 10^9 values
    only({ vary: { depth: { from: 1, to: 10, step: 1e-8 } } }, 'vary.depth.step');
    only({ vary: { depth: { sample: 'uniform', min: 1, max: 3, count: 5e6 } } }, 'vary.depth.count');
  });
  it('values within the parameter bounds', () => {
    only({ vary: { panels: { from: 1, to: 10, step: 1 } } }, 'vary.panels.from');
    only({ vary: { panels: { from: 30, to: 50, count: 3 } } }, 'vary.panels.to');
    only({ vary: { depth: [1, 25] } }, 'vary.depth[1]');
    only({ fixed: { span: 500 } }, 'fixed.span');
    only({ vary: { depth: { sample: 'lhs', min: 0, max: 2, count: 5 } } }, 'vary.depth.min');
  });
  it('whole numbers where the parameter is integer', () => {
    only({ vary: { panels: { from: 4, to: 10, step: 1.5 } } }, 'vary.panels.step');
    only({ vary: { panels: { from: 4.5, to: 10, step: 1 } } }, 'vary.panels.from');
    only({ vary: { panels: { from: 4, to: 9, count: 3 } } }, 'vary.panels.count');
    only({ vary: { panels: [6, 7.5, 8] } }, 'vary.panels[1]');
    only({ vary: { panels: { sample: 'uniform', min: 4, max: 10, count: 5 } } }, 'vary.panels.sample');
  });
  it('options valid, and a choice is not a number', () => {
    only({ vary: { supports: ['pin-pin', 'fixed'] } }, 'vary.supports[1]');
    only({ fixed: { supports: 3 } }, 'fixed.supports');
    only({ vary: { supports: { from: 1, to: 2, step: 1 } } }, 'vary.supports');
  });
  it('a quantity in the wrong dimension, and a repeated list value', () => {
    only({ fixed: { span: '24 kN' } }, 'fixed.span');
    only({ vary: { panels: [6, 8, 6] } }, 'vary.panels[2]');
  });
  it('a sample needs min < max', () => {
    only({ vary: { depth: { sample: 'uniform', min: 2, max: 2, count: 5 } } }, 'vary.depth.max');
  });
});

describe('combinations against the load cases', () => {
  const loads: Study['loads'] = [
    { case: 'dead', kind: 'self-weight' },
    { case: 'S', kind: 'line', value: 2, chord: 'top' },
  ];
  it('preset roles mapped to cases the loads use', () => {
    only({ loads, combinations: { preset: 'asce7-lrfd', cases: { D: 'dead', X: 'S' } } }, 'combinations.cases.X');
    // the typo also leaves 'dead' out of the preset: both are reported
    const typo = issues({ loads, combinations: { preset: 'asce7-lrfd', cases: { D: 'dea' } } });
    expect(typo.map((i) => i.path)).toEqual(['combinations.cases.D', 'combinations']);
    only({ loads, combinations: { preset: 'en1990-6.10', cases: { D: 'dead' }, psi0: { D: 0.5 } } }, 'combinations.psi0.D');
  });
  it('a load case a preset would leave out', () => {
    expect(only({ loads, combinations: { preset: 'asce7-lrfd' } }, 'combinations').message).toMatch(/'dead'/);
  });
  it('custom factors for a case no load has, and a repeated id', () => {
    only({ loads, combinations: [{ id: 'c1', factors: { dead: 1.2, Q: 1.5 } }] }, 'combinations[0].factors.Q');
    only({ loads, combinations: [{ id: 'c1', factors: { dead: 1 } }, { id: 'c1', factors: { S: 1 } }] }, 'combinations[1].id');
  });
});

it('reports every issue at once', () => {
  const list = issues({ vary: { dpeth: [1], panels: [6.5] }, where: ['spam > 1', 'depth >'] });
  expect(list.map((i) => i.path).sort()).toEqual(['vary.dpeth', 'vary.panels[0]', 'where[0]', 'where[1]']);
});
