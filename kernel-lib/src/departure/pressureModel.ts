/**
 * A full residual model from a user's pressure function: the general case of the Maxwell-relation
 * route. Every residual derivative comes from the departure integrator (integrateIsotherm.ts), so
 * the model plugs into states, inversions and `isochor eval` like any built-in equation.
 *
 * Two entry points:
 * - `modelFromPressure`: P written with HyperDual numbers (exact temperature derivatives);
 * - `modelFromPlainPressure`: P on plain numbers (temperature and density derivatives by five-point
 *   finite differences; every state carries an "accuracy" warning saying so, with the estimate).
 */
import { InputError, OutOfRangeError, type ResultWarning } from "../errors.js";
import { requirePositive } from "../validate.js";
import type {
  ModelInfo,
  ResidualDerivatives,
  ResidualModel,
  ResidualRequest,
} from "../eos/types.js";
import {
  integrateResidual,
  type IntegratedResidual,
  type IntegrationOptions,
} from "./integrateIsotherm.js";
import {
  finiteDifferenceEvaluator,
  hyperDualEvaluator,
  type FiniteDifferenceOptions,
  type HyperDualPressure,
  type PlainPressure,
  type PressureEvaluator,
} from "./pressureEvaluator.js";

/** Options shared by both entry points. */
export interface PressureModelSpecBase {
  /** A name for the model (shown in results), e.g. "Corvid Point fuel-gas fit". */
  name: string;
  /** Component ids in the order of the composition vector. */
  components: readonly string[];
  /**
   * Close-packing limit, mol/m3: a number or a function of (T, x). Default Infinity (then states
   * at (T, P) search densities up to 1e6 mol/m3). Giving it makes dense-liquid integration cheaper.
   */
  maxDensity?: number | ((temperatureK: number, x: readonly number[]) => number);
  /** Where the equation comes from (shown in results). Default "user-defined pressure function". */
  citation?: string;
  /** Quadrature options (tolerances), see IntegrationOptions. */
  integration?: Omit<IntegrationOptions, "composition" | "maxDensityMolPerM3">;
  /** Gas constant the function uses, J/(mol K). Default CODATA. */
  gasConstant?: number;
}

/** Spec of {@link modelFromPressure}. */
export interface PressureModelSpec extends PressureModelSpecBase {
  /** P(T, rho, x) in Pa, written with HyperDual arithmetic. */
  pressure: HyperDualPressure;
}

/** Spec of {@link modelFromPlainPressure}. */
export interface PlainPressureModelSpec extends PressureModelSpecBase {
  /** P(T, rho, x) in Pa on plain numbers. */
  pressure: PlainPressure;
  /** Finite-difference step options. */
  finiteDifferences?: FiniteDifferenceOptions;
}

/** A pressure-function model; `integrate` exposes the integrator's error estimates. */
export interface PressureModel extends ResidualModel {
  /** Residual derivatives with their error estimates and evaluation count. */
  integrate(
    temperatureK: number,
    densityMolPerM3: number,
    x: readonly number[],
    request?: ResidualRequest,
  ): IntegratedResidual;
  /** How the derivatives are obtained. */
  readonly derivativeMethod: string;
  /** The pressure function as the integrator reads it. */
  readonly evaluator: PressureEvaluator;
  /** Integration options the model was built with. */
  readonly integrationOptions: Omit<IntegrationOptions, "composition" | "maxDensityMolPerM3">;
}

/** Type guard: was this model built from a pressure function (so its departures are integrated)? */
export function isPressureModel(model: ResidualModel): model is PressureModel {
  return typeof model.integrate === "function";
}

