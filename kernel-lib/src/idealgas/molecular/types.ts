/**
 * Types of the statistical-mechanics route: molecular constants as data, and the thermodynamic
 * contribution of one degree of freedom.
 *
 * Spectroscopic quantities (rotational constants, vibrational wavenumbers, electronic term values,
 * barrier heights) are kept in cm^-1, the unit in which they are tabulated; they are converted to
 * characteristic temperatures (K) with the second radiation constant in `spectroscopicUnits.ts`.
 * Everything else is SI.
 */

/** One harmonic vibrational mode (or a set of degenerate modes). */
export interface VibrationalMode {
  /** Fundamental (observed) wavenumber, cm^-1. */
  readonly wavenumberInvCm: number;
  /** Degeneracy (1, 2 for E, 3 for F/T modes). */
  readonly degeneracy: number;
  /**
   * Index into `internalRotors` if this mode is the torsion of that internal rotor. Such a mode is
   * replaced by the hindered (or free) rotor unless the torsion is treated as a harmonic oscillator.
   */
  readonly internalRotorIndex?: number;
  /** Optional label, e.g. "nu4 a1u torsion". */
  readonly label?: string;
}

/** One electronic level (term) with its total degeneracy. */
export interface ElectronicLevel {
  /** Term value above the ground level, cm^-1. */
  readonly energyInvCm: number;
  /** Degeneracy g (e.g. 3 for the O2 X 3Sigma_g^- ground state). */
  readonly degeneracy: number;
  /** Optional term symbol, e.g. "a 1Delta_g". */
  readonly term?: string;
}

/**
 * Nuclear-spin statistics of a homonuclear linear molecule, used when its rotational levels are
 * summed explicitly (e.g. H2: even J carry weight 1 (para), odd J weight 3 (ortho)).
 */
export interface NuclearSpinWeights {
  /** Statistical weight of even-J levels. */
  readonly even: number;
  /** Statistical weight of odd-J levels. */
  readonly odd: number;
}

/** A one-dimensional internal rotor with the potential V(phi) = V0/2 (1 - cos(n phi)). */
export interface InternalRotor {
  /** Barrier height V0, cm^-1. */
  readonly barrierInvCm: number;
  /** Fold n of the potential (3 for a methyl top). */
  readonly fold: number;
  /** Symmetry number of the internal rotation (3 for a methyl top). */
  readonly symmetryNumber: number;
  /** Reduced moment of inertia of the internal rotation, amu Angstrom^2. */
  readonly reducedMomentAmuA2: number;
  /** Optional label, e.g. "CH3-CH3 torsion". */
  readonly label?: string;
}

/** Watson's A-reduced quartic centrifugal-distortion constants, cm^-1. */
export interface WatsonQuarticConstants {
  readonly deltaJInvCm: number;
  readonly deltaJKInvCm: number;
  readonly deltaKInvCm: number;
  readonly smallDeltaJInvCm: number;
  readonly smallDeltaKInvCm: number;
}

/** Shape of the molecule, which selects the rotational partition function. */
export type MolecularGeometry = "atom" | "linear" | "nonlinear";

/** Molecular constants of one ideal-gas species, with citations. */
export interface MolecularConstants {
  /** Component id, matching the component table (e.g. "ethane"). */
  readonly id: string;
  /** Chemical formula, e.g. "C2H6". */
  readonly formula: string;
  /** Common name. */
  readonly name: string;
  /** Molar mass, kg/mol. */
  readonly molarMassKgPerMol: number;
  readonly geometry: MolecularGeometry;
  /** External rotational symmetry number (1 for atoms). */
  readonly symmetryNumber: number;
  /**
   * Ground-state rotational constants, cm^-1: [B] for a linear molecule, [A, B, C] for a nonlinear
   * one (symmetric tops have two equal entries, spherical tops three), [] for an atom.
   */
  readonly rotationalConstantsInvCm: readonly number[];
  /** If present (linear molecules only), rotational levels are summed explicitly with these weights. */
  readonly nuclearSpinWeights?: NuclearSpinWeights;
  /**
   * Centrifugal distortion of a linear molecule, cm^-1: [D, H] in the ground-state levels
   * E_J = B x - D x^2 + H x^3, x = J(J+1) (validated so the levels rise with J for every J). Used by the explicit level sum (molecules with
   * `nuclearSpinWeights`, or the "level-sum" option); ignored by the classical rotor. Default none.
   */
  readonly centrifugalDistortionInvCm?: readonly number[];
  /**
   * Watson's A-reduced quartic centrifugal-distortion constants of a nonlinear molecule (I^r
   * representation, a axis = z), cm^-1; when given, the classical rotor gets the first-order
   * correction of rotorDistortion.ts. Default none (rigid rotor).
   */
  readonly quarticDistortion?: WatsonQuarticConstants;
  readonly vibrations: readonly VibrationalMode[];
  /** Electronic levels; the ground level has energy 0. Default: a single non-degenerate ground level. */
  readonly electronicLevels: readonly ElectronicLevel[];
  readonly internalRotors: readonly InternalRotor[];
  /** Citations of the constants, one line per quantity group. */
  readonly sources: readonly string[];
  /** Known limits of the model for this molecule (anharmonicity, Fermi resonance, inversion, ...). */
  readonly notes?: readonly string[];
}

/**
 * Contribution of one degree of freedom (or the sum of several) to the molar ideal-gas properties
 * at the standard pressure, measured from the ground state at 0 K.
 */
export interface ThermoContribution {
  /** Heat capacity, J/(mol K): cp for translation (includes R from pV), cv = cp for internal modes. */
  readonly cp: number;
  /** h(T) - h(0 K), J/mol (for translation this includes the pV = RT term). */
  readonly enthalpyFrom0K: number;
  /** Entropy at 1 bar, J/(mol K). */
  readonly entropy: number;
}

/** The zero contribution (e.g. the rotation of an atom). */
export const NO_CONTRIBUTION: ThermoContribution = Object.freeze({
  cp: 0,
  enthalpyFrom0K: 0,
  entropy: 0,
});

/** Sum of contributions. */
export function sumContributions(parts: readonly ThermoContribution[]): ThermoContribution {
  let cp = 0;
  let h = 0;
  let s = 0;
  for (const p of parts) {
    cp += p.cp;
    h += p.enthalpyFrom0K;
    s += p.entropy;
  }
  return { cp, enthalpyFrom0K: h, entropy: s };
}
