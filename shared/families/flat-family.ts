/**
 * One definition for the parallel-chord families that differ only in their web: chords B0..Bn and
 * T0..Tn, supports at B0 and Bn, span and depth in metres, panels even.
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, flatBottom, flatTop, prepareFlat, parallelChords } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, panelsParam } from './params';
import type { Params, TrussFamily } from './types';

/** What sets one flat family apart. */
export interface FlatFamilySpec {
  id: string;
  name: string;
  summary: string;
  /** The panel-count rule as the parameter describes it (panels are even). */
  panelRule: string;
  /** Add the web members (and any joints besides the chords') for n panels. */
  web(b: TopologyBuilder, n: number): void;
}

/** A flat, parallel-chord truss family with the given web. */
export function flatFamily(s: FlatFamilySpec): TrussFamily {
  const PANELS = panelsParam(8, 2, 60, s.panelRule);
  const build = (p: Params, n: number) => {
    const b = new TopologyBuilder();
    parallelChords(b, n);
    s.web(b, n);
    applySupports(b, p, 'B0', `B${n}`);
    return b.build(ids('T', 0, n), ids('B', 0, n));
  };
  return defineFamily({
    id: s.id, name: s.name, category: 'flat', summary: s.summary,
    params: [FLAT_SPAN, FLAT_DEPTH, PANELS, SUPPORTS, ROLLER_ANGLE],
    panels: PANELS,
    panelRule: 'even',
    span: FLAT_SPAN,
    build,
    prepare: prepareFlat,
    top: flatTop,
    bottom: flatBottom,
  });
}
