/**
 * Every density root of P(T, rho, x) = P for a model without a closed-form root routine
 * (Lee-Kesler, pressure-function models, multiparameter equations). Method: scan f(rho) =
 * P(rho) - P on a merged geometric + uniform grid from well below the ideal-gas density up to the
 * model's maximum density, then locate every sign change with Brent's method (numerics/brent.ts:
 * Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4). The geometric part resolves
 * the gas branch, the uniform part the liquid branch. Roots closer together than one grid step (a
 * state within a hair of a spinodal) can be missed; the grid size is an option.
 */
import { R as R_CODATA } from "../constants.js";
import { findRootBrent } from "../numerics/brent.js";
import type { ResidualModel } from "../eos/types.js";
import { pressureFromResidual } from "../eos/residualRelations.js";

/** Options of {@link findDensityRoots}. */
export interface DensityRootOptions {
  /** Points of each of the two scan grids. Default 96. */
  gridPoints?: number;
  /**
   * Upper end of the scan when the model has no finite maximum density, mol/m3. Default 1e6
   * (about 20 times the density of liquid water).
   */
  searchLimitMolPerM3?: number;
}

/** Densities (mol/m3, ascending) where the model's pressure equals `pressurePa`. */
export function findDensityRoots(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  options: DensityRootOptions = {},
): number[] {
  const Rg = model.gasConstant ?? R_CODATA;
  const T = temperatureK;
  const RT = Rg * T;
  const n = options.gridPoints ?? 96;
  const maxDensity = model.maxDensity(T, x);
  const upper = Number.isFinite(maxDensity)
    ? maxDensity * (1 - 1e-9)
    : (options.searchLimitMolPerM3 ?? 1e6);
  const pressureOf = model.pressure
    ? (rho: number) => model.pressure!(T, rho, x)
    : (rho: number) => pressureFromResidual(T, rho, model.residual(T, rho, x).aD, Rg);
  const f = (rho: number): number => {
    try {
      return pressureOf(rho) - pressurePa;
    } catch {
      return NaN;
    }
  };
  const lower = Math.min((pressurePa / RT) * 1e-3, upper * 1e-9);
  const grid: number[] = [];
  const ratio = Math.pow(upper / lower, 1 / (n - 1));
  let g = lower;
  for (let i = 0; i < n; i++, g *= ratio) grid.push(Math.min(g, upper));
  for (let i = 1; i <= n; i++) grid.push((upper * i) / n);
  grid.sort((p, q) => p - q);
  const roots: number[] = [];
  let prevRho = grid[0];
  let prevF = f(prevRho);
  for (let i = 1; i < grid.length; i++) {
    const rho = grid[i];
    if (rho === prevRho) continue;
    const fr = f(rho);
    if (Number.isFinite(prevF) && Number.isFinite(fr)) {
      if (fr === 0) {
        roots.push(rho);
      } else if (prevF !== 0 && prevF < 0 !== fr < 0) {
        roots.push(findRootBrent(f, prevRho, rho, { tolerance: 0, maxIterations: 200 }).value);
      }
    }
    prevRho = rho;
    prevF = fr;
  }
  return roots;
}

/**
 * Every density root at (T, P): the model's own closed form (`densityRoots`) when it has one, else
 * the scan of {@link findDensityRoots}. The one place that makes this choice.
 */
export function densityRootsOf(
  model: ResidualModel,
  temperatureK: number,
  pressurePa: number,
  x: readonly number[],
  options?: DensityRootOptions,
): number[] {
  return model.densityRoots
    ? model.densityRoots(temperatureK, pressurePa, x)
    : findDensityRoots(model, temperatureK, pressurePa, x, options);
}
