/**
 * The critical point of a mixture of given composition z: the criteria of R. A. Heidemann and
 * A. M. Khalil, "The calculation of critical points", AIChE J. 26 (1980) 769-779, in the form of
 * M. L. Michelsen, "Calculation of critical points and phase boundaries in the critical region",
 * Fluid Phase Equilibria 16 (1984) 57-76:
 *   1. the matrix B_ij = sqrt(z_i z_j) (d ln f_i / d n_j)_{T,V} = delta_ij + sqrt(z_i z_j) n F_ij
 *      (F = A_res/RT) has a zero smallest eigenvalue lambda(T, V) (the spinodal);
 *   2. the cubic form C = sum_ijk (d3 A/RT / dn_i dn_j dn_k) dn_i dn_j dn_k along its eigenvector
 *      (dn_i = sqrt(z_i) u_i) vanishes. C is the second derivative in s of
 *      sum_i dn_i ln f_i(T, V, z + s dn), taken by a central difference (Michelsen 1984, eq. 19).
 * n F_ij at constant T and V is recovered from the (T, P) derivatives of state/fugacity.ts:
 *   n F_ij = n (d ln phi_i / dn_j)_{T,P} - 1 - v_i v_j (dP/dV)_{T,n} / RT.
 * Nested one-dimensional solves (Brent): for a density rho, T*(rho) is the highest temperature
 * where lambda = 0 (lambda > 0 above it); then C(rho) at T*(rho) is brought to zero in ln rho,
 * bracketed by a scan outward from the pseudo-critical density (Kay's rule or the model's own);
 * the scan stops in a direction at the first density whose spinodal pressure is not positive (a
 * sign change of C there is no physical critical point) and the result must have P > 0.
 * The point found is not tested for global stability (a critical point inside a three-phase
 * region would be metastable).
 */
import { PhaseUnavailableError, SolverError, type ResultWarning } from "../../errors.js";
import { R as R_CODATA } from "../../constants.js";
import { pressureFromResidual } from "../../eos/residualRelations.js";
import type { ModelInfo, ResidualModel } from "../../eos/types.js";
import { findRootBrent } from "../../numerics/brent.js";
import { symmetricEigen } from "../../numerics/symmetricEigen.js";
import { checkComposition } from "../../state/checkInputs.js";
import { fugacityDerivatives } from "../../state/fugacity.js";
import { dPdRho } from "../../state/properties.js";
import { requirePositive } from "../../validate.js";

/** Options of {@link mixtureCriticalPoint}. */
export interface MixtureCriticalOptions {
  /** Starting density, mol/m3. Default the model's pseudo-critical density of z. */
  densityGuessMolPerM3?: number;
  /**
   * Temperature above which the search for the spinodal starts, K (lambda must be positive
   * there). Default 2.5 x the pseudo-critical temperature.
   */
  temperatureCeilingK?: number;
  /** Step of the outward scan for a sign change of the cubic form, in ln rho. Default 0.08. */
  scanStep?: number;
}

/** A mixture critical point. */
export interface MixtureCriticalPoint {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityMolPerM3: number;
  /** Feed composition. */
  readonly z: readonly number[];
  /** Smallest eigenvalue of B and the cubic form at the result (both ~0). */
  readonly residual: { readonly eigenvalue: number; readonly cubicForm: number };
  readonly method: string;
  readonly model: ModelInfo;
  readonly warnings: readonly ResultWarning[];
}

const METHOD =
  "Heidemann-Khalil criteria (AIChE J. 26 (1980) 769-779) as formulated by Michelsen (Fluid Phase Equilib. 16 (1984) 57-76)";

interface Spinodal {
  lambda: number;
  u: number[];
}

