/**
 * Saturation (vapour-liquid equilibrium) of a pure fluid described by any ResidualModel: the two
 * densities rho_L > rho_V at which pressure and Gibbs energy are equal,
 *   P(T, rho_L) = P(T, rho_V),   g(T, rho_L) = g(T, rho_V).
 *
 * Method at given T:
 * 1. Starting values: the model's published ancillary equations when it has them (reference
 *    fluids; e.g. W. Wagner and A. Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993) for water);
 *    for models with closed-form density roots (cubics), Newton on the pressure with those roots
 *    (closedFormRootsRoute below); otherwise the spinodals of the isotherm: the first and last
 *    densities where (dP/drho)_T = 0, found by a density scan (or, near the critical point, from
 *    the least-stiffness density outward).
 * 2. Newton's method on (rho_L, rho_V) for the two conditions, scaled by RT; the Jacobian follows
 *    from d(g/RT)/d(rho) = (dP/drho)_T / (rho R T) (Gibbs-Duhem), as in Y. Akasaka, "A Reliable
 *    and Useful Method to Determine the Saturation State from Helmholtz Energy Equations of
 *    State", J. Therm. Sci. Tech. 3, 442-451 (2008), with steps limited to keep both densities
 *    positive and on their own side of the spinodals.
 * 3. If Newton fails from the ancillary start, the spinodal route is used: Brent's method on the
 *    pressure between the spinodal pressures, with each phase density found by Brent on its own
 *    stable branch, then Newton polishes the result.
 * At given P the temperature is found by Newton on ln P_sat(T) with the Clausius-Clapeyron slope
 * d(ln P)/dT = dh_vap / (T P (v_V - v_L)), safeguarded by a bracket.
 *
 * Enthalpy of vaporisation from alpha_r only (the ideal-gas part cancels at equal T):
 *   h_vap = R T [(aD - aT)_V - (aD - aT)_L],   s_vap = h_vap / T.
 */
import {
  InputError,
  OutOfRangeError,
  PhaseUnavailableError,
  SolverError,
  type ResultWarning,
} from "../errors.js";
import type { ResidualModel } from "../eos/types.js";
import { findRootBrent } from "../numerics/brent.js";
import { requireCount, requirePositive } from "../validate.js";
import { wilsonLnReducedVaporPressure } from "./wilson.js";
import { locateCriticalPoint, type CriticalPointResult } from "./criticalPoint.js";
import { gibbsAtDensityRT } from "../eos/residualRelations.js";
import {
  emptyIsothermPoint,
  gasConstantOf,
  gibbsAt,
  pressureAt,
  stiffnessAt,
  hasSaturationEstimate,
  isothermPoint,
  PURE,
  requirePure,
  type IsothermPoint,
} from "./pureFluid.js";

/** Options of {@link saturationAtTemperature} and {@link saturationAtPressure}. */
export interface SaturationOptions {
  /**
   * Convergence tolerance on both conditions: |P_L - P_V| / (rho_L R T) and |g_L - g_V| / RT
   * (dimensionless). Default 1e-12.
   */
  tolerance?: number;
  /** Maximum Newton iterations. Default 60. */
  maxIterations?: number;
  /** Starting densities (mol/m3); default from ancillaries or spinodals. */
  start?: { liquidDensityMolPerM3: number; vaporDensityMolPerM3: number };
  /**
   * Critical-point guess for models that offer none (no `pseudoCritical`, no published point),
   * e.g. a user's pressure-function model: T in K, density in mol/m3.
   */
  criticalGuess?: { temperatureK: number; densityMolPerM3: number };
  /**
   * For models that publish a validity range (reference fluids): solve even at temperatures
   * beyond the equation's extrapolation range instead of refusing. Default false.
   */
  allowOutsideRange?: boolean;
}

