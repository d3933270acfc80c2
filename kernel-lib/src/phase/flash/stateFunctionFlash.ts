/**
 * State-function flashes: the equilibrium at (P, h), (P, s), (T, s) and (u, v), nested as in
 * M. L. Michelsen, "Multiphase isenthalpic and isentropic flash algorithms", Fluid Phase Equilib.
 * 33 (1987) 13-27, and "State function based flash specifications", Fluid Phase Equilib. 158-160
 * (1999) 617-626: an outer one-dimensional search on T (P-h, P-s, and u-v) or on ln P (T-s, and
 * the inner level of u-v, where v(T, P) = v_target is solved at each T), with an inner isothermal
 * flash with stability analysis (flashTP.ts), so the number of phases is found by the stability
 * test at every step, never assumed. The outer search brackets the root (a Newton-like step from
 * the phases' own heat capacities, then doubling steps) and closes the bracket with Brent's method
 * (numerics/brent.ts): h(T) at constant P, s(T) at constant P, -s(ln P) at constant T, -v(ln P) at
 * constant T and u(T) at constant v are monotone and continuous across phase boundaries (their
 * slopes jump), so a closed bracket holds the root. The result is the verified isothermal flash at
 * the root plus the residual of the specification, |y - y_target| / scale <= specTolerance
 * (default 1e-9; scale max(|h|, R T) for h and u, max(|s|, R) for s, v for v), else SolverError.
 *
 * One present component (a pure fluid): the specification is compared with the saturated phases
 * from phase/saturation.ts (at the given P, or T), and inside the dome the two saturated phases
 * are returned with amounts from the lever rule; outside it the search is confined to the
 * single-phase side (h, s, u, v jump across the saturation line of a pure fluid).
 */
import { R as R_CODATA } from "../../constants.js";
import { OutOfRangeError, PhaseUnavailableError, SolverError } from "../../errors.js";
import { findRootBrent } from "../../numerics/brent.js";
import { checkComposition, checkPressure, checkTemperature } from "../../state/checkInputs.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import { requireFinite, requirePositive } from "../../validate.js";
import { flashTP, prepareFeed, type FlashOptions } from "./flashTP.js";
import { componentCritical, componentSaturation } from "./pureComponent.js";
import type { Equilibrium, SpecificationResidual, StateFunctionEquilibrium } from "./types.js";
import { assembleEquilibrium, describeState } from "./verifyEquilibrium.js";

/** Options of the state-function flashes. */
export interface StateFlashOptions extends FlashOptions {
  /** Largest accepted |y - y_target| / scale of the specification. Default 1e-9. */
  specTolerance?: number;
  /** First temperature of the outer search, K. Default 300 (u-v: the ideal-gas estimate is not used). */
  initialGuessK?: number;
  /** Temperature search range, K. Default 40 to 2000. */
  minTemperatureK?: number;
  maxTemperatureK?: number;
  /** First pressure of a pressure search, Pa. Default 1e5 (T-s) or rho R T (u-v). */
  initialGuessPa?: number;
  /** Pressure search range, Pa. Default 1 Pa to 1e9 Pa. */
  minPressurePa?: number;
  maxPressurePa?: number;
}

type Spec = "h" | "s" | "u" | "v";

function gasConstant(binding: FluidBinding): number {
  return binding.model.gasConstant ?? R_CODATA;
}

/** Overall molar h, s, u (J/mol, J/(mol K)) and v (m3/mol) of an equilibrium. */
export function overallProperty(eq: Equilibrium, y: Spec): number {
  let sum = 0;
  for (const p of eq.phases) {
    const v = y === "v" ? 1 / p.state.densityMolPerM3 : p.state.molar[y];
    sum += p.amount * v;
  }
  return sum;
}

function overallCp(eq: Equilibrium): number {
  let cp = 0;
  for (const p of eq.phases) cp += p.amount * p.state.molar.cp;
  return cp;
}

