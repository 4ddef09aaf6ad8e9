/**
 * The truss at true proportions (SVG units are model units, y up): members coloured and dashed
 * by force sign, widths by |force|, supports, loads, optional joint labels, a hover / focus card
 * per member, the deflected shape to scale, and for an unstable frame its mechanism animated with
 * the unbraced panels shaded and over-braced members marked. Exports SVG and PNG.
 */
import { useId, useMemo, useRef, useState } from 'react';
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';
import { buildScene } from '../lib/scene';
import { DEFAULT_PERCENT, MODE_AMPLITUDE, shifted, unitOf, viewBoxOf } from '../lib/layout';
import type { DrawingScale } from '../lib/common-scale';
import { PALETTE } from '../lib/palette';
import { downloadBlob, fileNameOf, serializeSvg, svgToPng } from '../lib/export-image';
import { useReducedMotion } from '../hooks/use-reduced-motion';
import { useOscillation } from '../hooks/use-oscillation';
import { MemberLayer } from './member-layer';
import { SupportGlyph } from './support-glyph';
import { LoadArrows } from './load-arrows';
import { MemberTooltip } from './member-tooltip';
import { DrawingControls } from './drawing-controls';
import { DrawingLegend } from './drawing-legend';
import { DrawingDefs, ForceLabels, FrameLines, JointHalos, Joints, PanelShading } from './frame-overlays';

export interface TrussDrawingProps {
  model: Model;
  /** The analysis JSON of this model (as `panelpoint analyze --json` prints it). */
  analysis?: AnalysisJson;
  /** Combination or load case id; default the first result. */
  loading?: string;
  /** Members picked for a cut: drawn with cut marks. */
  selectedMembers?: readonly string[];
  /** Click / Enter on a member. Without it, members are only inspected. */
  onMemberActivate?: (id: string) => void;
  /** What a finding points at. */
  highlight?: { members?: readonly string[]; joints?: readonly string[] };
  /** Joints of a section's free body. */
  freeBody?: readonly string[];
  initialJointLabels?: boolean;
  /**
   * One scale shared with other drawings (from `commonScale`): the same view box and glyph size,
   * so drawings of equal width show metres at the same length. Without it the drawing fits itself.
   */
  scale?: DrawingScale;
}

