/**
 * The ten-component rich gas of the benchmark suite (invented demo composition, mole fractions):
 * pr-mix10-TP, stability-mix10-TP, the flash cases and the envelope cases all use it, so their
 * figures compare the same fluid.
 */
export const TEN = [
  "nitrogen",
  "carbon-dioxide",
  "methane",
  "ethane",
  "propane",
  "isobutane",
  "n-butane",
  "isopentane",
  "n-pentane",
  "n-hexane",
];
export const X10 = [0.02, 0.03, 0.7, 0.1, 0.06, 0.02, 0.03, 0.015, 0.015, 0.01];
