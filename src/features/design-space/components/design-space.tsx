/** The design space of a run: the point chart (or its binned heatmap) and a figure over two parameters. */
import type { RunRef } from '@/lib/api';
import type { RunDetail } from '@/lib/run-types';
import { fieldsOf } from '@/lib/figures';
import { Panel } from '@/components/panel';
import { ErrorBoundary } from '@/components/error-boundary';
import { useChartState } from '../hooks/use-chart-state';
import type { ChartSelection } from '../lib/selection';
import { ChartControls } from './chart-controls';
import { FigureChart } from './figure-chart';
import { ParamHeatmap } from './param-heatmap';

interface Props {
  run: RunDetail;
  runRef: RunRef;
  onSelection: (s: ChartSelection | undefined, fields: { x: string; y: string }) => void;
}

export function DesignSpace({ run, runRef, onSelection }: Props) {
  const [state, set] = useChartState(run);
  return (
    <div className="flex flex-col gap-3">
      <Panel title="Figure against figure">
        <ChartControls fields={fieldsOf(run)} state={state} set={set} />
        <ErrorBoundary what="the point chart">
          <FigureChart run={run} runRef={runRef} state={state} onSelection={onSelection} />
        </ErrorBoundary>
      </Panel>
      <Panel title="A figure over two parameters">
        <ErrorBoundary what="the heatmap">
          <ParamHeatmap run={run} runRef={runRef} state={state} set={set} />
        </ErrorBoundary>
      </Panel>
    </div>
  );
}
