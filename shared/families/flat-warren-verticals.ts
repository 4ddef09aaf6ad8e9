/**
 * Warren truss with verticals: full-length parallel chords, a vertical at every panel point, and
 * diagonals alternating direction from panel to panel (starting down from the top end joint).
 */
import { flatFamily } from './flat-family';
import { allVerticals } from './flat-common';

/** The Warren-with-verticals family: joints B0..Bn, T0..Tn; panels even. */
export const warrenVerticals = flatFamily({
  id: 'warren-verticals',
  name: 'Warren with verticals',
  summary: 'Parallel chords, verticals at every panel point, diagonals alternating so they meet at B1, T2, B3... Joints B0..Bn, T0..Tn; panels even.',
  panelRule: 'even, so the zigzag mirrors about midspan',
  web(b, n) {
    allVerticals(b, n);
    for (let i = 0; i < n; i++) {
      if (i % 2 === 0) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
      else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
    }
  },
});
