/** Words for a member: used by its tooltip and its accessible name. */
import { fmt, fmtSigned } from '@/lib/format';
import type { SceneMember } from './scene';

const SIGN_WORD = { tension: 'tension (T)', compression: 'compression (C)', zero: 'zero force', unknown: '' } as const;

/** Lines: id and joints; force with unit and T/C; length with unit. */
export function describeMember(m: SceneMember, units: { length: string; force: string }): string[] {
  const force = m.force === undefined
    ? 'no force: the frame is unstable'
    : `${fmtSigned(m.force)} ${units.force} ${SIGN_WORD[m.sign]}`.trim();
  return [`Member ${m.id} (${m.from}–${m.to})`, force, `length ${fmt(m.length)} ${units.length}`];
}