/** A saturation state. */
export interface SaturationResult {
  readonly temperatureK: number;
  /** Saturation (vapour) pressure, Pa. */
  readonly pressurePa: number;
  /** mol/m3 */
  readonly liquidDensityMolPerM3: number;
  /** mol/m3 */
  readonly vaporDensityMolPerM3: number;
  /** h_V - h_L, J/mol. */
  readonly enthalpyOfVaporizationJPerMol: number;
  /** s_V - s_L = h_vap / T, J/(mol K). */
  readonly entropyOfVaporizationJPerMolK: number;
  /** Residual enthalpy h_res/RT (same T and density) of each phase: aD - aT. */
  readonly residualEnthalpyRT: { readonly liquid: number; readonly vapor: number };
  /** Newton iterations (plus outer iterations at given P). */
  readonly iterations: number;
  /** Final |P_L - P_V| / (rho_L R T) and |g_L - g_V| / RT. */
  readonly residual: { readonly pressure: number; readonly gibbs: number };
  /**
   * How the start values were obtained: "ancillary equations" (published), "closed-form roots"
   * (Newton on the pressure with the model's own density roots), "spinodals" or "given".
   */
  readonly start: "ancillary equations" | "closed-form roots" | "spinodals" | "given";
  /** The model's critical point (from its own equations). */
  readonly critical: CriticalPointResult;
  readonly model: string;
  /** Below a published triple point, outside a published validity range, ... (empty when none). */
  readonly warnings: readonly ResultWarning[];
}

interface NewtonOutcome {
  rhoL: number;
  rhoV: number;
  iterations: number;
  resP: number;
  resG: number;
  converged: boolean;
}

/** Newton on (rho_L, rho_V); returns converged: false rather than throwing. */
function newtonSaturation(
  model: ResidualModel,
  T: number,
  Rg: number,
  rhoL0: number,
  rhoV0: number,
  tolerance: number,
  maxIterations: number,
  L: IsothermPoint,
  V: IsothermPoint,
): NewtonOutcome {
  let rhoL = rhoL0;
  let rhoV = rhoV0;
  const RT = Rg * T;
  let resP = Infinity;
  let resG = Infinity;
  for (let it = 0; it <= maxIterations; it++) {
    isothermPoint(model, T, rhoL, Rg, L);
    isothermPoint(model, T, rhoV, Rg, V);
    // F1 = (P_L - P_V) / RT (mol/m3), F2 = g_L/RT - g_V/RT
    const F1 = (L.pressurePa - V.pressurePa) / RT;
    const F2 = L.gibbsRT - V.gibbsRT;
    // Pressure residual in units of rho_L R T: the liquid pressure is a small difference of large
    // terms (rho R T (1 + aD) with 1 + aD near 0), so |P_L - P_V| / P cannot reach 1e-12 at low T.
    resP = Math.abs(F1) / rhoL;
    resG = Math.abs(F2);
    if (!Number.isFinite(F1) || !Number.isFinite(F2)) break;
    if (resP <= tolerance && resG <= tolerance) {
      return { rhoL, rhoV, iterations: it, resP, resG, converged: true };
    }
    if (it === maxIterations) break;
    const kL = L.stiffness;
    const kV = V.stiffness;
    // J = [[kL, -kV], [kL/rhoL, -kV/rhoV]]
    const det = kL * kV * (1 / rhoL - 1 / rhoV);
    if (!(Math.abs(det) > 0) || !(kL > 0) || !(kV > 0)) break;
    // Solve J [dL, dV] = -[F1, F2]
    const dL = (-F1 * (-kV / rhoV) + kV * -F2) / det;
    const dV = (kL * -F2 - (kL / rhoL) * -F1) / det;
    // Limit steps: keep densities positive and apart.
    let lambda = 1;
    while (
      lambda > 1e-6 &&
      (!(rhoL + lambda * dL > 0) ||
        !(rhoV + lambda * dV > 0) ||
        Math.abs(lambda * dL) > 0.5 * rhoL ||
        Math.abs(lambda * dV) > 0.5 * rhoV ||
        !(rhoL + lambda * dL > rhoV + lambda * dV))
    ) {
      lambda *= 0.5;
    }
    rhoL += lambda * dL;
    rhoV += lambda * dV;
  }
  return { rhoL, rhoV, iterations: maxIterations, resP, resG, converged: false };
}

/**
 * The two spinodal densities (dP/drho = 0) of the isotherm: the vapour spinodal is the FIRST
 * density, scanning up from the dilute gas, where (dP/drho)_T turns negative; the liquid spinodal
 * the LAST, scanning down from the dense liquid. (Multiparameter equations may oscillate wildly in
 * between, IAPWS-95 among them; only the two stable branches matter.) Near the critical point the
 * unstable region may fall between grid points; the least-stiffness density is then located by
 * golden-section search and the spinodals bracketed outward from it.
 */
