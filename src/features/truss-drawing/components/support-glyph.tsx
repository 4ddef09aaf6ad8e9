/** Support symbols: pin (triangle on hatched ground), roller (triangle on two wheels), turned to the reaction direction. */
import { PALETTE } from '../lib/palette';
import type { Pt, SceneSupport } from '../lib/scene';
import { sx, sy } from '../lib/layout';

interface Props {
  support: SceneSupport;
  at: Pt;
  /** Model units per nominal pixel. */
  u: number;
}

function hatch(y: number): string {
  const out: string[] = [];
  for (let x = -12; x <= 12; x += 6) out.push(`M${x} ${y}L${x - 5} ${y + 5}`);
  return out.join('');
}

export function SupportGlyph({ support, at, u }: Props) {
  const pin = support.kind === 'pin';
  const ground = pin ? 15 : 17;
  // Drawn for a reaction straight up (90°); turned on screen by angle − 90, counter-clockwise.
  const turn = -(support.angle - 90);
  return (
    <g
      data-support={support.node}
      data-kind={support.kind}
      transform={`translate(${sx(at)} ${sy(at)}) rotate(${turn}) scale(${u})`}
      stroke={PALETTE.support}
      strokeWidth={1.2}
      strokeLinejoin="round"
    >
      <title>{`${pin ? 'Pin' : `Roller (reaction at ${support.angle}°)`} at ${support.node}`}</title>
      {pin ? <path d="M0 0L-9 15L9 15Z" fill={PALETTE.paper} /> : <path d="M0 0L-8 11L8 11Z" fill={PALETTE.paper} />}
      {!pin && (
        <>
          <circle cx={-4.5} cy={14} r={2.8} fill={PALETTE.paper} />
          <circle cx={4.5} cy={14} r={2.8} fill={PALETTE.paper} />
        </>
      )}
      <path d={`M-14 ${ground}L14 ${ground}`} strokeWidth={1.6} />
      <path d={hatch(ground)} strokeWidth={0.8} />
    </g>
  );
}
