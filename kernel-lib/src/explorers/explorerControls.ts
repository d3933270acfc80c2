/**
 * Controls an explorer asks its view to draw, as data: the view (widgets/) turns each into a DOM
 * element, and a change comes back as (key, value) to the explorer's `update`. Labels are plain
 * text (the view sets them with textContent); values are SI.
 *
 * Browser-safe.
 */
import type { QuantityKind } from "../charts/displayUnits.js";
import type { ChartSpec } from "../charts/chartSpec.js";
import type { ExplorerFluids } from "./explorerFluids.js";
import type { ExplorerState } from "./explorerState.js";

/** A range slider over an SI quantity, shown in the explorer's display unit. */
export interface SliderControl {
  readonly type: "slider";
  readonly key: string;
  readonly label: string;
  readonly quantity: QuantityKind;
  /** SI bounds and value. */
  readonly min: number;
  readonly max: number;
  readonly value: number;
  /** Number of slider steps between min and max. */
  readonly steps: number;
  /** Slide in log space (pressures spanning decades). Default false. */
  readonly log?: boolean;
}

/** A drop-down of named choices. */
export interface SelectControl {
  readonly type: "select";
  readonly key: string;
  readonly label: string;
  readonly options: readonly { readonly value: string; readonly label: string }[];
  readonly value: string;
}

/** A group of check boxes (several choices at once; at least one stays checked). */
export interface ChecklistControl {
  readonly type: "checklist";
  readonly key: string;
  readonly label: string;
  readonly options: readonly { readonly value: string; readonly label: string }[];
  readonly values: readonly string[];
}

/** A typed number in the display unit of a quantity, applied on Enter or on leaving the field. */
export interface NumberControl {
  readonly type: "number";
  readonly key: string;
  readonly label: string;
  readonly quantity: QuantityKind;
  /** SI value; undefined shows an empty field. */
  readonly value: number | undefined;
  /** Molar mass, kg/mol, when the quantity is per kg (massEnergy ...). */
  readonly molarMassKgPerMol?: number;
}

export type ExplorerControl = SliderControl | SelectControl | ChecklistControl | NumberControl;

/** A value coming back from a control: SI number, choice, or list of choices. */
export type ControlValue = number | string | readonly string[];

/** What one kind of explorer does: controls, state updates, chart and (optionally) a table. */
export interface ExplorerDefinition<S extends ExplorerState = ExplorerState> {
  /** Controls for the current state. */
  controls(state: S, fluids: ExplorerFluids): ExplorerControl[];
  /**
   * The state after a control changed: a new object (the old one is not changed).
   * @throws InputError for a value the explorer cannot take (the view shows the message).
   */
  update(state: S, key: string, value: ControlValue, fluids: ExplorerFluids): S;
  /** The chart of the state: a spec from this library's chart builders. */
  chart(state: S, fluids: ExplorerFluids): ChartSpec;
  /** An HTML table (from tables/tableHtml, every string escaped) under the chart, if any. */
  table?(state: S, fluids: ExplorerFluids): string;
  /**
   * The state after the user picked a point on the chart (click or drag), given in the chart's
   * display units (x: abscissa, y: ordinate, as read off the axes). Absent: not pickable.
   */
  pick?(state: S, point: { x: number; y: number }, fluids: ExplorerFluids): S;
  /** Status line under the chart (plain text): model warnings, what the point is. */
  status?(state: S, fluids: ExplorerFluids): string;
}