function spinodals(
  model: ResidualModel,
  T: number,
  critical: CriticalPointResult,
): { vapor: number; liquid: number; top: number } {
  const rhoC = critical.densityMolPerM3;
  const top = Math.min(0.999 * model.maxDensity(T, PURE), 8 * rhoC);
  const s = (rho: number): number => stiffnessAt(model, T, rho);
  const n = 400;
  const lo = 1e-6 * rhoC;
  const ratio = Math.pow(top / lo, 1 / n);
  const grid = new Float64Array(n + 1);
  const sg = new Float64Array(n + 1);
  let first = -1;
  let last = -1;
  for (let i = 0, rho = lo; i <= n; i++, rho *= ratio) {
    grid[i] = i === n ? top : rho;
    sg[i] = s(grid[i]);
    if (!(sg[i] > 0)) {
      if (first < 0) first = i;
      last = i;
    }
  }
  if (first > 0 && last < n) {
    const vapor = findRootBrent(s, grid[first - 1], grid[first]).value;
    const liquid = findRootBrent(s, grid[last], grid[last + 1]).value;
    return { vapor, liquid, top };
  }
  if (first === 0 || last === n) {
    throw new SolverError(
      "saturation (spinodal search)",
      `(dP/drho)_T is not positive at the end of the density scan ${lo} to ${top} mol/m3 on the isotherm T = ${T} K`,
    );
  }
  // Near-critical: golden-section search for the least stiffness around the grid minimum.
  let iBest = 0;
  for (let i = 1; i <= n; i++) if (sg[i] < sg[iBest]) iBest = i;
  let a = grid[Math.max(iBest - 1, 0)];
  let b = grid[Math.min(iBest + 1, n)];
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let sc = s(c);
  let sd = s(d);
  for (let k = 0; k < 200 && b - a > 1e-15 * b; k++) {
    if (sc < sd) {
      b = d;
      d = c;
      sd = sc;
      c = b - g * (b - a);
      sc = s(c);
    } else {
      a = c;
      c = d;
      sc = sd;
      d = a + g * (b - a);
      sd = s(d);
    }
  }
  const best = (a + b) / 2;
  const bestS = s(best);
  if (!(bestS < 0)) {
    throw new SolverError(
      "saturation (spinodal search)",
      `(dP/drho)_T stays positive along the isotherm T = ${T} K (least stiffness ${bestS} at rho = ${best} mol/m3, density scanned ${lo} to ${top} mol/m3): no vapour-liquid loop at this temperature`,
    );
  }
  let vLo = best;
  let lHi = best;
  let step = 1 + 1e-6;
  while (!(s(vLo) > 0) && vLo > lo) {
    vLo /= step;
    step = Math.min(step * step, 2);
  }
  step = 1 + 1e-6;
  while (!(s(lHi) > 0) && lHi < top) {
    lHi = Math.min(lHi * step, top);
    step = Math.min(step * step, 2);
  }
  return {
    vapor: findRootBrent(s, vLo, best).value,
    liquid: findRootBrent(s, best, lHi).value,
    top,
  };
}

/** The spinodal route: Brent on P between the spinodal pressures. */
function spinodalRoute(
  model: ResidualModel,
  T: number,
  Rg: number,
  critical: CriticalPointResult,
): { rhoL: number; rhoV: number } {
  const sp = spinodals(model, T, critical);
  const P = (rho: number): number => pressureAt(model, T, rho, Rg);
  const pV = P(sp.vapor);
  const pL = P(sp.liquid);
  const pHi = pV;
  const pLo = Math.max(pL, 1e-12 * pV);
  const liquidAt = (p: number): number =>
    findRootBrent((rho) => P(rho) - p, sp.liquid, sp.top).value;
  const vaporAt = (p: number): number =>
    findRootBrent((rho) => P(rho) - p, 1e-9 * Math.min(sp.vapor, p / (Rg * T)), sp.vapor).value;
  const dg = (p: number): number => {
    return gibbsAt(model, T, liquidAt(p)) - gibbsAt(model, T, vaporAt(p));
  };
  const root = findRootBrent(dg, pLo, pHi);
  return { rhoL: liquidAt(root.value), rhoV: vaporAt(root.value) };
}

