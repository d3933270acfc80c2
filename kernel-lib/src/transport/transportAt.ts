/**
 * Viscosity and thermal conductivity of one phase at (T, rho, x): the entry of transport/.
 * Pure water bound to the IAPWS-95 equation gets the IAPWS formulations (iapwsWater.ts); every
 * other fluid Chung et al. (1988) (chung.ts), with its dilute-gas limit at rho = 0. The
 * thermodynamic inputs (ideal-gas cv for Chung; cp, cv and (drho/dP)_T of IAPWS-95 for the
 * conductivity's critical enhancement) come from the fluid's own binding through state/.
 */
import type { Component } from "../components/types.js";
import { getComponent } from "../components/getComponent.js";
import { InputError, OutOfRangeError, type ResultWarning } from "../errors.js";
import { dPdRho } from "../eos/residualRelations.js";
import { checkComposition, checkDensity, checkTemperature } from "../state/checkInputs.js";
import { stateAtTRho } from "../state/stateAt.js";
import type { FluidState } from "../state/types.js";
import {
  chungParameters,
  chungReducedDensity,
  chungThermalConductivity,
  chungViscosity,
  type ChungComponent,
} from "./chung.js";
import {
  IAPWS_MOLAR_MASS_KG_PER_MOL,
  IAPWS_REFERENCE_TEMPERATURE_K,
  iapwsBackgroundConductivity,
  iapwsBackgroundViscosity,
  iapwsCorrelationLengthNm,
  iapwsCriticalEnhancement,
  iapwsViscosityEnhancement,
} from "./iapwsWater.js";
import { polarityOf } from "./polarity.js";
import type {
  TransportFluid,
  TransportOfState,
  TransportOptions,
  TransportProperties,
} from "./types.js";

const CHUNG_CITATION =
  "T.-H. Chung, M. Ajlan, L. L. Lee and K. E. Starling (1988), Generalized multiparameter correlation for nonpolar and polar fluid transport properties, Ind. Eng. Chem. Res. 27, 671-679; dilute gas: T.-H. Chung, L. L. Lee and K. E. Starling (1984), Ind. Eng. Chem. Fundam. 23, 8-13; as written in B. E. Poling, J. M. Prausnitz and J. P. O'Connell (2001), The Properties of Gases and Liquids, 5th ed., McGraw-Hill, chapters 9 and 10.";

const IAPWS_CITATION =
  "IAPWS R12-08, Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary Water Substance (with the critical enhancement, from IAPWS-95); M. L. Huber et al. (2009), J. Phys. Chem. Ref. Data 38, 101-125. IAPWS R15-11, Release on the IAPWS Formulation 2011 for the Thermal Conductivity of Ordinary Water Substance (with the critical enhancement, from IAPWS-95); M. L. Huber et al. (2012), J. Phys. Chem. Ref. Data 41, 033102.";

const PURE: readonly number[] = [1];

/** Is this fluid pure water bound to the IAPWS-95 reference equation? */
export function isIapws95Water(fluid: TransportFluid): boolean {
  const info = fluid.model.info;
  return (
    info.id === "reference" && info.componentIds.length === 1 && info.componentIds[0] === "water"
  );
}

function componentsOf(fluid: TransportFluid): readonly Component[] {
  return fluid.components ?? fluid.model.info.componentIds.map((id) => getComponent(id));
}

/**
 * Chung's constants of each component: dipole moment and association factor from polarity.ts
 * (zero, with a warning, for a component it does not list); Vc from Pitzer's Zc = 0.291 - 0.080
 * omega (from memory of Reid, Prausnitz and Poling 1987, The Properties of Gases and Liquids,
 * 4th ed., section 2-3) when the record has none, with a warning.
 */
function chungComponents(
  components: readonly Component[],
  warnings: ResultWarning[],
): ChungComponent[] {
  return components.map((c) => {
    const polar = polarityOf(c.id);
    if (polar === undefined) {
      warnings.push({
        code: "accuracy",
        message: `transport properties: the dipole moment and association factor of ${c.id} are not in the transport table (transport/polarity.ts) and are taken as zero in Chung's method; for a polar or associating component the viscosity and conductivity may then be off by more than the method's usual accuracy`,
      });
    }
    let Vc = c.criticalVolumeM3PerMol;
    if (!(Vc > 0)) {
      const Zc = 0.291 - 0.08 * c.acentricFactor;
      Vc = (Zc * 8.314462618 * c.criticalTemperatureK) / c.criticalPressurePa;
      warnings.push({
        code: "accuracy",
        message: `transport properties: ${c.id} has no critical volume; Chung's method uses Vc = ${(Vc * 1e6).toPrecision(4)} cm3/mol from Pitzer's Zc = 0.291 - 0.080 omega`,
      });
    }
    return {
      criticalTemperatureK: c.criticalTemperatureK,
      criticalVolumeM3PerMol: Vc,
      molarMassKgPerMol: c.molarMassKgPerMol,
      acentricFactor: c.acentricFactor,
      dipoleDebye: polar?.dipoleDebye ?? 0,
      association: polar?.association ?? 0,
    };
  });
}

