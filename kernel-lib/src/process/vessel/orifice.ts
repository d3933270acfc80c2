/**
 * Mass flux through an orifice or valve from the fluid's own isentropic expansion.
 *
 * Frictionless adiabatic flow from a stagnation state (P0, h0, s0) to a throat at pressure P:
 * the energy balance h0 = h(P, s0) + w^2 / 2 gives the velocity w = sqrt(2 (h0 - h)) and the mass
 * flux G(P) = rho(P, s0) w(P). The flow chokes where G is largest along the isentrope (dG/dP = 0,
 * where w equals the speed of sound of the fluid along that path); below that pressure the throat
 * stays at the choking pressure. The real-fluid form of the nozzle equations (e.g. A. H. Shapiro,
 * The Dynamics and Thermodynamics of Compressible Fluid Flow, Ronald Press 1953, ch. 4): no
 * ideal-gas relation is used.
 *
 * Routes: "single-phase" follows the isentrope through the single-phase state inversion at (P, s)
 * (state/inversions.ts) and finds the choke as the root of w^2 - c^2 (c the single-phase speed of
 * sound) by Brent's method; "equilibrium" follows it through the (P, s) flash (all phases,
 * phase/flash) and maximises G numerically (Brent's minimisation of -G over ln P): the homogeneous
 * equilibrium model of two-phase flow (phases at one velocity and in equilibrium). "auto" takes
 * the single-phase route and checks, by the isothermal flash, that the stagnation state, the throat
 * and the middle of the expansion are stable as one phase; otherwise (or if the single-phase
 * inversion fails) it takes the equilibrium route.
 *
 * The equilibrium route is screened when the caller leaves the flash's extra trial phases at
 * "auto": the interior points of the choke search (which only locate the maximum) are solved by
 * a secant on T around isothermal flashes with the Wilson-start stability tests, and the throat
 * that is returned is computed again with the caller's options and must agree (same phases, G
 * within 1e-9), else the whole search is repeated with the caller's options (SCREEN_AGREEMENT).
 *
 * The ideal-gas choked flux G* = P0 sqrt(gamma M / (R T0)) (2 / (gamma + 1))^((gamma + 1) / (2
 * (gamma - 1))) is given by {@link idealGasChokedMassFlux} as a check only.
 */
import { R } from "../../constants.js";
import { InputError, SolverError } from "../../errors.js";
import type { Fluid } from "../../fluid/defineFluid.js";
import { findRootBrent } from "../../numerics/brent.js";
import { minimizeBrent } from "../../numerics/brentMinimize.js";
import { overallProperty } from "../../phase/flash/stateFunctionFlash.js";
import type { Equilibrium } from "../../phase/flash/types.js";
import type { FlashOptions } from "../../phase/flash/flashTP.js";
import { temperatureAtPS } from "../../state/inversions.js";
import type { FluidState } from "../../state/types.js";
import { lnKOf, warmSplit } from "./warmSplit.js";

/** The stagnation (vessel) state of the stream that flows. */
export interface StagnationState {
  readonly pressurePa: number;
  readonly temperatureK: number;
  /** Mole fractions of the flowing stream. */
  readonly x: readonly number[];
  /** J/mol */
  readonly enthalpyJPerMol: number;
  /** J/(mol K) */
  readonly entropyJPerMolK: number;
  /** kg/mol */
  readonly molarMassKgPerMol: number;
}

/** Options of {@link orificeMassFlux}. */
export interface OrificeFluxOptions {
  /** "auto" (default), "single-phase" (no phase check) or "equilibrium" (HEM through flashPS). */
  route?: "auto" | "single-phase" | "equilibrium";
  /** Relative tolerance on the throat pressure. Default 1e-7. */
  pressureTolerance?: number;
  /**
   * A guess of the choking pressure ratio P_throat / P0 (e.g. from the previous time step): the
   * equilibrium route then searches around it first (within +-3 % in ln P), the single-phase
   * route brackets the choke within +-1 % of it, and both fall back to the full search when the
   * choke is not inside.
   */
  throatRatioHint?: number;
  /**
   * A guess of the throat temperature ratio T_throat / T0 (with throatRatioHint): the first
   * temperature guess of the hinted search. Affects the work only, not the result.
   */
  throatTemperatureRatioHint?: number;
  /**
   * ln(y_i / x_i) of a nearby two-phase throat (e.g. the previous time step's throatLnK): the
   * first interior points of the screened search start their split from it. Affects the work
   * only (the throat returned is always computed by the full flash).
   */
  throatLnKHint?: readonly number[];
  /** Options of the phase-equilibrium calculations (flashPS, flashTP). */
  flash?: FlashOptions;
}

