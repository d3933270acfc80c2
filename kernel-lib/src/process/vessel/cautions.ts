/**
 * The cautions every vessel result carries, and what the model leaves out. Kept in one place so
 * results, records, charts and the command line show the same words.
 */

/** Cautions shown with every depressurisation or filling result. */
export const VESSEL_CAUTIONS: readonly string[] = [
  "This is a model of a vessel blowdown or filling, not a design: minimum design metal temperature (MDMT) decisions, relief and flare system design and depressuring specifications are governed by the site's codes, the applicable standards and licensed engineers; have the result checked by them before any decision.",
  "Lumped equilibrium model: one temperature for all phases of the contents and one for the whole wall; real vessels develop colder gas, colder wetted wall and warmer liquid locally, and the coldest metal can be colder than the values shown.",
  "Orifice flow is frictionless, isentropic and, when two-phase, homogeneous and in equilibrium (HEM); the discharge coefficient carries all other losses. Real valves, piping and flare back pressure change the flow.",
];

/** Effects the model does not include. */
export const VESSEL_NOT_MODELLED: readonly string[] = [
  "separate gas and liquid temperatures (non-equilibrium between phases)",
  "thermal stratification of gas and liquid, and the temperature profile through the wall thickness",
  "jet cooling at the nozzle and the cold metal of the outlet piping",
  "metastable (supersaturated) gas and delayed condensation or boiling; rain-out and droplet carry-over",
  "hydrates, ice and solid CO2 formation",
  "friction and heat transfer in the outlet piping; flare header back pressure varying with the flow",
  "transport properties and heat-transfer correlations are uncertain by tens of percent",
];
