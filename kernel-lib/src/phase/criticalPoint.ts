/**
 * The critical point of a pure-fluid model, located from its own equations:
 *   (dP/drho)_T = 0 and (d2P/drho2)_T = 0.
 * Method (nested one-dimensional solves, robust where a 2-D Newton is not): at a trial T, the
 * inflection density rho*(T) solves d2P/drho2 = 0, i.e. 2 aD + 4 aDD + aDDD = 0 (Brent); the
 * reduced stiffness s(T) = (dP/drho)_T / RT = 1 + 2 aD + aDD at rho*(T) is negative below the
 * critical temperature and positive above; T_c is the root of s(T) (Brent). Models without aDDD
 * get it by a central difference of aDD. Criterion: e.g. J. W. Gibbs; as computed for equations
 * of state in M. L. Michelsen and J. M. Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 12.
 * Brent's method: R. P. Brent, Algorithms for Minimization without Derivatives (1973), ch. 4.
 */
import { InputError, SolverError } from "../errors.js";
import type { ResidualModel } from "../eos/types.js";
import { findRootBrent } from "../numerics/brent.js";
import { pressureFromResidual, stiffnessFromResidual } from "../eos/residualRelations.js";
import { criticalGuessOf, gasConstantOf, PURE, requirePure, stiffnessAt } from "./pureFluid.js";

/** Options of {@link locateCriticalPoint}. */
export interface CriticalPointOptions {
  /** Starting guess; default the model's pseudoCritical() or published critical point. */
  guess?: { temperatureK: number; densityMolPerM3: number };
  /** Maximum Brent iterations of each solve. Default 200. */
  maxIterations?: number;
}

/** The critical point of a model and how it was found. */
export interface CriticalPointResult {
  readonly temperatureK: number;
  readonly densityMolPerM3: number;
  readonly pressurePa: number;
  /** Outer (temperature) Brent iterations. */
  readonly iterations: number;
  /** (dP/drho)_T / RT and rho (d2P/drho2)_T / RT at the result: both ~0. */
  readonly residual: { readonly stiffness: number; readonly curvature: number };
  readonly method: string;
}

const cache = new WeakMap<ResidualModel, CriticalPointResult>();

/** rho d(stiffness)/d(rho) = 2 aD + 4 aDD + aDDD (aDDD by central difference when absent). */
function curvature(model: ResidualModel, T: number, rho: number): number {
  const d = model.residual(T, rho, PURE);
  if (d.aDDD !== undefined) return 2 * d.aD + 4 * d.aDD + d.aDDD;
  const h = 1e-5 * rho;
  const sUp = stiffnessAt(model, T, rho + h);
  const sDn = stiffnessAt(model, T, rho - h);
  return (rho * (sUp - sDn)) / (2 * h);
}

const stiffness = stiffnessAt;

/**
 * Critical point of a pure-fluid model from its own equations (cached per model object: the first
 * successful location is reused, whatever guess a later call gives).
 *
 * @example
 * ```ts
 * locateCriticalPoint(referenceFluid("water")).temperatureK; // ~647.096 (IAPWS-95)
 * ```
 * @throws InputError for a mixture model or when no guess is available.
 * @throws SolverError when no inflection or no sign change of the stiffness is found.
 */
export function locateCriticalPoint(
  model: ResidualModel,
  options: CriticalPointOptions = {},
): CriticalPointResult {
  requirePure(model, "the critical point");
  // One critical point per model object: once located (from any guess) it is reused.
  const hit = cache.get(model);
  if (hit) return hit;
  const guess = options.guess ?? criticalGuessOf(model);
  if (!guess || !(guess.temperatureK > 0) || !(guess.densityMolPerM3 > 0)) {
    throw new InputError({
      input: "options.guess",
      unit: "K, mol/m3",
      validRange: "positive critical temperature and density (the model offers none)",
      received: guess,
    });
  }
  const maxIterations = options.maxIterations ?? 200;
  const Tg = guess.temperatureK;
  const rhoG = guess.densityMolPerM3;
  const rhoMax = 0.98 * model.maxDensity(Tg, PURE);
  const rhoLo = rhoG / 4;
  const rhoHi = Math.min(3 * rhoG, rhoMax);
  const inflection = (T: number): number => {
    const r = findRootBrent((rho) => curvature(model, T, rho), rhoLo, rhoHi, { maxIterations });
    return r.value;
  };
  const sMin = (T: number): number => stiffness(model, T, inflection(T));

  let lo = 0.97 * Tg;
  let hi = 1.03 * Tg;
  let fLo = sMin(lo);
  let fHi = sMin(hi);
  for (let k = 0; k < 8 && !(fLo < 0 && fHi > 0); k++) {
    if (!(fLo < 0)) {
      lo *= 0.93;
      fLo = sMin(lo);
    }
    if (!(fHi > 0)) {
      hi *= 1.07;
      fHi = sMin(hi);
    }
  }
  if (!(fLo < 0 && fHi > 0)) {
    throw new SolverError(
      "critical point (nested Brent)",
      `no sign change of (dP/drho)_T at the inflection density between T = ${lo} K (stiffness ${fLo}) and T = ${hi} K (stiffness ${fHi}), guess T = ${Tg} K, rho = ${rhoG} mol/m3`,
    );
  }
  const root = findRootBrent(sMin, lo, hi, { maxIterations });
  const T = root.value;
  const rho = inflection(T);
  const Rg = gasConstantOf(model);
  const d = model.residual(T, rho, PURE);
  const result: CriticalPointResult = {
    temperatureK: T,
    densityMolPerM3: rho,
    pressurePa: pressureFromResidual(T, rho, d.aD, Rg),
    iterations: root.iterations,
    residual: { stiffness: stiffnessFromResidual(d), curvature: curvature(model, T, rho) },
    method:
      "nested Brent: inflection density from d2P/drho2 = 0, temperature from (dP/drho)_T = 0 there",
  };
  cache.set(model, result);
  return result;
}
