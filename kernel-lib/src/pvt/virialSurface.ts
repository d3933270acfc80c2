/**
 * A global P-V-T surface: a virial-type expansion in density with temperature-dependent
 * coefficients (the form of a truncated virial equation, Mason & Spurling, The Virial Equation of
 * State, 1969, with each coefficient a polynomial in inverse temperature, as in the Tsonopoulos-type
 * B(T) correlations):
 *
 *     Z - 1 = sum_{i=1..nDensity} delta^i sum_{j=0..nTemperature-1} b_ij tau^j,
 *     delta = rho / rhoScale,  tau = temperatureScale / T.
 *
 * Linear in b_ij, so it is fitted by weighted linear least squares, and its residual Helmholtz
 * energy follows in closed form by integrating (Z - 1)/rho from zero density:
 *
 *     alpha_r = sum_ij b_ij delta^i tau^j / i,
 *
 * with the reduced derivatives of eos/types.ts (aD = Z - 1, aT = -sum j b_ij delta^i tau^j / i,
 * ...). Every departure is a linear function of the coefficients, so its fit uncertainty is exact
 * by linear propagation through the coefficient covariance (JCGM 100:2008, GUM, eq. 13).
 * Valid only inside the fitted (T, rho) range; a virial series converges poorly at liquid densities.
 */
import type { ResidualDerivatives } from "../eos/types.js";

/** A fitted virial-type surface (see the header): shape, scales, coefficients, covariance, range. */
export interface VirialSurface {
  readonly densityTerms: number;
  readonly temperatureTerms: number;
  /** rho scale, mol/m3. */
  readonly densityScale: number;
  /** T scale, K. */
  readonly temperatureScale: number;
  /** b_ij flattened in the order of `surfaceBasis` (i outer, j inner). */
  readonly coefficients: readonly number[];
  /** Covariance of the coefficients (already scaled for the observed scatter when that was larger). */
  readonly covariance: readonly (readonly number[])[];
  /** Fitted range, for validity warnings. */
  readonly range: { minTemperatureK: number; maxTemperatureK: number; maxDensityMolPerM3: number };
}

/** Which reduced quantity a basis row is built for. */
export type SurfaceQuantity = "a" | "aD" | "aDD" | "aT" | "aTT" | "aDT";

/**
 * Basis values of one reduced quantity at (T, rho): the quantity equals the dot product of this
 * row with the coefficients.
 */
export function surfaceBasis(
  s: Pick<VirialSurface, "densityTerms" | "temperatureTerms" | "densityScale" | "temperatureScale">,
  quantity: SurfaceQuantity,
  temperatureK: number,
  densityMolPerM3: number,
): number[] {
  const delta = densityMolPerM3 / s.densityScale;
  const tau = s.temperatureScale / temperatureK;
  const row: number[] = [];
  let di = 1;
  for (let i = 1; i <= s.densityTerms; i++) {
    di *= delta;
    let tj = 1;
    for (let j = 0; j < s.temperatureTerms; j++) {
      const base = di * tj;
      let f: number;
      switch (quantity) {
        case "a":
          f = base / i;
          break;
        case "aD":
          f = base;
          break;
        case "aDD":
          f = base * (i - 1);
          break;
        case "aT":
          f = (-j * base) / i;
          break;
        case "aTT":
          f = (j * (j + 1) * base) / i;
          break;
        case "aDT":
          f = -j * base;
          break;
      }
      row.push(f);
      tj *= tau;
    }
  }
  return row;
}

/** Reduced residual Helmholtz derivatives of the surface (eos/types.ts convention). */
export function surfaceDerivatives(
  s: VirialSurface,
  temperatureK: number,
  densityMolPerM3: number,
): ResidualDerivatives {
  // The six rows of surfaceBasis dotted with the coefficients in one pass (same terms, same order
  // of summation), without allocating the rows.
  const delta = densityMolPerM3 / s.densityScale;
  const tau = s.temperatureScale / temperatureK;
  const c = s.coefficients;
  let a = 0;
  let aD = 0;
  let aDD = 0;
  let aT = 0;
  let aTT = 0;
  let aDT = 0;
  let k = 0;
  let di = 1;
  for (let i = 1; i <= s.densityTerms; i++) {
    di *= delta;
    let tj = 1;
    for (let j = 0; j < s.temperatureTerms; j++) {
      const base = di * tj;
      const ck = c[k++];
      a += (base / i) * ck;
      aD += base * ck;
      aDD += base * (i - 1) * ck;
      aT += ((-j * base) / i) * ck;
      aTT += ((j * (j + 1) * base) / i) * ck;
      aDT += -j * base * ck;
      tj *= tau;
    }
  }
  return { a, aD, aDD, aT, aTT, aDT };
}

/** Variance of a linear combination g . b of the coefficients. */
export function surfaceVariance(s: VirialSurface, gradient: readonly number[]): number {
  let v = 0;
  for (let i = 0; i < gradient.length; i++) {
    const row = s.covariance[i] as readonly number[];
    for (let j = 0; j < gradient.length; j++) v += gradient[i] * row[j] * gradient[j];
  }
  return Math.max(v, 0);
}

/** k-th virial coefficient of the surface at T: sum_j b_kj tau^j / rhoScale^k (m3/mol for k = 1). */
export function virialFromSurface(s: VirialSurface, temperatureK: number, k: number): number {
  const tau = s.temperatureScale / temperatureK;
  let v = 0;
  for (let j = 0; j < s.temperatureTerms; j++)
    v += s.coefficients[(k - 1) * s.temperatureTerms + j] * tau ** j;
  return v / s.densityScale ** k;
}