/** The flux and the throat. */
export interface OrificeFlux {
  /** kg/(m2 s), ideal (discharge coefficient 1). */
  readonly massFluxKgPerM2S: number;
  /** True when the throat pressure is above the back pressure (critical flow). */
  readonly choked: boolean;
  readonly throatPressurePa: number;
  readonly throatTemperatureK: number;
  /** m/s */
  readonly throatVelocityMPerS: number;
  /** Overall density at the throat, kg/m3. */
  readonly throatDensityKgPerM3: number;
  /** Molar vapour fraction at the throat (1 for a single-phase gas, 0 for a liquid). */
  readonly throatVaporFraction: number;
  /** True when the throat state has more than one phase (homogeneous equilibrium flow). */
  readonly twoPhaseThroat: boolean;
  /** ln(y_i / x_i) at a two-phase throat (a warm start of the next search: throatLnKHint). */
  readonly throatLnK?: readonly number[];
  readonly route: "single-phase" | "equilibrium";
  /** States evaluated along the isentrope. */
  readonly evaluations: number;
}

interface PathPoint {
  P: number;
  T: number;
  h: number;
  rhoMass: number;
  c: number;
  vaporFraction: number;
  phases: number;
  /** ln(y_i / x_i) of a two-phase point. */
  lnK?: readonly number[];
}

function checkStagnation(s: StagnationState, backPressurePa: number): void {
  if (!(s.pressurePa > 0)) {
    throw new InputError({
      input: "stagnation.pressurePa",
      unit: "Pa",
      validRange: "> 0",
      received: s.pressurePa,
    });
  }
  if (!(backPressurePa > 0 && backPressurePa < s.pressurePa)) {
    throw new InputError({
      input: "backPressurePa",
      unit: "Pa",
      validRange: `> 0 and below the stagnation pressure ${s.pressurePa} Pa (flow goes from high to low pressure)`,
      received: backPressurePa,
    });
  }
}

/**
 * The single-phase isentrope point at P (state inversion at (P, s0), state/inversions.ts, without
 * the stability test that fluid.temperatureAtPS adds as a warning: the single-phase route tests
 * the throat and the middle of the expansion itself, see orificeMassFlux).
 */
function singlePhasePoint(fluid: Fluid, s: StagnationState, P: number, guessK: number): PathPoint {
  const inv = temperatureAtPS(fluid, P, s.entropyJPerMolK, s.x, { initialGuessK: guessK });
  const st: FluidState = inv.state;
  return {
    P,
    T: inv.temperatureK,
    h: st.molar.h,
    rhoMass: st.densityKgPerM3,
    c: st.speedOfSoundMPerS,
    vaporFraction: st.phase === "liquid" ? 0 : 1,
    phases: 1,
  };
}

/** The equilibrium isentrope point at P ((P, s) flash). */
function equilibriumPoint(
  fluid: Fluid,
  s: StagnationState,
  P: number,
  guessK: number,
  flash: FlashOptions,
): PathPoint {
  const eq: Equilibrium = fluid.flashPS(P, s.entropyJPerMolK, s.x, {
    ...flash,
    initialGuessK: guessK,
  });
  return pathPointOf(s, P, eq);
}

/**
 * The equilibrium isentrope point at P from the isothermal flash at a known temperature T of the
 * isentrope (the screened search's throat; warm-started from the screened point's K-values,
 * FlashOptions.initialLnK): accepted when its entropy meets s0 within SPEC_TOLERANCE (relative
 * to max(|s0|, R), the default of the (P, s) flash), else undefined.
 */
