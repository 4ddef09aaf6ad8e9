/**
 * Compound truss of two simple Pratt trusses sharing one joint C at mid-depth of the middle panel
 * and tied by one link bar. With linkage "concurrent" the link's line passes through C
 * (a deliberate failure: the two trusses can turn about C).
 */
import { TopologyBuilder, ids } from './builder';
import { COMPOUND_PANELS, linkageParam, panelPoints, prattSide } from './compound-common';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, flatBottom, flatTop, prepareFlat } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, opt } from './params';
import type { Params } from './types';

const LINKAGE = linkageParam(
  ['sound', 'concurrent'],
  'sound: link B(c)–B(c+1) along the bottom of the middle panel; concurrent: link B(c−1)–T(c+2), whose line passes through the common joint C (unstable).',
);

function build(p: Params, n: number) {
  const c = (n - 1) / 2;
  const b = new TopologyBuilder();
  panelPoints(b, n);
  b.joint('C', 0.5, 0.5);
  prattSide(b, 0, c, 'left');
  b.bar(`T${c}`, 'C', 'diagonal');
  b.bar(`B${c}`, 'C', 'diagonal');
  b.bar('C', `T${c + 1}`, 'diagonal');
  b.bar('C', `B${c + 1}`, 'diagonal');
  prattSide(b, c + 1, n, 'right');
  if (opt(p, LINKAGE) === 'concurrent') b.bar(`B${c - 1}`, `T${c + 2}`, 'link');
  else b.bar(`B${c}`, `B${c + 1}`, 'link');
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(ids('T', 0, n), ids('B', 0, n));
}

/** The compound-link family: B0..Bn, T0..Tn, common joint C; panels odd. */
export const compoundLink = defineFamily({
  id: 'compound-link',
  name: 'Compound (common joint and link)',
  category: 'compound',
  summary: 'Two Pratt trusses over panels left and right of the middle panel, sharing joint C at mid-depth of the middle panel and tied by one link bar. Joints B0..Bn, T0..Tn, C; panels odd; linkage "concurrent" puts the link through C.',
  params: [FLAT_SPAN, FLAT_DEPTH, COMPOUND_PANELS, LINKAGE, SUPPORTS, ROLLER_ANGLE],
  panels: COMPOUND_PANELS,
  panelRule: 'odd',
  span: FLAT_SPAN,
  extraKey: LINKAGE,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