function build(
  spec: PressureModelSpecBase,
  evaluator: PressureEvaluator,
  kind: string,
): PressureModel {
  if (!(typeof spec.name === "string" && spec.name.length > 0)) {
    throw new InputError({
      input: "name",
      unit: "-",
      validRange: "a non-empty string",
      received: spec.name,
    });
  }
  if (!(Array.isArray(spec.components) && spec.components.length > 0)) {
    throw new InputError({
      input: "components",
      unit: "-",
      validRange: "a non-empty list of component ids",
      received: spec.components,
    });
  }
  if (typeof spec.maxDensity === "number") requirePositive("maxDensity", spec.maxDensity, "mol/m3");
  const maxDensity = (T: number, x: readonly number[]): number =>
    spec.maxDensity === undefined
      ? Infinity
      : typeof spec.maxDensity === "number"
        ? spec.maxDensity
        : spec.maxDensity(T, x);
  const info: ModelInfo = {
    id: "pressure-function",
    name: spec.name,
    citation: `${spec.citation ?? "user-defined pressure function"}; departures by numerical integration along the isotherm (${kind})`,
    componentIds: spec.components.slice(),
  };
  // the quadrature options, read once (every call then passes an object of one shape)
  const quad: Pick<IntegrationOptions, "relTolerance" | "absTolerance" | "maxSubdivisions"> = {
    relTolerance: spec.integration?.relTolerance,
    absTolerance: spec.integration?.absTolerance,
    maxSubdivisions: spec.integration?.maxSubdivisions,
  };
  let last:
    { T: number; rho: number; x: readonly number[]; result: IntegratedResidual } | undefined;
  const integrate = (
    T: number,
    rho: number,
    x: readonly number[],
    request?: ResidualRequest,
  ): IntegratedResidual => {
    const limit = maxDensity(T, x);
    if (!(rho < limit)) {
      throw new OutOfRangeError({
        input: "densityMolPerM3",
        unit: "mol/m3",
        validRange: `below the maximum density ${limit} mol/m3 given for ${spec.name}`,
        received: rho,
      });
    }
    const result = integrateResidual(evaluator, T, rho, x, {
      relTolerance: quad.relTolerance,
      absTolerance: quad.absTolerance,
      maxSubdivisions: quad.maxSubdivisions,
      maxDensityMolPerM3: limit,
      composition: request?.composition === true,
      gasConstant: spec.gasConstant,
    });
    last = { T, rho, x, result };
    return result;
  };
  return {
    info,
    gasConstant: spec.gasConstant,
    derivativeMethod: evaluator.derivativeMethod,
    evaluator,
    integrationOptions: { ...spec.integration, gasConstant: spec.gasConstant },
    integrate,
    residual(
      T: number,
      rho: number,
      x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      return integrate(T, rho, x, request).derivatives;
    },
    pressure: (T: number, rho: number, x: readonly number[]) => evaluator.value(T, rho, x),
    maxDensity,
    checkValidity(T: number, rho: number, x: readonly number[]): ResultWarning[] {
      const r =
        last && last.T === T && last.rho === rho && last.x === x
          ? last.result
          : integrate(T, rho, x);
      const e = r.errorEstimate;
      const worst = Math.max(e.a, e.aT, e.aTT);
      const warnings: ResultWarning[] = [];
      if (!evaluator.exact || worst > 1e-8) {
        warnings.push({
          code: "accuracy",
          message: `departures of ${spec.name} by numerical integration with ${evaluator.derivativeMethod}: estimated absolute errors alpha_r ${e.a.toExponential(1)}, T dalpha_r/dT ${e.aT.toExponential(1)}, T^2 d2alpha_r/dT2 ${e.aTT.toExponential(1)} (${r.evaluations} pressure evaluations)`,
        });
      }
      return warnings;
    },
  };
}

/**
 * A full residual model from a pressure function written with HyperDual numbers.
 *
 * @example
 * ```ts
 * // van der Waals for methane, typed in a cell (a in Pa m6/mol2, b in m3/mol):
 * const vdw = modelFromPressure({
 *   name: "vdW by hand",
 *   components: ["methane"],
 *   maxDensity: 1 / 4.28e-5,
 *   pressure: (T, rho) =>
 *     rho.mul(R).mul(T).div(rho.mul(-4.28e-5).add(1)).sub(rho.mul(rho).mul(0.2303)),
 * });
 * ```
 */
export function modelFromPressure(spec: PressureModelSpec): PressureModel {
  if (typeof spec.pressure !== "function") {
    throw new InputError({
      input: "pressure",
      unit: "-",
      validRange: "a function (T, rho, x) => HyperDual",
      received: typeof spec.pressure,
    });
  }
  return build(
    spec,
    hyperDualEvaluator(spec.pressure),
    "hyper-dual temperature derivatives, exact",
  );
}

/**
 * A full residual model from a pressure function on plain numbers. Less exact than
 * {@link modelFromPressure}: temperature and density derivatives come from finite differences,
 * and every state says so in its warnings with the estimated error.
 */
export function modelFromPlainPressure(spec: PlainPressureModelSpec): PressureModel {
  if (typeof spec.pressure !== "function") {
    throw new InputError({
      input: "pressure",
      unit: "-",
      validRange: "a function (T, rho, x) => number",
      received: typeof spec.pressure,
    });
  }
  return build(
    spec,
    finiteDifferenceEvaluator(spec.pressure, spec.finiteDifferences),
    "finite-difference temperature derivatives, less exact",
  );
}