function equilibriumPointAtT(
  fluid: Fluid,
  s: StagnationState,
  P: number,
  T: number,
  flash: FlashOptions,
  lnK?: readonly number[],
): PathPoint | undefined {
  const eq = fluid.flashTP(T, P, s.x, lnK === undefined ? flash : { ...flash, initialLnK: lnK });
  const scale = Math.max(Math.abs(s.entropyJPerMolK), R);
  const residual = Math.abs(overallProperty(eq, "s") - s.entropyJPerMolK) / scale;
  return residual <= SPEC_TOLERANCE ? pathPointOf(s, P, eq) : undefined;
}

/**
 * The isentrope point at P by the secant method on T around the isothermal flash (the first step
 * from the latest secant slope, else the phases' frozen heat capacity, ds/dT = cp/T), from a
 * close guess (a neighbouring point of the choke search): accepted when the entropy meets s0
 * within SPEC_TOLERANCE / 100 in at most SECANT_STEPS flashes, else undefined (the caller then
 * takes the (P, s) flash, which brackets).
 * slope.dsdT, when positive, replaces the frozen first slope and is updated with the secant's.
 * Used for the screened interior points only; flashAt is the isothermal flash of the screened
 * search (a warm-started split where one is known, see warmSplit.ts).
 */
function secantPoint(
  s: StagnationState,
  P: number,
  guessK: number,
  flashAt: (T: number, P: number) => Equilibrium,
  slope: { dsdT: number },
): PathPoint | undefined {
  const scale = Math.max(Math.abs(s.entropyJPerMolK), R);
  const tol = SPEC_TOLERANCE / 100;
  let T0 = guessK;
  let eq = flashAt(T0, P);
  let r0 = overallProperty(eq, "s") - s.entropyJPerMolK;
  if (Math.abs(r0) / scale <= tol) return pathPointOf(s, P, eq);
  let dsdT = slope.dsdT;
  if (!(dsdT > 0)) {
    let cp = 0;
    for (const ph of eq.phases) cp += ph.amount * ph.state.molar.cp;
    dsdT = cp / T0;
  }
  if (!(dsdT > 0)) return undefined;
  let T1 = T0 - r0 / dsdT;
  for (let k = 0; k < SECANT_STEPS; k++) {
    if (!(T1 > 0.5 * guessK && T1 < 1.5 * guessK)) return undefined;
    eq = flashAt(T1, P);
    const r1 = overallProperty(eq, "s") - s.entropyJPerMolK;
    if (r1 !== r0) slope.dsdT = (r1 - r0) / (T1 - T0);
    if (Math.abs(r1) / scale <= tol) return pathPointOf(s, P, eq);
    if (r1 === r0) return undefined;
    const T2 = T1 - (r1 * (T1 - T0)) / (r1 - r0);
    T0 = T1;
    r0 = r1;
    T1 = T2;
  }
  return undefined;
}

/** Flashes the secant search of {@link secantPoint} may take. */
const SECANT_STEPS = 6;

function pathPointOf(s: StagnationState, P: number, eq: Equilibrium): PathPoint {
  const v = overallProperty(eq, "v");
  const vapor = eq.phases.find((p) => p.kind === "vapor");
  return {
    P,
    T: eq.temperatureK,
    h: overallProperty(eq, "h"),
    rhoMass: s.molarMassKgPerMol / v,
    c: eq.phases.length === 1 ? eq.phases[0].state.speedOfSoundMPerS : NaN,
    vaporFraction:
      eq.phases.length === 1
        ? eq.phases[0].state.phase === "liquid"
          ? 0
          : 1
        : vapor === undefined
          ? 0
          : vapor.amount,
    phases: eq.phases.length,
    lnK: lnKOf(eq),
  };
}

function velocity(s: StagnationState, p: PathPoint): number {
  const dh = (s.enthalpyJPerMol - p.h) / s.molarMassKgPerMol;
  return dh > 0 ? Math.sqrt(2 * dh) : 0;
}

