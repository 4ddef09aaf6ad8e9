/**
 * Howe truss, parallel chords: verticals at every panel point (end posts included) and one
 * diagonal per panel sloping up toward midspan (in compression under gravity load).
 */
import { flatFamily } from './flat-family';
import { allVerticals } from './flat-common';

/** The Howe family: joints B0..Bn, T0..Tn; panels even. */
export const howe = flatFamily({
  id: 'howe',
  name: 'Howe',
  summary: 'Parallel chords, verticals at every panel point, diagonals sloping up toward midspan. Joints B0..Bn (bottom), T0..Tn (top); panels even.',
  panelRule: 'even, so the diagonals mirror about midspan',
  web(b, n) {
    allVerticals(b, n);
    for (let i = 0; i < n; i++) {
      if (i < n / 2) b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
      else b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    }
  },
});
