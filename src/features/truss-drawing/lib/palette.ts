/**
 * Colours of the truss drawing, as plain values so an exported SVG carries them inline.
 * Force sign is told by line style as well as colour: tension solid, compression dashed.
 */
export const PALETTE = {
  tension: '#1d4f91',
  compression: '#c0581c',
  zero: '#9aa0a4',
  neutral: '#2b3338',
  ghost: '#b9b4aa',
  deflected: '#2f7d5b',
  unbraced: '#b3243f',
  overBraced: '#7b4bb3',
  highlight: '#e0a100',
  focus: '#0d7a6a',
  freeBody: '#0d7a6a',
  load: '#3a4249',
  support: '#4a545b',
  ink: '#1c2226',
  paper: '#fcfcfa',
  label: '#4a545b',
} as const;

export const MONO = "'JetBrains Mono', ui-monospace, Menlo, Consolas, monospace";
