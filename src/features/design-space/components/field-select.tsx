/** A labelled select of fields (figures and parameters), in the house's small dense style. */
import { useId } from 'react';
import { fieldLabel, type Field } from '@/lib/figures';
import { FIELD } from '@/components/ui';

interface Props {
  label: string;
  value: string;
  fields: readonly Field[];
  onChange: (v: string) => void;
  /** Options before the fields, e.g. ['status', 'Status'] or ['', 'none']. */
  extra?: readonly (readonly [string, string])[];
  disabled?: boolean;
  hint?: string;
}

export function FieldSelect({ label, value, fields, onChange, extra = [], disabled, hint }: Props) {
  const id = useId();
  const params = fields.filter((f) => f.kind === 'param');
  const figures = fields.filter((f) => f.kind === 'figure');
  return (
    <div className="flex items-center gap-1.5">
      <label htmlFor={id} className="text-ink-2">{label}</label>
      <select id={id} value={value} disabled={disabled} onChange={(e) => onChange(e.target.value)} title={hint} className={`num ${FIELD}`}>
        {extra.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
        {params.length > 0 && <optgroup label="Parameters">{params.map((f) => <option key={f.key} value={f.key}>{fieldLabel(f)}</option>)}</optgroup>}
        {figures.length > 0 && <optgroup label="Figures">{figures.map((f) => <option key={f.key} value={f.key}>{fieldLabel(f)}</option>)}</optgroup>}
      </select>
    </div>
  );
}
