/**
 * Cautions shown beside every design result: in reports, JSON, sweep summaries and the web app.
 */

/** One-paragraph caution, kept short enough to print under a report. */
export const CAUTIONS: readonly string[] = [
  'Panelpoint is a preliminary study tool for plane pin-jointed trusses: linear elastic, small displacements, loads at joints.',
  'Not checked: connections, out-of-plane and lateral bracing, fatigue, vibration (footbridges), second-order effects and imperfections beyond the column curves.',
  'Results need review by a licensed engineer under the code that governs the project.',
];
