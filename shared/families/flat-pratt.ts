/**
 * Pratt truss, parallel chords: verticals at every panel point (end posts included) and one
 * diagonal per panel sloping down toward midspan (in tension under gravity load).
 */
import type { TopologyBuilder } from './builder';
import { flatFamily } from './flat-family';
import { allVerticals } from './flat-common';

/** Diagonals of panel i: from the top joint nearer the support down to the bottom joint nearer midspan. */
export function prattDiagonals(b: TopologyBuilder, n: number): void {
  for (let i = 0; i < n; i++) {
    if (i < n / 2) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
  }
}

/** The Pratt family: joints B0..Bn, T0..Tn; panels even. */
export const pratt = flatFamily({
  id: 'pratt',
  name: 'Pratt',
  summary: 'Parallel chords, verticals at every panel point, diagonals sloping down toward midspan. Joints B0..Bn (bottom), T0..Tn (top); panels even.',
  panelRule: 'even, so the diagonals mirror about midspan',
  web(b, n) {
    allVerticals(b, n);
    prattDiagonals(b, n);
  },
});
