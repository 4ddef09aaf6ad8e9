/**
 * One variant in full: the drawing (rendered by the caller, so this feature does not import the
 * drawing feature), the verdict and findings, the member table and a method-of-sections probe
 * computed in the browser. Works from props: the server's variant, or an example analysed here.
 */
import { useMemo, useState, type ReactNode } from 'react';
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { ErrorBoundary } from '@/components/error-boundary';
import { memberRows } from '../lib/member-rows';
import { probeCut } from '../lib/section-probe';
import { VerdictPanel } from './verdict-panel';
import { FindingsList, type Highlight } from './findings-list';
import { MemberTable } from './member-table';
import { SectionProbe } from './section-probe';
import { CautionLine } from '@/components/caution-line';

/** What the page hands to the drawing it renders. */
export interface DrawingSlot {
  loading?: string;
  selectedMembers: readonly string[];
  onMemberActivate: (id: string) => void;
  highlight?: Highlight;
  freeBody?: readonly string[];
}

export interface VariantDetailProps {
  model: Model;
  analysis: AnalysisJson;
  /** Draw the truss (the route passes TrussDrawing). */
  renderDrawing: (slot: DrawingSlot) => ReactNode;
  /** Shown above the title: where the variant comes from. */
  context?: ReactNode;
  /** Shown under the title: what the page adds (the server's check, marks). */
  toolbar?: ReactNode;
}

function loadingsOf(a: AnalysisJson): { id: string; label: string }[] {
  const src = (r: unknown) => (r as { source?: string }).source;
  return [
    ...Object.entries(a.results).map(([id, r]) => ({ id, label: src(r) ? `${id} — ${src(r)}` : id })),
    ...Object.keys(a.cases).map((id) => ({ id, label: `${id} (case alone)` })),
  ];
}

export function VariantDetail({ model, analysis, renderDrawing, context, toolbar }: VariantDetailProps) {
  const loadings = useMemo(() => loadingsOf(analysis), [analysis]);
  const [loading, setLoading] = useState<string | undefined>(loadings[0]?.id);
  const [cut, setCut] = useState<string[]>([]);
  const [shown, setShown] = useState<{ index: number; h: Highlight }>();
  const rows = useMemo(() => memberRows(model, analysis, loading), [model, analysis, loading]);
  const probe = useMemo(() => (cut.length && loading ? probeCut(model, loading, cut) : undefined), [model, loading, cut]);
  const toggle = (id: string) => setCut((c) => (c.includes(id) ? c.filter((m) => m !== id) : [...c, id]));
  const stable = analysis.classification.status !== 'unstable';

  return (
    <div className="flex flex-col gap-3">
      <header className="flex flex-wrap items-end gap-x-6 gap-y-2">
        <div className="min-w-0 flex-1">
          {context && <div className="text-xs text-ink-3">{context}</div>}
          <h1 className="m-0 text-lg font-semibold text-ink">{model.name}</h1>
          {model.description && <p className="m-0 max-w-4xl text-xs text-ink-2">{model.description}</p>}
        </div>
        {loadings.length > 0 && (
          <label className="flex items-center gap-2 text-xs text-ink-2">
            Loading
            <select value={loading} onChange={(e) => setLoading(e.target.value)} className="num rounded border border-rule-strong bg-sheet px-1.5 py-1 text-xs text-ink">
              {loadings.map((l) => <option key={l.id} value={l.id}>{l.label}</option>)}
            </select>
          </label>
        )}
      </header>
      {toolbar}
      <div className="grid grid-cols-1 gap-3 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <ErrorBoundary what="the drawing">
          {renderDrawing({
            loading, selectedMembers: cut, onMemberActivate: toggle,
            highlight: shown?.h, freeBody: probe?.freeBody,
          })}
        </ErrorBoundary>
        <div className="flex flex-col gap-3">
          <VerdictPanel analysis={analysis} loading={loading} />
          <FindingsList findings={analysis.classification.findings} shown={shown?.index}
            onShow={(index, h) => setShown(index === undefined || !h ? undefined : { index, h })} />
        </div>
      </div>
      <div className="grid grid-cols-1 gap-3 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <MemberTable rows={rows} units={analysis.units} cut={cut} onToggleCut={toggle} />
        <div className="flex flex-col gap-3">
          <SectionProbe cut={cut} result={probe} forceUnit={analysis.units.force} onClear={() => setCut([])} />
          {!stable && <p className="m-0 text-xs text-ink-2">No forces while the frame is a mechanism: fix the findings first.</p>}
        </div>
      </div>
      <CautionLine more={analysis.cautions} />
    </div>
  );
}
