/**
 * Departure explorer: residual h, s, u, a, g (real fluid minus ideal gas at the same T and P)
 * along one isotherm, against pressure or density, with sliders for the temperature and for each
 * mole fraction. What to look for: departures near zero at low pressure (the ideal-gas limit),
 * growing where the fluid is dense; for a pure fluid below Tc the jump at the vapour pressure
 * (condensation); near the critical temperature the steepest change with pressure.
 *
 * Curves: charts/sample/departuresFromFluid (the stable states along the isotherm in one sweep,
 * sweep/runSweep.ts, equal to state/stateAtTP per point); chart: charts/departureChart.
 *
 * Browser-safe.
 */
import { departureChart, type DepartureProperty } from "../charts/departures.js";
import { departuresFromFluid } from "../charts/sample/departuresFromFluid.js";
import { logGrid } from "../charts/sampling.js";
import { InputError } from "../errors.js";
import { requireChoice } from "../validate.js";
import type { ControlValue, ExplorerControl, ExplorerDefinition } from "./explorerControls.js";
import {
  fluidSubtitle,
  formatQuantity,
  modelControl,
  modelIn,
  numberIn,
  temperatureControl,
  unknownControl,
} from "./explorerCommon.js";
import type { DepartureExplorerState } from "./explorerState.js";

/** The residual properties, with their selector labels. */
export const DEPARTURE_PROPERTIES: readonly { value: DepartureProperty; label: string }[] = [
  { value: "h", label: "h − hⁱᵍ" },
  { value: "s", label: "s − sⁱᵍ" },
  { value: "u", label: "u − uⁱᵍ" },
  { value: "a", label: "a − aⁱᵍ" },
  { value: "g", label: "g − gⁱᵍ" },
];

/** Slider steps of a mole-fraction slider. */
const FRACTION_STEPS = 200;

/**
 * Sets mole fraction i to `value` and rescales the others in proportion so the sum stays 1
 * (equal shares when the others are all zero).
 */
export function setMoleFraction(x: readonly number[], i: number, value: number): number[] {
  const rest = x.reduce((sum, xi, j) => (j === i ? sum : sum + xi), 0);
  return x.map((xj, j) => {
    if (j === i) return value;
    if (rest > 0) return (xj / rest) * (1 - value);
    return (1 - value) / (x.length - 1);
  });
}

export const departureExplorer: ExplorerDefinition<DepartureExplorerState> = {
  controls(state, fluids) {
    const controls: ExplorerControl[] = [
      temperatureControl(state.temperatureK, state.temperatureRangeK),
    ];
    if (state.components.length > 1) {
      state.components.forEach((c, i) => {
        controls.push({
          type: "slider",
          key: `x.${i}`,
          label: `Mole fraction ${c.name}`,
          quantity: "dimensionless",
          min: 0,
          max: 1,
          value: state.x[i],
          steps: FRACTION_STEPS,
        });
      });
    }
    controls.push(modelControl(state, fluids), {
      type: "checklist",
      key: "properties",
      label: "Departures",
      options: DEPARTURE_PROPERTIES,
      values: state.properties,
    });
    controls.push({
      type: "select",
      key: "abscissa",
      label: "Abscissa",
      options: [
        { value: "pressure", label: "Pressure (log)" },
        { value: "density", label: "Molar density" },
      ],
      value: state.abscissa,
    });
    return controls;
  },

  update(state, key, value: ControlValue) {
    if (key === "temperatureK") {
      const [lo, hi] = state.temperatureRangeK;
      return { ...state, temperatureK: numberIn(key, value, lo, hi, "K") };
    }
    const fraction = /^x\.(\d+)$/.exec(key);
    if (fraction && Number(fraction[1]) < state.x.length) {
      const i = Number(fraction[1]);
      return { ...state, x: setMoleFraction(state.x, i, numberIn(key, value, 0, 1, "mol/mol")) };
    }
    if (key === "model") return { ...state, model: modelIn(state, value) };
    if (key === "properties") {
      const known = DEPARTURE_PROPERTIES.map((p) => p.value as string);
      if (
        !Array.isArray(value) ||
        value.length === 0 ||
        value.some((v) => typeof v !== "string" || !known.includes(v))
      ) {
        throw new InputError({
          input: "properties",
          unit: "-",
          validRange: 'one or more of "h", "s", "u", "a", "g"',
          received: value,
        });
      }
      // keep the canonical order h, s, u, a, g
      const chosen = known.filter((p) => value.includes(p)) as DepartureProperty[];
      return { ...state, properties: chosen };
    }
    if (key === "abscissa") {
      return { ...state, abscissa: requireChoice("abscissa", value, ["pressure", "density"]) };
    }
    throw unknownControl(key, ["temperatureK", "x.<i>", "model", "properties", "abscissa"]);
  },

  chart(state, fluids) {
    const fluid = fluids.fluid(state.model);
    const [lo, hi] = state.pressureRangePa;
    const curves = departuresFromFluid(
      fluid.binding,
      [state.temperatureK],
      fluids.once(`pressures ${lo} ${hi} ${state.points}`, () => logGrid(lo, hi, state.points)),
      { x: state.x },
    );
    // Fixed legend label and subtitle (temperature and composition go to the status line): a
    // slider move then changes only data, redrawn in place by the page.
    return departureChart([{ ...curves[0], label: "at the slider temperature" }], {
      property: state.properties,
      x: state.abscissa,
      logX: state.abscissa === "pressure",
      units: state.units,
      width: state.properties.length > 1 ? Math.round(state.width / 2) : state.width,
      height: state.properties.length > 1 ? Math.round(state.height * 0.7) : state.height,
      title: state.title ?? "Departure functions",
      subtitle: fluidSubtitle(state, fluids),
    });
  },

  status(state) {
    const T = `T = ${formatQuantity(state.temperatureK, "temperature", state.units)}. `;
    return (
      T +
      (state.components.length > 1
        ? `Composition: ${state.components.map((c, i) => `${c.name} ${state.x[i].toFixed(3)}`).join(", ")} (mole fractions).`
        : "Pure fluid: below the critical temperature the curve jumps at the vapour pressure.")
    );
  },
};