export function TrussDrawing(props: TrussDrawingProps) {
  const { model, analysis, loading } = props;
  const scene = useMemo(() => buildScene(model, analysis, loading), [model, analysis, loading]);
  const u = props.scale?.u ?? unitOf(scene.extent);
  const reducedMotion = useReducedMotion();
  const small = scene.members.length <= 40;
  const [labels, setLabels] = useState(props.initialJointLabels ?? small);
  const [values, setValues] = useState(small);
  const [percent, setPercent] = useState(DEFAULT_PERCENT);
  const [modeIndex, setModeIndex] = useState(0);
  const [playing, setPlaying] = useState(!reducedMotion);
  const [hover, setHover] = useState<string>();
  const [focus, setFocus] = useState<string>();
  const [active, setActive] = useState(0);
  const [exportNote, setExportNote] = useState('');
  const svgRef = useRef<SVGSVGElement>(null);
  const id = useId();

  const mode = scene.modes[Math.min(modeIndex, scene.modes.length - 1)];
  const phase = useOscillation(playing && !!mode, 2600, reducedMotion ? 1 : 0);
  const amp = MODE_AMPLITUDE * scene.span;
  const pos = shifted(scene.nodes, mode, amp * phase);
  const factor = scene.maxDisp > 0 ? ((percent / 100) * scene.span) / scene.maxDisp : 0;
  const deflected = scene.displacements && factor > 0 ? shifted(scene.nodes, scene.displacements, factor) : undefined;
  const reachFactor = scene.maxDisp > 0 ? ((Math.max(percent, DEFAULT_PERCENT) / 100) * scene.span) / scene.maxDisp : 0;
  const fixedBox = props.scale?.box;
  const viewBox = useMemo(() => {
    if (fixedBox) return fixedBox;
    const shapes: ReturnType<typeof shifted>[] = [];
    if (mode) for (const f of [amp, -amp]) shapes.push(shifted(scene.nodes, mode, f));
    if (scene.displacements && reachFactor > 0) shapes.push(shifted(scene.nodes, scene.displacements, reachFactor));
    return viewBoxOf(scene, u, shapes);
  }, [fixedBox, scene, u, mode, amp, reachFactor]);

  const selected = useMemo(() => new Set(props.selectedMembers ?? []), [props.selectedMembers]);
  const highlighted = useMemo(() => new Set(props.highlight?.members ?? []), [props.highlight]);
  const pointed = hover ?? focus;
  const pointedMember = scene.members.find((m) => m.id === pointed);
  const note = pointedMember && scene.overBraced.has(pointedMember.id) ? 'in an over-braced region' : undefined;

  const onExport = async (kind: 'svg' | 'png') => {
    if (!svgRef.current) return;
    try {
      const { text, width, height } = serializeSvg(svgRef.current);
      const blob = kind === 'svg' ? new Blob([text], { type: 'image/svg+xml' }) : await svgToPng(text, width, height);
      downloadBlob(blob, fileNameOf(model.name, kind));
      setExportNote(`Exported ${kind.toUpperCase()} (${width} × ${height} px).`);
    } catch (err) {
      setExportNote(err instanceof Error ? err.message : 'Export failed.');
    }
  };

  const navigate = (i: number) => {
    setActive(i);
    svgRef.current?.querySelector<SVGGElement>(`[data-member-index="${i}"]`)?.focus();
  };

  const title = `${model.name}${scene.loading ? `, ${scene.loading.id}` : ''}`;
  return (
    <figure className="m-0 flex flex-col self-start rounded border border-rule bg-sheet" aria-labelledby={`${id}-cap`}>
      <DrawingControls
        labels={labels} onLabels={setLabels} values={values} onValues={setValues} hasForces={scene.peak > 0}
        deflection={scene.displacements && scene.maxDisp > 0 ? { percent, onPercent: setPercent, factor, max: scene.maxDisp, node: scene.maxDispNode, unit: scene.units.length } : undefined}
        mechanism={scene.modes.length ? { playing, onPlaying: setPlaying, mode: modeIndex, modes: scene.modes.length, onMode: setModeIndex, reducedMotion } : undefined}
        onExport={onExport}
      />
      <svg
        ref={svgRef}
        viewBox={viewBox.map((v) => Number(v.toPrecision(8))).join(' ')}
        preserveAspectRatio="xMidYMid meet"
        data-extent={[scene.extent.x0, scene.extent.y0, scene.extent.w, scene.extent.h].join(' ')}
        data-shared-scale={fixedBox ? 'true' : undefined}
        role="group"
        aria-labelledby={`${id}-title`}
        aria-describedby={`${id}-help`}
        className="block h-auto max-h-[68vh] w-full"
        style={{ aspectRatio: `${viewBox[2]} / ${viewBox[3]}` }}
      >
        <title id={`${id}-title`}>{`Truss drawing: ${title}`}</title>
        <DrawingDefs u={u} />
        <PanelShading scene={scene} pos={pos} u={u} />
        {props.freeBody && <JointHalos joints={props.freeBody} pos={pos} u={u} color={PALETTE.freeBody} layer="free-body" />}
        {props.highlight?.joints && <JointHalos joints={props.highlight.joints} pos={pos} u={u} color={PALETTE.highlight} layer="highlight" />}
        {mode && <FrameLines scene={scene} pos={scene.nodes} u={u} color={PALETTE.ghost} width={1} dash={`${3 * u} ${2 * u}`} layer="rest-shape" />}
        <MemberLayer scene={scene} pos={pos} u={u} selected={selected} highlighted={highlighted} pointed={pointed}
          activeIndex={active} onActivate={props.onMemberActivate} onNavigate={navigate}
          onPoint={(m, how, i) => {
            (how === 'hover' ? setHover : setFocus)(m);
            if (m && how === 'focus') setActive(i);
          }} />
        {deflected && <FrameLines scene={scene} pos={deflected} u={u} color={PALETTE.deflected} width={1.1} opacity={0.8} layer="deflected" />}
        <g data-layer="supports">
          {scene.supports.map((s) => {
            const at = scene.nodes.get(s.node);
            return at && <SupportGlyph key={s.node} support={s} at={at} u={u} />;
          })}
        </g>
        <LoadArrows scene={scene} pos={pos} u={u} showValues={values || scene.peak === 0} />
        <Joints scene={scene} pos={pos} u={u} labels={labels} />
        {values && scene.peak > 0 && <ForceLabels scene={scene} pos={pos} u={u} />}
        {pointedMember && <MemberTooltip member={pointedMember} scene={scene} pos={pos} u={u} viewBox={viewBox} extra={note} />}
      </svg>
      <p id={`${id}-help`} className="sr-only">
        Tab into the drawing to reach the members; arrow keys move between them{props.onMemberActivate ? ', Enter or Space picks a member for a cut' : ''}.
      </p>
      <DrawingLegend scene={scene} deflected={!!deflected} animated={!!mode} cut={selected.size > 0} />
      <figcaption id={`${id}-cap`} className="flex flex-wrap gap-x-3 border-t border-rule px-3 py-1 text-xs text-ink-3">
        <span>{title}</span>
        <span>true proportions, lengths in {scene.units.length}, forces in {scene.units.force}</span>
        <span role="status" className="ml-auto">{exportNote}</span>
      </figcaption>
    </figure>
  );
}