/**
 * Route for models with all density roots in closed form (`densityRoots`, e.g. cubics): Newton's
 * method on the pressure for Delta g(P) = g_L - g_V = 0 with the exact slope
 * d(Delta g / RT)/dP = (v_L - v_V) / RT (Gibbs-Duhem), the two outer roots of the cubic giving
 * the phase densities; safeguarded by bisection in ln P on a bracket that is narrowed whenever
 * the equation has fewer than three roots (one root below rho_c: P too low; above: too high).
 * The start is Wilson's estimate with omega = 0 (phase/wilson.ts).
 * Returns undefined when the model never shows three roots (then the spinodal route is used).
 */
function closedFormRootsRoute(
  model: ResidualModel,
  T: number,
  Rg: number,
  critical: CriticalPointResult,
): { rhoL: number; rhoV: number } | undefined {
  const roots = model.densityRoots;
  if (!roots) return undefined;
  const RT = Rg * T;
  const rhoC = critical.densityMolPerM3;
  let lnLo = -Infinity; // ln P known too low (vapour only)
  let lnHi = Math.log(critical.pressurePa); // ln P known too high
  let lnP = lnHi + wilsonLnReducedVaporPressure(T, critical.temperatureK, 0);
  for (let k = 0; k < 200; k++) {
    const P = Math.exp(lnP);
    const r = roots.call(model, T, P, PURE);
    let next: number;
    if (r.length >= 3) {
      const rhoV = r[0];
      const rhoL = r[r.length - 1];
      const dl = model.residual(T, rhoL, PURE);
      const dv = model.residual(T, rhoV, PURE);
      const f = gibbsAtDensityRT(rhoL, dl) - gibbsAtDensityRT(rhoV, dv);
      if (f > 0) lnLo = lnP;
      else lnHi = lnP;
      const slope = (1 / rhoL - 1 / rhoV) / RT; // d f / dP
      const step = f / (slope * P); // Newton step in ln P
      if (Math.abs(f) < 1e-13 || Math.abs(step) < 1e-15) return { rhoL, rhoV };
      next = lnP - step;
    } else if (r.length >= 1 && r[0] < rhoC) {
      lnLo = lnP;
      next = NaN;
    } else {
      lnHi = lnP;
      next = NaN;
    }
    if (!(next > lnLo && next < lnHi)) {
      next = Number.isFinite(lnLo) ? 0.5 * (lnLo + lnHi) : lnHi - Math.max(1, 2 * (lnHi - lnP));
    }
    if (Number.isFinite(lnLo) && lnHi - lnLo < 1e-15) return undefined;
    lnP = next;
  }
  return undefined;
}

function validateOptions(options: SaturationOptions): { tolerance: number; maxIterations: number } {
  if (!(typeof options === "object" && options !== null)) {
    throw new InputError({
      input: "options",
      unit: "-",
      validRange: "an options object (or nothing)",
      received: options,
    });
  }
  const tolerance = options.tolerance ?? 1e-12;
  if (!(tolerance > 0 && tolerance < 1)) {
    throw new InputError({
      input: "options.tolerance",
      unit: "-",
      validRange: "between 0 and 1 (exclusive)",
      received: tolerance,
    });
  }
  const maxIterations = options.maxIterations ?? 60;
  requireCount("options.maxIterations", maxIterations);
  return { tolerance, maxIterations };
}

/**
 * Saturation state of a pure fluid at temperature T (K).
 *
 * @example
 * ```ts
 * const sat = saturationAtTemperature(referenceFluid("water"), 450);
 * sat.pressurePa; // 932203.56... (IAPWS R6-95 Table 8: 0.932203564 MPa)
 * ```
 * @throws InputError for a bad T, a mixture model or bad options.
 * @throws PhaseUnavailableError at or above the model's critical temperature.
 * @throws SolverError when no saturation state is found (the message says what was tried).
 */
