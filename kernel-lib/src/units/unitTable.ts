/**
 * The units the library reads and writes, defined from exact definitions.
 *
 * Sources of the factors (every one exact by definition):
 * - B. N. Taylor & A. Thompson, NIST Special Publication 811, "Guide for the Use of the
 *   International System of Units (SI)", 2008 edition, Appendix B.8 (factors in alphabetical order)
 *   and B.9 (by kind of quantity): atmosphere, bar, torr, mmHg, inch, foot, pound (avoirdupois),
 *   pound-force per square inch, British thermal unit (IT), temperature scales.
 * - International yard and pound agreement (1959): 1 ft = 0.3048 m, 1 lb = 0.45359237 kg.
 * - Fifth International Conference on the Properties of Steam (1956): 1 Btu_IT / lb = 2.326 kJ/kg,
 *   whence 1 Btu_IT = 1055.05585262 J.
 * - Standard acceleration of gravity g_n = 9.80665 m/s2 (3rd CGPM, 1901), which defines lbf.
 *
 * SI = (value * factor + offset) * M^molarMassPower, plus the atmospheric pressure for a gauge
 * unit; M is the molar mass in kg/mol, needed only by mass-based units (kJ/kg, kg/m3, lb, ...).
 */
import type { Dimension } from "./dimension.js";

/** One unit: how to convert a value in it to the library's SI molar basis. */
export interface UnitDefinition {
  /** The symbol the library writes, e.g. "kJ/(kg K)", "barg". */
  symbol: string;
  /** Other ways engineers write it (matched after removing spaces, · and *). */
  aliases: readonly string[];
  dimension: Dimension;
  /** SI value of one unit (of the difference, for offset temperatures). */
  factor: number;
  /** Added after scaling, for absolute temperatures on an offset scale (K). Default 0. */
  offset: number;
  /** True for gauge pressures: the atmospheric pressure is added to get absolute pressure. */
  gauge: boolean;
  /** Power of the molar mass (kg/mol) that takes the mass basis to the molar basis. */
  molarMassPower: -1 | 0 | 1;
}

// Exact base definitions (NIST SP 811, 2008, App. B.8).
/** Pound (avoirdupois), kg. */
export const POUND_KG = 0.45359237;
/** International foot, m. */
export const FOOT_M = 0.3048;
/** Inch, m. */
export const INCH_M = 0.0254;
/** Standard acceleration of gravity, m/s2. */
export const STANDARD_GRAVITY = 9.80665;
/** Pound-force per square inch, Pa (= lb g_n / in^2, about 6894.757). */
export const PSI_PA = (POUND_KG * STANDARD_GRAVITY) / (INCH_M * INCH_M);
/** British thermal unit (International Table), J. */
export const BTU_IT_J = 1055.05585262;
/** Standard atmosphere, Pa. */
export const ATMOSPHERE_PA = 101325;
const CUBIC_FOOT_M3 = FOOT_M * FOOT_M * FOOT_M;
const POUND_MOLE_MOL = 1000 * POUND_KG;

function unit(
  symbol: string,
  dimension: Dimension,
  factor: number,
  aliases: readonly string[] = [],
  extra: Partial<Pick<UnitDefinition, "offset" | "gauge" | "molarMassPower">> = {},
): UnitDefinition {
  return {
    symbol,
    aliases,
    dimension,
    factor,
    offset: extra.offset ?? 0,
    gauge: extra.gauge ?? false,
    molarMassPower: extra.molarMassPower ?? 0,
  };
}

const massBased = { molarMassPower: 1 } as const; // per kg -> per mol: multiply by M
const perMass = { molarMassPower: -1 } as const; // kg -> mol, kg/m3 -> mol/m3: divide by M

/** Pressure units that come in absolute and gauge forms: [base, factor, gauge symbol]. */
const GAUGEABLE: readonly [string, number, string][] = [
  ["kPa", 1e3, "kPa(g)"],
  ["MPa", 1e6, "MPa(g)"],
  ["bar", 1e5, "barg"],
  ["psi", PSI_PA, "psig"],
];

