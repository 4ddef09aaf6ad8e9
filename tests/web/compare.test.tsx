// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import type { Model } from '@shared/schemas/model';
import type { VariantDetailDto } from '@/lib/run-types';
import { fakeApi, renderAt, RUN_PATH, rows } from './team-fixtures';
import { DEPOT, analysed, preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

/** The depot roof stretched along the span by `k` (an 18 m truss becomes 18·k m). */
const stretched = (k: number): Model => ({ ...DEPOT, name: `${DEPOT.name} ×${k}`, nodes: DEPOT.nodes.map((n) => ({ ...n, x: n.x * k })) });

function detail(index: number, model: Model): VariantDetailDto {
  const base = rows()[index];
  return { variant: { ...base, params: { ...base.params, span: Math.max(...model.nodes.map((n) => n.x)) } }, model, analysis: analysed(model), check: { matches: true, differences: [] } };
}

describe('compare', () => {
  it('draws the variants in one common view box (one scale) and marks the best value of each row', async () => {
    const short = detail(0, DEPOT);
    const long = detail(4, stretched(4 / 3));
    const unstable = { ...detail(1, DEPOT), model: null, analysis: null };
    const getVariant = vi.fn(async (_ref, i: number) => (i === 0 ? short : i === 4 ? long : unstable));
    renderAt(`${RUN_PATH}/compare?v=0,4,1`, fakeApi('engineer', { getVariant }));
    await waitFor(() => expect(document.querySelectorAll('svg[data-shared-scale]')).toHaveLength(2), { timeout: 10_000 });
    const svgs = [...document.querySelectorAll('svg[data-shared-scale]')];
    const boxes = svgs.map((s) => s.getAttribute('viewBox'));
    expect(boxes[0]).toBe(boxes[1]);
    // The box holds the longer truss (24 m) with room for supports; the 18 m one is drawn in the same box, so shorter on screen.
    const [x, , w] = boxes[0]!.split(' ').map(Number);
    expect(x).toBeLessThan(0);
    expect(x + w).toBeGreaterThan(24);
    const extents = svgs.map((s) => Number(s.getAttribute('data-extent')!.split(' ')[2]));
    expect(extents[0]).toBeCloseTo(18, 9);
    expect(extents[1]).toBeCloseTo(24, 9);
    expect(screen.getByText(/All drawings at one scale/)).toBeTruthy();
    expect(screen.getByText(/Not built: mechanism/)).toBeTruthy();

    const table = screen.getByRole('table', { name: /Differences/ });
    const cells = (key: string) => [...within(table).getByText((_, el) => el?.getAttribute('data-row') === key).querySelectorAll('td')];
    const best = (key: string) => cells(key).map((td) => td.hasAttribute('data-best'));
    // Lighter is better (fixture weights: variant 0 5 kN, variant 4 6 kN, variant 1 none).
    expect(best('weight')).toEqual([true, false, false]);
    // Compression: the smaller magnitude is better (−120 kN against −160 kN).
    expect(best('peakCompression')).toEqual([true, false, false]);
    expect(best('status')).toEqual([true, true, false]);
    expect(cells('param:span').map((td) => td.textContent)).toEqual(['18', '24', '18']);
    expect(within(table).getByText((_, el) => el?.getAttribute('data-row') === 'param:depth').getAttribute('data-differs')).toBe('true');
  });

  it('asks for two to four variants', async () => {
    renderAt(`${RUN_PATH}/compare?v=3`, fakeApi());
    expect((await screen.findByRole('alert', {}, { timeout: 10_000 })).textContent).toMatch(/two to four variants/);
  });
});
