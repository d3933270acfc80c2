/**
 * Optimal-string-alignment edit distance (Levenshtein distance plus adjacent transpositions),
 * Damerau, F.J. (1964), Commun. ACM 7(3), 171-176; dynamic programming over two rows.
 * Used to suggest the closest known names when a lookup fails.
 */
export function editDistance(a: string, b: string): number {
  const n = b.length;
  let prevPrev = new Array<number>(n + 1).fill(0);
  let prev = Array.from({ length: n + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const row = new Array<number>(n + 1);
    row[0] = i;
    for (let j = 1; j <= n; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(prev[j] + 1, row[j - 1] + 1, prev[j - 1] + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) {
        best = Math.min(best, prevPrev[j - 2] + 1);
      }
      row[j] = best;
    }
    prevPrev = prev;
    prev = row;
  }
  return prev[n];
}
