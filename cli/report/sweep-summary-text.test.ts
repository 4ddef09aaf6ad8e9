import { describe, expect, it } from 'vitest';
import { emptySummary } from '../../shared/sweep/summary';
import { sweepSummaryText } from './sweep-summary-text';

describe('sweepSummaryText', () => {
  it('shows parameter values to six significant digits in the tables; the id names the exact variant', () => {
    const s = emptySummary({ figure: 'maxAbsForce', sense: 'minimize' });
    s.evaluated = 3;
    s.byStatus.determinate = 2;
    s.byStatus.unstable = 1;
    const entry = (index: number, depth: number) => ({
      index, id: `00000000000000${index}0`, params: { span: 24, depth, panels: 8 }, status: 'determinate', value: 218.8,
      peakTension: 194.5, peakCompression: -218.8, maxDisplacement: 0.011, spanOverDeflection: 2175,
    });
    s.best = [entry(1, 3.59348370927318), entry(2, 3.6)];
    s.reasons = [{ status: 'unstable', reason: 'A mechanism.', count: 1, example: { index: 0, id: '0000000000000000', params: { span: 24, depth: 1.00000000001, panels: 8 } } }];
    const text = sweepSummaryText(s, { study: 'Harrow Lane depot roof', out: '/tmp/x', seconds: 1, interrupted: false, paramNames: ['span', 'depth', 'panels'] });
    expect(text).toContain('3.59348');
    expect(text).not.toContain('3.593483');
    expect(text).toContain('depth=1 ');
  });
});
