/**
 * The serialisable state of an explorer: plain JSON, written by the Node side into the notebook
 * output and read by the page, which recomputes every chart from it with the bundled engine.
 *
 * The field names follow the Jupyter widget protocol (@jupyter-widgets/base: `_model_name`,
 * `_model_module`, `_model_module_version`, `_view_name`, `_view_module`, `_view_module_version`),
 * so the same object can become the synced state of a comm-backed DOMWidgetModel when the kernel
 * gets a comm channel. Values are SI (K, Pa, J/mol); units are converted only for display.
 *
 * Browser-safe: no Node module here.
 */
import type { Component } from "../components/types.js";
import type { UnitChoice } from "../charts/displayUnits.js";
import type { DepartureProperty } from "../charts/departures.js";
import type { ModelId } from "../eos/createModel.js";

/** The explorers this library ships. */
export type ExplorerKind = "isotherms" | "departures" | "pressure-enthalpy";

/** Every explorer kind, in the order the docs list them. */
export const EXPLORER_KINDS: readonly ExplorerKind[] = [
  "isotherms",
  "departures",
  "pressure-enthalpy",
];

/** A model an explorer can switch to: a built-in id, or "reference" (the fluid's reference equation). */
export type ExplorerModelId = ModelId | "reference";

/** Module name and version the widget protocol fields carry. */
export const EXPLORER_MODULE = "isochor-widgets";
export const EXPLORER_MODULE_VERSION = "0.1.0";

/** Fields every explorer state carries. */
export interface ExplorerStateBase {
  /** Widget protocol: model class name, e.g. "IsothermExplorerModel". */
  readonly _model_name: string;
  readonly _model_module: typeof EXPLORER_MODULE;
  readonly _model_module_version: string;
  /** Widget protocol: view class name, e.g. "IsothermExplorerView". */
  readonly _view_name: string;
  readonly _view_module: typeof EXPLORER_MODULE;
  readonly _view_module_version: string;
  readonly kind: ExplorerKind;
  /** Chart title (plain text; shown as text, never parsed). */
  title?: string;
  /** Component records (from the component table or user-defined), in composition order. */
  readonly components: readonly Component[];
  /** Models offered in the model selector. */
  readonly models: readonly ExplorerModelId[];
  /** Model in use. */
  model: ExplorerModelId;
  /** Display units of axes, controls and tables. */
  readonly units: UnitChoice;
  /** Plot width and height, CSS px. */
  readonly width: number;
  readonly height: number;
}

/** Isotherms in P-v (or P-rho) with a temperature slider and a model selector. */
export interface IsothermExplorerState extends ExplorerStateBase {
  readonly kind: "isotherms";
  /** Temperature of the isotherm, K. */
  temperatureK: number;
  /** Slider range, K. */
  readonly temperatureRangeK: readonly [number, number];
  /** Points on the isotherm. */
  readonly points: number;
  /** Abscissa: molar volume (log) or molar density. */
  abscissa: "molarVolume" | "density";
  /**
   * Inside the dome: "tie-line" (the stable isotherm, flat at the vapour pressure; default) or
   * "loop" (the model's own van der Waals loop with the equal-area lobes, clipped to the window).
   */
  insideDome: "tie-line" | "loop";
}

/** Departure functions against pressure (or density) at one temperature and composition. */
export interface DepartureExplorerState extends ExplorerStateBase {
  readonly kind: "departures";
  /** Temperature of the isotherm, K. */
  temperatureK: number;
  readonly temperatureRangeK: readonly [number, number];
  /** Mole fractions, summing to 1. */
  x: number[];
  /** Pressures sampled, Pa: [low, high], logarithmically spaced. */
  readonly pressureRangePa: readonly [number, number];
  readonly points: number;
  /** Residual properties drawn, one panel each. */
  properties: DepartureProperty[];
  abscissa: "pressure" | "density";
}

/** A pure fluid's P-h diagram with a state point (typed or dragged) and its property table. */
export interface PressureEnthalpyExplorerState extends ExplorerStateBase {
  readonly kind: "pressure-enthalpy";
  /** State point pressure, Pa. */
  pressurePa: number;
  /** State point molar enthalpy, J/mol (the model's reference state). */
  enthalpyJPerMol: number;
  /** Pressure axis range, Pa (fixed, so the diagram holds still while the point is dragged). */
  readonly pressureRangePa: readonly [number, number];
  /** Temperatures the typed-temperature input accepts, K. */
  readonly temperatureRangeK: readonly [number, number];
  readonly points: number;
  /** Show enthalpy per kg (true) or per mole. */
  readonly massBasis: boolean;
}

/** Any explorer's state. */
export type ExplorerState =
  IsothermExplorerState | DepartureExplorerState | PressureEnthalpyExplorerState;

/** Widget protocol names of each kind. */
export const EXPLORER_CLASS_NAMES: Readonly<Record<ExplorerKind, { model: string; view: string }>> =
  {
    isotherms: { model: "IsothermExplorerModel", view: "IsothermExplorerView" },
    departures: { model: "DepartureExplorerModel", view: "DepartureExplorerView" },
    "pressure-enthalpy": {
      model: "PressureEnthalpyExplorerModel",
      view: "PressureEnthalpyExplorerView",
    },
  };

/** The widget protocol fields of a kind. */
export function protocolFields(kind: ExplorerKind): {
  _model_name: string;
  _model_module: typeof EXPLORER_MODULE;
  _model_module_version: string;
  _view_name: string;
  _view_module: typeof EXPLORER_MODULE;
  _view_module_version: string;
} {
  return {
    _model_name: EXPLORER_CLASS_NAMES[kind].model,
    _model_module: EXPLORER_MODULE,
    _model_module_version: EXPLORER_MODULE_VERSION,
    _view_name: EXPLORER_CLASS_NAMES[kind].view,
    _view_module: EXPLORER_MODULE,
    _view_module_version: EXPLORER_MODULE_VERSION,
  };
}
