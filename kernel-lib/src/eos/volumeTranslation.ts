/**
 * Peneloux volume translation as a wrapper around any residual model: v = v_eos - c, with
 * c = sum_i x_i c_i independent of temperature (A. Peneloux, E. Rauzy, R. Freze, A consistent
 * correction for Redlich-Kwong-Soave volumes, Fluid Phase Equilib. 8 (1982) 7-23).
 *
 * With r = 1/(1 + c rho) and rho_e = r rho (the density the untranslated equation sees):
 *   alpha_r(T, rho) = alpha_e(T, rho_e) + ln r,
 *   aD  = r aD_e - (1 - r),                                   so Z = r Z_e,
 *   aDD = r^2 aDD_e - 2 r (1 - r) aD_e + (1 - r)^2,
 *   aDDD = r^3 aDDD_e - 6 r^2 (1 - r) aDD_e + 6 r (1 - r)^2 aD_e - 2 (1 - r)^3,
 *   aT = aT_e, aTT = aTT_e, aDT = r aDT_e,  aDDT = r^2 aDDT_e - 2 r (1 - r) aDT_e,
 *   d(n alpha_r)/dn_i = dnA_e,i - c_i rho_e Z_e + ln r.
 * Where translation changes results: at the same T and P, ln phi_i = ln phi_e,i - c_i P/(R T),
 * the same factor in every phase, so equilibrium ratios (and flash results) are unchanged; the
 * molar volume drops by c, the enthalpy by c P, the entropy and cp are unchanged.
 *
 * Shift correlations (c from the Rackett compressibility Z_RA, here estimated by
 * Z_RA = 0.29056 - 0.08775 omega, Yamada & Gunn, J. Chem. Eng. Data 18 (1973) 234):
 *   SRK: c = 0.40768 (0.29441 - Z_RA) R Tc / Pc   (Peneloux et al. 1982, eq. 9),
 *   PR:  c = 0.50033 (0.25969 - Z_RA) R Tc / Pc   (the analogous Peng-Robinson form; from memory
 *        of its reprint in Whitson & Brule, Phase Behavior, SPE Monograph 20 (2000), ch. 4).
 * Or the caller gives c_i (m3/mol) directly.
 *
 * Rackett-fitted shift (`rackettShift`, option "rackett" of createModel): the same constant
 * translation, with c_i fitted so that the cubic's liquid volume equals the modified Rackett
 * saturated-liquid volume (Spencer & Danner 1972, components/rackettLiquidVolume.ts, with the
 * component's fitted Z_RA) at Tr = 0.7, Peneloux et al.'s matching point:
 *   c_i = v_L,eos(0.7 Tc, P70) - V_Rackett(0.7 Tc),   P70 = Pc 10^-(1 + omega).
 * P70 is the vapour pressure at Tr = 0.7 by the definition of the acentric factor (Pitzer et al.,
 * J. Am. Chem. Soc. 77 (1955) 3433), which the Soave and Peng-Robinson alpha functions were fitted
 * to reproduce; the liquid volume barely depends on the pressure there, so no saturation solve is
 * needed. Peneloux's correlation above approximates the same quantity with an estimated Z_RA.
 */
import { R } from "../constants.js";
import { InputError, type ResultWarning } from "../errors.js";
import type {
  ResidualDerivatives,
  ResidualDerivativesDraft,
  ResidualModel,
  ResidualRequest,
} from "./types.js";
import type { ModelComponent } from "./modelComponent.js";
import { hasPressureFunction } from "./pressureFunction.js";
import type { HyperDual } from "../numerics/hyperDual.js";
import { rackettSaturatedLiquidVolume } from "../components/rackettLiquidVolume.js";
import { createCubicModel } from "./cubic/cubicModel.js";
import type { CubicModelId } from "./cubic/cubicFamilies.js";

