/**
 * "Did you mean" for misspelt names in a study.
 */

/** ", did you mean 'x'?" for the closest candidate within a small edit distance, else "". */
export function suggest(name: string, candidates: readonly string[]): string {
  const allowed = name.length <= 2 ? 0 : name.length <= 5 ? 1 : 2;
  let best = '';
  let bestDistance = allowed + 1;
  for (const c of candidates) {
    const d = editDistance(name.toLowerCase(), c.toLowerCase());
    if (d < bestDistance) [best, bestDistance] = [c, d];
  }
  return best ? `; did you mean '${best}'?` : '';
}

/** Levenshtein distance with adjacent transpositions counted as one edit. */
function editDistance(a: string, b: string): number {
  const d: number[][] = Array.from({ length: a.length + 1 }, (_, i) => [i]);
  for (let j = 1; j <= b.length; j++) d[0][j] = j;
  for (let i = 1; i <= a.length; i++) {
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      d[i][j] = Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1, d[i - 1][j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) d[i][j] = Math.min(d[i][j], d[i - 2][j - 2] + 1);
    }
  }
  return d[a.length][b.length];
}
