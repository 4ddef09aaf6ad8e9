import { fmtPlain } from '@/lib/format';
/**
 * Two to four variants side by side: their drawings in equal columns at one scale (the route
 * renders them with a shared scale), then the table of differences.
 */
import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { VariantDetailDto } from '@/lib/run-types';
import { StatusPill } from '@/components/status-pill';
import { ErrorBoundary } from '@/components/error-boundary';
import { LINK } from '@/components/ui';
import { DifferenceTable } from './difference-table';

interface Props {
  items: readonly VariantDetailDto[];
  paramNames: readonly string[];
  variantHref: (index: number) => string;
  renderDrawing: (item: VariantDetailDto) => ReactNode;
  /** A line that states the common scale. */
  scaleNote: ReactNode;
}

const COLUMNS = ['', '', 'md:grid-cols-2', 'md:grid-cols-3', 'md:grid-cols-2 2xl:grid-cols-4'];

export function CompareView({ items, paramNames, variantHref, renderDrawing, scaleNote }: Props) {
  return (
    <div className="flex flex-col gap-3">
      <p className="m-0 text-xs text-ink-2">{scaleNote}</p>
      <div className={`grid grid-cols-1 gap-3 ${COLUMNS[items.length] ?? ''}`}>
        {items.map((it) => (
          <div key={it.variant.index} className="flex min-w-0 flex-col gap-1">
            <div className="flex flex-wrap items-center gap-2 text-xs">
              <Link to={variantHref(it.variant.index)} className={`num font-medium ${LINK}`}>variant {it.variant.index}</Link>
              <StatusPill status={it.variant.status} critical={it.variant.critical} />
              <span className="num text-ink-3">{Object.entries(it.variant.params).map(([k, v]) => `${k}=${fmtPlain(v)}`).join(' ')}</span>
            </div>
            <ErrorBoundary what={`the drawing of variant ${it.variant.index}`}>{renderDrawing(it)}</ErrorBoundary>
          </div>
        ))}
      </div>
      <DifferenceTable variants={items.map((i) => i.variant)} paramNames={paramNames} />
    </div>
  );
}
