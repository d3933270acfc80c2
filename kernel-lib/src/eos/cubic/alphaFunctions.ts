/**
 * Temperature functions of the cubic equations' attraction parameter, a_i(T) = a_c,i alpha_i(T).
 * Each is written as psi = sqrt(alpha) with its first and second temperature derivatives, because
 * the one-fluid rule combines sqrt(a_i a_j) = sqrt(a_c,i a_c,j) psi_i psi_j (so no square root of a
 * product is ever taken inside the hot loop).
 *
 * - constant: van der Waals (1873): alpha = 1.
 * - redlich-kwong: Redlich & Kwong, Chem. Rev. 44 (1949) 233: alpha = Tr^(-1/2).
 * - soave: Soave, Chem. Eng. Sci. 27 (1972) 1197, eq. 13: sqrt(alpha) = 1 + m (1 - sqrt(Tr)),
 *   with m = 0.480 + 1.574 w - 0.176 w^2 (eq. 17).
 * - peng-robinson-1976: Peng & Robinson, Ind. Eng. Chem. Fundam. 15 (1976) 59, eqs. 17-18:
 *   same form, m = 0.37464 + 1.54226 w - 0.26992 w^2.
 * - peng-robinson-1978: Robinson & Peng, GPA Research Report RR-28 (1978): for w > 0.49,
 *   m = 0.379642 + 1.48503 w - 0.164423 w^2 + 0.016666 w^3; the 1976 form otherwise.
 */

/** sqrt(alpha) and its derivatives with respect to T (1/K, 1/K^2) at one temperature. */
export interface PsiValues {
  psi: number;
  dPsi: number;
  d2Psi: number;
}

/** Which alpha function a cubic family uses. */
export type AlphaKind =
  "constant" | "redlich-kwong" | "soave" | "peng-robinson-1976" | "peng-robinson-1978";

/** Per-component coefficient of the Soave-type forms (m); 0 for the others. */
export function alphaSlope(kind: AlphaKind, acentricFactor: number): number {
  const w = acentricFactor;
  switch (kind) {
    case "soave":
      return 0.48 + 1.574 * w - 0.176 * w * w;
    case "peng-robinson-1976":
      return 0.37464 + 1.54226 * w - 0.26992 * w * w;
    case "peng-robinson-1978":
      return w > 0.49
        ? 0.379642 + 1.48503 * w - 0.164423 * w * w + 0.016666 * w * w * w
        : 0.37464 + 1.54226 * w - 0.26992 * w * w;
    default:
      return 0;
  }
}

/**
 * Writes psi = sqrt(alpha), d psi/dT and d2 psi/dT2 into `out` (no allocation: this runs inside
 * every state evaluation).
 *
 * @param m - the slope from {@link alphaSlope} (ignored by "constant" and "redlich-kwong").
 */
export function evaluatePsi(
  kind: AlphaKind,
  m: number,
  temperatureK: number,
  criticalTemperatureK: number,
  out: PsiValues,
): void {
  const T = temperatureK;
  const Tc = criticalTemperatureK;
  if (kind === "constant") {
    out.psi = 1;
    out.dPsi = 0;
    out.d2Psi = 0;
  } else if (kind === "redlich-kwong") {
    // psi = Tr^(-1/4)
    const tr = T / Tc;
    const psi = Math.pow(tr, -0.25);
    out.psi = psi;
    out.dPsi = (-0.25 * psi) / T;
    out.d2Psi = (0.3125 * psi) / (T * T);
  } else {
    // psi = 1 + m (1 - sqrt(T/Tc))
    const sq = Math.sqrt(T * Tc);
    out.psi = 1 + m * (1 - Math.sqrt(T / Tc));
    out.dPsi = -m / (2 * sq);
    out.d2Psi = m / (4 * T * sq);
  }
}
