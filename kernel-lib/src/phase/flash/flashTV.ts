/**
 * The equilibrium at temperature T and overall molar density rho (T-v flash): a closed vessel
 * held at a known temperature. M. L. Michelsen, "State function based flash specifications",
 * Fluid Phase Equilib. 158-160 (1999) 617-626, treats (T, v) as the inner level of the (u, v)
 * flash; here it is solved the same nested way as flashUV's inner level (stateFunctionFlash.ts):
 * a one-dimensional search on ln P for v(T, P) = v_target around the isothermal flash with
 * stability analysis (flashTP.ts), so the number of phases is found by the stability test, never
 * assumed. The overall volume v = sum_k beta_k v_k decreases with P at constant T and is
 * continuous across a mixture's phase boundaries (its slope jumps), so a bracket closed by
 * Brent's method (numerics/brent.ts) holds the root.
 *
 * Start: the single-phase state at (T, rho) (state/stateAt.ts) gives P0; if the flash at (T, P0)
 * returns that one phase (its density equal to rho within the specification tolerance), it is
 * the answer. Otherwise the bracket steps out from ln P0 (or from ln(rho R T) when P0 <= 0).
 *
 * One present component (a pure fluid): below its critical temperature the saturated phases at T
 * (phase/saturation.ts) bound the dome; inside it the two saturated phases are returned with the
 * lever rule on v; outside it, the single phase at (T, rho) checked by the flash at its own P.
 *
 * The result is verified as every flash result (verifyEquilibrium.ts) plus the residual of the
 * specification |v - v_target| / v_target <= specTolerance (default 1e-9), else SolverError.
 */
import { OutOfRangeError, PhaseUnavailableError, SolverError } from "../../errors.js";
import { R as R_CODATA } from "../../constants.js";
import { findRootBrent } from "../../numerics/brent.js";
import { checkComposition, checkTemperature } from "../../state/checkInputs.js";
import { stateAtTRho } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import { requirePositive } from "../../validate.js";
import { flashTP, prepareFeed } from "./flashTP.js";
import { componentCritical, componentSaturation } from "./pureComponent.js";
import { overallProperty, type StateFlashOptions } from "./stateFunctionFlash.js";
import type { Equilibrium, StateFunctionEquilibrium } from "./types.js";
import { assembleEquilibrium, describeState } from "./verifyEquilibrium.js";

const METHOD =
  "search on ln P (bracket + Brent) for the overall volume around the isothermal flash";

/**
 * The equilibrium of feed z at temperature T (K) and overall molar density rho (mol/m3).
 *
 * @example
 * ```ts
 * const eq = flashTV(binding, 250, 3000, [0.8, 0.15, 0.05]);
 * eq.phases.length; // 2 inside the envelope, each phase verified
 * ```
 * @throws InputError for bad inputs; SolverError when no verified equilibrium meets rho.
 */
