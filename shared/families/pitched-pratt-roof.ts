/**
 * Pitched Pratt roof truss: verticals at every panel point, diagonals sloping down toward the
 * apex post (in tension under gravity load).
 */
import { panelRoofFamily } from './panel-roof-family';

/** The pitched Pratt family: bottom B0..Bn, top T1..T(n-1), apex T(n/2); panels even. */
export const prattRoof = panelRoofFamily('pratt', 'pratt-roof', 'Pratt roof',
  'Pitched top chord, verticals at every panel point, diagonals sloping down toward the apex. Joints B0..Bn (bottom; B0, Bn are the heels), T1..T(n-1) (top); panels even.');
