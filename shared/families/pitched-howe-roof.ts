/**
 * Pitched Howe roof truss: verticals at every panel point, diagonals sloping up toward the
 * apex post (in compression under gravity load).
 */
import { panelRoofFamily } from './panel-roof-family';

/** The pitched Howe family: bottom B0..Bn, top T1..T(n-1), apex T(n/2); panels even. */
export const howeRoof = panelRoofFamily('howe', 'howe-roof', 'Howe roof',
  'Pitched top chord, verticals at every panel point, diagonals sloping up toward the apex. Joints B0..Bn (bottom; B0, Bn are the heels), T1..T(n-1) (top); panels even.');
