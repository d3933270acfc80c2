// Public exports of numerics/: root finders, linear solve, quadrature, hyper-dual differentiation.
export { realCubicRoots } from "./cubicRoots.js";
export type { CubicRootsOptions, CubicRootsResult } from "./cubicRoots.js";
export { findRootBrent } from "./brent.js";
export type { BrentOptions, RootResult } from "./brent.js";
export { solveLinear } from "./linearSolve.js";
export { symmetricEigen } from "./symmetricEigen.js";
export type { SymmetricEigenResult } from "./symmetricEigen.js";
export { solveNewtonSystem } from "./newton.js";
export type { NewtonOptions, NewtonResult } from "./newton.js";
export { integrateAdaptive } from "./gaussKronrod.js";
export type { QuadratureOptions, QuadratureResult } from "./gaussKronrod.js";
export { HyperDual, hd, derivatives2, partials2 } from "./hyperDual.js";
export type { HyperDualLike, Num, Derivatives2, Partials2 } from "./hyperDual.js";
export { integrateDormandPrince } from "./dormandPrince.js";
export type {
  DormandPrinceOptions,
  DormandPrinceResult,
  OdeEvent,
  OdeEventHit,
} from "./dormandPrince.js";
export { minimizeBrent } from "./brentMinimize.js";
export type { MinimizeOptions, MinimizeResult } from "./brentMinimize.js";
