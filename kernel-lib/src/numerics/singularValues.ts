/**
 * Singular values of a small square matrix by one-sided Jacobi rotations (Hestenes, "Inversion of
 * matrices by biorthogonalization and related results", J. SIAM 6 (1958) 51; Golub & Van Loan,
 * Matrix Computations, 4th ed., 2013, §8.6.3; Demmel & Veselic, SIAM J. Matrix Anal. Appl. 13
 * (1992) 1204, for its relative accuracy). Columns are rotated pairwise until every pair is
 * orthogonal to `tolerance`; the singular values are the final column norms (unsorted).
 */
/**
 * Singular values (unsorted) of a square matrix given by rows.
 * @param tolerance relative orthogonality of a column pair under which it is not rotated. Default 1e-15.
 * @param maxSweeps most sweeps over all column pairs. Default 60.
 */
export function singularValues(
  matrix: readonly (readonly number[])[],
  tolerance = 1e-15,
  maxSweeps = 60,
): number[] {
  const n = matrix.length;
  const u = matrix.map((r) => r.slice());
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    let rotated = false;
    for (let p = 0; p < n - 1; p++) {
      for (let q = p + 1; q < n; q++) {
        let alpha = 0;
        let beta = 0;
        let gamma = 0;
        for (let i = 0; i < n; i++) {
          const up = u[i][p];
          const uq = u[i][q];
          alpha += up * up;
          beta += uq * uq;
          gamma += up * uq;
        }
        if (Math.abs(gamma) <= tolerance * Math.sqrt(alpha * beta) || gamma === 0) continue;
        rotated = true;
        const zeta = (beta - alpha) / (2 * gamma);
        const t = Math.sign(zeta || 1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
        const c = 1 / Math.sqrt(1 + t * t);
        const s = c * t;
        for (let i = 0; i < n; i++) {
          const row = u[i] as number[];
          const up = row[p];
          const uq = row[q];
          row[p] = c * up - s * uq;
          row[q] = s * up + c * uq;
        }
      }
    }
    if (!rotated) break;
  }
  const out: number[] = [];
  for (let j = 0; j < n; j++) {
    let norm = 0;
    for (let i = 0; i < n; i++) norm = Math.hypot(norm, u[i][j]);
    out.push(norm);
  }
  return out;
}
