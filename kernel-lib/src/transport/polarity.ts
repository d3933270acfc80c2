/**
 * Dipole moments and Chung's association factors of the table components, the polar inputs of
 * Chung et al. (1988) (chung.ts). The component table (components/) does not carry them.
 *
 * Dipole moments, debye: Poling, Prausnitz and O'Connell (2001), The Properties of Gases and
 * Liquids, 5th ed., McGraw-Hill, Appendix A (from memory of the table, rounded to one decimal as
 * printed there; not re-checked against the book). Nonpolar molecules are listed with 0 so that
 * a component missing here is known to be missing.
 *
 * Association factors kappa: Chung, Ajlan, Lee and Starling (1988), Ind. Eng. Chem. Res. 27,
 * 671-679, Table III (from memory: water 0.075908, methanol 0.215175, ethanol 0.174823); zero for
 * every other component, as the paper does for non-associating fluids.
 */

/** Polar inputs of one component: dipole moment (debye) and association factor (-). */
export interface Polarity {
  readonly dipoleDebye: number;
  readonly association: number;
}

const ZERO: Polarity = { dipoleDebye: 0, association: 0 };
const dipole = (d: number): Polarity => ({ dipoleDebye: d, association: 0 });

const TABLE: Readonly<Record<string, Polarity>> = {
  hydrogen: ZERO,
  nitrogen: ZERO,
  oxygen: ZERO,
  argon: ZERO,
  helium: ZERO,
  neon: ZERO,
  krypton: ZERO,
  xenon: ZERO,
  "carbon-monoxide": dipole(0.1),
  "carbon-dioxide": ZERO,
  water: { dipoleDebye: 1.8, association: 0.075908 },
  "hydrogen-sulfide": dipole(0.9),
  "sulfur-dioxide": dipole(1.6),
  "carbonyl-sulfide": dipole(0.7),
  "carbon-disulfide": ZERO,
  "methyl-mercaptan": dipole(1.3),
  "ethyl-mercaptan": dipole(1.5),
  ammonia: dipole(1.5),
  "nitric-oxide": dipole(0.2),
  "nitrous-oxide": dipole(0.2),
  "hydrogen-cyanide": dipole(3.0),
  "hydrogen-chloride": dipole(1.1),
  chlorine: ZERO,
  methane: ZERO,
  ethane: ZERO,
  propane: ZERO,
  "n-butane": ZERO,
  isobutane: dipole(0.1),
  "n-pentane": ZERO,
  isopentane: dipole(0.1),
  neopentane: ZERO,
  "n-hexane": ZERO,
  "2-methylpentane": ZERO,
  "3-methylpentane": ZERO,
  "2,2-dimethylbutane": ZERO,
  "2,3-dimethylbutane": ZERO,
  "n-heptane": ZERO,
  "n-octane": ZERO,
  "n-nonane": ZERO,
  "n-decane": ZERO,
  "n-undecane": ZERO,
  "n-dodecane": ZERO,
  "n-hexadecane": ZERO,
  ethylene: ZERO,
  propylene: dipole(0.4),
  "1-butene": dipole(0.3),
  isobutene: dipole(0.5),
  "1-pentene": dipole(0.4),
  "1-hexene": dipole(0.4),
  "1,3-butadiene": ZERO,
  acetylene: ZERO,
  cyclopentane: ZERO,
  cyclohexane: dipole(0.3),
  methylcyclohexane: ZERO,
  benzene: ZERO,
  toluene: dipole(0.4),
  ethylbenzene: dipole(0.4),
  "o-xylene": dipole(0.5),
  "m-xylene": dipole(0.3),
  "p-xylene": dipole(0.1),
  monoethanolamine: dipole(2.6),
  methanol: { dipoleDebye: 1.7, association: 0.215175 },
  ethanol: { dipoleDebye: 1.7, association: 0.174823 },
  acetone: dipole(2.9),
};

/** The polar inputs of a component id, or undefined when this table does not list it. */
export function polarityOf(componentId: string): Polarity | undefined {
  return Object.prototype.hasOwnProperty.call(TABLE, componentId) ? TABLE[componentId] : undefined;
}

/** Ids listed in the table (for the test that every table component is covered). */
export const POLARITY_IDS: readonly string[] = Object.keys(TABLE);