/** True for the ideal-gas model (one phase at every state). */
export function isIdealGasModel(fluid: Fluid): boolean {
  return fluid.model.info.id === "ideal-gas";
}

/** Is (T, P, x) stable as one phase with the density of this single-phase state? */
export function isStableSinglePhase(
  fluid: Fluid,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  densityMolPerM3: number,
  flash: FlashOptions = {},
): boolean {
  const eq = fluid.flashTP(temperatureK, pressurePa, x, flash);
  if (eq.phases.length !== 1) return false;
  const rho = eq.phases[0].state.densityMolPerM3;
  return Math.abs(rho - densityMolPerM3) <= 1e-6 * densityMolPerM3;
}

/**
 * Screening of the equilibrium route: the interior points of the choke search (which only locate
 * the maximum of G) use flashes with the Wilson-start stability tests only (FlashOptions
 * extraTrials "none"); the throat state that is returned is computed again with the caller's
 * options (all trial phases) and accepted only when it has the same number of phases and the
 * same G within SCREEN_AGREEMENT (relative). Otherwise the whole search is repeated with the
 * caller's options, so a phase missed by the Wilson starts near the throat cannot change the
 * result. Every point is still a verified equilibrium (equal fugacities) of the (P, s) flash.
 */
const SCREEN_AGREEMENT = 1e-9;
/** The (P, s) flash's default specification tolerance (phase/flash/stateFunctionFlash.ts). */
const SPEC_TOLERANCE = 1e-9;

/**
 * The relative noise of G at the points of the choke search (the isentrope's entropy met to
 * 1e-11 relative, the flashes' fugacities to 1e-11): a parabola vertex whose G is below the
 * middle point's by less than this is accepted as the maximum (the flux there is then exact to
 * about this, as G is flat at its maximum).
 */
const VERTEX_NOISE = 1e-9;

/** Rounds of three points of the hinted choke search before Brent's minimisation. */
const HINT_ROUNDS = 3;

/** The screened search disagreed with the full flash at its throat. */
class ScreenMismatch extends Error {}