function scaleOf(binding: FluidBinding, y: Spec, target: number, T: number): number {
  if (y === "h" || y === "u") return Math.max(Math.abs(target), gasConstant(binding) * T);
  if (y === "s") return Math.max(Math.abs(target), gasConstant(binding));
  return Math.abs(target);
}

function residualOf(
  binding: FluidBinding,
  eq: Equilibrium,
  y: Spec,
  target: number,
): SpecificationResidual {
  const achieved = overallProperty(eq, y);
  const scale = scaleOf(binding, y, target, eq.temperatureK);
  return {
    property: y,
    target,
    achieved,
    relativeError: Math.abs(achieved - target) / scale,
    scale,
  };
}

/**
 * Finds x in [lo, hi] with f(x) = 0 for an increasing f, starting at x0 with a first step dx0:
 * steps out (doubling) until the sign changes, then Brent. A step that ends outside a
 * correlation's range (OutOfRangeError) or where the model has no root (PhaseUnavailableError)
 * becomes the limit of the search and the step is shortened.
 */
function bracketAndSolve(
  f: (x: number) => number,
  x0: number,
  dx0: number,
  lo: number,
  hi: number,
  tolerance: number,
  what: string,
): number {
  let a = Math.min(hi, Math.max(lo, x0));
  let fa = f(a);
  if (fa === 0) return a;
  let step = Math.abs(dx0) > 0 ? Math.abs(dx0) : 0.05 * Math.abs(a) + 1;
  const dir = fa > 0 ? -1 : 1;
  let b = a;
  let bracketed = false;
  const tried: string[] = [`${what}(${a}) - target = ${fa.toPrecision(4)}`];
  for (let k = 0; k < 80; k++) {
    let next = b + dir * step;
    if (!(next > lo && next < hi) && (next <= lo ? b === lo : b === hi)) next = b;
    if (next <= lo) next = lo;
    if (next >= hi) next = hi;
    if (next === b) {
      throw new SolverError(
        `outer search on ${what}`,
        `no sign change of the specification residual up to the limit ${b} of the search range [${lo}, ${hi}]: ${tried.slice(-4).join("; ")}`,
      );
    }
    let fn: number;
    try {
      fn = f(next);
    } catch (e) {
      // outside a correlation's range or no root there: that end is the limit of the search
      if (!(e instanceof OutOfRangeError || e instanceof PhaseUnavailableError)) throw e;
      tried.push(`${what}(${next}): ${e.message.slice(0, 120)}`);
      if (dir > 0) hi = next;
      else lo = next;
      step = Math.abs(next - b) / 4;
      continue;
    }
    tried.push(`${what}(${next}) - target = ${fn.toPrecision(4)}`);
    if (fn === 0) return next;
    if (Math.sign(fn) !== Math.sign(fa)) {
      a = b;
      b = next;
      bracketed = true;
      break;
    }
    a = next;
    fa = fn;
    b = next;
    step *= 2;
  }
  if (!bracketed) {
    throw new SolverError(
      `outer search on ${what}`,
      `no bracket found in 80 steps: ${tried.slice(-4).join("; ")}`,
    );
  }
  const r = findRootBrent(f, Math.min(a, b), Math.max(a, b), { tolerance, maxIterations: 200 });
  return r.value;
}

function checkSpec(
  binding: FluidBinding,
  eq: Equilibrium,
  specs: readonly { y: Spec; target: number }[],
  tol: number,
  method: string,
  outerIterations: number,
): StateFunctionEquilibrium {
  const specification = specs.map((s) => residualOf(binding, eq, s.y, s.target));
  for (const r of specification) {
    if (!(r.relativeError <= tol)) {
      throw new SolverError(
        method,
        `at ${describeState(binding, eq.temperatureK, eq.pressurePa, eq.z)} the specification ${r.property} = ${r.target} is met only to ${r.relativeError.toExponential(3)} relative (achieved ${r.achieved}, tolerance ${tol}): the outer search ended on a discontinuity (a phase found on one side and missed on the other?)`,
      );
    }
  }
  return {
    ...eq,
    check: {
      ...eq.check,
      iterations: eq.check.iterations + outerIterations,
      method: `${method}; inner: ${eq.check.method}`,
    },
    specification,
  };
}

