/**
 * The virial equation truncated after the second coefficient, Z = 1 + B(T, x) rho, so
 * alpha_r = B rho exactly. Pure-component B from Tsonopoulos (1974) (tsonopoulos.ts); mixture
 * B = sum_i sum_j x_i x_j B_ij with the cross coefficients from the combining rules recommended by
 * Tsonopoulos, AIChE J. 20 (1974) 263, and reprinted in Poling, Prausnitz & O'Connell, The
 * Properties of Gases and Liquids, 5th ed. (2001), section 4-5:
 *   Tc_ij = sqrt(Tc_i Tc_j)(1 - k_ij),   omega_ij = (omega_i + omega_j)/2,
 *   Pc_ij = 4 Tc_ij (Pc_i Vc_i/Tc_i + Pc_j Vc_j/Tc_j) / (Vc_i^(1/3) + Vc_j^(1/3))^3.
 * Composition derivative: d(n alpha_r)/dn_i = 2 rho sum_j x_j B_ij.
 *
 * Validity: the truncated series holds for gases up to about half the critical density (common
 * practice, no source; e.g. the rule Vr > 2 quoted in chemical-engineering texts); beyond that the
 * model warns. With B < 0, P(rho) has a maximum at rho = -1/(2B): that is `maxDensity`, and no
 * pressure above that maximum has a root.
 */
import { R } from "../../constants.js";
import { InputError, OutOfRangeError, type ResultWarning } from "../../errors.js";
import type { ModelInfo, ResidualDerivatives, ResidualRequest } from "../types.js";
import { checkModelComponents, type ModelComponent } from "../modelComponent.js";
import { resolveInteractions, type InteractionMatrix } from "../interaction/interactionTable.js";
import { TSONOPOULOS, tsonopoulosB, type SecondVirial } from "./tsonopoulos.js";
import { HyperDual } from "../../numerics/hyperDual.js";
import type { ModelWithPressure } from "../pressureFunction.js";

/**
 * Components whose second virial coefficient needs Tsonopoulos' polar term (his f2 with fitted a, b),
 * which this model does not include: they get a warning.
 */
const STRONGLY_POLAR = new Set([
  "water",
  "ammonia",
  "methanol",
  "ethanol",
  "monoethanolamine",
  "acetone",
  "sulfur-dioxide",
  "hydrogen-cyanide",
  "hydrogen-chloride",
  "methyl-mercaptan",
  "ethyl-mercaptan",
]);

/** Options of {@link createVirialModel}. */
export interface VirialModelOptions {
  /** k_ij of the Tc_ij rule (N x N). Default: zero for every pair (reported as defaulted). */
  kij?: readonly (readonly number[])[];
}

/** The virial model with access to its B(T, x). */
export interface VirialModel extends ModelWithPressure {
  readonly interactions: InteractionMatrix;
  /** Mixture B, T dB/dT, T^2 d2B/dT2 (m3/mol) at (T, x). */
  secondVirial(temperatureK: number, x: readonly number[]): SecondVirial;
}