function fluxAlong(
  fluid: Fluid,
  s: StagnationState,
  backPressurePa: number,
  route: "single-phase" | "equilibrium",
  relTol: number,
  hint?: number,
  flash: FlashOptions = {},
  screen = false,
  tHint?: number,
  lnKHint?: readonly number[],
): OrificeFlux & { points: PathPoint[] } {
  let evaluations = 0;
  let guess = s.temperatureK;
  if (hint !== undefined && tHint !== undefined && tHint > 0.2 && tHint < 5) {
    guess = tHint * s.temperatureK;
  }
  const points: PathPoint[] = [];
  // screening (see SCREENED_TRIALS): the search runs on the Wilson-start flashes, the point
  // returned is computed again with the caller's flash options and must agree
  const searchFlash: FlashOptions = screen ? { ...flash, extraTrials: "none" } : flash;
  // ds/dT along the isobars of the latest secant (the first step of the next one)
  const slope = { dsdT: NaN };
  // the screened interior points: the two-phase split from the latest two-phase point's
  // K-values (warmSplit.ts: verified, no stability test), else the Wilson-start flash
  let lnK: readonly number[] | undefined = screen ? lnKHint : undefined;
  const screenedFlash = (T: number, P: number): Equilibrium => {
    if (lnK !== undefined) {
      const warm = warmSplit(fluid, T, P, s.x, lnK);
      if (warm !== undefined) {
        lnK = lnKOf(warm);
        return warm;
      }
    }
    const eq = fluid.flashTP(T, P, s.x, searchFlash);
    lnK = lnKOf(eq);
    return eq;
  };
  const at = (P: number): PathPoint => {
    evaluations++;
    let p: PathPoint;
    if (route === "single-phase") p = singlePhasePoint(fluid, s, P, guess);
    else if (screen) {
      // the guess extrapolated in ln P along the two latest points
      const n = points.length;
      let g = guess;
      if (n >= 2) {
        const a = points[n - 2];
        const b = points[n - 1];
        const d = Math.log(b.P) - Math.log(a.P);
        if (d !== 0) g = b.T + ((b.T - a.T) / d) * (Math.log(P) - Math.log(b.P));
      }
      if (!(g > 0)) g = guess;
      p =
        secantPoint(s, P, g, screenedFlash, slope) ??
        equilibriumPoint(fluid, s, P, guess, searchFlash);
    } else p = equilibriumPoint(fluid, s, P, guess, searchFlash);
    guess = p.T;
    points.push(p);
    return p;
  };
  const result = (ps: PathPoint, choked: boolean): OrificeFlux & { points: PathPoint[] } => {
    let p = ps;
    if (screen) {
      evaluations++;
      p =
        equilibriumPointAtT(fluid, s, ps.P, ps.T, flash, ps.lnK) ??
        equilibriumPoint(fluid, s, ps.P, ps.T, flash);
      points.push(p);
      const gScreen = ps.rhoMass * velocity(s, ps);
      const gFull = p.rhoMass * velocity(s, p);
      if (
        p.phases !== ps.phases ||
        !(Math.abs(gFull - gScreen) <= SCREEN_AGREEMENT * Math.max(gFull, gScreen))
      ) {
        throw new ScreenMismatch();
      }
    }
    const w = velocity(s, p);
    return {
      massFluxKgPerM2S: p.rhoMass * w,
      choked,
      throatPressurePa: p.P,
      throatTemperatureK: p.T,
      throatVelocityMPerS: w,
      throatDensityKgPerM3: p.rhoMass,
      throatVaporFraction: p.vaporFraction,
      twoPhaseThroat: p.phases > 1,
      throatLnK: p.lnK,
      route,
      evaluations,
      points,
    };
  };
  const lnB = Math.log(backPressurePa);
  const ln0 = Math.log(s.pressurePa);
  if (route === "single-phase") {
    // w^2 - c^2 rises as P falls (w grows, c falls); its root is the choke. Stepping down from
    // near the stagnation pressure brackets it without visiting states far below the choke.
    const f = (lnP: number): number => {
      const p = at(Math.exp(lnP));
      return velocity(s, p) ** 2 - p.c ** 2;
    };
    let upper = ln0 - 1e-9;
    let lower = NaN;
    if (hint !== undefined && hint > 0 && hint < 1) {
      // a bracket of +-1 % around the hinted choke (the previous step's), when it brackets
      const lnH = ln0 + Math.log(hint);
      const a = lnH - 0.01;
      const b = lnH + 0.01;
      if (a > lnB && b < upper && f(b) <= 0 && f(a) > 0) {
        const root = findRootBrent(f, a, b, { tolerance: relTol });
        return result(at(Math.exp(root.value)), true);
      }
    }
    for (const r of [0.75, 0.55, 0.4, 0.25, 0.12, 0.05, 0.02, 0.005]) {
      const lnP = ln0 + Math.log(r);
      if (lnP <= lnB) break;
      if (f(lnP) > 0) {
        lower = lnP;
        break;
      }
      upper = lnP;
    }
    if (Number.isNaN(lower)) {
      const pb = at(backPressurePa);
      if (!(velocity(s, pb) ** 2 - pb.c ** 2 > 0)) return result(pb, false);
      lower = lnB;
    }
    const root = findRootBrent(f, lower, upper, { tolerance: relTol });
    const p = at(Math.exp(root.value));
    return result(p, true);
  }
  const negG = (lnP: number): number => {
    const p = at(Math.exp(lnP));
    return -p.rhoMass * velocity(s, p);
  };
  if (hint !== undefined && hint > 0 && hint < 1) {
    const lo = Math.max(lnB, ln0 + Math.log(hint) - 0.03);
    const hi = Math.min(ln0 - 1e-6, ln0 + Math.log(hint) + 0.03);
    // three points around the hint and the vertex of their parabola: accepted when the vertex
    // lies between the outer two and G there is the largest of the four (G is smooth and
    // nearly quadratic at its maximum unless the expansion crosses a phase boundary there);
    // a vertex outside the three points (the throat moved more than d) centres the next three
    // on it, up to HINT_ROUNDS times, within +-3 % of the hint
    let lnH = ln0 + Math.log(hint);
    const d = 0.004;
    for (let round = 0; round < HINT_ROUNDS; round++) {
      if (!(lnH - d > lnB && lnH + d < ln0 - 1e-6)) break;
      const g0 = -negG(lnH - d);
      const g1 = -negG(lnH);
      const g2 = -negG(lnH + d);
      const curvature = g0 - 2 * g1 + g2;
      if (!(curvature < 0)) break;
      const lnV = lnH + (0.5 * d * (g0 - g2)) / curvature;
      if (g1 >= g0 && g1 >= g2) {
        const pv = at(Math.exp(lnV));
        const gv = pv.rhoMass * velocity(s, pv);
        // (G at the vertex may fall below G at the middle point by the noise of the
        // isentrope's points, about 1e-10 relative, when the two are within ~1e-5 in ln P)
        if (gv >= g1 * (1 - VERTEX_NOISE) && Math.abs(lnV - lnH) <= d) return result(pv, true);
        break;
      }
      if (!(lnV > lo + d && lnV < hi - d)) break;
      lnH = lnV;
    }
    if (hi > lo) {
      const tol = Math.max(relTol, 1e-9);
      const m = minimizeBrent(negG, lo, hi, { tolerance: tol });
      const inside = m.value - lo > 4 * m.errorEstimate && hi - m.value > 4 * m.errorEstimate;
      if (inside) return result(at(Math.exp(m.value)), true);
    }
  }
  // step down from the stagnation pressure until G falls: the maximum is then bracketed by the
  // last three points (G is unimodal along the isentrope), and no state far below it is visited
  const ratios = [0.9, 0.75, 0.62, 0.52, 0.43, 0.35, 0.27, 0.2, 0.14, 0.09, 0.05, 0.02, 0.005];
  let prevLn = ln0;
  let prevG = 0;
  let prevPrevLn = ln0;
  let bracket: [number, number] | undefined;
  for (const r of ratios) {
    const lnP = ln0 + Math.log(r);
    if (lnP <= lnB) break;
    const g = -negG(lnP);
    if (g < prevG) {
      bracket = [lnP, prevPrevLn];
      break;
    }
    prevPrevLn = prevLn;
    prevLn = lnP;
    prevG = g;
  }
  if (bracket === undefined) {
    const pb = at(backPressurePa);
    const gB = pb.rhoMass * velocity(s, pb);
    if (gB >= prevG) return result(pb, false);
    bracket = [lnB, prevPrevLn];
  }
  const m = minimizeBrent(negG, bracket[0], bracket[1], { tolerance: relTol });
  const pt = at(Math.exp(m.value));
  if (pt.P <= backPressurePa * (1 + 4 * relTol)) return result(at(backPressurePa), false);
  return result(pt, true);
}

