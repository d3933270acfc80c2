/**
 * Isotherm explorer: one isotherm of the chosen model in P-v (or P-rho) at the slider temperature,
 * over the model's own saturation dome and critical point, with the equal-area construction below
 * the critical temperature. Moving the slider through Tc shows the loop flatten into the critical
 * inflection; switching models shows how far each cubic puts its dome from the reference equation.
 *
 * Curves: charts/sample/isothermsFromModel (pressure from the residual Helmholtz energy on a density
 * grid); dome: charts/sample/saturationFromModel (cached per model); chart: charts/isothermChart.
 *
 * Browser-safe.
 */
import { maxOf } from "../numerics/extent.js";
import { isothermChart } from "../charts/isotherms.js";
import { isothermsFromModel } from "../charts/sample/isothermsFromModel.js";
import type { ControlValue, ExplorerDefinition } from "./explorerControls.js";
import {
  fluidSubtitle,
  formatQuantity,
  modelControl,
  modelIn,
  numberIn,
  temperatureControl,
  unknownControl,
} from "./explorerCommon.js";
import type { IsothermExplorerState } from "./explorerState.js";
import type { ExplorerFluids } from "./explorerFluids.js";
import { InputError } from "../errors.js";
import { requireChoice } from "../validate.js";
import type { ResidualModel } from "../eos/types.js";
import type { SampledDome } from "../charts/sample/saturationFromModel.js";

/**
 * The model to sample: itself, or, when it has no finite maximum density (a reference equation
 * has no covolume), a view of it capped at 1.1 x the densest saturated liquid of its dome.
 */
function sampledModel(model: ResidualModel, dome: SampledDome | null): ResidualModel {
  if (Number.isFinite(model.maxDensity(300, [1]))) return model;
  const densest = dome ? maxOf(dome.saturation.map((r) => r.liquid.densityMolPerM3 ?? 0)) : 0;
  if (!(densest > 0)) {
    throw new InputError({
      input: "model",
      unit: "-",
      validRange: "a model with a finite maximum density, or a pure fluid with a saturation dome",
      received: model.info.name,
    });
  }
  // The prototype chain keeps every method and field of the model; only maxDensity differs.
  return Object.create(model, { maxDensity: { value: () => 1.1 * densest } }) as ResidualModel;
}

/** Legend label of the isotherm (its temperature is on the slider and in the status line). */
const SLIDER_LABEL = "at the slider temperature";

export const isothermExplorer: ExplorerDefinition<IsothermExplorerState> = {
  controls(state, fluids) {
    return [
      temperatureControl(state.temperatureK, state.temperatureRangeK),
      modelControl(state, fluids),
      {
        type: "select",
        key: "abscissa",
        label: "Abscissa",
        options: [
          { value: "molarVolume", label: "Molar volume (log)" },
          { value: "density", label: "Molar density" },
        ],
        value: state.abscissa,
      },
      {
        type: "select",
        key: "insideDome",
        label: "Inside the dome",
        options: [
          { value: "tie-line", label: "Stable isotherm (tie line)" },
          { value: "loop", label: "The model's loop" },
        ],
        value: state.insideDome,
      },
    ];
  },

  update(state, key, value: ControlValue) {
    if (key === "temperatureK") {
      const [lo, hi] = state.temperatureRangeK;
      return { ...state, temperatureK: numberIn(key, value, lo, hi, "K") };
    }
    if (key === "model") return { ...state, model: modelIn(state, value) };
    if (key === "abscissa") {
      return { ...state, abscissa: requireChoice("abscissa", value, ["molarVolume", "density"]) };
    }
    if (key === "insideDome") {
      return { ...state, insideDome: requireChoice(key, value, ["tie-line", "loop"]) };
    }
    throw unknownControl(key, ["temperatureK", "model", "abscissa", "insideDome"]);
  },

  chart(state, fluids: ExplorerFluids) {
    const fluid = fluids.fluid(state.model);
    const dome = fluids.dome(state.model);
    const [curve] = isothermsFromModel(
      sampledModel(fluid.binding.model, dome),
      [state.temperatureK],
      {
        points: state.points,
        insideDome: state.insideDome,
        equalArea: state.insideDome === "loop",
      },
    );
    // Fixed label and pressure axis per model and view: a slider move then changes only data,
    // which the page redraws in place (widgets/src/explorers/liveChart.ts) instead of
    // re-embedding. The stable isotherm never goes below zero pressure; the loop window keeps
    // the lobes of a cubic and clips the swings of a reference equation (marks clip to it).
    const Pc = dome?.critical.pressurePa;
    const lowest = state.insideDome === "loop" ? -0.5 : 0;
    return isothermChart(
      {
        isotherms: [{ ...curve, label: SLIDER_LABEL }],
        ...(dome ? { saturation: dome.saturation, critical: dome.critical } : {}),
      },
      {
        x: state.abscissa,
        ...(Pc !== undefined ? { pressureRangePa: [lowest * Pc, 2 * Pc] as const } : {}),
        units: state.units,
        width: state.width,
        height: state.height,
        title: state.title ?? "Isotherm",
        subtitle: fluidSubtitle(state, fluids),
      },
    );
  },

  status(state, fluids) {
    const dome = fluids.dome(state.model);
    if (!dome) return "No vapour-liquid critical point for this model and composition.";
    const Tc = dome.critical.temperatureK;
    const T = `T = ${formatQuantity(state.temperatureK, "temperature", state.units)}. `;
    const TcText = formatQuantity(Tc, "temperature", state.units);
    if (state.temperatureK >= Tc) {
      return `${T}Above the critical temperature (Tc = ${TcText} in this model): one phase at every density.`;
    }
    if (state.insideDome === "tie-line") {
      return `${T}Below the critical temperature (Tc = ${TcText} in this model): between the saturated vapour and liquid the stable isotherm runs flat at the vapour pressure (the equal-area tie line). Choose "The model's loop" to see what the equation does there.`;
    }
    const reference = !Number.isFinite(
      fluids.fluid(state.model).binding.model.maxDensity(300, [1]),
    );
    return (
      `${T}Below the critical temperature (Tc = ${TcText} in this model): the model's loop, with the equal-area lobes, clipped to the chart window.` +
      (reference
        ? " A reference equation is fitted to stable and metastable states only; between its spinodals the pressure swings by tens of MPa, and that part of the loop has no physical meaning."
        : "")
    );
  },
};
