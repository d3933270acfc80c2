// Public exports of petroleum/: pseudo-components from boiling point and specific gravity.
export { petroleumPseudoComponent } from "./pseudoComponent.js";
export type { PseudoComponentSpec, CriticalPropertyMethod } from "./pseudoComponent.js";
export {
  riaziDaubert1980,
  riaziDaubert1987,
  RIAZI_DAUBERT_1980,
  RIAZI_DAUBERT_1987,
} from "./riaziDaubert.js";
export type { FractionCriticalEstimate } from "./riaziDaubert.js";
export { keslerLee1976, KESLER_LEE_1976 } from "./keslerLee.js";
export { leeKeslerAcentricFactor } from "./leeKeslerAcentric.js";
export { keslerLeeIdealGasCp, KESLER_LEE_CP_1976, KESLER_LEE_CP_RANGE_K } from "./keslerLeeCp.js";
export { watsonK } from "./watsonK.js";
