// Public exports of pvt/: departure functions from measured P-V-T data (browser-safe).
export { PvtFormatError } from "./pvtFormatError.js";
export type { PvtFormatProblem } from "./pvtFormatError.js";
export type { PvtDataset, PvtPoint, SetAsidePoint } from "./types.js";
export { parsePvtCsv } from "./parsePvtCsv.js";
export type { ParsePvtCsvOptions } from "./parsePvtCsv.js";
export { pvtFromArrays } from "./pvtFromArrays.js";
export type { PvtArrays, PvtFromArraysOptions } from "./pvtFromArrays.js";
export { columnUnitToSI } from "./columnUnits.js";
export type { ColumnQuantity, AffineToSI } from "./columnUnits.js";
// The generic helpers live in numerics/ (weightedLeastSquares, seededRandom, runsTest,
// cumulativeIrregular, aicc), imported by path; familyThreshold stays here.
export type { WeightedLeastSquaresResult } from "../numerics/weightedLeastSquares.js";
export type { RunsTestResult } from "../numerics/runsTest.js";
export type { FitDiagnostics } from "./fitDiagnostics.js";
export { fitIsochore } from "./isochoreFit.js";
export type { IsochoreFit, IsochoreFitOptions } from "./isochoreFit.js";
export { fitVirialSurface } from "./fitVirialSurface.js";
export type {
  FitVirialSurfaceOptions,
  VirialSurfaceFit,
  SurfacePoint,
} from "./fitVirialSurface.js";
export { surfaceDerivatives } from "./virialSurface.js";
export type { VirialSurface } from "./virialSurface.js";
export { surfaceResidualModel } from "./surfaceResidualModel.js";
export type { SurfaceModelOptions } from "./surfaceResidualModel.js";
export { lowDensityBridge } from "./lowDensityBridge.js";
export type { BridgeOptions, BridgeResult } from "./lowDensityBridge.js";
export { integrateIsotherm as integratePvtIsotherm } from "./integrateIsotherm.js";
export type {
  IsothermNodes as PvtIsothermNodes,
  IsothermDepartures as PvtIsothermIntegrals,
  IntegrateIsothermOptions as PvtIntegrateIsothermOptions,
} from "./integrateIsotherm.js";
export { departuresFromPvt } from "./departuresFromPvt.js";
export { virialFromSurface } from "./virialSurface.js";
export type {
  PvtRouteOptions,
  PvtRouteResult,
  PvtIsotherm,
  PvtState,
  PvtRouteProgress,
  PvtRouteStage,
} from "./departuresFromPvt.js";
export type { DepartureSet as PvtDepartureSet } from "./departureSet.js";
export type { PvtDiagnostic } from "./pvtDiagnostic.js";
export { compareWithModel } from "./compareWithModel.js";
export type { ModelComparisonPoint } from "./compareWithModel.js";
export { departuresAroundCriticalPoint } from "./aroundCriticalPoint.js";
export type {
  AroundCriticalPointRequest,
  AroundCriticalPointResult,
  ResidualCvInput,
} from "./aroundCriticalPoint.js";
export { residualCvFromPvt, checkCalorimetry } from "./residualCv.js";
export type { ResidualCvProfile, ResidualCvMeasurement } from "./residualCv.js";
export { departuresAcrossDome } from "./acrossDome.js";
export type { SaturationData, DomeState, AcrossDomeResult } from "./acrossDome.js";
export { surfacePressureModel } from "./surfacePressureModel.js";
export type { SurfacePressureModelOptions } from "./surfacePressureModel.js";