function pressureUnits(): UnitDefinition[] {
  const out: UnitDefinition[] = [
    unit("Pa", "pressure", 1, ["pascal", "Pa(a)"]),
    unit("atm", "pressure", ATMOSPHERE_PA, ["atm(a)", "atma"]),
    unit("mbar", "pressure", 100, ["mbar(a)", "mbara"]),
    unit("torr", "pressure", ATMOSPHERE_PA / 760, ["Torr"]),
    // Conventional millimetre of mercury: 133.322387415 Pa (NIST SP 811 B.8).
    unit("mmHg", "pressure", 133.322387415, []),
  ];
  for (const [base, factor, gaugeSymbol] of GAUGEABLE) {
    // A bare psi is ambiguous (see AMBIGUOUS_UNITS); a bare kPa, MPa or bar is absolute.
    const absSymbol = base === "psi" ? "psia" : base;
    const absAliases = [`${base}(a)`, `${base}(abs)`, `${base}abs`, `${base}a`];
    const gaugeAliases = [`${base}g`, `${base}(g)`, `${base}(gauge)`, `${base}gauge`];
    out.push(
      unit(
        absSymbol,
        "pressure",
        factor,
        absAliases.filter((x) => x !== absSymbol),
      ),
    );
    out.push(
      unit(
        gaugeSymbol,
        "pressure",
        factor,
        gaugeAliases.filter((x) => x !== gaugeSymbol),
        {
          gauge: true,
        },
      ),
    );
  }
  return out;
}