function chungAt(
  fluid: TransportFluid,
  T: number,
  rho: number,
  x: readonly number[],
  warnings: ResultWarning[],
): { viscosityPaS: number; thermalConductivityWPerMK: number } {
  const p = chungParameters(chungComponents(componentsOf(fluid), warnings), x);
  const y = chungReducedDensity(p, rho);
  if (!(y < 0.6)) {
    throw new OutOfRangeError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: `below ${((0.6 * 6) / (p.criticalVolumeCm3PerMol * 1e-6)).toPrecision(4)} mol/m3 for Chung's method here (reduced density rho Vc / 6 below 0.6, beyond any liquid it was fitted to; it diverges at 1)`,
      received: rho,
    });
  }
  const Tr = T / p.criticalTemperatureK;
  const liquidLike = rho * p.criticalVolumeCm3PerMol * 1e-6 > 2;
  if (liquidLike) {
    warnings.push({
      code: "accuracy",
      message: `transport properties: a liquid-like density (${(rho * p.criticalVolumeCm3PerMol * 1e-6).toFixed(2)} times the critical): the viscosity follows the density steeply here (liquid methane at 120 K: about 6 % per 1 % of density, 3 % for the conductivity), so the model's liquid density decides the accuracy; a cubic equation without volume translation can be 10 % off in liquid density (use volumeTranslation: "rackett" or a reference equation)`,
    });
  }
  const reducedDensity = rho * p.criticalVolumeCm3PerMol * 1e-6;
  if (Tr > 0.9 && Tr < 1.2 && reducedDensity > 0.3 && reducedDensity < 2) {
    // the bounds are a generous rule of thumb (common practice, no source): nitrogen at its
    // critical point reads 29 mW/(m K) against 676 (Lemmon and Jacobsen 2004, from memory)
    warnings.push({
      code: "model-limitation",
      message: `transport properties: near the critical point (Tr = ${Tr.toFixed(3)}, rho/rho_c = ${reducedDensity.toFixed(2)} on Chung's mixture constants): Chung's method has no critical enhancement, so the true thermal conductivity is higher, up to many times at the critical point itself; the viscosity is little affected`,
    });
  }
  if (liquidLike && Tr < 0.6) {
    warnings.push({
      code: "accuracy",
      message: `transport properties: a liquid at Tr = ${Tr.toFixed(3)} (below 0.6): Chung's viscosity may be off by 20 % or more here (from memory of Poling et al. 2001, section 9-6); a liquid-specific viscosity method is better far below the critical temperature`,
    });
  }
  const tStar = (1.2593 * T) / p.criticalTemperatureK;
  if (!(tStar >= 0.3 && tStar <= 100)) {
    warnings.push({
      code: "outside-validity",
      message: `transport properties: T* = 1.2593 T / Tc = ${tStar.toPrecision(3)} is outside 0.3 to 100, the range of the collision integral of Neufeld, Janzen and Aziz (1972) that Chung's method uses; extrapolated`,
    });
  }
  const ideal = fluid.idealGas.at(T, 1e5, x);
  for (const w of ideal.warnings) {
    warnings.push({ code: w.code, message: `transport properties (ideal-gas cv): ${w.message}` });
  }
  const cv0 = ideal.cv;
  return {
    viscosityPaS: chungViscosity(p, T, rho),
    thermalConductivityWPerMK: chungThermalConductivity(p, T, rho, cv0),
  };
}

function iapwsAt(
  fluid: TransportFluid,
  T: number,
  rho: number,
  warnings: ResultWarning[],
): { viscosityPaS: number; thermalConductivityWPerMK: number } {
  // the releases' kg/m3 are IAPWS-95's mol/m3 times its own molar mass (the component table's
  // 18.015 g/mol differs by 1.5e-5 relative)
  const M = IAPWS_MOLAR_MASS_KG_PER_MOL;
  const rhoKg = rho * M;
  let viscosityPaS = iapwsBackgroundViscosity(T, rhoKg);
  let lambda = iapwsBackgroundConductivity(T, rhoKg);
  if (rho > 0) {
    // the critical enhancements, from the correlation length of IAPWS-95 (Delta chi at T and T_R)
    const state = stateAtTRho(fluid, T, rho, PURE);
    const model = fluid.model;
    const reference = model.residual(IAPWS_REFERENCE_TEMPERATURE_K, rho, PURE);
    const xi = iapwsCorrelationLengthNm(
      T,
      rhoKg,
      M / state.dPdRhoPaM3PerMol,
      M / dPdRho(IAPWS_REFERENCE_TEMPERATURE_K, reference, model.gasConstant),
    );
    viscosityPaS *= iapwsViscosityEnhancement(xi);
    lambda += iapwsCriticalEnhancement(T, rhoKg, {
      cpJPerKgK: state.molar.cp / M,
      cvJPerKgK: state.molar.cv / M,
      correlationLengthNm: xi,
      viscosityPaS,
    });
  }
  if (!(T >= 253.15 && T <= 1173.15)) {
    warnings.push({
      code: "outside-validity",
      message: `transport properties: T = ${T} K is outside the range of the IAPWS 2008 and 2011 formulations (about 253.15 K to 1173.15 K); extrapolated`,
    });
  }
  return { viscosityPaS, thermalConductivityWPerMK: lambda };
}

