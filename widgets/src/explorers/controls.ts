/**
 * DOM controls from the explorers' control descriptions (kernel-lib/src/explorers/
 * explorerControls.ts). Every label and option text is set with textContent, never parsed as
 * HTML; values shown are in the explorer's display units, values reported back are SI.
 */
import {
  fromDisplayValue,
  resolveDisplayUnit,
  toDisplayValue,
  withUnit,
  type DisplayUnitChoice,
} from "../../../kernel-lib/src/charts/index.js";
import { formatSignificant } from "../../../kernel-lib/src/tables/formatNumber.js";
import type {
  ControlValue,
  ExplorerControl,
  NumberControl,
  SliderControl,
} from "../../../kernel-lib/src/explorers/explorerControls.js";

/** A drawn control: its element and how to show a new value without rebuilding. */
export interface DrawnControl {
  readonly key: string;
  readonly element: HTMLElement;
  /** Shows a new description's value (skipped while the user holds the control). */
  refresh(control: ExplorerControl): void;
}

/** Called with (key, SI value) when the user changes a control. */
export type OnControl = (key: string, value: ControlValue) => void;

const ROW_STYLE =
  "display:flex;align-items:center;gap:0.6em;margin:0.15em 0;font:13px system-ui,sans-serif";
const LABEL_STYLE = "min-width:11em";

function el<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  style?: string,
  text?: string,
): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  if (style) node.setAttribute("style", style);
  if (text !== undefined) node.textContent = text;
  return node;
}

/** Slider position (0..steps) of an SI value, and back. */
export function sliderPosition(c: SliderControl, value: number): number {
  const f = c.log
    ? Math.log(value / c.min) / Math.log(c.max / c.min)
    : (value - c.min) / (c.max - c.min);
  return Math.round(f * c.steps);
}

export function sliderValue(c: SliderControl, position: number): number {
  const f = position / c.steps;
  if (position >= c.steps) return c.max;
  if (position <= 0) return c.min;
  return c.log ? c.min * Math.pow(c.max / c.min, f) : c.min + (c.max - c.min) * f;
}

function unitOf(c: SliderControl | NumberControl, units: DisplayUnitChoice) {
  return resolveDisplayUnit(c.quantity, units);
}

/** The value in display units, per kg when the quantity is a mass basis. */
function shown(
  c: SliderControl | NumberControl,
  valueSI: number,
  units: DisplayUnitChoice,
  molarMass?: number,
): string {
  const unit = unitOf(c, units);
  const perBasis = molarMass && /^mass/.test(c.quantity) ? valueSI / molarMass : valueSI;
  const shownValue = toDisplayValue(perBasis, unit);
  // As many decimals as one slider step resolves ("40.0 °C", "0.96"), not a fixed count of
  // significant digits ("40.000 °C", "0.96000").
  const step = sliderStepInDisplay(c, perBasis, unit);
  const decimals = Math.min(6, Math.max(0, Math.ceil(-Math.log10(step))));
  const text =
    Number.isFinite(step) && step > 0
      ? formatSignificant(shownValue, { decimals })
      : formatSignificant(shownValue, { digits: 5 });
  return withUnit(text, unit);
}

/** The change of the shown value over one slider step, in display units. */
function sliderStepInDisplay(
  c: SliderControl | NumberControl,
  shownSI: number,
  unit: ReturnType<typeof unitOf>,
): number {
  if (c.type !== "slider") return NaN;
  const span = c.log
    ? Math.abs(shownSI) * (Math.log(c.max / c.min) / c.steps)
    : Math.abs(c.max - c.min) / c.steps;
  return span * unit.scale;
}

/**
 * Draws one control.
 * @param molarMass kg/mol, for per-kg display of mass-basis quantities.
 */
