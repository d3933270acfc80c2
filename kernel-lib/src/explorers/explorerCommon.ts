/**
 * Pieces every explorer shares (internal): the model selector, the temperature slider, checks of
 * control values, and the subtitle naming fluid and model.
 *
 * Browser-safe.
 */
import { InputError } from "../errors.js";
import {
  resolveUnit,
  toDisplay,
  withUnit,
  type QuantityKind,
  type UnitChoice,
} from "../charts/displayUnits.js";
import { formatSignificant } from "../tables/formatNumber.js";
import type { ControlValue, SelectControl, SliderControl } from "./explorerControls.js";
import { checkExplorerModelId, type ExplorerFluids } from "./explorerFluids.js";
import type { ExplorerStateBase } from "./explorerState.js";

/** Slider steps of a temperature slider. */
export const TEMPERATURE_STEPS = 400;

/** The model selector of an explorer (names from the models themselves). */
export function modelControl(state: ExplorerStateBase, fluids: ExplorerFluids): SelectControl {
  return {
    type: "select",
    key: "model",
    label: "Model",
    options: state.models.map((id) => ({ value: id, label: fluids.fluid(id).name })),
    value: state.model,
  };
}

/** A temperature slider over the state's range. */
export function temperatureControl(
  valueK: number,
  rangeK: readonly [number, number],
): SliderControl {
  return {
    type: "slider",
    key: "temperatureK",
    label: "Temperature",
    quantity: "temperature",
    min: rangeK[0],
    max: rangeK[1],
    value: valueK,
    steps: TEMPERATURE_STEPS,
  };
}

/** A control value that must be a number inside [lo, hi] (SI). */
export function numberIn(
  key: string,
  value: ControlValue,
  lo: number,
  hi: number,
  unit: string,
): number {
  if (!(typeof value === "number" && value >= lo && value <= hi)) {
    throw new InputError({
      input: key,
      unit,
      validRange: `from ${lo} to ${hi}`,
      received: value,
    });
  }
  return value;
}

/** Applies the model selector: the id must be one the explorer offers. */
export function modelIn(state: ExplorerStateBase, value: ControlValue): ExplorerStateBase["model"] {
  if (typeof value !== "string" || !(state.models as readonly string[]).includes(value)) {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: state.models.join(", "),
      received: value,
    });
  }
  return checkExplorerModelId(value, state.components);
}

/** "Methane, Peng-Robinson (1976)" (plain text). */
export function fluidSubtitle(state: ExplorerStateBase, fluids: ExplorerFluids): string {
  const names = state.components.map((c) => c.name).join(" + ");
  const model = fluids.fluid(state.model).name;
  // A reference equation's name already starts with the fluid: "Carbon dioxide (Span and Wagner 1996)".
  return model.toLowerCase().startsWith(names.toLowerCase()) ? model : `${names}, ${model}`;
}

/** Unknown control key: a typed error naming the keys the explorer has. */
export function unknownControl(key: string, keys: readonly string[]): InputError {
  return new InputError({
    input: "control",
    unit: "-",
    validRange: keys.join(", "),
    received: key,
  });
}

/** An SI value in the explorer's display unit, e.g. "190.56 K" or "-117.02 °C" (plain text). */
export function formatQuantity(
  valueSI: number,
  kind: QuantityKind,
  units: UnitChoice,
  digits = 5,
): string {
  const unit = resolveUnit(kind, units);
  return withUnit(formatSignificant(toDisplay(valueSI, unit), { digits }), unit);
}