export function saturationAtTemperature(
  model: ResidualModel,
  temperatureK: number,
  options: SaturationOptions = {},
): SaturationResult {
  options = options ?? {};
  try {
    return solveAtTemperature(model, temperatureK, options);
  } catch (e) {
    // Below a published triple point the stable phase is solid; when the metastable
    // vapour-liquid equilibrium cannot be solved there, say so rather than how the search failed.
    const triple = model.triple;
    if (e instanceof SolverError && triple && temperatureK < triple.temperatureK) {
      throw new PhaseUnavailableError(
        `no vapour-liquid saturation state at T = ${temperatureK} K: below the triple point (${triple.temperatureK} K, ${triple.pressurePa} Pa) of ${model.info.name}, in the solid region, and the equation's metastable vapour-liquid equilibrium could not be solved there (${e.message})`,
      );
    }
    throw e;
  }
}

function solveAtTemperature(
  model: ResidualModel,
  temperatureK: number,
  options: SaturationOptions,
): SaturationResult {
  requirePure(model, "saturation");
  requirePositive("temperatureK", temperatureK, "K");
  const { tolerance, maxIterations } = validateOptions(options);
  const critical = locateCriticalPoint(model, { guess: options.criticalGuess });
  const T = temperatureK;
  if (!(T < critical.temperatureK)) {
    throw new PhaseUnavailableError(
      `no saturation state at T = ${T} K: at or above the critical temperature ${critical.temperatureK} K of ${model.info.name} (located from its own equations); above it the fluid is one phase at every pressure`,
    );
  }
  if (
    !options.allowOutsideRange &&
    typeof model.validityStatus === "function" &&
    model.validityStatus(T, 0) === "outside"
  ) {
    throw new OutOfRangeError({
      input: "temperatureK",
      unit: "K",
      validRange: model.validityDescription ?? "the model's validity range",
      received: T,
      hint: "pass { allowOutsideRange: true } to solve the equation there anyway",
    });
  }
  const Rg = gasConstantOf(model);
  const L = emptyIsothermPoint();
  const V = emptyIsothermPoint();
  let start: SaturationResult["start"];
  let rhoL0: number;
  let rhoV0: number;
  if (options.start) {
    start = "given";
    rhoL0 = requirePositive(
      "options.start.liquidDensityMolPerM3",
      options.start.liquidDensityMolPerM3,
      "mol/m3",
    );
    rhoV0 = requirePositive(
      "options.start.vaporDensityMolPerM3",
      options.start.vaporDensityMolPerM3,
      "mol/m3",
    );
  } else if (hasSaturationEstimate(model)) {
    start = "ancillary equations";
    const est = model.saturationEstimate(T);
    rhoL0 = est.liquidDensityMolPerM3;
    rhoV0 = est.vaporDensityMolPerM3;
  } else {
    const closed = closedFormRootsRoute(model, T, Rg, critical);
    if (closed) {
      start = "closed-form roots";
      rhoL0 = closed.rhoL;
      rhoV0 = closed.rhoV;
    } else {
      start = "spinodals";
      const r = spinodalRoute(model, T, Rg, critical);
      rhoL0 = r.rhoL;
      rhoV0 = r.rhoV;
    }
  }
  let out = newtonSaturation(model, T, Rg, rhoL0, rhoV0, tolerance, maxIterations, L, V);
  const trivial = (o: NewtonOutcome): boolean =>
    Math.abs(o.rhoL - o.rhoV) <= 1e-9 * critical.densityMolPerM3;
  if ((!out.converged || trivial(out)) && start !== "spinodals") {
    start = "spinodals";
    const r = spinodalRoute(model, T, Rg, critical);
    out = newtonSaturation(model, T, Rg, r.rhoL, r.rhoV, tolerance, maxIterations, L, V);
  }
  if (!out.converged || trivial(out)) {
    throw new SolverError(
      "saturation (Newton on the two densities)",
      `T = ${T} K, start rho_L = ${rhoL0}, rho_V = ${rhoV0} mol/m3 (${start}); after ${out.iterations} iterations rho_L = ${out.rhoL}, rho_V = ${out.rhoV} mol/m3, relative pressure residual ${out.resP}, Gibbs residual ${out.resG} (tolerance ${tolerance})` +
        (trivial(out) ? "; the two densities collapsed to one (trivial solution)" : ""),
    );
  }
  // L and V hold the converged phases (the Newton loop evaluates before it tests convergence).
  const hVap = Rg * T * (V.hResRT - L.hResRT);
  const warnings: ResultWarning[] = [];
  const triple = model.triple;
  if (triple && T < triple.temperatureK) {
    warnings.push({
      code: "extrapolated",
      message: `T = ${T} K is below the triple point (${triple.temperatureK} K) of ${model.info.name}: the stable phase there is solid, and this vapour-liquid equilibrium is metastable`,
    });
  }
  // Both phases share T and P, so one validity check (on the vapour, evaluated last) covers both.
  if (model.checkValidity) for (const w of model.checkValidity(T, out.rhoV, PURE)) warnings.push(w);
  return {
    temperatureK: T,
    // The vapour-side pressure: rho_V R T (1 + aD_V) has no cancellation, while the liquid-side
    // value is a small difference of large terms at low reduced temperature.
    pressurePa: V.pressurePa,
    liquidDensityMolPerM3: out.rhoL,
    vaporDensityMolPerM3: out.rhoV,
    enthalpyOfVaporizationJPerMol: hVap,
    entropyOfVaporizationJPerMolK: hVap / T,
    residualEnthalpyRT: { liquid: L.hResRT, vapor: V.hResRT },
    iterations: out.iterations,
    residual: { pressure: out.resP, gibbs: out.resG },
    start,
    critical,
    model: model.info.name,
    warnings,
  };
}

