/**
 * Natural-convection heat transfer coefficients of a vessel wall, inside (the contents) and
 * outside (still air), from published correlations of the mean Nusselt number:
 *  - vertical surfaces: S. W. Churchill and H. H. S. Chu, "Correlating equations for laminar and
 *    turbulent free convection from a vertical plate", Int. J. Heat Mass Transfer 18 (1975)
 *    1323-1329, eq. (4): Nu_L = {0.825 + 0.387 Ra_L^(1/6) / [1 + (0.492/Pr)^(9/16)]^(8/27)}^2;
 *  - horizontal cylinders: S. W. Churchill and H. H. S. Chu, "Correlating equations for laminar
 *    and turbulent free convection from a horizontal cylinder", Int. J. Heat Mass Transfer 18
 *    (1975) 1049-1053, eq. (19): Nu_D = {0.60 + 0.387 Ra_D^(1/6) / [1 + (0.559/Pr)^(9/16)]^(8/27)}^2;
 *  - spheres: S. W. Churchill, in Heat Exchanger Design Handbook, Hemisphere 1983, section 2.5.7
 *    (from memory): Nu_D = 2 + 0.589 Ra_D^(1/4) / [1 + (0.469/Pr)^(9/16)]^(4/9).
 * Ra = g beta |T_wall - T_fluid| L^3 rho^2 cp / (mu k), properties of the fluid at its state
 * (beta the volume expansivity of the real fluid; for a two-phase content each phase with its
 * own properties on its own wetted area). These are correlations for external surfaces applied
 * to the inside of a closed vessel, the usual practice of lumped blowdown models (common
 * practice, no source); their uncertainty is tens of percent.
 *
 * Still air outside: viscosity by Sutherland's law mu = 1.716e-5 (T/273.15)^1.5 (383.55)/(T +
 * 110.4) Pa s and conductivity k = 0.0241 (T/273.15)^1.5 (467.15)/(T + 194) W/(m K) (from memory
 * of F. M. White, Viscous Fluid Flow, 3rd ed., Tables 1-2 and 1-3), cp = 1006 J/(kg K), air as an
 * ideal gas at 101325 Pa with molar mass 0.028965 kg/mol.
 */
import { InputError } from "../../errors.js";
import { R } from "../../constants.js";

/** Standard gravity, m/s2 (CGPM 1901, exact). */
const G = 9.80665;

/** Transport properties of a fluid state (from a transport-property method). */
export interface ContentsTransport {
  /** Dynamic viscosity, Pa s. */
  readonly viscosityPaS: number;
  /** Thermal conductivity, W/(m K). */
  readonly thermalConductivityWPerMK: number;
}

/** The fluid properties a natural-convection correlation needs. */
export interface ConvectionFluid {
  /** kg/m3 */
  readonly densityKgPerM3: number;
  /** J/(kg K) */
  readonly cpJPerKgK: number;
  /** Volume expansivity, 1/K. */
  readonly expansivityPerK: number;
  readonly viscosityPaS: number;
  readonly thermalConductivityWPerMK: number;
}

/** Which correlation. */
export type ConvectionSurface = "vertical" | "horizontal-cylinder" | "sphere";

/** Rayleigh number of a fluid over a temperature difference (K) and a length (m). */
export function rayleighNumber(f: ConvectionFluid, deltaTK: number, lengthM: number): number {
  const nu = f.viscosityPaS / f.densityKgPerM3;
  const alpha = f.thermalConductivityWPerMK / (f.densityKgPerM3 * f.cpJPerKgK);
  return (G * Math.abs(f.expansivityPerK) * Math.abs(deltaTK) * lengthM ** 3) / (nu * alpha);
}

/** Mean Nusselt number of the chosen correlation at Rayleigh number Ra and Prandtl number Pr. */
export function naturalConvectionNusselt(
  surface: ConvectionSurface,
  rayleigh: number,
  prandtl: number,
): number {
  if (!(rayleigh >= 0)) {
    throw new InputError({ input: "rayleigh", unit: "-", validRange: ">= 0", received: rayleigh });
  }
  if (!(prandtl > 0)) {
    throw new InputError({ input: "prandtl", unit: "-", validRange: "> 0", received: prandtl });
  }
  if (surface === "vertical") {
    return (
      (0.825 + (0.387 * rayleigh ** (1 / 6)) / (1 + (0.492 / prandtl) ** (9 / 16)) ** (8 / 27)) ** 2
    );
  }
  if (surface === "horizontal-cylinder") {
    return (
      (0.6 + (0.387 * rayleigh ** (1 / 6)) / (1 + (0.559 / prandtl) ** (9 / 16)) ** (8 / 27)) ** 2
    );
  }
  return 2 + (0.589 * rayleigh ** 0.25) / (1 + (0.469 / prandtl) ** (9 / 16)) ** (4 / 9);
}

/** Heat transfer coefficient W/(m2 K) of natural convection of fluid f over a wall. */
export function naturalConvectionCoefficient(
  surface: ConvectionSurface,
  f: ConvectionFluid,
  deltaTK: number,
  lengthM: number,
): number {
  const Pr = (f.viscosityPaS * f.cpJPerKgK) / f.thermalConductivityWPerMK;
  const Ra = rayleighNumber(f, deltaTK, lengthM);
  return (naturalConvectionNusselt(surface, Ra, Pr) * f.thermalConductivityWPerMK) / lengthM;
}

/** Properties of still air at the film temperature T (K), 101325 Pa (see the header). */
export function airAt(temperatureK: number): ConvectionFluid {
  if (!(temperatureK > 100 && temperatureK < 2000)) {
    throw new InputError({
      input: "air film temperature",
      unit: "K",
      validRange: "100 to 2000 K",
      received: temperatureK,
    });
  }
  const T = temperatureK;
  const M = 0.028965;
  return {
    densityKgPerM3: (101325 * M) / (R * T),
    cpJPerKgK: 1006,
    expansivityPerK: 1 / T,
    viscosityPaS: 1.716e-5 * (T / 273.15) ** 1.5 * ((273.15 + 110.4) / (T + 110.4)),
    thermalConductivityWPerMK: 0.0241 * (T / 273.15) ** 1.5 * ((273.15 + 194) / (T + 194)),
  };
}