/** Builds the truncated virial model. Mixtures need every component's critical volume. */
export function createVirialModel(
  components: readonly ModelComponent[],
  options: VirialModelOptions = {},
): VirialModel {
  const n = components.length;
  checkModelComponents(components, n > 1);
  const ids = components.map((c) => c.id);
  const interactions = resolveInteractions(ids, "virial", options.kij);
  // pair constants
  const tc = new Float64Array(n * n);
  const pc = new Float64Array(n * n);
  const om = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const ci = components[i];
      const cj = components[j];
      if (i === j) {
        tc[i * n + j] = ci.criticalTemperatureK;
        pc[i * n + j] = ci.criticalPressurePa;
        om[i * n + j] = ci.acentricFactor;
        continue;
      }
      const t =
        Math.sqrt(ci.criticalTemperatureK * cj.criticalTemperatureK) * (1 - interactions.kij[i][j]);
      const vi = ci.criticalVolumeM3PerMol;
      const vj = cj.criticalVolumeM3PerMol;
      const zSum =
        (ci.criticalPressurePa * vi) / ci.criticalTemperatureK +
        (cj.criticalPressurePa * vj) / cj.criticalTemperatureK;
      const root = Math.cbrt(vi) + Math.cbrt(vj);
      tc[i * n + j] = t;
      pc[i * n + j] = (4 * t * zSum) / (root * root * root);
      om[i * n + j] = 0.5 * (ci.acentricFactor + cj.acentricFactor);
    }
  }
  const info: ModelInfo = {
    id: "virial",
    name: "Virial equation to B (Tsonopoulos 1974)",
    citation:
      "C. Tsonopoulos, An empirical correlation of second virial coefficients, AIChE J. 20 (1974) 263-272",
    componentIds: ids,
  };
  const pairB = new Float64Array(n * n);
  const scratch: SecondVirial = { b: 0, tDb: 0, ttD2b: 0 };

  function mixtureB(T: number, x: readonly number[], withPairs: boolean): SecondVirial {
    let b = 0;
    let tDb = 0;
    let ttD2b = 0;
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const k = i * n + j;
        tsonopoulosB(T, tc[k], pc[k], om[k], scratch);
        const w = x[i] * x[j];
        b += w * scratch.b;
        tDb += w * scratch.tDb;
        ttD2b += w * scratch.ttD2b;
        if (withPairs) pairB[k] = scratch.b;
      }
    }
    return { b, tDb, ttD2b };
  }

  /** Tsonopoulos B_ij in hyper-dual arithmetic (independent of the closed-form derivatives). */
  function pairBHyperDual(T: HyperDual, k: number): HyperDual {
    const y = T.inv().mul(tc[k]);
    const y2 = y.mul(y);
    const y3 = y2.mul(y);
    const y8 = y2.mul(y2).mul(y2).mul(y2);
    const c = TSONOPOULOS;
    const f0 = y
      .mul(c.F0_1)
      .add(c.F0_0)
      .add(y2.mul(c.F0_2))
      .add(y3.mul(c.F0_3))
      .add(y8.mul(c.F0_8));
    const f1 = y2.mul(c.F1_2).add(c.F1_0).add(y3.mul(c.F1_3)).add(y8.mul(c.F1_8));
    return f0.add(f1.mul(om[k])).mul((R * tc[k]) / pc[k]);
  }
  const model: VirialModel = {
    info,
    interactions,
    pressureFunction(T: HyperDual, rho: HyperDual, x: readonly number[]): HyperDual {
      let B = HyperDual.constant(0);
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) B = B.add(pairBHyperDual(T, i * n + j).mul(x[i] * x[j]));
      }
      return rho.mul(R).mul(T).mul(B.mul(rho).add(1));
    },
    secondVirial: (T, x) => mixtureB(T, x, false),
    residual(
      T: number,
      rho: number,
      x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      const B = mixtureB(T, x, request?.composition === true);
      if (B.b < 0 && !(rho <= -1 / (2 * B.b))) {
        throw new OutOfRangeError({
          input: "densityMolPerM3",
          unit: "mol/m3",
          validRange: `at most -1/(2B) = ${-1 / (2 * B.b)} mol/m3 (beyond it the truncated virial equation has dP/drho < 0)`,
          received: rho,
        });
      }
      const r = {
        a: B.b * rho,
        aD: B.b * rho,
        aDD: 0,
        aT: B.tDb * rho,
        aTT: B.ttD2b * rho,
        aDT: B.tDb * rho,
        aDDD: 0,
      };
      if (!request?.composition) return r;
      const dnA = new Array<number>(n);
      for (let i = 0; i < n; i++) {
        let s = 0;
        for (let j = 0; j < n; j++) s += x[j] * pairB[i * n + j];
        dnA[i] = 2 * rho * s;
      }
      return { ...r, dnA };
    },
    maxDensity(T: number, x: readonly number[]): number {
      const b = mixtureB(T, x, false).b;
      return b < 0 ? -1 / (2 * b) : Infinity;
    },
    densityRoots(T: number, P: number, x: readonly number[]): number[] {
      const b = mixtureB(T, x, false).b;
      const c = P / (R * T);
      if (b === 0) return [c];
      const disc = 1 + 4 * b * c;
      if (!(disc >= 0)) return [];
      // the root on the stable branch (dP/drho = RT(1 + 2 B rho) > 0), cancellation-free
      return [(2 * c) / (1 + Math.sqrt(disc))];
    },
    pseudoCritical(x: readonly number[]) {
      let Tc = 0;
      let Pc = 0;
      let Vc = 0;
      for (let i = 0; i < n; i++) {
        Tc += x[i] * components[i].criticalTemperatureK;
        Pc += x[i] * components[i].criticalPressurePa;
        Vc += x[i] * components[i].criticalVolumeM3PerMol;
      }
      return {
        temperatureK: Tc,
        pressurePa: Pc,
        densityMolPerM3: Vc > 0 ? 1 / Vc : Pc / (0.29 * R * Tc),
        rule: "Kay's rule (mole-fraction averages of Tc, Pc, Vc)",
      };
    },
    checkValidity(T: number, rho: number, x: readonly number[]): ResultWarning[] {
      const pcr = model.pseudoCritical!(x);
      const warnings: ResultWarning[] = [];
      const polar = ids.filter((id, i) => x[i] > 0 && STRONGLY_POLAR.has(id));
      if (polar.length > 0) {
        warnings.push({
          code: "model-limitation",
          message: `${polar.join(", ")}: strongly polar or hydrogen-bonding; Tsonopoulos' polar term is not included, so B is the non-polar estimate and can be far too small in magnitude`,
        });
      }
      if (rho > 0.5 * pcr.densityMolPerM3) {
        warnings.push({
          code: "outside-validity",
          message: `the virial equation truncated after B is meant for densities below about half the critical density (${(0.5 * pcr.densityMolPerM3).toPrecision(4)} mol/m3); this state has ${rho.toPrecision(4)} mol/m3`,
        });
      }
      void T;
      return warnings;
    },
  };
  if (n > 1) {
    components.forEach((c, i) => {
      if (!(c.criticalVolumeM3PerMol > 0)) {
        throw new InputError({
          input: `components[${i}] (${c.id}).criticalVolumeM3PerMol`,
          unit: "m3/mol",
          validRange: "a finite number > 0 (the Tsonopoulos Pc_ij rule needs it)",
          received: c.criticalVolumeM3PerMol,
        });
      }
    });
  }
  return model;
}