/** Options of {@link saturationAtPressure}. */
export interface SaturationAtPressureOptions extends SaturationOptions {
  /** Relative tolerance on the saturation pressure reached. Default 1e-12. */
  pressureTolerance?: number;
}

/**
 * Saturation state of a pure fluid at pressure P (Pa): the temperature and both densities.
 *
 * @throws InputError for a bad P.
 * @throws PhaseUnavailableError at or above the model's critical pressure, or below the lowest
 *   temperature the model can be solved at.
 * @throws SolverError when the temperature iteration fails.
 */
export function saturationAtPressure(
  model: ResidualModel,
  pressurePa: number,
  options: SaturationAtPressureOptions = {},
): SaturationResult {
  options = options ?? {};
  requirePure(model, "saturation");
  requirePositive("pressurePa", pressurePa, "Pa");
  validateOptions(options);
  const pTol = options.pressureTolerance ?? 1e-12;
  const critical = locateCriticalPoint(model, { guess: options.criticalGuess });
  if (!(pressurePa < critical.pressurePa)) {
    throw new PhaseUnavailableError(
      `no saturation state at P = ${pressurePa} Pa: at or above the critical pressure ${critical.pressurePa} Pa of ${model.info.name}`,
    );
  }
  const Tc = critical.temperatureK;
  const hints = model;
  const lnP = Math.log(pressurePa);
  // Bracket in T: [T_lo, Tc) with ln psat(T) increasing in T. Below a triple point the metastable
  // line is followed down to the lowest temperature the equation solves at (lowestTemperature).
  const floor = lowestTemperature(model, Tc, pressurePa, options);
  let tLo = floor.temperatureK;
  let tHi = Tc * (1 - 1e-9);
  // Start: from the ancillary (bisected) or Clausius-Clapeyron between Tc and 0.7 Tc.
  let T: number;
  {
    // Anchor of the Clausius-Clapeyron start: 0.7 Tc, or the triple point when that is higher.
    const tAnchor = Math.max(0.7 * Tc, hints.triple ? hints.triple.temperatureK : 0);
    const s7 = saturationAtTemperature(model, tAnchor, options);
    const slope =
      (Math.log(critical.pressurePa) - Math.log(s7.pressurePa)) / (1 / tAnchor - 1 / Tc);
    const invT = 1 / Tc + (Math.log(critical.pressurePa) - lnP) / slope;
    T = Math.min(Math.max(1 / invT, tLo), Tc * (1 - 1e-7));
  }
  let iterations = 0;
  let sat: SaturationResult | undefined;
  for (let k = 0; k < 100; k++) {
    sat = saturationAtTemperature(model, T, options);
    iterations += sat.iterations + 1;
    const f = Math.log(sat.pressurePa) - lnP;
    if (Math.abs(f) <= pTol) break;
    if (f > 0) tHi = Math.min(tHi, T);
    else tLo = Math.max(tLo, T);
    // Clausius-Clapeyron: d ln P / dT = h_vap / (T P (v_V - v_L))
    const dv = 1 / sat.vaporDensityMolPerM3 - 1 / sat.liquidDensityMolPerM3;
    const slope = sat.enthalpyOfVaporizationJPerMol / (T * sat.pressurePa * dv);
    let next = T - f / slope;
    if (!(next > tLo && next < tHi)) next = 0.5 * (tLo + tHi);
    if (Math.abs(next - T) <= 1e-15 * T) break;
    T = next;
    if (k === 99) {
      throw new SolverError(
        "saturation at given pressure (Newton-Clapeyron on T)",
        `P = ${pressurePa} Pa: 100 iterations, last T = ${T} K, ln P residual ${f}, bracket ${tLo}..${tHi} K`,
      );
    }
  }
  if (!sat) throw new SolverError("saturation at given pressure", "no iteration ran");
  // The result is verified: the requested pressure is met, never the bracket end returned.
  const miss = Math.abs(Math.log(sat.pressurePa) - lnP);
  if (!(miss <= Math.max(pTol, 1e-9))) {
    throw new SolverError(
      "saturation at given pressure (Newton-Clapeyron on T)",
      `P = ${pressurePa} Pa not met: last T = ${sat.temperatureK} K gives ${sat.pressurePa} Pa (ln P residual ${miss}); bracket ${tLo}..${tHi} K`,
    );
  }
  return { ...sat, iterations };
}

