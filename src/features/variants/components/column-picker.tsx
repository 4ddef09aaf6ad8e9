/** Which columns the table shows: a disclosure with one labelled tick box per column. */
import type { Column } from '../lib/columns';

export function ColumnPicker({ all, isShown, toggle }: { all: Column[]; isShown: (k: string) => boolean; toggle: (k: string, on: boolean) => void }) {
  return (
    <details className="relative">
      <summary className="cursor-pointer rounded border border-rule-strong bg-sheet px-2 py-0.5 text-xs text-ink hover:bg-paper">Columns</summary>
      <fieldset className="absolute right-0 z-20 mt-1 w-56 rounded border border-rule-strong bg-sheet p-2 shadow-md">
        <legend className="sr-only">Columns to show</legend>
        {all.map((c) => (
          <label key={c.key} className="flex items-center gap-2 py-0.5 text-xs">
            <input type="checkbox" checked={isShown(c.key)} onChange={(e) => toggle(c.key, e.target.checked)} />
            <span className={c.group === 'param' ? 'num' : ''}>{c.label}{c.unit ? ` (${c.unit})` : ''}</span>
          </label>
        ))}
        <p className="m-0 mt-1 text-[11px] text-ink-3">Kept in this browser.</p>
      </fieldset>
    </details>
  );
}