export function flashTV(
  binding: FluidBinding,
  temperatureK: number,
  densityMolPerM3: number,
  zIn: readonly number[],
  options: StateFlashOptions = {},
): StateFunctionEquilibrium {
  const T = temperatureK;
  checkTemperature(T);
  requirePositive("densityMolPerM3", densityMolPerM3, "mol/m3");
  checkComposition(zIn, binding.model.info.componentIds.length, "z");
  const specTol = requirePositive("options.specTolerance", options.specTolerance ?? 1e-9, "-");
  const pMin = requirePositive("options.minPressurePa", options.minPressurePa ?? 1, "Pa");
  const pMax = requirePositive("options.maxPressurePa", options.maxPressurePa ?? 1e9, "Pa");
  const { z, present } = prepareFeed(zIn);
  const vTarget = 1 / densityMolPerM3;
  let evaluations = 0;
  const finish = (eq: Equilibrium, method: string): StateFunctionEquilibrium => {
    const achieved = overallProperty(eq, "v");
    const relativeError = Math.abs(achieved - vTarget) / vTarget;
    if (!(relativeError <= specTol)) {
      throw new SolverError(
        METHOD,
        `at ${describeState(binding, eq.temperatureK, eq.pressurePa, eq.z)} the overall molar volume ${achieved} m3/mol meets the target ${vTarget} only to ${relativeError.toExponential(3)} relative (tolerance ${specTol})`,
      );
    }
    return {
      ...eq,
      check: {
        ...eq.check,
        iterations: eq.check.iterations + evaluations,
        method: `${method}; inner: ${eq.check.method}`,
      },
      specification: [{ property: "v", target: vTarget, achieved, relativeError, scale: vTarget }],
    };
  };
  if (present.length === 1) {
    const k = present[0];
    if (T < componentCritical(binding, k).temperatureK) {
      const sat = componentSaturation(binding, k, { temperatureK: T });
      const vL = 1 / sat.liquidDensityMolPerM3;
      const vV = 1 / sat.vaporDensityMolPerM3;
      if (vTarget > vL && vTarget < vV) {
        const q = (vTarget - vL) / (vV - vL);
        const eq = assembleEquilibrium(
          binding,
          T,
          sat.pressurePa,
          z,
          present,
          [
            { x: z.slice(), lnPhi: [], densityMolPerM3: sat.vaporDensityMolPerM3, amount: q },
            { x: z.slice(), lnPhi: [], densityMolPerM3: sat.liquidDensityMolPerM3, amount: 1 - q },
          ],
          {
            iterations: 0,
            method: "saturation of the one present component (phase/saturation.ts), lever rule",
            warnings: [],
            pureComponent: true,
          },
        );
        return finish(eq, "saturation at T and the lever rule on v");
      }
    }
  }
  // the single phase at (T, rho), accepted when the flash at its own pressure returns it
  const single = stateAtTRho(binding, T, densityMolPerM3, z);
  const P0 = single.pressurePa;
  if (P0 > 0) {
    evaluations++;
    const eq = flashTP(binding, T, P0, z, options);
    const v = overallProperty(eq, "v");
    if (eq.phases.length === 1 && Math.abs(v - vTarget) <= specTol * vTarget) {
      return finish(eq, "single phase at (T, rho), stable by the flash at its own pressure");
    }
  }
  // search on ln P: g(ln P) = v_target - v(T, P) increases with ln P
  let last: Equilibrium | undefined;
  const g = (lnP: number): number => {
    evaluations++;
    last = flashTP(binding, T, Math.exp(lnP), z, options);
    return vTarget - overallProperty(last, "v");
  };
  let lo = Math.log(pMin);
  let hi = Math.log(pMax);
  const Rg = binding.model.gasConstant ?? R_CODATA;
  const start = P0 > 0 ? P0 : densityMolPerM3 * Rg * T;
  let a = Math.min(hi, Math.max(lo, Math.log(start)));
  let fa = g(a);
  if (fa === 0) return finish(last!, METHOD);
  const dir = fa > 0 ? -1 : 1;
  let step = 0.3;
  let b = a;
  let fb: number;
  const tried: string[] = [];
  let bracketed = false;
  for (let k = 0; k < 80 && !bracketed; k++) {
    let next = b + dir * step;
    next = Math.min(hi, Math.max(lo, next));
    if (next === b) break;
    try {
      fb = g(next);
    } catch (e) {
      if (!(e instanceof OutOfRangeError || e instanceof PhaseUnavailableError)) throw e;
      tried.push(`P = ${Math.exp(next).toPrecision(6)} Pa: ${e.message.slice(0, 120)}`);
      if (dir > 0) hi = next;
      else lo = next;
      step = Math.abs(next - b) / 4;
      continue;
    }
    tried.push(`P = ${Math.exp(next).toPrecision(6)} Pa: v - target = ${(-fb).toPrecision(4)}`);
    if (fb === 0) return finish(last!, METHOD);
    if (Math.sign(fb) !== Math.sign(fa)) {
      a = b;
      b = next;
      bracketed = true;
      break;
    }
    a = next;
    fa = fb;
    b = next;
    step *= 2;
  }
  if (!bracketed) {
    throw new SolverError(
      METHOD,
      `no pressure in [${Math.exp(lo)}, ${Math.exp(hi)}] Pa brackets the overall volume ${vTarget} m3/mol at ${describeState(binding, T, P0, z)}: ${tried.slice(-4).join("; ")}`,
    );
  }
  const root = findRootBrent(g, Math.min(a, b), Math.max(a, b), {
    tolerance: 1e-14,
    maxIterations: 200,
  });
  const eq =
    last !== undefined && last.pressurePa === Math.exp(root.value)
      ? last
      : flashTP(binding, T, Math.exp(root.value), z, options);
  return finish(eq, METHOD);
}