/**
 * The lowest temperature of the saturation search at given P and a check that P is reachable
 * there. Without a triple point: 0.3 Tc (cubics and other models solve the equation well below
 * any real triple point). With one: 0.98 T_t when P is above the triple-point pressure; below it
 * the metastable line is followed down to the lowest temperature the equation may be used at
 * (its extrapolation range, or 0.5 T_t when it states none), and P below the saturation pressure
 * there is refused with a PhaseUnavailableError naming the triple point.
 */
function lowestTemperature(
  model: ResidualModel,
  Tc: number,
  pressurePa: number,
  options: SaturationAtPressureOptions,
): { temperatureK: number } {
  const triple = model.triple;
  const refuse = (reason: string): never => {
    throw new PhaseUnavailableError(
      `no vapour-liquid saturation state at P = ${pressurePa} Pa for ${model.info.name}: ` +
        (triple
          ? `below the triple point (${triple.temperatureK} K, ${triple.pressurePa} Pa), where the stable phases are solid and vapour, and ${reason}`
          : reason),
    );
  };
  if (!triple) {
    const tLo = 0.3 * Tc;
    const psat = saturationAtTemperature(model, tLo, options).pressurePa;
    if (!(pressurePa >= psat)) {
      refuse(
        `the pressure is below the saturation pressure ${psat} Pa at the lowest temperature searched (0.3 Tc = ${tLo} K)`,
      );
    }
    return { temperatureK: tLo };
  }
  if (pressurePa >= triple.pressurePa) return { temperatureK: 0.98 * triple.temperatureK };
  let tLo = triple.temperatureK;
  const usable = (T: number): boolean =>
    options.allowOutsideRange === true ||
    typeof model.validityStatus !== "function" ||
    model.validityStatus(T, 0) !== "outside";
  while (tLo * 0.99 > 0.5 * triple.temperatureK && usable(tLo * 0.99)) tLo *= 0.99;
  // the metastable equilibrium may not be solvable down to there: halve the distance to T_t
  for (let k = 0; k < 6; k++) {
    let psat: number;
    try {
      psat = solveAtTemperature(model, tLo, options).pressurePa;
    } catch (e) {
      if (!(e instanceof SolverError)) throw e;
      tLo = 0.5 * (tLo + triple.temperatureK);
      continue;
    }
    if (!(pressurePa >= psat)) {
      refuse(
        `the pressure is below the metastable saturation pressure ${psat} Pa at the lowest temperature the equation is used at (${tLo} K)`,
      );
    }
    return { temperatureK: tLo };
  }
  return refuse(
    `the metastable vapour-liquid equilibrium could not be solved below ${triple.temperatureK} K`,
  );
}
