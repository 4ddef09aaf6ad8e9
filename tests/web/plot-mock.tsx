// Stand-ins for plotly.js and react-plotly.js/factory in jsdom (no WebGL): the fake Plot keeps
// the props of each render so a test can read the traces and fire Plotly's events.
import { useEffect, useRef } from 'react';
import { vi } from 'vitest';
import type { PlotParams } from 'react-plotly.js/factory';

export const plots: PlotParams[] = [];
export const downloadImage = vi.fn(async () => 'ok');

function FakePlot(props: PlotParams) {
  const ref = useRef<HTMLDivElement>(null);
  plots.push(props);
  useEffect(() => {
    if (ref.current) props.onInitialized?.({ data: props.data ?? [], layout: props.layout, frames: null }, ref.current);
  });
  const types = (props.data ?? []).map((t) => (t as { type?: string }).type).join(' ');
  return <div ref={ref} data-testid="fake-plot" data-trace-types={types} />;
}

export const factoryModule = { default: () => FakePlot };
export const plotlyModule = { default: { downloadImage } };

/** The traces of the latest plot whose data match `pick`. */
export function lastPlot(pick: (p: PlotParams) => boolean = () => true): PlotParams {
  const found = [...plots].reverse().find(pick);
  if (!found) throw new Error('no plot rendered');
  return found;
}
