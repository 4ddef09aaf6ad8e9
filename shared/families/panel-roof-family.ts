/**
 * The pitched roof trusses with a vertical at every panel point (Howe roof, Pratt roof): one
 * definition, the diagonal pattern as a parameter. Lengths m, panels even.
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, panelRoof, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params, TrussFamily } from './types';

const PANELS = panelsParam(6, 4, 40, 'panels along each chord, both slopes together; even (the apex post sits at midspan)');

/** A pitched roof family whose diagonals follow `pattern`: bottom B0..Bn, top T1..T(n-1), apex T(n/2). */
export function panelRoofFamily(pattern: 'howe' | 'pratt', id: string, name: string, summary: string): TrussFamily {
  const build = (p: Params, n: number) => {
    const b = new TopologyBuilder();
    const chords = panelRoof(b, n, pattern);
    applySupports(b, p, 'B0', `B${n}`);
    return b.build(chords.top, chords.bottom);
  };
  return defineFamily({
    id, name, category: 'pitched', summary,
    params: [...PITCHED_GEOMETRY, PANELS, ...END_SUPPORTS],
    panels: PANELS,
    panelRule: 'even',
    span: PITCHED_SPAN,
    extraCheck: checkPitch,
    build,
    prepare: preparePitched,
    top: pitchedTop,
    bottom: ground,
  });
}