/**
 * Ideal mass flux (kg/(m2 s), discharge coefficient 1) through an orifice from the stagnation
 * state s to the back pressure, from the fluid's own isentropic expansion (see the file header).
 * Multiply by the discharge coefficient and the area for the mass flow.
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane"] });
 * const st = gas.stateAtTP(300, 50e5);
 * orificeMassFlux(gas, { pressurePa: 50e5, temperatureK: 300, x: [1], enthalpyJPerMol: st.molar.h,
 *   entropyJPerMolK: st.molar.s, molarMassKgPerMol: st.molarMassKgPerMol }, 1e5).choked; // true
 * ```
 * @throws InputError for a back pressure not below the stagnation pressure; SolverError when
 *   neither route finds the isentrope.
 */
export function orificeMassFlux(
  fluid: Fluid,
  stagnation: StagnationState,
  backPressurePa: number,
  options: OrificeFluxOptions = {},
): OrificeFlux {
  checkStagnation(stagnation, backPressurePa);
  // the ideal-gas model has one phase everywhere (and no critical point for the flashes)
  const route = options.route ?? (isIdealGasModel(fluid) ? "single-phase" : "auto");
  const relTol = options.pressureTolerance ?? 1e-7;
  if (!(relTol > 0 && relTol < 0.01)) {
    throw new InputError({
      input: "options.pressureTolerance",
      unit: "-",
      validRange: "> 0 and < 0.01",
      received: relTol,
    });
  }
  if (route === "equilibrium") {
    const { points: _p, ...r } = equilibriumFlux(
      fluid,
      stagnation,
      backPressurePa,
      relTol,
      options,
    );
    return r;
  }
  if (route === "single-phase") {
    const { points: _p, ...r } = fluxAlong(
      fluid,
      stagnation,
      backPressurePa,
      route,
      relTol,
      options.throatRatioHint,
      {},
      false,
      options.throatTemperatureRatioHint,
    );
    return r;
  }
  let single: (OrificeFlux & { points: PathPoint[] }) | undefined;
  try {
    single = fluxAlong(
      fluid,
      stagnation,
      backPressurePa,
      "single-phase",
      relTol,
      options.throatRatioHint,
      {},
      false,
      options.throatTemperatureRatioHint,
    );
  } catch (e) {
    if (!(e instanceof SolverError || e instanceof InputError)) throw e;
    single = undefined;
  }
  if (single !== undefined) {
    const x = stagnation.x;
    const throat = single.points[single.points.length - 1];
    const midP = Math.sqrt(stagnation.pressurePa * throat.P);
    const mid = singlePhasePoint(fluid, stagnation, midP, throat.T);
    const checks: PathPoint[] = [throat, mid];
    const stable = checks.every((p) =>
      isStableSinglePhase(
        fluid,
        p.T,
        p.P,
        x,
        p.rhoMass / stagnation.molarMassKgPerMol,
        options.flash,
      ),
    );
    if (stable) {
      const { points: _p, ...r } = single;
      return r;
    }
  }
  const { points: _p, ...r } = equilibriumFlux(fluid, stagnation, backPressurePa, relTol, options);
  return r;
}

