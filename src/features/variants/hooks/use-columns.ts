/** The visible columns of the variants table, and a toggle that is remembered in this browser. */
import { useMemo, useState } from 'react';
import type { RunDetail } from '@/lib/run-types';
import { columnsOf, isVisible, loadChoice, saveChoice, toggled, type Column } from '../lib/columns';

export function useColumns(run: Pick<RunDetail, 'paramNames' | 'paramColumns'>): { all: Column[]; visible: Column[]; isShown: (key: string) => boolean; toggle: (key: string, on: boolean) => void } {
  const [choice, setChoice] = useState(loadChoice);
  const all = useMemo(() => columnsOf(run), [run]);
  const visible = all.filter((c) => isVisible(choice, c.key));
  const toggle = (key: string, on: boolean) => {
    const next = toggled(choice, key, on);
    saveChoice(next);
    setChoice(next);
  };
  return { all, visible, isShown: (key) => isVisible(choice, key), toggle };
}
