// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import { serializeSvg } from '@/features/truss-drawing/lib/export-image';
import { fmtSigned } from '@/lib/format';
import { DEPOT, MISSING, analysed, forcesOf, preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

const svgOf = (c: HTMLElement) => c.querySelector('svg[data-extent]') as SVGSVGElement;
const memberPath = (c: HTMLElement, id: string) => c.querySelector(`path[data-member="${id}"]`) as SVGPathElement;
const numbersIn = (d: string) => (d.match(/-?\d+(\.\d+)?(e-?\d+)?/g) ?? []).map(Number);

describe('TrussDrawing on the depot roof (determinate Pratt truss, ULS-1)', () => {
  const analysis = analysed(DEPOT);
  const forces = forcesOf(analysis, 'ULS-1');

  it('draws one path per member, compression dashed and tension solid', () => {
    const { container } = render(<TrussDrawing model={DEPOT} analysis={analysis} loading="ULS-1" />);
    expect(container.querySelectorAll('path[data-member]')).toHaveLength(DEPOT.members.length);
    // Statics of a simply supported truss under gravity (common practice): top chord in compression, bottom chord in tension.
    expect(memberPath(container, 'TC3').getAttribute('stroke-dasharray')).toBeTruthy();
    expect(memberPath(container, 'BC3').hasAttribute('stroke-dasharray')).toBe(false);
    let compression = 0, tension = 0;
    for (const m of DEPOT.members) {
      const p = memberPath(container, m.id);
      const f = forces[m.id];
      if (f < 0) {
        compression++;
        expect(p.getAttribute('data-sign'), m.id).toBe('compression');
        expect(p.getAttribute('stroke-dasharray'), m.id).toMatch(/^[\d.]+ [\d.]+$/);
      } else if (f > 0) {
        tension++;
        expect(p.getAttribute('data-sign'), m.id).toBe('tension');
        expect(p.hasAttribute('stroke-dasharray'), m.id).toBe(false);
      } else expect(p.getAttribute('data-sign'), m.id).toBe('zero');
      expect(p.getAttribute('stroke'), m.id).not.toBe(memberPath(container, f < 0 ? 'BC3' : 'TC3').getAttribute('stroke'));
    }
    expect(compression).toBeGreaterThan(0);
    expect(tension).toBeGreaterThan(0);
    // Width follows |force|: the peak member is drawn wider than a lightly loaded one.
    const w = (id: string) => Number(memberPath(container, id).getAttribute('stroke-width'));
    expect(w('TC3')).toBeGreaterThan(w('D3'));
  });

  it('draws the supports (pin, roller on wheels) and one arrow per loaded joint', () => {
    const { container } = render(<TrussDrawing model={DEPOT} analysis={analysis} loading="ULS-1" />);
    const pin = container.querySelector('[data-support="B0"]')!;
    const roller = container.querySelector('[data-support="B6"]')!;
    expect(pin.getAttribute('data-kind')).toBe('pin');
    expect(roller.getAttribute('data-kind')).toBe('roller');
    expect(roller.querySelectorAll('circle')).toHaveLength(2);
    expect(pin.querySelectorAll('circle')).toHaveLength(0);
    const loaded = new Set(DEPOT.loads!.filter((l) => l.case === 'D').map((l) => l.node));
    const arrows = [...container.querySelectorAll('[data-load]')].map((g) => g.getAttribute('data-load'));
    expect(new Set(arrows)).toEqual(loaded);
    // Arrow length scales with magnitude: the end joints carry half the load of the inner ones.
    const len = (node: string) => {
      const [x1, y1, x2, y2] = numbersIn(container.querySelector(`[data-load="${node}"] path`)!.getAttribute('d')!);
      return Math.hypot(x2 - x1, y2 - y1);
    };
    expect(len('T0')).toBeLessThan(len('T3'));
  });

  it('keeps true proportions: one uniform scale, y up, and the frame box has the model aspect', () => {
    const { container } = render(<TrussDrawing model={DEPOT} analysis={analysis} />);
    const svg = svgOf(container);
    expect(svg.getAttribute('preserveAspectRatio')).toBe('xMidYMid meet');
    const nodes = new Map(DEPOT.nodes.map((n) => [n.id, n]));
    for (const m of DEPOT.members) {
      const [x1, y1, x2, y2] = numbersIn(memberPath(container, m.id).getAttribute('d')!);
      const a = nodes.get(m.from)!, b = nodes.get(m.to)!;
      expect([x1, y1, x2, y2]).toEqual([a.x, -a.y, b.x, -b.y].map((v) => v + 0));
    }
    const [, , w, h] = svg.getAttribute('data-extent')!.split(' ').map(Number);
    expect(w / h).toBeCloseTo(18 / 1.8, 9); // the model: 18 m span, 1.8 m deep
    const [vx, vy, vw, vh] = svg.getAttribute('viewBox')!.split(' ').map(Number);
    expect(vx).toBeLessThan(0);
    expect(vy).toBeLessThan(-1.8);
    expect(vx + vw).toBeGreaterThan(18);
    expect(vy + vh).toBeGreaterThan(0);
  });

  it('shows member id, force with unit and T/C, and length on hover and on keyboard focus', () => {
    render(<TrussDrawing model={DEPOT} analysis={analysis} loading="ULS-1" />);
    const d1 = screen.getByRole('img', { name: /^Member D1 / });
    fireEvent.mouseEnter(d1);
    let tip = screen.getByRole('tooltip');
    expect(within(tip).getByText(`${fmtSigned(forces.D1)} kN tension (T)`)).toBeTruthy();
    expect(within(tip).getByText(/^length 3\.499 m$/)).toBeTruthy(); // √(3² + 1.8²) = 3.4986 m
    fireEvent.mouseLeave(d1);
    expect(screen.queryByRole('tooltip')).toBeNull();
    const tc3 = screen.getByRole('img', { name: /^Member TC3 / });
    expect(tc3.getAttribute('tabindex')).toBe('-1');
    fireEvent.focus(tc3);
    tip = screen.getByRole('tooltip');
    expect(within(tip).getByText(`${fmtSigned(forces.TC3)} kN compression (C)`)).toBeTruthy();
    expect(tc3.getAttribute('tabindex')).toBe('0');
  });

  it('draws the deflected shape and drops it at 0 %', () => {
    const { container } = render(<TrussDrawing model={DEPOT} analysis={analysis} />);
    expect(container.querySelector('[data-layer="deflected"]')).not.toBeNull();
    fireEvent.change(screen.getByLabelText('Deflected shape'), { target: { value: '0' } });
    expect(container.querySelector('[data-layer="deflected"]')).toBeNull();
  });

  it('exports an SVG without the interaction layers', () => {
    const { container } = render(<TrussDrawing model={DEPOT} analysis={analysis} />);
    fireEvent.mouseEnter(screen.getByRole('img', { name: /^Member D1 / }));
    const { text, width, height } = serializeSvg(svgOf(container), 1000);
    expect(text).toContain('data-member="D1"');
    expect(text).not.toContain('role="tooltip"');
    expect(width).toBe(1000);
    expect(height).toBeGreaterThan(50);
  });
});

describe('TrussDrawing on the draft with a missing diagonal (one mechanism)', () => {
  const analysis = analysed(MISSING);

  it('shades the unbraced panel, marks the over-braced members and offers the animation', () => {
    const { container } = render(<TrussDrawing model={MISSING} analysis={analysis} />);
    const panel = container.querySelector('[data-panel="unbraced"]')!;
    expect(panel).not.toBeNull();
    const named = analysis.classification.findings.find((f) => f.code === 'panel-unbraced')!.joints!;
    expect(panel.getAttribute('data-joints')).toBe(named.join(' '));
    expect(container.querySelector('[data-halo="D5X"]')).not.toBeNull();
    expect(container.querySelectorAll('path[data-member]')).toHaveLength(MISSING.members.length);
    expect(container.querySelector('path[data-member="BC1"]')!.getAttribute('data-sign')).toBe('unknown');
    const play = screen.getByRole('button', { name: 'Animate mechanism' });
    expect(play.getAttribute('aria-pressed')).toBe('false');
    // Reduced motion: the mode is shown still at full amplitude, so a moving joint is off its rest place.
    const b2 = container.querySelector('[data-joint="B2"]')!;
    expect(Number(b2.getAttribute('cy'))).not.toBeCloseTo(0, 6);
    fireEvent.click(play);
    expect(screen.getByRole('button', { name: 'Pause mechanism' }).getAttribute('aria-pressed')).toBe('true');
    expect(container.querySelector('[data-layer="rest-shape"]')).not.toBeNull();
  });
});
