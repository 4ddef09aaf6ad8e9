/** The chart state from the address, and a setter that writes one key (replacing the history entry). */
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { RunDetail } from '@/lib/run-types';
import { chartStateOf, type ChartState } from '../lib/chart-state';

export function useChartState(run: RunDetail): [ChartState, (key: keyof ChartState, value: string) => void] {
  const [params, setParams] = useSearchParams();
  const state = useMemo(() => chartStateOf(params, run), [params, run]);
  const set = useCallback((key: keyof ChartState, value: string) => {
    setParams((p) => {
      const next = new URLSearchParams(p);
      if (value) next.set(key, value);
      else next.delete(key);
      return next;
    }, { replace: true });
  }, [setParams]);
  return [state, set];
}
