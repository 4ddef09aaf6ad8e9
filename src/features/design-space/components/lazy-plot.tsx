/** A chart that loads Plotly on first use, inside its own error boundary. */
import { lazy, Suspense } from 'react';
import { ErrorBoundary } from '@/components/error-boundary';
import type { PlotChartProps } from './plot-chart';

const PlotChart = lazy(() => import('./plot-chart'));

export function LazyPlot(props: PlotChartProps) {
  return (
    <ErrorBoundary what={`the chart (${props.label})`}>
      <Suspense fallback={<p role="status" className="m-0 px-3 py-6 text-xs text-ink-3" style={{ minHeight: props.height }}>Loading the chart library…</p>}>
        <PlotChart {...props} />
      </Suspense>
    </ErrorBoundary>
  );
}
