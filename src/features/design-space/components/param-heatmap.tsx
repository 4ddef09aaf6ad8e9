/** A figure over two parameters: the mean of the figure per bin (…/aggregate with z), count, min and max on hover. */
import { useMemo } from 'react';
import type { RunRef } from '@/lib/api';
import type { RunDetail } from '@/lib/run-types';
import { fieldLabel, fieldOf, fieldsOf } from '@/lib/figures';
import { fmtCount } from '@/lib/format';
import { ErrorPanel } from '@/components/error-panel';
import { useAggregate } from '../api/get-aggregate';
import type { ChartState } from '../lib/chart-state';
import { exactValues, heatmapFigure } from '../lib/heatmap-figure';
import { FieldSelect } from './field-select';
import { LazyPlot } from './lazy-plot';
import { ChartAside } from './chart-notes';

interface Props {
  run: RunDetail;
  runRef: RunRef;
  state: ChartState;
  set: (key: keyof ChartState, value: string) => void;
}

const BINS = 60;
const HEIGHT = 400;

export function ParamHeatmap({ run, runRef, state, set }: Props) {
  const fields = fieldsOf(run);
  const params = fields.filter((f) => f.kind === 'param' && f.numeric);
  const figures = fields.filter((f) => f.kind === 'figure' && f.key !== 'index');
  const on = params.length >= 2 && state.hx !== state.hy;
  const agg = useAggregate(runRef, { x: state.hx, y: state.hy, z: state.hz, bins: BINS }, on);
  // The parameters' own values per bin: a grid of study values is drawn at those values, without empty stripes.
  const onX = useAggregate(runRef, { x: state.hx, y: state.hy, z: state.hx, bins: BINS }, on);
  const onY = useAggregate(runRef, { x: state.hx, y: state.hy, z: state.hy, bins: BINS }, on);
  const zf = fieldOf(fields, state.hz);
  const labels = { x: fieldLabel(fieldOf(fields, state.hx), state.hx), y: fieldLabel(fieldOf(fields, state.hy), state.hy), z: fieldLabel(zf, state.hz), reverse: zf?.better === 'abs-low' };
  const fig = useMemo(() => (agg.data && onX.data && onY.data
    ? heatmapFigure(agg.data, labels, { x: exactValues(onX.data, 'x'), y: exactValues(onY.data, 'y') }) : undefined),
  [agg.data, onX.data, onY.data, labels.x, labels.y, labels.z, labels.reverse]);
  return (
    <>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1.5 border-b border-rule px-3 py-1.5 text-xs">
        <FieldSelect label="Figure" value={state.hz} fields={figures} onChange={(v) => set('hz', v)} />
        <FieldSelect label="over x" value={state.hx} fields={params} onChange={(v) => set('hx', v)} />
        <FieldSelect label="and y" value={state.hy} fields={params} onChange={(v) => set('hy', v)} />
      </div>
      {params.length < 2 ? (
        <p className="m-0 px-3 py-2 text-xs text-ink-2">The study varies fewer than two numeric parameters: there is no plane to map.</p>
      ) : state.hx === state.hy ? (
        <p className="m-0 px-3 py-2 text-xs text-ink-2">Pick two different parameters.</p>
      ) : agg.isError || onX.isError || onY.isError ? (
        <div className="p-3"><ErrorPanel error={agg.error ?? onX.error ?? onY.error} what="the binned figures" onRetry={() => { void agg.refetch(); void onX.refetch(); void onY.refetch(); }} /></div>
      ) : (
        <div className="grid grid-cols-1 xl:grid-cols-[minmax(0,1fr)_17rem]">
          <div className="min-w-0">
            {fig && fig.stats.shown === 0 ? (
              <p role="status" className="m-0 px-3 py-6 text-xs text-ink-2" style={{ minHeight: HEIGHT / 2 }}>No variant of this run has a value of {labels.z}{fig.stats.total ? ` (${fmtCount(fig.stats.total)} variants, none with it)` : ''}: pick another figure.</p>
            ) : fig ? <LazyPlot data={fig.data} layout={fig.layout} label={`mean ${labels.z} over ${labels.x} and ${labels.y}`} height={HEIGHT}
              fileName={`${run.study.name} ${state.hz} over ${state.hx} ${state.hy}`.replace(/[^\w.-]+/g, '-')} />
              : <p role="status" className="m-0 px-3 py-6 text-xs text-ink-3" style={{ minHeight: HEIGHT }}>Loading the bins…</p>}
          </div>
          <ChartAside>
            <p className="m-0 text-ink-2">Each cell is the mean {labels.z} of the variants in it; hover for their count, least and largest value. Empty cells hold no variant with a value: unstable and failed variants have none.</p>
            {fig && <p className="m-0 num text-ink-3">{fmtCount(fig.stats.shown)} variants with a value, in {fmtCount(fig.stats.bins - fig.stats.empty)} of {fmtCount(fig.stats.bins)} cells</p>}
          </ChartAside>
        </div>
      )}
    </>
  );
}
