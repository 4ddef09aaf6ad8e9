/**
 * The Plotly chart, loaded on demand (this module pulls in plotly.js, ≈4.6 MB): the plot, and
 * PNG / SVG export of exactly what is shown through Plotly.downloadImage.
 */
import { useRef, useState } from 'react';
import Plotly from 'plotly.js-dist-min';
import createPlotlyComponent from 'react-plotly.js/factory';
import { PLOT_CONFIG, type Layout, type Trace } from '../lib/plot-theme';
import { BTN } from '@/components/ui';

const Plot = createPlotlyComponent(Plotly);

export interface PlotChartProps {
  data: Trace[];
  layout: Layout;
  /** What the chart shows, for screen readers and the export note. */
  label: string;
  /** File name of exports, without extension. */
  fileName: string;
  height: number;
  onSelected?: (event: unknown) => void;
  onDeselect?: () => void;
}

export default function PlotChart(p: PlotChartProps) {
  const graph = useRef<HTMLElement | null>(null);
  const [note, setNote] = useState('');
  const keep = (_figure: unknown, gd: HTMLElement) => {
    graph.current = gd;
  };
  const exportAs = async (format: 'png' | 'svg') => {
    const gd = graph.current;
    if (!gd) return;
    try {
      const [width, height] = [gd.offsetWidth || 1000, gd.offsetHeight || p.height];
      await Plotly.downloadImage(gd, { format, filename: p.fileName, width, height, scale: format === 'png' ? 2 : 1 });
      setNote(`Exported ${format.toUpperCase()} (${width} × ${height} px${format === 'png' ? ' at 2×' : ''}).`);
    } catch (err) {
      setNote(err instanceof Error ? err.message : 'Export failed.');
    }
  };
  return (
    <div>
      <div className="flex items-center justify-end gap-1.5 px-2 pt-1 text-xs">
        <span role="status" className="mr-auto text-ink-3">{note}</span>
        <span className="text-ink-3">Export</span>
        <button type="button" className={BTN} onClick={() => void exportAs('png')}>PNG</button>
        <button type="button" className={BTN} onClick={() => void exportAs('svg')}>SVG</button>
      </div>
      <div role="figure" aria-label={p.label} data-testid="plot">
        <Plot
          data={p.data}
          layout={{ ...p.layout, height: p.height, autosize: true }}
          config={PLOT_CONFIG}
          useResizeHandler
          style={{ width: '100%', height: p.height }}
          onInitialized={keep}
          onUpdate={keep}
          onSelected={p.onSelected}
          onDeselect={p.onDeselect}
        />
      </div>
    </div>
  );
}