function options0(o: StateFlashOptions) {
  const tMin = requirePositive("options.minTemperatureK", o.minTemperatureK ?? 40, "K");
  const tMax = requirePositive("options.maxTemperatureK", o.maxTemperatureK ?? 2000, "K");
  const pMin = requirePositive("options.minPressurePa", o.minPressurePa ?? 1, "Pa");
  const pMax = requirePositive("options.maxPressurePa", o.maxPressurePa ?? 1e9, "Pa");
  const specTol = requirePositive("options.specTolerance", o.specTolerance ?? 1e-9, "-");
  return { tMin, tMax, pMin, pMax, specTol };
}

/** Two saturated phases of one present component with amounts from the lever rule on y. */
function saturatedSplit(
  binding: FluidBinding,
  z: readonly number[],
  present: readonly number[],
  T: number,
  P: number,
  rhoL: number,
  rhoV: number,
  vaporAmount: number,
): Equilibrium {
  const working = [
    { x: z.slice(), lnPhi: [], densityMolPerM3: rhoV, amount: vaporAmount },
    { x: z.slice(), lnPhi: [], densityMolPerM3: rhoL, amount: 1 - vaporAmount },
  ].filter((p) => p.amount > 0);
  return assembleEquilibrium(binding, T, P, z, present, working, {
    iterations: 0,
    method: "saturation of the one present component (phase/saturation.ts), lever rule",
    warnings: [],
    pureComponent: true,
  });
}

const METHOD_PT = "outer search on T (bracket + Brent) around the isothermal flash";
const METHOD_TP = "outer search on ln P (bracket + Brent) around the isothermal flash";

/** Isobaric flash on T for y = h or s. */
function flashPY(
  binding: FluidBinding,
  P: number,
  y: "h" | "s",
  target: number,
  zIn: readonly number[],
  options: StateFlashOptions,
): StateFunctionEquilibrium {
  checkPressure(P);
  requireFinite(
    y === "h" ? "enthalpyJPerMol" : "entropyJPerMolK",
    target,
    y === "h" ? "J/mol" : "J/(mol K)",
  );
  checkComposition(zIn, binding.model.info.componentIds.length, "z");
  const { z, present } = prepareFeed(zIn);
  const { tMin, tMax, specTol } = options0(options);
  let evaluations = 0;
  let last: Equilibrium | undefined;
  const at = (T: number): Equilibrium => {
    evaluations++;
    last = flashTP(binding, T, P, z, options);
    return last;
  };
  const f = (T: number): number => overallProperty(at(T), y) - target;
  let lo = tMin;
  let hi = tMax;
  if (present.length === 1) {
    const k = present[0];
    const crit = componentCritical(binding, k);
    if (P < crit.pressurePa) {
      const sat = componentSaturation(binding, k, { pressurePa: P });
      const Ts = sat.temperatureK;
      const L = stateAtTRho(binding, Ts, sat.liquidDensityMolPerM3, z);
      const V = stateAtTRho(binding, Ts, sat.vaporDensityMolPerM3, z);
      const yL = L.molar[y];
      const yV = V.molar[y];
      if (target >= yL && target <= yV) {
        const eq = saturatedSplit(
          binding,
          z,
          present,
          Ts,
          sat.pressurePa,
          sat.liquidDensityMolPerM3,
          sat.vaporDensityMolPerM3,
          (target - yL) / (yV - yL),
        );
        return checkSpec(
          binding,
          eq,
          [{ y, target }],
          specTol,
          "saturation at P and the lever rule",
          0,
        );
      }
      if (target < yL) hi = Math.min(hi, Ts * (1 - 1e-9));
      else lo = Math.max(lo, Ts * (1 + 1e-9));
    }
  }
  const T0 = Math.min(hi, Math.max(lo, options.initialGuessK ?? 300));
  const e0 = at(T0);
  const r0 = overallProperty(e0, y) - target;
  const cp = overallCp(e0);
  const slope = y === "h" ? cp : cp / T0;
  let dT = Number.isFinite(slope) && slope > 0 ? Math.abs(r0 / slope) : 10;
  dT = Math.min(200, Math.max(0.5, 1.2 * dT));
  const Tsol = bracketAndSolve(f, T0, dT, lo, hi, 1e-10 * T0, "T");
  const eq = last !== undefined && last.temperatureK === Tsol ? last : at(Tsol);
  return checkSpec(binding, eq, [{ y, target }], specTol, METHOD_PT, evaluations);
}

