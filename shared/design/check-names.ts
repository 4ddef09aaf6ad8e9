/**
 * Member check ids (small integers, kept in typed arrays on the hot path) and their names with the
 * clause of each code.
 */
import type { DesignCode } from '../schemas/design';

/** Check ids. */
export const CHECK = {
  none: 0,
  tensionYield: 1,
  tensionRupture: 2,
  bucklingIn: 3,
  bucklingOut: 4,
  sectionCompression: 5,
  slenderTension: 6,
  slenderCompression: 7,
  wall: 8,
} as const;

/** A check id. */
export type CheckId = (typeof CHECK)[keyof typeof CHECK];

const AISC: readonly string[] = [
  'no check',
  'tension yielding, AISC 360-16 §D2(a)',
  'tensile rupture, AISC 360-16 §D2(b)',
  'flexural buckling in the truss plane, AISC 360-16 §E3',
  'flexural buckling out of the truss plane, AISC 360-16 §E3',
  'compression of the cross-section (not an AISC check)',
  'slenderness L/r of a tension member, AISC 360-16 §D1 user note',
  'slenderness Lc/r of a compression member, AISC 360-16 §E2 user note',
  'slender wall: local buckling not covered, AISC 360-16 Table B4.1a',
];

const EN: readonly string[] = [
  'no check',
  'plastic resistance Npl,Rd, EN 1993-1-1 §6.2.3(2)(a)',
  'ultimate resistance of the net section Nu,Rd, EN 1993-1-1 §6.2.3(2)(b)',
  'flexural buckling in the truss plane, EN 1993-1-1 §6.3.1',
  'flexural buckling out of the truss plane, EN 1993-1-1 §6.3.1',
  'compression resistance Nc,Rd, EN 1993-1-1 §6.2.4',
  'slenderness L/i of a tension member (project limit)',
  'slenderness Lcr/i of a compression member (project limit)',
  'class 4 wall: local buckling not covered, EN 1993-1-1 Table 5.2',
];

/** Name and clause of check `id` under `code`. */
export function checkName(code: DesignCode, id: number): string {
  return (code === 'en1993-1-1' ? EN : AISC)[id] ?? `check ${id}`;
}

/** Checks of a member in compression (their force is the largest compression). */
export function isCompressionCheck(id: number): boolean {
  return id === CHECK.bucklingIn || id === CHECK.bucklingOut || id === CHECK.sectionCompression || id === CHECK.slenderCompression || id === CHECK.wall;
}