/** The equilibrium route, screened when the caller's trial phases allow it (SCREEN_AGREEMENT). */
function equilibriumFlux(
  fluid: Fluid,
  stagnation: StagnationState,
  backPressurePa: number,
  relTol: number,
  options: OrificeFluxOptions,
): OrificeFlux & { points: PathPoint[] } {
  const flash = options.flash ?? {};
  const screen = (flash.extraTrials ?? "auto") === "auto";
  const run = (screened: boolean): OrificeFlux & { points: PathPoint[] } =>
    fluxAlong(
      fluid,
      stagnation,
      backPressurePa,
      "equilibrium",
      relTol,
      options.throatRatioHint,
      flash,
      screened,
      options.throatTemperatureRatioHint,
      options.throatLnKHint,
    );
  if (!screen) return run(false);
  try {
    return run(true);
  } catch (e) {
    // a failed screened search (a disagreement, or a flash that failed without the extra
    // trials) is repeated in full: the caller's options decide
    if (!(e instanceof ScreenMismatch || e instanceof SolverError)) throw e;
    return run(false);
  }
}

/**
 * The ideal-gas choked mass flux (kg/(m2 s), discharge coefficient 1) of a perfect gas with
 * constant heat-capacity ratio gamma: G* = P0 sqrt(gamma M / (R T0)) (2 / (gamma + 1))^((gamma
 * + 1) / (2 (gamma - 1))) (Shapiro 1953, ch. 4). A check of the real-fluid route, not a model.
 */
export function idealGasChokedMassFlux(
  pressurePa: number,
  temperatureK: number,
  gamma: number,
  molarMassKgPerMol: number,
  gasConstant: number = R,
): number {
  if (!(gamma > 1)) {
    throw new InputError({ input: "gamma", unit: "-", validRange: "> 1", received: gamma });
  }
  return (
    pressurePa *
    Math.sqrt((gamma * molarMassKgPerMol) / (gasConstant * temperatureK)) *
    (2 / (gamma + 1)) ** ((gamma + 1) / (2 * (gamma - 1)))
  );
}
