/**
 * The choice of a density root at given (T, P): mechanically unstable roots ((dP/drho)_T <= 0)
 * are discarded; of the rest, "stable" takes the one of lowest Gibbs energy (at equal T and P the
 * ideal parts are equal, so the lowest g_r/RT = a + aD - ln Z; the first on a tie), "vapor" the
 * lightest and "liquid" the densest. Written once here for every caller (states at (T, P),
 * fugacity coefficients of a phase, the stability test's trial phases).
 */
import type { ResidualDerivatives, ResidualDerivativesDraft, ResidualModel } from "../eos/types.js";
import { dPdRho, residualGibbsTP } from "../eos/residualRelations.js";
import type { PhaseRequest } from "./types.js";

/**
 * What {@link chooseDensityRoot} learnt besides the chosen root's derivatives: plain numbers, so
 * a caller can keep one record and reuse it (read it out before the next call).
 */
export interface RootChoice {
  /** The chosen root, mol/m3 (NaN when no root is mechanically stable). */
  densityMolPerM3: number;
  /** Its position among the mechanically stable roots (0 = lightest). */
  index: number;
  /** How many roots are mechanically stable. */
  stableCount: number;
  /**
   * Lowest and second-lowest g_r/RT among the stable roots: compared only for the "stable"
   * request with more than one root (Infinity otherwise).
   */
  lowestGibbsOverRT: number;
  secondGibbsOverRT: number;
}

/** A fresh {@link RootChoice}. */
export function emptyRootChoice(): RootChoice {
  return {
    densityMolPerM3: NaN,
    index: 0,
    stableCount: 0,
    lowestGibbsOverRT: Infinity,
    secondGibbsOverRT: Infinity,
  };
}

// the residual request of every root evaluation, allocated once
const COMPOSITION = Object.freeze({ composition: true });

/** Starts a choice in `out`: no root seen yet. */
function beginChoice(out: RootChoice): void {
  out.densityMolPerM3 = NaN;
  out.index = 0;
  out.stableCount = 0;
  out.lowestGibbsOverRT = Infinity;
  out.secondGibbsOverRT = Infinity;
}

/**
 * THE rule, offered one root at a time in ascending density: a root with (dP/drho)_T <= 0 (or
 * NaN) is passed over; of the rest the first is taken, "liquid" takes every later one (so the
 * densest), and with `compareGibbs` one whose g_r/RT is below the lowest so far (the first on a
 * tie), keeping the lowest and second-lowest g_r/RT. Updates `out`; true when this root is now
 * the chosen one (its derivatives `r` are then the caller's to keep).
 */
function offerRoot(
  out: RootChoice,
  request: PhaseRequest,
  compareGibbs: boolean,
  temperatureK: number,
  densityMolPerM3: number,
  r: ResidualDerivatives,
  gasConstant: number | undefined,
): boolean {
  if (!(dPdRho(temperatureK, r, gasConstant) > 0)) return false;
  const count = out.stableCount;
  let take = count === 0 || request === "liquid";
  if (compareGibbs) {
    const g = residualGibbsTP(r);
    if (count === 0 || g < out.lowestGibbsOverRT) {
      out.secondGibbsOverRT = out.lowestGibbsOverRT;
      out.lowestGibbsOverRT = g;
      take = true;
    } else if (g < out.secondGibbsOverRT) {
      out.secondGibbsOverRT = g;
    }
  }
  if (take) {
    out.index = count;
    out.densityMolPerM3 = densityMolPerM3;
  }
  out.stableCount = count + 1;
  return take;
}

/**
 * Evaluates every root in `rhos` (mol/m3, ascending; the first `rootCount`, default all) at T (K)
 * and x once, with composition
 * derivatives (the chosen one needs them, and there are at most a few roots), and returns the
 * derivatives of the root the request picks (undefined when no root is mechanically stable);
 * `out` receives the rest.
 */
