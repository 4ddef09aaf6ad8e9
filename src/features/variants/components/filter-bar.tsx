/** Filters of the variants table: status, critical forms, marks, numeric ranges; each applies at once, from page 1. */
import { useId, useState, type FormEvent } from 'react';
import type { RunDetail, VariantStatus } from '@/lib/run-types';
import { fieldLabel, fieldsOf, STATUSES } from '@/lib/figures';
import { fmt } from '@/lib/format';
import type { RangeFilter, VariantQuery } from '@/lib/variant-query';
import { BTN, FIELD } from '@/components/ui';

const STATUS_WORD: Record<VariantStatus, string> = { determinate: 'determinate', indeterminate: 'indeterminate', unstable: 'unstable', error: 'failed' };

interface Props {
  run: RunDetail;
  query: VariantQuery;
  update: (patch: Partial<VariantQuery>) => void;
}

function RangeForm({ run, onAdd }: { run: RunDetail; onAdd: (field: string, r: RangeFilter) => void }) {
  const id = useId();
  const numeric = fieldsOf(run).filter((f) => f.numeric);
  const [field, setField] = useState(numeric[0]?.key ?? 'index');
  const [lo, setLo] = useState('');
  const [hi, setHi] = useState('');
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const r: RangeFilter = {};
    if (lo.trim() !== '' && Number.isFinite(Number(lo))) r.gte = Number(lo);
    if (hi.trim() !== '' && Number.isFinite(Number(hi))) r.lte = Number(hi);
    if (r.gte === undefined && r.lte === undefined) return;
    onAdd(field, r);
    setLo('');
    setHi('');
  };
  return (
    <form onSubmit={submit} className="inline-flex flex-wrap items-center gap-1.5" aria-label="Add a range filter">
      <label htmlFor={`${id}-f`} className="text-ink-2">Range of</label>
      <select id={`${id}-f`} value={field} onChange={(e) => setField(e.target.value)} className={`num ${FIELD}`}>
        {numeric.map((f) => <option key={f.key} value={f.key}>{fieldLabel(f)}</option>)}
      </select>
      <label htmlFor={`${id}-lo`} className="text-ink-2">from</label>
      <input id={`${id}-lo`} inputMode="decimal" value={lo} onChange={(e) => setLo(e.target.value)} className={`num w-20 ${FIELD}`} />
      <label htmlFor={`${id}-hi`} className="text-ink-2">to</label>
      <input id={`${id}-hi`} inputMode="decimal" value={hi} onChange={(e) => setHi(e.target.value)} className={`num w-20 ${FIELD}`} />
      <button type="submit" className={BTN}>Add</button>
    </form>
  );
}

export function FilterBar({ run, query, update }: Props) {
  const id = useId();
  const toggleStatus = (s: VariantStatus, on: boolean) => {
    const next = new Set(query.status ?? []);
    if (on) next.add(s);
    else next.delete(s);
    update({ status: STATUSES.filter((x) => next.has(x)) });
  };
  const ranges = Object.entries(query.ranges ?? {});
  return (
    <div className="flex flex-col gap-1.5 border-b border-rule px-3 py-1.5 text-xs">
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1.5">
        <fieldset className="m-0 inline-flex flex-wrap items-center gap-x-2 border-0 p-0">
          <legend className="float-left mr-1 text-ink-2">Status</legend>
          {STATUSES.map((s) => (
            <label key={s} className="inline-flex items-center gap-1">
              <input type="checkbox" checked={query.status?.includes(s) ?? false} onChange={(e) => toggleStatus(s, e.target.checked)} />
              {STATUS_WORD[s]}
            </label>
          ))}
        </fieldset>
        <label htmlFor={`${id}-crit`} className="text-ink-2">Critical forms</label>
        <select id={`${id}-crit`} value={query.critical === undefined ? '' : String(query.critical)} className={FIELD}
          onChange={(e) => update({ critical: e.target.value === '' ? undefined : e.target.value === 'true' })}>
          <option value="">any</option><option value="true">only critical</option><option value="false">not critical</option>
        </select>
        <label htmlFor={`${id}-mark`} className="text-ink-2">Marked</label>
        <select id={`${id}-mark`} value={query.marked ?? ''} className={FIELD}
          onChange={(e) => update({ marked: (e.target.value || undefined) as VariantQuery['marked'] })}>
          <option value="">any</option><option value="candidate">candidates</option><option value="rejected">rejected</option>
        </select>
        <RangeForm run={run} onAdd={(f, r) => update({ ranges: { ...query.ranges, [f]: r } })} />
      </div>
      {ranges.length > 0 && (
        <ul aria-label="Range filters" className="m-0 flex list-none flex-wrap gap-1.5 p-0">
          {ranges.map(([f, r]) => (
            <li key={f} className="num inline-flex items-center gap-1 rounded border border-rule-strong bg-paper px-1.5">
              {r.gte !== undefined ? `${fmt(r.gte)} ≤ ` : ''}{f}{r.lte !== undefined ? ` ≤ ${fmt(r.lte)}` : ''}
              <button type="button" aria-label={`Remove the range on ${f}`} className="px-0.5 text-ink-3 hover:text-bad"
                onClick={() => update({ ranges: Object.fromEntries(ranges.filter(([k]) => k !== f)) })}>×</button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
