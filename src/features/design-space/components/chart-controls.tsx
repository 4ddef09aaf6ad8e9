/** The choices of the point chart: x, y, colour (status or a figure), split by a parameter (facets or traces). */
import { useId } from 'react';
import type { Field } from '@/lib/figures';
import type { ChartState } from '../lib/chart-state';
import { FieldSelect } from './field-select';
import { FIELD } from '@/components/ui';

interface Props {
  fields: readonly Field[];
  state: ChartState;
  set: (key: keyof ChartState, value: string) => void;
}

export function ChartControls({ fields, state, set }: Props) {
  const id = useId();
  const params = fields.filter((f) => f.kind === 'param');
  const numeric = fields.filter((f) => f.numeric);
  const tracesSplit = !!state.split && state.splitAs === 'traces';
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1.5 border-b border-rule px-3 py-1.5 text-xs">
      <FieldSelect label="x" value={state.x} fields={numeric} onChange={(v) => set('x', v)} />
      <FieldSelect label="y" value={state.y} fields={numeric} onChange={(v) => set('y', v)} />
      <FieldSelect label="Colour" value={tracesSplit ? 'status' : state.colour} fields={numeric.filter((f) => f.key !== 'index')}
        extra={[['status', 'Status']]} onChange={(v) => set('colour', v)} disabled={tracesSplit}
        hint={tracesSplit ? 'One trace per split value: the colour shows the split.' : undefined} />
      <FieldSelect label="Split by" value={state.split} fields={params} extra={[['', 'none']]} onChange={(v) => set('split', v)} />
      {state.split && (
        <div className="flex items-center gap-1.5">
          <label htmlFor={`${id}-as`} className="text-ink-2">as</label>
          <select id={`${id}-as`} value={state.splitAs} onChange={(e) => set('splitAs', e.target.value)} className={FIELD}>
            <option value="facets">side-by-side charts</option>
            <option value="traces">one trace per value</option>
          </select>
        </div>
      )}
    </div>
  );
}
