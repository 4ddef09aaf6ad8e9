/**
 * K truss, parallel chords: every vertical except the midspan one has a mid-height joint M_i;
 * in each panel two diagonals run from that joint on the outer vertical to the top and bottom of
 * the inner vertical, so each half reads as a row of K's facing midspan.
 */
import { flatFamily } from './flat-family';

/** The K-truss family: joints B0..Bn, T0..Tn and M_i (i ≠ n/2); panels even. */
export const kPanel = flatFamily({
  id: 'k-panel',
  name: 'K truss',
  summary: 'Parallel chords; verticals split at mid-height joints M_i (all but the midspan one), two diagonals per panel from M_i to the inner vertical. Joints B0..Bn, T0..Tn, M_i; panels even.',
  panelRule: 'even: the midspan vertical is the one without a mid-height joint',
  web(b, n) {
    const c = n / 2;
    for (let i = 0; i <= n; i++) {
      if (i === c) {
        b.bar(`B${i}`, `T${i}`, 'vertical');
        continue;
      }
      b.joint(`M${i}`, i / n, 0.5);
      b.bar(`B${i}`, `M${i}`, 'vertical');
      b.bar(`M${i}`, `T${i}`, 'vertical');
    }
    for (let i = 0; i < n; i++) {
      // The K's joint sits on the vertical nearer the support.
      const m = i < c ? `M${i}` : `M${i + 1}`;
      const inner = i < c ? i + 1 : i;
      b.bar(m, `T${inner}`, 'diagonal');
      b.bar(m, `B${inner}`, 'diagonal');
    }
  },
});