/** Smallest eigenvalue of B and its eigenvector at (T, rho), over the present components. */
function smallestEigen(
  model: ResidualModel,
  T: number,
  rho: number,
  z: readonly number[],
  present: readonly number[],
): Spinodal {
  const Rg = model.gasConstant ?? R_CODATA;
  const d = fugacityDerivatives(model, T, rho, z);
  const r = model.residual(T, rho, z, {});
  const dPdV = -rho * rho * dPdRho(T, r, Rg);
  const RT = Rg * T;
  const v = d.partialMolarVolume;
  const B = present.map((i) =>
    present.map((j) => {
      const nFij = d.dLnPhiDn[i][j] - 1 - (v[i] * v[j] * dPdV) / RT;
      return (i === j ? 1 : 0) + Math.sqrt(z[i] * z[j]) * nFij;
    }),
  );
  const e = symmetricEigen(B);
  return { lambda: e.values[0], u: e.vectors[0] };
}

/** sum_i dn_i ln f_i(T, V, n) up to terms linear in n (they vanish in the second difference). */
function directionalLnF(
  model: ResidualModel,
  T: number,
  volume: number,
  n: readonly number[],
  dn: readonly number[],
): number {
  let total = 0;
  for (const v of n) total += v;
  const x = n.map((v) => v / total);
  const dnA = model.residual(T, total / volume, x, { composition: true }).dnA;
  if (dnA === undefined) {
    throw new PhaseUnavailableError(
      `${model.info.name} does not provide composition derivatives (dnA): mixture critical points need them`,
    );
  }
  let g = 0;
  for (let i = 0; i < n.length; i++) if (dn[i] !== 0) g += dn[i] * (Math.log(n[i]) + dnA[i]);
  return g;
}

/**
 * The critical point of the mixture z (mole fractions) of a model with composition derivatives.
 *
 * @example
 * ```ts
 * const c = mixtureCriticalPoint(fluid.model, [0.5, 0.5]);
 * c.temperatureK; c.pressurePa;
 * ```
 * @throws InputError for bad z or options; PhaseUnavailableError when no critical point is
 *   bracketed near the pseudo-critical density; SolverError when a solve fails.
 */