export function chooseDensityRoot(
  model: ResidualModel,
  temperatureK: number,
  rhos: ArrayLike<number>,
  x: readonly number[],
  request: PhaseRequest,
  out: RootChoice,
  rootCount: number = rhos.length,
): ResidualDerivatives | undefined {
  const compareGibbs = request === "stable" && rootCount > 1;
  let residual: ResidualDerivatives | undefined;
  beginChoice(out);
  for (let k = 0; k < rootCount; k++) {
    const rho = rhos[k];
    const r = model.residual(temperatureK, rho, x, COMPOSITION);
    if (offerRoot(out, request, compareGibbs, temperatureK, rho, r, model.gasConstant)) {
      residual = r;
    }
  }
  return residual;
}

/**
 * The choice of {@link chooseDensityRoot} for a model with `residualInto` (no allocation: the
 * sweeps' path): roots `rhos[0 .. count - 1]` (ascending), derivatives without composition
 * derivatives written into the two scratch records in turn. Returns the record holding the chosen
 * root's derivatives (undefined when no root is mechanically stable); `out` receives the rest.
 * The same comparisons on the same numbers as chooseDensityRoot, so the same choice.
 */
export function chooseDensityRootInto(
  model: ResidualModel & { residualInto: NonNullable<ResidualModel["residualInto"]> },
  temperatureK: number,
  rhos: Float64Array,
  rootCount: number,
  x: readonly number[],
  request: PhaseRequest,
  out: RootChoice,
  scratchA: ResidualDerivativesDraft,
  scratchB: ResidualDerivativesDraft,
): ResidualDerivativesDraft | undefined {
  const compareGibbs = request === "stable" && rootCount > 1;
  let residual: ResidualDerivativesDraft | undefined;
  let free = scratchA;
  beginChoice(out);
  for (let k = 0; k < rootCount; k++) {
    const r = free;
    const rho = rhos[k];
    model.residualInto(temperatureK, rho, x, r);
    if (offerRoot(out, request, compareGibbs, temperatureK, rho, r, model.gasConstant)) {
      residual = r;
      free = r === scratchA ? scratchB : scratchA;
    }
  }
  return residual;
}

/** A model with the allocation-free residual entries of the (T, P) path. */
export type ModelWithResidualInto = ResidualModel & {
  residualInto: NonNullable<ResidualModel["residualInto"]>;
  residualWithCompositionInto: NonNullable<ResidualModel["residualWithCompositionInto"]>;
};

/**
 * The choice of {@link chooseDensityRoot} (the same comparisons on the same numbers, so the same
 * root) without a derivatives object per root: a single root is evaluated once, with its
 * composition derivatives, into `chosen`; several are compared through
 * {@link chooseDensityRootInto} (scratch records, no composition derivatives) and the chosen one
 * evaluated again with them into `chosen`. `dnA` (length n) receives d(n alpha_r)/dn_i and is
 * set as `chosen.dnA`. Returns `chosen`, or undefined when no root is mechanically stable.
 */
export function chooseDensityRootWithComposition(
  model: ModelWithResidualInto,
  temperatureK: number,
  rhos: Float64Array,
  rootCount: number,
  x: readonly number[],
  request: PhaseRequest,
  out: RootChoice,
  scratchA: ResidualDerivativesDraft,
  scratchB: ResidualDerivativesDraft,
  chosen: ResidualDerivativesDraft,
  dnA: number[],
): ResidualDerivatives | undefined {
  if (rootCount === 1) {
    const rho = rhos[0];
    model.residualWithCompositionInto(temperatureK, rho, x, chosen, dnA);
    chosen.dnA = dnA;
    beginChoice(out);
    return offerRoot(out, request, false, temperatureK, rho, chosen, model.gasConstant)
      ? (chosen as ResidualDerivatives)
      : undefined;
  }
  const r = chooseDensityRootInto(
    model,
    temperatureK,
    rhos,
    rootCount,
    x,
    request,
    out,
    scratchA,
    scratchB,
  );
  if (r === undefined) return undefined;
  model.residualWithCompositionInto(temperatureK, out.densityMolPerM3, x, chosen, dnA);
  chosen.dnA = dnA;
  return chosen as ResidualDerivatives;
}
