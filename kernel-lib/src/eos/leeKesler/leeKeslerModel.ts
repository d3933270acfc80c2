/**
 * Lee-Kesler three-parameter corresponding states (Lee & Kesler, AIChE J. 21 (1975) 510) as a
 * residual Helmholtz model, mixtures by the Lee-Kesler-Ploecker rules (Ploecker, Knapp & Prausnitz,
 * Ind. Eng. Chem. Process Des. Dev. 17 (1978) 324):
 *   Zc_i = 0.2905 - 0.085 omega_i,  Vc_i = Zc_i R Tc_i / Pc_i,
 *   Vc_ij = (Vc_i^(1/3) + Vc_j^(1/3))^3 / 8,  Tc_ij = sqrt(Tc_i Tc_j)(1 - k_ij),
 *   Vcm = sum sum x_i x_j Vc_ij,  Tcm = sum sum x_i x_j Vc_ij^eta Tc_ij / Vcm^eta  (eta = 0.25),
 *   omega_m = sum x_i omega_i,  Zcm = 0.2905 - 0.085 omega_m,  Pcm = Zcm R Tcm / Vcm.
 *
 * Interpolation: alpha_r = alpha_0 + (omega/omega_R)(alpha_R - alpha_0), evaluated at the same
 * reduced temperature T/Tcm and reduced density r = R Tcm rho / Pcm = rho Vcm / Zcm.
 * DEVIATION from the paper, stated: Lee and Kesler interpolate Z (and the departures) at the same
 * Tr and Pr, which is not a Helmholtz function of (T, rho). Interpolating the residual Helmholtz
 * energy at the same (Tr, r) keeps the model thermodynamically consistent (every property from one
 * function, exact fugacities); it is identical to the paper for omega = 0 and omega = omega_R and
 * differs at second order in between. Measured for omega = 0.2 against the paper's own
 * interpolation of the same two equations (tests/unit/eos/publishedValues.test.ts): |dZ| <= 0.003
 * for 1.1 <= Tr <= 3, 0.1 <= Pr <= 5 (gas and supercritical); in compressed liquid at Tr = 0.7 up
 * to 0.011 (1.4 %) at Pr = 5.
 *
 * Composition derivatives (exact): d(n alpha_r)/dn_i = alpha_r + aD + g_i - sum_k x_k g_k with
 * g_k = d alpha_r / dx_k = -aT dln Tcm/dx_k + aD (dln Vcm/dx_k + 0.085 omega_k / Zcm)
 *       + omega_k (alpha_R - alpha_0)/omega_R.
 */
import { pressureFromResidual } from "../residualRelations.js";
import table from "../data/leeKesler.json";
import { R } from "../../constants.js";
import type { ResultWarning } from "../../errors.js";
import type {
  ModelInfo,
  ResidualDerivatives,
  ResidualDerivativesDraft,
  ResidualRequest,
} from "../types.js";
import { checkModelComponents, type ModelComponent } from "../modelComponent.js";
import { resolveInteractions, type InteractionMatrix } from "../interaction/interactionTable.js";
import { HyperDual } from "../../numerics/hyperDual.js";
import type { ModelWithPressure } from "../pressureFunction.js";
import {
  leeKeslerFluid,
  type FluidDerivatives,
  type LeeKeslerConstants,
} from "./leeKeslerFluid.js";

/** The simple (omega = 0) and reference (n-octane, omega_R = 0.3978) fluid constants. */
export const LEE_KESLER_SIMPLE: LeeKeslerConstants = table.simple;
export const LEE_KESLER_REFERENCE: LeeKeslerConstants = table.reference;
/** Acentric factor of the reference fluid. */
export const LEE_KESLER_REFERENCE_OMEGA: number = table.referenceAcentricFactor;

/** Options of {@link createLeeKeslerModel}. */
export interface LeeKeslerModelOptions {
  /** k_ij of the Tc_ij rule (N x N). Default zero (reported as defaulted). */
  kij?: readonly (readonly number[])[];
}

/** Pseudo-critical constants of a Lee-Kesler mixture. */
export interface LeeKeslerPseudoCritical {
  /** K */
  temperatureK: number;
  /** m3/mol */
  volumeM3PerMol: number;
  /** Pa */
  pressurePa: number;
  acentricFactor: number;
}

