/**
 * Wald-Wolfowitz runs test on the signs of fit residuals (Wald & Wolfowitz, Ann. Math. Stat. 11
 * (1940) 147; normal approximation of the number of runs). Residuals ordered along the fitted
 * variable that change sign too rarely (z well below 0) reveal a systematic misfit: the model
 * order is too low, or the data contain a step (e.g. a phase change on an isochore).
 */
export interface RunsTestResult {
  /** Number of runs of equal sign. */
  runs: number;
  /** Expected number under randomness. */
  expected: number;
  /** Standardised statistic (runs - expected) / sd; NaN when fewer than 2 of either sign. */
  z: number;
}

/** Residuals must be given in the order of the fitted variable; zeros are skipped. */
export function runsTest(residuals: readonly number[]): RunsTestResult {
  const signs = residuals.filter((r) => r !== 0).map((r) => r > 0);
  const n1 = signs.filter((s) => s).length;
  const n2 = signs.length - n1;
  let runs = signs.length > 0 ? 1 : 0;
  for (let i = 1; i < signs.length; i++) if (signs[i] !== signs[i - 1]) runs++;
  const n = n1 + n2;
  const expected = n > 0 ? (2 * n1 * n2) / n + 1 : 0;
  if (n1 < 2 || n2 < 2) return { runs, expected, z: Number.NaN };
  const variance = (2 * n1 * n2 * (2 * n1 * n2 - n)) / (n * n * (n - 1));
  return { runs, expected, z: (runs - expected) / Math.sqrt(variance) };
}