export function mixtureCriticalPoint(
  model: ResidualModel,
  z: readonly number[],
  options: MixtureCriticalOptions = {},
): MixtureCriticalPoint {
  const n = model.info.componentIds.length;
  checkComposition(z, n, "z");
  const present: number[] = [];
  for (let i = 0; i < n; i++) if (z[i] > 0) present.push(i);
  const pc = model.pseudoCritical?.(z);
  const rho0 = requirePositive(
    "options.densityGuessMolPerM3",
    options.densityGuessMolPerM3 ?? pc?.densityMolPerM3 ?? NaN,
    "mol/m3",
  );
  const ceiling = requirePositive(
    "options.temperatureCeilingK",
    options.temperatureCeilingK ?? 2.5 * (pc?.temperatureK ?? NaN),
    "K",
  );
  const maxRho = model.maxDensity(ceiling, z);
  const scan = requirePositive("options.scanStep", options.scanStep ?? 0.08, "-");

  // T*(rho): the highest temperature with lambda = 0 below the ceiling
  let lastT = ceiling;
  const spinodalT = (rho: number): number | undefined => {
    const lam = (T: number): number => smallestEigen(model, T, rho, z, present).lambda;
    let hi = ceiling;
    if (!(lam(hi) > 0)) return undefined;
    // step down from just above the last spinodal temperature (neighbouring densities have
    // close ones) in 3 % steps, growing, until lambda turns negative
    let lo = Math.min(hi * 0.97, lastT * 1.01);
    let factor = 0.97;
    let k = 0;
    while (lam(lo) > 0) {
      hi = lo;
      lo *= factor;
      factor = Math.max(0.7, factor - 0.03);
      if (++k > 60 || lo < 1) return undefined;
    }
    const t = findRootBrent(lam, lo, hi, { tolerance: 1e-9 * hi }).value;
    lastT = t;
    return t;
  };
  const Rg = model.gasConstant ?? R_CODATA;
  // pressure on the spinodal at (T, rho): a critical point needs P > 0
  const pressureAt = (T: number, rho: number): number =>
    pressureFromResidual(T, rho, model.residual(T, rho, z, {}).aD, Rg);
  let lastSpinodalP = NaN;
  const cubicAt = (lnRho: number): number => {
    const rho = Math.exp(lnRho);
    const T = spinodalT(rho);
    if (T === undefined) throw new PhaseUnavailableError(`no spinodal at rho = ${rho} mol/m3`);
    lastSpinodalP = pressureAt(T, rho);
    const { u } = smallestEigen(model, T, rho, z, present);
    const dn = new Array<number>(n).fill(0);
    present.forEach((i, k) => (dn[i] = Math.sqrt(z[i]) * u[k]));
    const V = 1 / rho;
    const h = 1e-4;
    const g = (s: number): number =>
      directionalLnF(
        model,
        T,
        V,
        z.map((zi, i) => zi + s * dn[i]),
        dn,
      );
    return (g(h) - 2 * g(0) + g(-h)) / (h * h);
  };

  // bracket C(ln rho) = 0 outward from the guess
  const l0 = Math.log(rho0);
  let bracket: [number, number] | undefined;
  let cPrev: number | undefined;
  try {
    cPrev = cubicAt(l0);
  } catch (e) {
    if (!(e instanceof PhaseUnavailableError || e instanceof SolverError)) throw e;
  }
  const tried: number[] = [rho0];
  if (cPrev !== undefined) {
    for (const dir of [1, -1]) {
      let lPrev = l0;
      let c0 = cPrev;
      lastT = ceiling;
      for (let k = 1; k <= Math.ceil(1.1 / scan) && bracket === undefined; k++) {
        const l = l0 + dir * scan * k;
        if (Math.exp(l) >= maxRho) break;
        let c: number;
        try {
          c = cubicAt(l);
        } catch (e) {
          if (!(e instanceof PhaseUnavailableError || e instanceof SolverError)) throw e;
          break;
        }
        tried.push(Math.exp(l));
        // beyond the first density whose spinodal pressure is not positive the scan stops in
        // this direction: a sign change of C out there is no physical critical point (it gave
        // P < -90 MPa near 130 K for ethane/n-heptane), and the other direction is tried
        if (!(lastSpinodalP > 0)) break;
        if (c * c0 <= 0) bracket = dir > 0 ? [lPrev, l] : [l, lPrev];
        lPrev = l;
        c0 = c;
      }
      if (bracket !== undefined) break;
    }
  }
  if (bracket === undefined) {
    throw new PhaseUnavailableError(
      `no mixture critical point bracketed for z = [${z.map((v) => v.toPrecision(4)).join(", ")}] with ${model.info.name}: the cubic form kept its sign at densities ${tried.map((r) => r.toPrecision(4)).join(", ")} mol/m3 (on the spinodal below ${ceiling.toPrecision(5)} K)`,
    );
  }
  lastT = ceiling;
  const root = findRootBrent(cubicAt, bracket[0], bracket[1], { tolerance: 1e-10 });
  const rho = Math.exp(root.value);
  lastT = ceiling;
  const T = spinodalT(rho);
  if (T === undefined) {
    throw new SolverError(METHOD, `the spinodal was lost at the converged density ${rho} mol/m3`);
  }
  const P = pressureAt(T, rho);
  const eig = smallestEigen(model, T, rho, z, present).lambda;
  const cubic = cubicAt(root.value);
  if (!(Math.abs(eig) < 1e-8 && P > 0)) {
    throw new SolverError(
      METHOD,
      `the result does not meet the criteria: smallest eigenvalue ${eig}, P = ${P} Pa at T = ${T} K, rho = ${rho} mol/m3`,
    );
  }
  return {
    temperatureK: T,
    pressurePa: P,
    densityMolPerM3: rho,
    z: z.slice(),
    residual: { eigenvalue: eig, cubicForm: cubic },
    method: METHOD,
    model: model.info,
    warnings: [],
  };
}
