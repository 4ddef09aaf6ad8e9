// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { VariantDetail } from '@/features/variant-detail/components/VariantDetail';
import { TrussDrawing } from '@/features/truss-drawing/components/TrussDrawing';
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { fmtSigned, parseFigure } from '@/lib/format';
import { DEPOT, MISSING, analysed, forcesOf, preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

function show(model: Model, analysis: AnalysisJson) {
  return render(
    <VariantDetail model={model} analysis={analysis}
      renderDrawing={(slot) => <TrussDrawing model={model} analysis={analysis} {...slot} />} />,
  );
}

const tableForce = (c: HTMLElement, id: string) =>
  parseFigure(c.querySelector(`tr[data-member-row="${id}"] td[data-col="force"]`)!.textContent!);
const probeForce = (c: HTMLElement, id: string) =>
  parseFigure(c.querySelector(`tr[data-probe-row="${id}"] td[data-col="statics"]`)!.textContent!);

describe('VariantDetail', () => {
  const analysis = analysed(DEPOT);

  it('shows the verdict with the counts and the member table', () => {
    const { container } = show(DEPOT, analysis);
    expect(screen.getByTestId('verdict-status').textContent).toBe('Stable, statically determinate');
    const verdict = screen.getByRole('region', { name: 'Verdict' });
    // Maxwell's count for the depot roof: m + r − 2j = 25 + 3 − 28 = 0.
    const maxwell = within(verdict).getByText("Maxwell's count m + r − 2j").nextElementSibling!;
    expect(maxwell.textContent).toBe('0');
    const table = screen.getByRole('table', { name: /Members/ });
    expect(within(table).getAllByRole('row')).toHaveLength(DEPOT.members.length + 1);
    const f = forcesOf(analysis, 'ULS-1');
    expect(container.querySelector('tr[data-member-row="TC3"] td[data-col="force"]')!.textContent).toBe(fmtSigned(f.TC3));
    expect(screen.getByRole('note').textContent).toContain('review by a licensed engineer');
  });

  it('sorts the member table by force', () => {
    const { container } = show(DEPOT, analysis);
    fireEvent.click(screen.getByRole('button', { name: /Force \(kN\)/ }));
    const header = screen.getByRole('columnheader', { name: /Force \(kN\)/ });
    expect(header.getAttribute('aria-sort')).toBe('ascending');
    const ids = [...container.querySelectorAll('tr[data-member-row]')].map((r) => r.getAttribute('data-member-row')!);
    const values = ids.map((id) => tableForce(container, id));
    expect(values).toEqual([...values].sort((a, b) => a - b));
    fireEvent.click(screen.getByRole('button', { name: /Force \(kN\)/ }));
    expect(header.getAttribute('aria-sort')).toBe('descending');
  });

  it('solves a three-member cut with the same forces as the table', () => {
    const { container } = show(DEPOT, analysis);
    // Panel 3 of the Pratt truss: top chord TC3, diagonal D3, bottom chord BC3 split it in two.
    for (const id of ['TC3', 'D3', 'BC3']) fireEvent.click(screen.getByRole('button', { name: new RegExp(`^Member ${id} `) }));
    for (const id of ['TC3', 'D3', 'BC3']) {
      // Method of sections against the stiffness result: equal for a determinate truss (statics).
      expect(probeForce(container, id)).toBeCloseTo(tableForce(container, id), 6);
      expect(Math.abs(probeForce(container, id))).toBeGreaterThan(1);
    }
    expect(container.querySelectorAll('[data-cut]')).toHaveLength(3);
    expect(container.querySelectorAll('[data-joint-halo]').length).toBeGreaterThan(0);
    // Same cut from the table's tick boxes, under another loading.
    fireEvent.click(screen.getByRole('button', { name: 'Clear cut' }));
    fireEvent.change(screen.getByLabelText('Loading'), { target: { value: 'ULS-3' } });
    for (const id of ['TC2', 'D2', 'BC2']) fireEvent.click(screen.getByLabelText(`Cut ${id}`));
    for (const id of ['TC2', 'D2', 'BC2']) expect(probeForce(container, id)).toBeCloseTo(tableForce(container, id), 6);
  });

  it('says why a cut cannot be solved', () => {
    show(DEPOT, analysis);
    fireEvent.click(screen.getByLabelText('Cut TC3'));
    const probe = screen.getByRole('region', { name: 'Method of sections' });
    expect(within(probe).getByRole('status').textContent).toMatch(/does not split the truss in two/);
  });

  it('shows an unstable frame: the verdict, its findings and where they point', () => {
    const a = analysed(MISSING);
    const { container } = show(MISSING, a);
    expect(screen.getByTestId('verdict-status').textContent).toBe('Unstable: 1 mechanism');
    const findings = screen.getByRole('region', { name: /Findings/ });
    const unbraced = a.classification.findings.find((f) => f.code === 'panel-unbraced')!;
    const item = within(findings).getByText(unbraced.message).closest('li')!;
    fireEvent.click(within(item).getByRole('button', { name: 'Show on drawing' }));
    const halos = [...container.querySelectorAll('[data-layer="highlight"] [data-joint-halo]')].map((c) => c.getAttribute('data-joint-halo'));
    expect(halos).toEqual(unbraced.joints);
    expect(container.querySelector('tr[data-member-row="BC1"] td[data-col="force"]')!.textContent).toBe('—');
  });
});
