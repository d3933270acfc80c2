/**
 * charts/: pure functions that turn SI data into editable Vega-Lite specs (browser-safe).
 *
 *   data (SI arrays) --builder--> layers in display units (displayUnits) + theme --> ChartSpec
 *   ChartSpec --display/showChart--> notebook cell;  --withProcessPath--> same diagram + a path
 */
export type { ChartSpec, ChartMeta } from "./chartSpec.js";
export { chartMeta } from "./chartSpec.js";
// Display-unit helpers are exported under display-specific names so they cannot clash with units/.
export {
  DISPLAY_UNITS,
  displayUnit,
  resolveUnit as resolveDisplayUnit,
  toDisplay as toDisplayValue,
  fromDisplay as fromDisplayValue,
  quantityTitle,
  withUnit,
} from "./displayUnits.js";
export type {
  QuantityKind as DisplayQuantityKind,
  DisplayUnit,
  UnitSystem as DisplayUnitSystem,
  UnitChoice as DisplayUnitChoice,
} from "./displayUnits.js";
export {
  SERIES_COLORS,
  SERIES_DASHES,
  INK,
  FONT_FAMILY,
  HEATMAP_SCHEME,
  themeConfig,
} from "./theme.js";
export { linearGrid, logGrid, isothermDensityGrid, thinCurve } from "./sampling.js";
export type { DensityGridOptions } from "./sampling.js";
export type { BaseChartOptions } from "./chartOptions.js";
export type { ChartXY } from "./curveRows.js";
export type {
  ChartSaturationRow,
  ChartSaturatedPhase,
  ChartCriticalPoint,
} from "./saturationInput.js";
export { isothermChart } from "./isotherms.js";
export type {
  IsothermChartData,
  IsothermChartOptions,
  IsothermChartCurve,
  IsothermChartPoint,
  ChartEqualArea,
} from "./isotherms.js";
export { departureChart } from "./departures.js";
export type {
  DepartureChartOptions,
  DepartureCurve,
  DeparturePoint,
  DepartureProperty,
} from "./departures.js";
export { compressibilityChart } from "./compressibility.js";
export type { CompressibilityChartOptions, ReducedIsotherm } from "./compressibility.js";
export { pressureEnthalpyChart } from "./pressureEnthalpy.js";
export type {
  PressureEnthalpyChartOptions,
  PressureEnthalpyData,
  PressureEnthalpyPoint,
} from "./pressureEnthalpy.js";
export { temperatureEntropyChart } from "./temperatureEntropy.js";
export type {
  TemperatureEntropyChartOptions,
  TemperatureEntropyData,
  TemperatureEntropyPoint,
} from "./temperatureEntropy.js";
export { propertySurfaceChart } from "./propertySurface.js";
export type { PropertySurfaceChartOptions, PropertySurfaceData } from "./propertySurface.js";
export { gridIsolines } from "./isolines.js";
export type { GridIsoline, IsolineOptions, IsolineGrid } from "./isolines.js";
export { modelVsDataChart } from "./modelVsData.js";
export type { ChartMeasuredPoint, ModelVsDataInput, ModelVsDataOptions } from "./modelVsData.js";
export { processPathChart, withProcessPath } from "./processPath.js";
export type { PathDiagram, ProcessPathOptions, ProcessPathState } from "./processPath.js";
export { phaseEnvelopeChart } from "./phaseEnvelope.js";
export type {
  PhaseEnvelopeChartData,
  PhaseEnvelopeChartOptions,
  EnvelopePathState,
} from "./phaseEnvelope.js";
export * from "./sample/index.js";
export { departureBandChart } from "./departureBandChart.js";
export type { DepartureBandChartOptions } from "./departureBandChart.js";
export { departureResidualChart } from "./departureResidualChart.js";
export type { DepartureResidualChartOptions } from "./departureResidualChart.js";