/** Peneloux shift c (m3/mol) for one component, for the SRK or PR family. */
export function penelouxShift(
  family: "soave-redlich-kwong" | "peng-robinson",
  component: Pick<ModelComponent, "criticalTemperatureK" | "criticalPressurePa" | "acentricFactor">,
): number {
  const zra = 0.29056 - 0.08775 * component.acentricFactor;
  const rtp = (R * component.criticalTemperatureK) / component.criticalPressurePa;
  return family === "soave-redlich-kwong"
    ? 0.40768 * (0.29441 - zra) * rtp
    : 0.50033 * (0.25969 - zra) * rtp;
}

/** Reduced temperature at which the Rackett-fitted shift matches the liquid volume. */
export const RACKETT_SHIFT_REDUCED_TEMPERATURE = 0.7;

/**
 * Constant volume shift c (m3/mol) of one component for a cubic model, fitted so that the
 * translated liquid volume equals the modified Rackett saturated-liquid volume at Tr = 0.7 (see the
 * header). Components without a tabulated Z_RA use the Yamada-Gunn estimate (then the result is
 * no better than Peneloux's correlation).
 *
 * @param modelId - the cubic model the shift is for ("peng-robinson", "soave-redlich-kwong", ...).
 * @throws InputError when the cubic has no liquid-like root at the matching point.
 * @example rackettShift("peng-robinson", getComponent("propane")) // about 3.3e-6 m3/mol
 */
export function rackettShift(modelId: CubicModelId, component: ModelComponent): number {
  const Tc = component.criticalTemperatureK;
  const T = RACKETT_SHIFT_REDUCED_TEMPERATURE * Tc;
  const P = component.criticalPressurePa * Math.pow(10, -1 - component.acentricFactor);
  const pure = createCubicModel(modelId, [component], { kij: [[0]] });
  const roots = pure.densityRoots ? pure.densityRoots(T, P, [1]) : [];
  const rhoL = roots.length > 0 ? roots[roots.length - 1] : NaN;
  // a liquid root has Z well below the critical compressibility (about 0.3 for cubics)
  if (!(rhoL > 0 && P / (rhoL * R * T) < 0.1)) {
    throw new InputError({
      input: `${component.id} (constants for the Rackett-fitted shift)`,
      unit: "-",
      validRange: `constants for which ${modelId} has a liquid root at Tr = 0.7 and P = Pc 10^-(1+omega)`,
      received: `roots ${roots.join(", ")} mol/m3 at ${T} K, ${P} Pa`,
    });
  }
  return 1 / rhoL - rackettSaturatedLiquidVolume(component, T);
}

/** How a translated model names itself (default: the Peneloux description). */
export interface VolumeTranslationLabel {
  /** Appended to the base model id after "+", e.g. "rackett". */
  readonly idSuffix: string;
  /** Appended to the base model name after "with ", e.g. "volume translation fitted to Rackett". */
  readonly name: string;
  /** Citation appended to the base model's. */
  readonly citation: string;
}

const PENELOUX_LABEL: VolumeTranslationLabel = {
  idSuffix: "peneloux",
  name: "Peneloux volume translation",
  citation: "A. Peneloux, E. Rauzy, R. Freze, Fluid Phase Equilib. 8 (1982) 7-23",
};

/** The label of the Rackett-fitted translation (createModel option "rackett"). */
export const RACKETT_TRANSLATION_LABEL: VolumeTranslationLabel = {
  idSuffix: "rackett",
  name: "volume translation fitted to the Rackett liquid volume at Tr = 0.7",
  citation:
    "constant shift as in A. Peneloux, E. Rauzy, R. Freze, Fluid Phase Equilib. 8 (1982) 7-23, fitted to the modified Rackett equation of C.F. Spencer, R.P. Danner, J. Chem. Eng. Data 17 (1972) 236",
};

/**
 * Wraps `base` with a constant volume shift per component.
 *
 * @param shiftsM3PerMol - c_i in m3/mol, one per component (positive shrinks the volume).
 * @param label - how the result names itself; default the Peneloux description.
 */