/**
 * The equilibrium of feed z at pressure P (Pa) and molar enthalpy h (J/mol, in the binding's
 * reference state): the outlet of a throttling valve.
 * @throws InputError for bad inputs; SolverError when no verified equilibrium meets h.
 */
export function flashPH(
  binding: FluidBinding,
  pressurePa: number,
  enthalpyJPerMol: number,
  z: readonly number[],
  options: StateFlashOptions = {},
): StateFunctionEquilibrium {
  return flashPY(binding, pressurePa, "h", enthalpyJPerMol, z, options);
}

/** The equilibrium at pressure P (Pa) and molar entropy s (J/(mol K)): an isentropic expansion. */
export function flashPS(
  binding: FluidBinding,
  pressurePa: number,
  entropyJPerMolK: number,
  z: readonly number[],
  options: StateFlashOptions = {},
): StateFunctionEquilibrium {
  return flashPY(binding, pressurePa, "s", entropyJPerMolK, z, options);
}

/** The equilibrium at temperature T (K) and molar entropy s (J/(mol K)). */
export function flashTS(
  binding: FluidBinding,
  temperatureK: number,
  entropyJPerMolK: number,
  zIn: readonly number[],
  options: StateFlashOptions = {},
): StateFunctionEquilibrium {
  const T = temperatureK;
  checkTemperature(T);
  requireFinite("entropyJPerMolK", entropyJPerMolK, "J/(mol K)");
  checkComposition(zIn, binding.model.info.componentIds.length, "z");
  const { z, present } = prepareFeed(zIn);
  const { pMin, pMax, specTol } = options0(options);
  let lnLo = Math.log(pMin);
  let lnHi = Math.log(pMax);
  let evaluations = 0;
  let last: Equilibrium | undefined;
  const at = (lnP: number): Equilibrium => {
    evaluations++;
    last = flashTP(binding, T, Math.exp(lnP), z, options);
    return last;
  };
  // s decreases with P: solve target - s(ln P) = 0 (increasing)
  const f = (lnP: number): number => entropyJPerMolK - overallProperty(at(lnP), "s");
  if (present.length === 1) {
    const k = present[0];
    const crit = componentCritical(binding, k);
    if (T < crit.temperatureK) {
      const sat = componentSaturation(binding, k, { temperatureK: T });
      const L = stateAtTRho(binding, T, sat.liquidDensityMolPerM3, z);
      const V = stateAtTRho(binding, T, sat.vaporDensityMolPerM3, z);
      if (entropyJPerMolK >= L.molar.s && entropyJPerMolK <= V.molar.s) {
        const q = (entropyJPerMolK - L.molar.s) / (V.molar.s - L.molar.s);
        const eq = saturatedSplit(
          binding,
          z,
          present,
          T,
          sat.pressurePa,
          sat.liquidDensityMolPerM3,
          sat.vaporDensityMolPerM3,
          q,
        );
        return checkSpec(
          binding,
          eq,
          [{ y: "s", target: entropyJPerMolK }],
          specTol,
          "saturation at T and the lever rule",
          0,
        );
      }
      const lnPs = Math.log(sat.pressurePa);
      if (entropyJPerMolK < L.molar.s) lnLo = Math.max(lnLo, lnPs + 1e-9);
      else lnHi = Math.min(lnHi, lnPs - 1e-9);
    }
  }
  const ln0 = Math.min(lnHi, Math.max(lnLo, Math.log(options.initialGuessPa ?? 1e5)));
  const lnSol = bracketAndSolve(f, ln0, 0.5, lnLo, lnHi, 1e-13, "ln P");
  const eq = last !== undefined && last.pressurePa === Math.exp(lnSol) ? last : at(lnSol);
  return checkSpec(
    binding,
    eq,
    [{ y: "s", target: entropyJPerMolK }],
    specTol,
    METHOD_TP,
    evaluations,
  );
}