export function drawControl(
  c: ExplorerControl,
  units: DisplayUnitChoice,
  onControl: OnControl,
  molarMass?: number,
): DrawnControl {
  const row = el("div", ROW_STYLE);
  row.className = "isochor-explorer-control";
  row.dataset.key = c.key;
  row.append(el("span", LABEL_STYLE, c.label));
  if (c.type === "slider") {
    let current = c;
    const input = el("input", "width:18em");
    input.type = "range";
    input.setAttribute("aria-label", c.label);
    input.min = "0";
    input.max = String(c.steps);
    input.step = "1";
    input.value = String(sliderPosition(c, c.value));
    const readout = el(
      "span",
      "font-variant-numeric:tabular-nums",
      shown(c, c.value, units, molarMass),
    );
    let held = false;
    input.addEventListener("pointerdown", () => (held = true));
    input.addEventListener("pointerup", () => (held = false));
    input.addEventListener("input", () => {
      const v = sliderValue(current, Number(input.value));
      readout.textContent = shown(current, v, units, molarMass);
      onControl(c.key, v);
    });
    row.append(input, readout);
    return {
      key: c.key,
      element: row,
      refresh(next) {
        if (next.type !== "slider") return;
        current = next;
        if (!held) input.value = String(sliderPosition(next, next.value));
        readout.textContent = shown(next, next.value, units, molarMass);
      },
    };
  }
  if (c.type === "select") {
    const select = el("select");
    select.setAttribute("aria-label", c.label);
    for (const o of c.options) {
      const option = el("option", undefined, o.label);
      option.value = o.value;
      select.append(option);
    }
    select.value = c.value;
    select.addEventListener("change", () => onControl(c.key, select.value));
    row.append(select);
    return {
      key: c.key,
      element: row,
      refresh(next) {
        if (next.type === "select") select.value = next.value;
      },
    };
  }
  if (c.type === "checklist") {
    const boxes: HTMLInputElement[] = [];
    for (const o of c.options) {
      const label = el("label", "display:inline-flex;align-items:center;gap:0.2em");
      const box = el("input");
      box.type = "checkbox";
      box.value = o.value;
      box.checked = c.values.includes(o.value);
      box.addEventListener("change", () => {
        const values = boxes.filter((b) => b.checked).map((b) => b.value);
        if (values.length === 0) {
          box.checked = true; // at least one stays checked
          return;
        }
        onControl(c.key, values);
      });
      boxes.push(box);
      label.append(box, document.createTextNode(o.label));
      row.append(label);
    }
    return {
      key: c.key,
      element: row,
      refresh(next) {
        if (next.type === "checklist")
          for (const b of boxes) b.checked = next.values.includes(b.value);
      },
    };
  }
  // typed number
  const input = el("input", "width:8em");
  input.type = "number";
  input.setAttribute("aria-label", c.label);
  input.step = "any";
  const unit = unitOf(c, units);
  const show = (v: number | undefined) =>
    v === undefined ? "" : formatSignificant(toDisplayValue(v, unit), { digits: 6 });
  input.value = show(c.value);
  input.addEventListener("change", () => {
    const typed = Number(input.value);
    if (input.value.trim() === "" || !Number.isFinite(typed)) return;
    onControl(c.key, fromDisplayValue(typed, unit));
  });
  row.append(input, el("span", undefined, unit.symbol));
  return {
    key: c.key,
    element: row,
    refresh(next) {
      if (next.type === "number" && document.activeElement !== input)
        input.value = show(next.value);
    },
  };
}

/** What must match for controls to be refreshed in place rather than drawn anew. */
export function controlsShape(controls: readonly ExplorerControl[]): string {
  return JSON.stringify(
    controls.map((c) => {
      if (c.type === "slider") return [c.type, c.key, c.min, c.max, c.steps, c.log ?? false];
      if (c.type === "select") return [c.type, c.key, c.options];
      if (c.type === "checklist") return [c.type, c.key, c.options];
      return [c.type, c.key];
    }),
  );
}
