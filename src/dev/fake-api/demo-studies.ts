/**
 * The invented studies of the fake demo: the fictional Harrow Lane bus depot roof (Pratt trusses
 * sized in CHS, and a wide unsized search of more than 100,000 variants), and the fictional
 * Kestrel Brook footbridge. Same format as examples/studies.
 */
const loads = [
  { case: 'D', kind: 'area', value: '0.45 kPa', spacing: 6, chord: 'top', projection: 'length' },
  { case: 'D', kind: 'self-weight' },
  { case: 'S', kind: 'area', value: '0.75 kPa', spacing: 6, chord: 'top' },
  { case: 'W', kind: 'area', value: '-0.5 kPa', spacing: 6, chord: 'top' },
];

export const DEPOT_SIZED = {
  name: 'Harrow Lane depot roof, Pratt trusses sized in CHS',
  description: 'Invented demo: roof trusses of the fictional Harrow Lane bus depot at 6 m centres. Span, panels, depth and the end supports vary; every stable variant is sized from the CHS catalogue (AISC 360-16 LRFD, ASTM A500 Gr. C).',
  family: 'pratt',
  fixed: { rollerAngle: 0 },
  vary: {
    span: { from: 18, to: 30, step: 2 },
    panels: [6, 8, 10, 12, 14],
    depth: { from: 1.2, to: 3.6, step: 0.05 },
    supports: ['pin-roller', 'pin-pin', 'roller-roller', 'pin-inclined'],
  },
  where: ['span / depth <= 20'],
  loads,
  combinations: { preset: 'asce7-lrfd' },
  design: { code: 'aisc360-16-lrfd', material: 'a500-c-round', catalogue: 'chs', unbraced: { outOfPlane: { top: 3.0 } }, deflectionLimit: 240 },
  objective: { minimize: 'weight' },
};

export const DEPOT_WIDE = {
  name: 'Harrow Lane depot roof, wide search (unsized)',
  description: 'Invented demo: a fine grid over span, depth and panels for the fictional depot roof, forces and deflections only (no sizing).',
  family: 'pratt',
  vary: {
    span: { from: 12, to: 42, step: 0.5 },
    panels: [6, 8, 10, 12, 14, 16],
    depth: { from: 1.0, to: 4.0, step: 0.02 },
    supports: ['pin-roller', 'pin-pin'],
  },
  loads,
  combinations: { preset: 'asce7-lrfd' },
  objective: { minimize: 'maxAbsForce' },
};

export const FOOTBRIDGE = {
  name: 'Kestrel Brook footbridge, Warren with verticals',
  description: 'Invented demo: two parallel-chord trusses of the fictional Kestrel Brook footbridge, 18 m span.',
  family: 'warren-verticals',
  fixed: { span: 18 },
  vary: { panels: [6, 8, 10, 12], depth: { from: 1.2, to: 2.4, step: 0.1 }, supports: ['pin-roller', 'pin-pin'] },
  loads: [
    { case: 'D', kind: 'self-weight' },
    { case: 'L', kind: 'area', value: '5 kPa', spacing: 1.25, chord: 'bottom' },
  ],
  combinations: { preset: 'asce7-lrfd' },
  objective: { minimize: 'maxDisplacement' },
};