/**
 * The equilibrium at molar internal energy u (J/mol) and overall molar density rho (mol/m3): a
 * closed vessel (the specification of a vessel's blowdown step). Nested: outer search on T for
 * u; at each T an inner search on ln P for v = 1/rho (a pure fluid: the lever rule on v inside
 * the dome at T).
 */
export function flashUV(
  binding: FluidBinding,
  internalEnergyJPerMol: number,
  densityMolPerM3: number,
  zIn: readonly number[],
  options: StateFlashOptions = {},
): StateFunctionEquilibrium {
  requireFinite("internalEnergyJPerMol", internalEnergyJPerMol, "J/mol");
  requirePositive("densityMolPerM3", densityMolPerM3, "mol/m3");
  checkComposition(zIn, binding.model.info.componentIds.length, "z");
  const { z, present } = prepareFeed(zIn);
  const { tMin, tMax, pMin, pMax, specTol } = options0(options);
  const vTarget = 1 / densityMolPerM3;
  const Rg = gasConstant(binding);
  let evaluations = 0;
  /** The equilibrium at T with overall v = vTarget. */
  const atT = (T: number): Equilibrium => {
    evaluations++;
    if (present.length === 1) {
      const k = present[0];
      const crit = componentCritical(binding, k);
      if (T < crit.temperatureK) {
        const sat = componentSaturation(binding, k, { temperatureK: T });
        const vL = 1 / sat.liquidDensityMolPerM3;
        const vV = 1 / sat.vaporDensityMolPerM3;
        if (vTarget > vL && vTarget < vV) {
          return saturatedSplit(
            binding,
            z,
            present,
            T,
            sat.pressurePa,
            sat.liquidDensityMolPerM3,
            sat.vaporDensityMolPerM3,
            (vTarget - vL) / (vV - vL),
          );
        }
      }
      const state = stateAtTRho(binding, T, densityMolPerM3, z);
      return flashTP(binding, T, state.pressurePa, z, options);
    }
    let last: Equilibrium | undefined;
    const g = (lnP: number): number => {
      last = flashTP(binding, T, Math.exp(lnP), z, options);
      return vTarget - overallProperty(last, "v");
    };
    const p0 = options.initialGuessPa ?? densityMolPerM3 * Rg * T;
    const lnP = bracketAndSolve(
      g,
      Math.log(Math.min(pMax, Math.max(pMin, p0))),
      0.3,
      Math.log(pMin),
      Math.log(pMax),
      1e-14,
      "ln P",
    );
    return last !== undefined && last.pressurePa === Math.exp(lnP)
      ? last
      : flashTP(binding, T, Math.exp(lnP), z, options);
  };
  let last: Equilibrium | undefined;
  const f = (T: number): number => {
    last = atT(T);
    return overallProperty(last, "u") - internalEnergyJPerMol;
  };
  const T0 = Math.min(tMax, Math.max(tMin, options.initialGuessK ?? 300));
  const Tsol = bracketAndSolve(f, T0, 20, tMin, tMax, 1e-10 * T0, "T");
  const eq = last !== undefined && last.temperatureK === Tsol ? last : atT(Tsol);
  return checkSpec(
    binding,
    eq,
    [
      { y: "u", target: internalEnergyJPerMol },
      { y: "v", target: vTarget },
    ],
    specTol,
    "outer search on T (bracket + Brent) over an inner search on ln P for v, around the isothermal flash",
    evaluations,
  );
}