/**
 * Viscosity and thermal conductivity of one phase of the fluid at T (K), molar density rho
 * (mol/m3) and mole fractions x. rho = 0 gives the dilute-gas limit.
 *
 * Method: IAPWS 2008/2011 for pure water bound to IAPWS-95, Chung et al. (1988) otherwise (see
 * chung.ts for its stated accuracy: about 5-10 % for dense fluids, worse for cold liquids). For a
 * liquid the result is only as good as the density passed in: Chung's viscosity moves about 6 %
 * per 1 % of liquid density (liquid methane at 120 K), so take liquid densities from a model that
 * gets them right (a cubic with `volumeTranslation: "rackett"`, or a reference equation); liquid
 * states carry a warning saying so.
 * Transport properties of a two-phase mixture as a whole do not exist: call this per phase.
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane"] });
 * transportAtTRho(gas, 300, 40, [1]).viscosityPaS; // about 1.1e-5 Pa s
 * ```
 * @throws InputError for T <= 0, rho < 0, NaN or a bad composition; OutOfRangeError for a density
 *   beyond Chung's range.
 */
export function transportAtTRho(
  fluid: TransportFluid,
  temperatureK: number,
  densityMolPerM3: number,
  x?: readonly number[],
  options?: TransportOptions,
): TransportProperties {
  checkTemperature(temperatureK);
  if (!(densityMolPerM3 >= 0)) {
    throw new InputError({
      input: "densityMolPerM3",
      unit: "mol/m3",
      validRange: ">= 0 (0 is the dilute-gas limit)",
      received: densityMolPerM3,
    });
  }
  if (densityMolPerM3 > 0) checkDensity(densityMolPerM3);
  const n = fluid.model.info.componentIds.length;
  if (x === undefined && n !== 1) {
    throw new InputError({
      input: "x",
      unit: "mol/mol",
      validRange: `${n} mole fractions (required for a mixture)`,
      received: x,
    });
  }
  const xs = x ?? PURE;
  checkComposition(xs, n);
  const method = options?.method ?? "auto";
  if (!(method === "auto" || method === "chung-1988")) {
    throw new InputError({
      input: "options.method",
      unit: "-",
      validRange: '"auto" or "chung-1988"',
      received: method,
    });
  }
  const warnings: ResultWarning[] = [];
  const water = method === "auto" && isIapws95Water(fluid);
  const values = water
    ? iapwsAt(fluid, temperatureK, densityMolPerM3, warnings)
    : chungAt(fluid, temperatureK, densityMolPerM3, xs, warnings);
  if (!(values.viscosityPaS > 0 && values.thermalConductivityWPerMK > 0)) {
    throw new OutOfRangeError({
      input: "state (temperatureK, densityMolPerM3)",
      unit: "K, mol/m3",
      validRange: `a state where the ${water ? "IAPWS" : "Chung"} correlations give positive values`,
      received: { temperatureK, densityMolPerM3, ...values },
    });
  }
  return {
    temperatureK,
    densityMolPerM3,
    x: xs.slice(),
    viscosityPaS: values.viscosityPaS,
    thermalConductivityWPerMK: values.thermalConductivityWPerMK,
    method: water ? "iapws-2008-2011" : "chung-1988",
    citation: water ? IAPWS_CITATION : CHUNG_CITATION,
    warnings,
  };
}

/**
 * Transport properties of a state the engine computed (a single-phase state or one phase of an
 * equilibrium): its T, density and composition, with the fluid that made it. The state's own
 * warnings come first in the result's.
 */
export function transportOfState(
  fluid: TransportFluid,
  state: FluidState,
  options?: TransportOptions,
): TransportOfState {
  const t = transportAtTRho(fluid, state.temperatureK, state.densityMolPerM3, state.x, options);
  return {
    ...t,
    pressurePa: state.pressurePa,
    phase: state.phase,
    warnings: state.warnings.length > 0 ? [...state.warnings, ...t.warnings] : t.warnings,
  };
}
