/**
 * Any figure against any other: a WebGL scatter of up to POINT_LIMIT variants from …/points
 * (colour by status or a figure, split by a parameter, unstable variants on a strip under the
 * axis), or beyond that a heatmap of counts (or of the colour figure's mean) from …/aggregate.
 * A box or lasso selection is handed up as variant indices.
 */
import { useMemo } from 'react';
import type { RunRef } from '@/lib/api';
import type { RunDetail } from '@/lib/run-types';
import { fieldLabel, fieldOf, fieldsOf } from '@/lib/figures';
import { fmtCount } from '@/lib/format';
import { ErrorPanel } from '@/components/error-panel';
import { POINT_LIMIT, usePoints } from '../api/get-points';
import { useAggregate } from '../api/get-aggregate';
import { useCriticalIndices } from '../api/get-critical';
import { splitSupport, useSplitValues } from '../api/get-split-values';
import type { ChartState } from '../lib/chart-state';
import { groupPoints } from '../lib/group-points';
import { scatterFigure } from '../lib/scatter-figure';
import { heatmapFigure } from '../lib/heatmap-figure';
import { selectionOf, type ChartSelection } from '../lib/selection';
import { LazyPlot } from './lazy-plot';
import { ChartAside, KindCounts } from './chart-notes';

interface Props {
  run: RunDetail;
  runRef: RunRef;
  state: ChartState;
  onSelection: (s: ChartSelection | undefined, fields: { x: string; y: string }) => void;
}

const EMPTY_SET: ReadonlySet<number> = new Set();

export function FigureChart({ run, runRef, state, onSelection }: Props) {
  const fields = fieldsOf(run);
  const [xf, yf] = [fieldOf(fields, state.x), fieldOf(fields, state.y)];
  const colourFigure = state.colour !== 'status' && !(state.split && state.splitAs === 'traces') ? state.colour : undefined;
  const tooMany = run.variantCount > POINT_LIMIT;
  const points = usePoints(runRef, { x: state.x, y: state.y, color: colourFigure, limit: POINT_LIMIT }, !tooMany);
  const split = state.split && splitSupport(run, state.split).ok ? state.split : '';
  const splitQ = useSplitValues(runRef, run, split, !tooMany && !!split);
  const critical = useCriticalIndices(runRef, (run.summary?.critical ?? 0) > 0);
  const heat = tooMany || !!points.data?.truncated;
  const agg = useAggregate(runRef, { x: state.x, y: state.y, bins: 60, ...(colourFigure ? { z: colourFigure } : {}) }, heat);
  const cf = colourFigure ? fieldOf(fields, colourFigure) : undefined;
  const labels = { x: fieldLabel(xf, state.x), y: fieldLabel(yf, state.y), colour: cf ? fieldLabel(cf) : undefined, split: state.split, colourReverse: cf?.better === 'abs-low' };
  const splitWhy = state.split ? (tooMany ? 'The binned chart is not split.' : splitSupport(run, state.split).why) : undefined;

  const splitValues = split ? splitQ.data : undefined;

  const scatter = useMemo(() => {
    if (heat || !points.data || (split && !splitValues)) return undefined;
    const grouped = groupPoints(points.data, {
      critical: critical.data?.indices ?? EMPTY_SET, colourBy: colourFigure ? 'figure' : 'status',
      split: splitValues ? { values: splitValues, as: state.splitAs } : undefined,
    });
    const rows = Math.ceil(grouped.facets.length / 3);
    const height = rows > 1 ? 300 * rows + 90 : 470;
    return { grouped, height, figure: scatterFigure(grouped, labels, height) };
  }, [heat, points.data, split, splitValues, critical.data, colourFigure, state.splitAs, labels.x, labels.y, labels.colour, labels.colourReverse]);

  const heatmap = useMemo(() => (heat && agg.data ? heatmapFigure(agg.data, { x: labels.x, y: labels.y, z: labels.colour, reverse: labels.colourReverse }) : undefined),
    [heat, agg.data, labels.x, labels.y, labels.colour, labels.colourReverse]);

  const error = points.error ?? splitQ.error ?? agg.error;
  if (error) return <ErrorPanel error={error} what="the chart data" onRetry={() => { void points.refetch(); void agg.refetch(); }} />;
  const height = scatter?.height ?? 470;
  const label = `${labels.y} against ${labels.x}`;
  const onSelected = (e: unknown) => {
    const s = selectionOf(e);
    const single = scatter?.grouped.facets.length === 1 && xf?.numeric && yf?.numeric;
    onSelection(s && !single ? { indices: s.indices } : s, { x: state.x, y: state.y });
  };

  return (
    <div className="grid grid-cols-1 xl:grid-cols-[minmax(0,1fr)_17rem]">
      <div className="min-w-0">
        {scatter && <LazyPlot data={scatter.figure.data} layout={scatter.figure.layout} label={label} height={height}
          fileName={`${run.study.name} ${state.y} vs ${state.x}`.replace(/[^\w.-]+/g, '-')} onSelected={onSelected} onDeselect={() => onSelection(undefined, state)} />}
        {heatmap && <LazyPlot data={heatmap.data} layout={heatmap.layout} label={`${label}, binned`} height={height}
          fileName={`${run.study.name} ${state.y} vs ${state.x} binned`.replace(/[^\w.-]+/g, '-')} />}
        {!scatter && !heatmap && <p role="status" className="m-0 px-3 py-6 text-xs text-ink-3" style={{ minHeight: height }}>Loading the points…</p>}
      </div>
      <ChartAside>
        {splitWhy && <p className="m-0 text-warn">{splitWhy}</p>}
        {scatter && <>
          <KindCounts counts={scatter.grouped.drawn} label={`Drawn: ${fmtCount(Object.values(scatter.grouped.drawn).reduce((a, b) => a + b, 0))} variants`} />
          {scatter.grouped.strip > 0 && <p className="m-0 text-ink-2"><span className="num">{fmtCount(scatter.grouped.strip)}</span> have no {labels.y} (unstable and failed variants carry no forces): they sit on the strip under the axis, at their {labels.x}.</p>}
          <KindCounts counts={scatter.grouped.notPlaced} label={`Not drawn: no ${labels.x}`} />
          {(critical.data?.total ?? 0) > (critical.data?.indices.size ?? 0) && <p className="m-0 text-warn">Only the first {critical.data!.indices.size} of {fmtCount(critical.data!.total)} critical forms carry the ◇ marker.</p>}
          <p className="m-0 text-ink-3">Drag a box, or pick the lasso in the chart's tools, to list those variants in the table below.</p>
        </>}
        {heatmap && <p className="m-0 text-ink-2">
          {fmtCount(run.variantCount)} variants are more than {fmtCount(POINT_LIMIT)} to draw one by one: each cell counts the variants in its bin{labels.colour ? ` and shows their mean ${labels.colour}` : ''}. {fmtCount(heatmap.stats.shown)} variants have both values{labels.colour ? ` and a ${labels.colour}` : ''}. Filter the table to reach single variants.
        </p>}
      </ChartAside>
    </div>
  );
}