/** Every unit the library knows. */
export const UNIT_TABLE: readonly UnitDefinition[] = Object.freeze([
  // Temperature (NIST SP 811 B.8: T/K = t/°C + 273.15; T/K = (t/°F + 459.67)/1.8; T/K = T/°R / 1.8).
  unit("K", "temperature", 1, ["kelvin"]),
  unit("degC", "temperature", 1, ["°C", "celsius", "Celsius"], { offset: 273.15 }),
  unit("degF", "temperature", 5 / 9, ["°F", "fahrenheit", "Fahrenheit"], {
    offset: (459.67 * 5) / 9,
  }),
  unit("degR", "temperature", 5 / 9, ["°R", "rankine", "Rankine"]),

  ...pressureUnits(),

  // Amount of substance; mass units convert through the molar mass.
  unit("mol", "amount", 1, ["mole"]),
  unit("kmol", "amount", 1e3, ["kmole"]),
  unit("lbmol", "amount", POUND_MOLE_MOL, ["lb-mol", "lbmole", "lb-mole"]),
  unit("kg", "amount", 1, [], perMass),
  unit("t", "amount", 1e3, ["tonne"], perMass),
  unit("lb", "amount", POUND_KG, ["lbm", "lbs"], perMass),

  // Molar mass.
  unit("kg/mol", "molar-mass", 1),
  unit("g/mol", "molar-mass", 1e-3, ["kg/kmol", "lb/lbmol"]),

  // Molar energy (enthalpy, internal energy, Gibbs and Helmholtz energies).
  unit("J/mol", "molar-energy", 1, ["kJ/kmol"]),
  unit("kJ/mol", "molar-energy", 1e3, ["MJ/kmol"]),
  unit("Btu/lbmol", "molar-energy", BTU_IT_J / POUND_MOLE_MOL, ["Btu/lb-mol"]),
  unit("J/kg", "molar-energy", 1, [], massBased),
  unit("kJ/kg", "molar-energy", 1e3, [], massBased),
  unit("Btu/lb", "molar-energy", BTU_IT_J / POUND_KG, ["Btu/lbm"], massBased),

  // Molar entropy and heat capacity.
  unit("J/(mol K)", "molar-entropy", 1, ["J/mol/K", "J/molK", "kJ/(kmol K)", "kJ/kmol/K"]),
  unit("kJ/(mol K)", "molar-entropy", 1e3, ["kJ/mol/K"]),
  unit("Btu/(lbmol degR)", "molar-entropy", BTU_IT_J / POUND_MOLE_MOL / (5 / 9), [
    "Btu/(lbmol degF)",
    "Btu/lbmol/degR",
    "Btu/lbmol/degF",
    "Btu/(lbmol R)",
    "Btu/(lbmol F)",
  ]),
  unit("J/(kg K)", "molar-entropy", 1, ["J/kg/K", "J/kgK"], massBased),
  unit("kJ/(kg K)", "molar-entropy", 1e3, ["kJ/kg/K", "kJ/kgK"], massBased),
  unit(
    "Btu/(lb degR)",
    "molar-entropy",
    BTU_IT_J / POUND_KG / (5 / 9),
    ["Btu/(lb degF)", "Btu/lb/degR", "Btu/lb/degF", "Btu/(lb R)", "Btu/(lb F)"],
    massBased,
  ),

  // Molar volume.
  unit("m3/mol", "molar-volume", 1),
  unit("m3/kmol", "molar-volume", 1e-3, ["L/mol", "dm3/mol"]),
  unit("cm3/mol", "molar-volume", 1e-6, ["mL/mol"]),
  unit("ft3/lbmol", "molar-volume", CUBIC_FOOT_M3 / POUND_MOLE_MOL),
  unit("m3/kg", "molar-volume", 1, [], massBased),
  unit("ft3/lb", "molar-volume", CUBIC_FOOT_M3 / POUND_KG, ["ft3/lbm"], massBased),

  // Molar density; mass densities convert through the molar mass.
  unit("mol/m3", "molar-density", 1),
  unit("kmol/m3", "molar-density", 1e3, ["mol/L", "mol/dm3"]),
  unit("lbmol/ft3", "molar-density", POUND_MOLE_MOL / CUBIC_FOOT_M3),
  unit("kg/m3", "molar-density", 1, ["g/L"], perMass),
  unit("g/cm3", "molar-density", 1e3, ["g/mL", "kg/L"], perMass),
  unit("lb/ft3", "molar-density", POUND_KG / CUBIC_FOOT_M3, ["lbm/ft3"], perMass),

  // Speed (of sound).
  unit("m/s", "speed", 1),
  unit("km/h", "speed", 1 / 3.6),
  unit("ft/s", "speed", FOOT_M),

  // Joule-Thomson coefficient: a temperature difference per pressure difference (no offset,
  // no gauge), so degC/bar = K/bar and a bare psi is unambiguous here.
  unit("K/Pa", "joule-thomson", 1),
  unit("K/kPa", "joule-thomson", 1e-3, ["degC/kPa"]),
  unit("K/MPa", "joule-thomson", 1e-6, ["degC/MPa"]),
  unit("K/bar", "joule-thomson", 1e-5, ["degC/bar"]),
  unit("K/atm", "joule-thomson", 1 / ATMOSPHERE_PA, ["degC/atm"]),
  unit("degF/psi", "joule-thomson", 5 / 9 / PSI_PA, ["degR/psi"]),

  // Power (heat duty).
  unit("W", "power", 1),
  unit("kW", "power", 1e3),
  unit("MW", "power", 1e6),
  unit("Btu/h", "power", BTU_IT_J / 3600, ["Btu/hr"]),
  // Horsepower (550 ft lbf/s, NIST SP 811 B.8: 745.6999 W) and metric horsepower (75 kgf m/s).
  unit("hp", "power", 550 * FOOT_M * POUND_KG * STANDARD_GRAVITY, ["bhp"]),
  unit("hp(metric)", "power", 75 * STANDARD_GRAVITY),
]);

/**
 * Unit strings refused as ambiguous, with the choices offered. A bare "psi" may be absolute or
 * gauge; a bare "g" may be a gram or a gauge marker; a bare "deg" names no scale.
 */
export const AMBIGUOUS_UNITS: Readonly<Record<string, readonly string[]>> = Object.freeze({
  psi: ["psia", "psig"],
  g: ["kg (mass)", "g/mol (molar mass)", "barg, psig or kPa(g) (gauge pressure)"],
  gram: ["kg (mass)", "g/mol (molar mass)"],
  deg: ["degC", "degF", "degR", "K"],
  C: ["degC"],
  F: ["degF"],
  R: ["degR", "J/(mol K) (the gas constant is not a unit)"],
  ton: ["t (tonne, 1000 kg)"],
  cal: ["J (the thermochemical and IT calories differ; convert explicitly)"],
});