/** The Lee-Kesler model with its mixing rules exposed. */
export interface LeeKeslerModel extends ModelWithPressure {
  readonly interactions: InteractionMatrix;
  /** Tcm, Vcm, Pcm, omega_m at composition x. */
  mixtureCritical(x: readonly number[]): LeeKeslerPseudoCritical;
}

/** Builds the Lee-Kesler model (pure or mixed). */
export function createLeeKeslerModel(
  components: readonly ModelComponent[],
  options: LeeKeslerModelOptions = {},
): LeeKeslerModel {
  checkModelComponents(components);
  const n = components.length;
  const ids = components.map((c) => c.id);
  const interactions = resolveInteractions(ids, "lee-kesler", options.kij);
  const { eta, zcIntercept, zcSlope } = table.mixing;
  const omegaR = LEE_KESLER_REFERENCE_OMEGA;
  const omega = components.map((c) => c.acentricFactor);
  const vc = components.map(
    (c) =>
      ((zcIntercept - zcSlope * c.acentricFactor) * R * c.criticalTemperatureK) /
      c.criticalPressurePa,
  );
  const vij = new Float64Array(n * n);
  const tvij = new Float64Array(n * n); // Vc_ij^eta Tc_ij
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const s = Math.cbrt(vc[i]) + Math.cbrt(vc[j]);
      const v = (s * s * s) / 8;
      vij[i * n + j] = v;
      tvij[i * n + j] =
        Math.pow(v, eta) *
        Math.sqrt(components[i].criticalTemperatureK * components[j].criticalTemperatureK) *
        (1 - interactions.kij[i][j]);
    }
  }
  const dV = new Float64Array(n);
  const dN = new Float64Array(n);
  function critical(x: readonly number[]): LeeKeslerPseudoCritical & { N: number } {
    let V = 0;
    let N = 0;
    let w = 0;
    for (let i = 0; i < n; i++) {
      let sv = 0;
      let sn = 0;
      for (let j = 0; j < n; j++) {
        sv += x[j] * vij[i * n + j];
        sn += x[j] * tvij[i * n + j];
      }
      dV[i] = 2 * sv;
      dN[i] = 2 * sn;
      V += x[i] * sv;
      N += x[i] * sn;
      w += x[i] * omega[i];
    }
    const Tc = N / Math.pow(V, eta);
    const zc = zcIntercept - zcSlope * w;
    return {
      temperatureK: Tc,
      volumeM3PerMol: V,
      pressurePa: (zc * R * Tc) / V,
      acentricFactor: w,
      N,
    };
  }
  const f0: FluidDerivatives = { a: 0, aD: 0, aDD: 0, aDDD: 0, aT: 0, aTT: 0, aDT: 0 };
  const fR: FluidDerivatives = { a: 0, aD: 0, aDD: 0, aDDD: 0, aT: 0, aTT: 0, aDT: 0 };
  const info: ModelInfo = {
    id: "lee-kesler",
    name: "Lee-Kesler (1975) corresponding states, Lee-Kesler-Ploecker mixing",
    citation: `${table.citation}; mixing: ${table.mixing.citation}`,
    componentIds: ids,
  };
  /** Z of one fluid, eq. 1 of the paper, in hyper-dual arithmetic. */
  function fluidZ(k: LeeKeslerConstants, tr: HyperDual, r: HyperDual): HyperDual {
    const t = tr.inv();
    const t2 = t.mul(t);
    const t3 = t2.mul(t);
    const B = t.mul(-k.b2).add(k.b1).sub(t2.mul(k.b3)).sub(t3.mul(k.b4));
    const C = t.mul(-k.c2).add(k.c1).add(t3.mul(k.c3));
    const D = t.mul(k.d2).add(k.d1);
    const r2 = r.mul(r);
    const r5 = r2.mul(r2).mul(r);
    const q = r2.mul(k.gamma);
    const tail = t3.mul(k.c4).mul(r2).mul(q.add(k.beta)).mul(q.neg().exp());
    return B.mul(r).add(C.mul(r2)).add(D.mul(r5)).add(tail).add(1);
  }
  const model: LeeKeslerModel = {
    info,
    interactions,
    pressureFunction(T: HyperDual, rho: HyperDual, x: readonly number[]): HyperDual {
      const c = critical(x);
      const zc = zcIntercept - zcSlope * c.acentricFactor;
      const tr = T.div(c.temperatureK);
      const r = rho.mul(c.volumeM3PerMol / zc);
      const z0 = fluidZ(LEE_KESLER_SIMPLE, tr, r);
      const zR = fluidZ(LEE_KESLER_REFERENCE, tr, r);
      const z = z0.add(zR.sub(z0).mul(c.acentricFactor / omegaR));
      return rho.mul(R).mul(T).mul(z);
    },
    mixtureCritical: (x) => {
      const c = critical(x);
      return {
        temperatureK: c.temperatureK,
        volumeM3PerMol: c.volumeM3PerMol,
        pressurePa: c.pressurePa,
        acentricFactor: c.acentricFactor,
      };
    },
    residual(
      T: number,
      rho: number,
      x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      const c = critical(x);
      const zc = zcIntercept - zcSlope * c.acentricFactor;
      const tr = T / c.temperatureK;
      const r = (rho * c.volumeM3PerMol) / zc;
      leeKeslerFluid(LEE_KESLER_SIMPLE, tr, r, f0);
      leeKeslerFluid(LEE_KESLER_REFERENCE, tr, r, fR);
      const wr = c.acentricFactor / omegaR;
      const mix = (p: number, q: number): number => p + wr * (q - p);
      const out: ResidualDerivativesDraft & { aDDD: number } = {
        a: mix(f0.a, fR.a),
        aD: mix(f0.aD, fR.aD),
        aDD: mix(f0.aDD, fR.aDD),
        aT: mix(f0.aT, fR.aT),
        aTT: mix(f0.aTT, fR.aTT),
        aDT: mix(f0.aDT, fR.aDT),
        aDDD: mix(f0.aDDD, fR.aDDD),
      };
      if (request?.composition) {
        const dOmega = (fR.a - f0.a) / omegaR;
        const g = new Array<number>(n);
        let sum = 0;
        for (let k = 0; k < n; k++) {
          const dlnTc = dN[k] / c.N - (eta * dV[k]) / c.volumeM3PerMol;
          const dlnR = dV[k] / c.volumeM3PerMol + (zcSlope * omega[k]) / zc;
          g[k] = -out.aT * dlnTc + out.aD * dlnR + omega[k] * dOmega;
          sum += x[k] * g[k];
        }
        out.dnA = g.map((gk) => out.a + out.aD + gk - sum);
      }
      return out;
    },
    maxDensity(_T: number, x: readonly number[]): number {
      // search limit, reduced density 20: beyond every liquid the correlation was fitted to
      const c = critical(x);
      const zc = zcIntercept - zcSlope * c.acentricFactor;
      return (20 * zc) / c.volumeM3PerMol;
    },
    pseudoCritical(x: readonly number[]) {
      const c = critical(x);
      // the simple fluid's own critical density is not a round number; for labels the Zc rule suffices
      return {
        temperatureK: c.temperatureK,
        pressurePa: c.pressurePa,
        densityMolPerM3: 1 / c.volumeM3PerMol,
        rule:
          n === 1
            ? "Tc, Pc of the component; Vc = Zc R Tc / Pc with Zc = 0.2905 - 0.085 omega"
            : "Lee-Kesler-Ploecker pseudo-critical constants",
      };
    },
    checkValidity(T: number, rho: number, x: readonly number[]): ResultWarning[] {
      const c = critical(x);
      const tr = T / c.temperatureK;
      const warnings: ResultWarning[] = [];
      if (!(tr >= 0.3 && tr <= 4)) {
        warnings.push({
          code: "outside-validity",
          message: `Lee-Kesler was fitted for 0.3 <= Tr <= 4; this state has Tr = ${tr.toPrecision(4)} (Tc of the mixture ${c.temperatureK.toPrecision(5)} K)`,
        });
      }
      // the fitted pressure range, Pr <= 10 (Lee and Kesler 1975; state/physicalLimits.ts)
      const pr = pressureFromResidual(T, rho, model.residual(T, rho, x).aD, R) / c.pressurePa;
      if (pr > 10) {
        warnings.push({
          code: "outside-validity",
          message: `Lee-Kesler was fitted for reduced pressures up to 10; this state has Pr = ${pr.toPrecision(4)} (Pc of the mixture ${c.pressurePa.toPrecision(5)} Pa)`,
        });
      }
      return warnings;
    },
  };
  return model;
}