export function withVolumeTranslation(
  base: ResidualModel,
  shiftsM3PerMol: readonly number[],
  label: VolumeTranslationLabel = PENELOUX_LABEL,
): ResidualModel {
  const n = base.info.componentIds.length;
  if (!(Array.isArray(shiftsM3PerMol) && shiftsM3PerMol.length === n)) {
    throw new InputError({
      input: "shiftsM3PerMol",
      unit: "m3/mol",
      validRange: `${n} finite numbers, one per component`,
      received: shiftsM3PerMol,
    });
  }
  shiftsM3PerMol.forEach((c, i) => {
    if (!Number.isFinite(c)) {
      throw new InputError({
        input: `shiftsM3PerMol[${i}]`,
        unit: "m3/mol",
        validRange: "a finite number",
        received: c,
      });
    }
  });
  const shifts = shiftsM3PerMol.slice();
  const mixShift = (x: readonly number[]): number => {
    let c = 0;
    for (let i = 0; i < n; i++) c += x[i] * shifts[i];
    return c;
  };
  const basePressure = hasPressureFunction(base) ? base.pressureFunction : undefined;
  const model: { -readonly [K in keyof ResidualModel]: ResidualModel[K] } = {
    // P(T, rho) = P_e(T, rho / (1 + c rho))
    ...(basePressure && {
      pressureFunction: (T: HyperDual, rho: HyperDual, x: readonly number[]): HyperDual =>
        basePressure(T, rho.div(rho.mul(mixShift(x)).add(1)), x),
    }),
    info: {
      ...base.info,
      id: `${base.info.id}+${label.idSuffix}`,
      name: `${base.info.name} with ${label.name}`,
      citation: `${base.info.citation}; ${label.citation}`,
    },
    gasConstant: base.gasConstant,
    residual(
      T: number,
      rho: number,
      x: readonly number[],
      request?: ResidualRequest,
    ): ResidualDerivatives {
      const c = mixShift(x);
      const r = 1 / (1 + c * rho);
      const rhoE = r * rho;
      const e = base.residual(T, rhoE, x, request);
      const s = 1 - r;
      const lnR = Math.log(r);
      const out: ResidualDerivativesDraft = {
        a: e.a + lnR,
        aD: r * e.aD - s,
        aDD: r * r * e.aDD - 2 * r * s * e.aD + s * s,
        aT: e.aT,
        aTT: e.aTT,
        aDT: r * e.aDT,
      };
      // T d(aDD)/dT at constant rho (r and rho_e do not depend on T)
      if (e.aDDT !== undefined) out.aDDT = r * r * e.aDDT - 2 * r * s * e.aDT;
      if (e.aDDD !== undefined) {
        out.aDDD =
          r * r * r * e.aDDD - 6 * r * r * s * e.aDD + 6 * r * s * s * e.aD - 2 * s * s * s;
      }
      if (e.dnA) {
        const zE = 1 + e.aD;
        out.dnA = e.dnA.map((d, i) => d - shifts[i] * rhoE * zE + lnR);
      }
      return out;
    },
    maxDensity(T: number, x: readonly number[]): number {
      const m = base.maxDensity(T, x);
      const c = mixShift(x);
      if (m === Infinity) return c > 0 ? 1 / c : Infinity;
      const d = 1 - c * m;
      return d > 0 ? m / d : Infinity;
    },
    pseudoCritical: base.pseudoCritical
      ? (x: readonly number[]) => {
          const p = base.pseudoCritical!(x);
          const c = mixShift(x);
          return { ...p, densityMolPerM3: 1 / (1 / p.densityMolPerM3 - c) };
        }
      : undefined,
    checkValidity: (T: number, rho: number, x: readonly number[]): readonly ResultWarning[] => {
      const c = mixShift(x);
      return base.checkValidity ? base.checkValidity(T, rho / (1 + c * rho), x) : [];
    },
  };
  if (base.densityRoots) {
    const roots = base.densityRoots.bind(base);
    model.densityRoots = (T: number, P: number, x: readonly number[]): number[] => {
      const c = mixShift(x);
      const out: number[] = [];
      for (const rhoE of roots(T, P, x)) {
        const d = 1 - c * rhoE;
        if (d > 0) out.push(rhoE / d);
      }
      return out.sort((p, q) => p - q);
    };
  }
  return model;
}
