/**
 * Model-order choice by the small-sample corrected Akaike information criterion (Hurvich & Tsai,
 * Biometrika 76 (1989) 297): AICc = -2 ln L + 2k + 2k(k+1)/(n-k-1). With stated standard
 * uncertainties -2 ln L = chi2 (up to a constant); with unit weights and unknown scale it is
 * n ln(RSS/n). A candidate needs n - k - 1 > 0.
 */
export function aicc(
  chiSquareOrRss: number,
  observations: number,
  coefficients: number,
  scaleKnown: boolean,
): number {
  const n = observations;
  const k = coefficients;
  if (!(n - k - 1 > 0)) return Number.POSITIVE_INFINITY;
  // Floor the RSS so noise-free data do not send the criterion to -Infinity (1e-300 relative).
  const fitTerm = scaleKnown ? chiSquareOrRss : n * Math.log(Math.max(chiSquareOrRss / n, 1e-300));
  return fitTerm + 2 * k + (2 * k * (k + 1)) / (n - k - 1);
}
