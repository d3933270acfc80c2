// Public exports of idealgas/molecular/: ideal-gas properties from molecular constants.
export {
  idealGasFromMolecule,
  MOLECULAR_MAX_TEMPERATURE_K,
  MOLECULAR_DEFAULT_MAX_TEMPERATURE_K,
  type MolecularIdealGas,
  type MolecularIdealGasOptions,
  type TorsionTreatment,
  type LinearRotorTreatment,
} from "./idealGasFromMolecule.js";
export { getMolecule, listMolecules, validateMolecularConstants } from "./moleculeTable.js";
export {
  buildHinderedRotor,
  hinderedRotorHarmonicWavenumber,
  type HinderedRotorModel,
  type HinderedRotorOptions,
} from "./hinderedRotor.js";
export type {
  MolecularConstants,
  MolecularGeometry,
  VibrationalMode,
  ElectronicLevel,
  NuclearSpinWeights,
  InternalRotor,
  ThermoContribution,
  WatsonQuarticConstants,
} from "./types.js";
