/**
 * P-h explorer for a pure fluid: the two-phase dome with quality lines, a state point placed by
 * dragging on the diagram, by sliders, or by typing its temperature, the isotherm and isentrope
 * through the point, and the point's properties tabulated live (with both saturated phases when
 * the point is inside the dome).
 *
 * The point is held as (P, h), which fixes the state on both sides of and inside the dome
 * (phase/stateAtPressureEnthalpy); a typed temperature is turned into h at the point's pressure
 * (state/stateAtTP, stable phase). Lines: charts/sample isothermOnPressureEnthalpy (one sweep of
 * (T, P) states, sweep/runSweep.ts) and isentropeOnPressureEnthalpy (a (P, s) inversion per
 * point); chart: charts/pressureEnthalpyChart + withProcessPath.
 *
 * Browser-safe.
 */
import { phaseWord } from "../tables/phaseWords.js";
import { minOf } from "../numerics/extent.js";
import { fromDisplay, resolveUnit } from "../charts/displayUnits.js";
import { pressureEnthalpyChart } from "../charts/pressureEnthalpy.js";
import { withProcessPath } from "../charts/processPath.js";
import {
  isentropeOnPressureEnthalpy,
  isothermOnPressureEnthalpy,
} from "../charts/sample/diagramLinesFromFluid.js";
import { logGrid } from "../charts/sampling.js";
import { InputError } from "../errors.js";
import {
  stateAtPressureEnthalpy,
  stateAtPressureQuality,
  type PureFluidStateResult,
} from "../phase/twoPhaseState.js";
import { stateAtTP } from "../state/stateAt.js";
import type { FluidState } from "../state/types.js";
import { tableHtml } from "../tables/tableHtml.js";
import type { TableColumn } from "../tables/columns.js";
import type { ControlValue, ExplorerDefinition } from "./explorerControls.js";
import {
  fluidSubtitle,
  formatQuantity,
  modelControl,
  modelIn,
  numberIn,
  unknownControl,
} from "./explorerCommon.js";
import { EXPLORER_REFERENCE_TEXT, type ExplorerFluids } from "./explorerFluids.js";
import type { PressureEnthalpyExplorerState } from "./explorerState.js";

/** Points on each isentrope (each point is a (P, s) inversion, costlier than an isotherm point). */
const ISENTROPE_POINTS = 24;

/** The state at the explorer's point, memoised per (model, P, h). */
export function pointState(
  state: PressureEnthalpyExplorerState,
  fluids: ExplorerFluids,
): PureFluidStateResult {
  return fluids.once(`point ${state.model} ${state.pressurePa} ${state.enthalpyJPerMol}`, () =>
    stateAtPressureEnthalpy(
      fluids.fluid(state.model).binding,
      state.pressurePa,
      state.enthalpyJPerMol,
    ),
  );
}

/** Molar enthalpy range of the diagram, J/mol: the dome's liquid side to the hot dilute gas. */
export function enthalpyRange(
  state: PressureEnthalpyExplorerState,
  fluids: ExplorerFluids,
): [number, number] {
  return fluids.once(`h-range ${state.model}`, () => {
    const binding = fluids.fluid(state.model).binding;
    const dome = fluids.dome(state.model);
    const hot = stateAtTP(binding, state.temperatureRangeK[1], state.pressureRangePa[0], [1]).molar
      .h;
    const cold = dome
      ? minOf(dome.saturation.map((r) => r.liquid.enthalpyJPerMol ?? Infinity))
      : stateAtTP(binding, state.temperatureRangeK[0], state.pressureRangePa[1], [1]).molar.h;
    const pad = 0.04 * (hot - cold);
    return [cold - pad, hot + pad];
  });
}

function temperatureOf(point: PureFluidStateResult): number {
  return point.kind === "two-phase" ? point.temperatureK : point.state.temperatureK;
}

function entropyOf(point: PureFluidStateResult): number {
  return point.kind === "two-phase" ? point.molar.s : point.state.molar.s;
}

function molarMass(state: PressureEnthalpyExplorerState): number | undefined {
  return state.massBasis ? state.components[0].molarMassKgPerMol : undefined;
}

/** The point moved to (P, h), refused outside the diagram's ranges. */
function movedTo(
  state: PressureEnthalpyExplorerState,
  pressurePa: number,
  enthalpyJPerMol: number,
  fluids: ExplorerFluids,
): PressureEnthalpyExplorerState {
  const [pLo, pHi] = state.pressureRangePa;
  const [hLo, hHi] = enthalpyRange(state, fluids);
  const next = {
    ...state,
    pressurePa: numberIn("pressurePa", pressurePa, pLo, pHi, "Pa"),
    enthalpyJPerMol: numberIn("enthalpyJPerMol", enthalpyJPerMol, hLo, hHi, "J/mol"),
  };
  pointState(next, fluids); // throws here (shown by the view) if no state exists there
  return next;
}

export const pressureEnthalpyExplorer: ExplorerDefinition<PressureEnthalpyExplorerState> = {
  controls(state, fluids) {
    const [hLo, hHi] = enthalpyRange(state, fluids);
    const point = pointState(state, fluids);
    const M = molarMass(state);
    return [
      {
        type: "slider",
        key: "enthalpyJPerMol",
        label: "Enthalpy",
        quantity: M ? "massEnergy" : "molarEnergy",
        min: hLo,
        max: hHi,
        value: state.enthalpyJPerMol,
        steps: 400,
      },
      {
        type: "slider",
        key: "pressurePa",
        label: "Pressure",
        quantity: "pressure",
        min: state.pressureRangePa[0],
        max: state.pressureRangePa[1],
        value: state.pressurePa,
        steps: 400,
        log: true,
      },
      {
        type: "number",
        key: "temperatureK",
        label: "Temperature (type, then Enter)",
        quantity: "temperature",
        value: temperatureOf(point),
      },
      modelControl(state, fluids),
    ];
  },

  update(state, key, value: ControlValue, fluids) {
    if (key === "enthalpyJPerMol" || key === "pressurePa") {
      if (typeof value !== "number") {
        throw new InputError({ input: key, unit: "SI", validRange: "a number", received: value });
      }
      return key === "pressurePa"
        ? movedTo(state, value, state.enthalpyJPerMol, fluids)
        : movedTo(state, state.pressurePa, value, fluids);
    }
    if (key === "temperatureK") {
      const [lo, hi] = state.temperatureRangeK;
      const T = numberIn(key, value, lo, hi, "K");
      const s = stateAtTP(fluids.fluid(state.model).binding, T, state.pressurePa, [1]);
      return movedTo(state, state.pressurePa, s.molar.h, fluids);
    }
    if (key === "model") {
      // Keep the point's T and P (or P and quality inside the dome): the models share one
      // reference state, but the same h is a different state in another model.
      const point = pointState(state, fluids);
      const next = { ...state, model: modelIn(state, value) };
      const binding = fluids.fluid(next.model).binding;
      const h =
        point.kind === "two-phase"
          ? stateAtPressureQuality(binding, state.pressurePa, point.quality).molar.h
          : stateAtTP(binding, point.state.temperatureK, state.pressurePa, [1]).molar.h;
      return { ...next, enthalpyJPerMol: h };
    }
    throw unknownControl(key, ["enthalpyJPerMol", "pressurePa", "temperatureK", "model"]);
  },

  pick(state, point, fluids) {
    const M = molarMass(state);
    const hUnit = resolveUnit(M ? "massEnergy" : "molarEnergy", state.units);
    const pUnit = resolveUnit("pressure", state.units);
    const h = fromDisplay(point.x, hUnit) * (M ?? 1);
    const P = fromDisplay(point.y, pUnit);
    return movedTo(state, P, h, fluids);
  },

  chart(state, fluids) {
    const binding = fluids.fluid(state.model).binding;
    const dome = fluids.dome(state.model);
    const point = pointState(state, fluids);
    const [pLo, pHi] = state.pressureRangePa;
    const pressures = fluids.once(`P grid ${pLo} ${pHi} ${state.points}`, () =>
      logGrid(pLo, pHi, state.points),
    );
    const fewPressures = fluids.once(`P grid ${pLo} ${pHi} ${ISENTROPE_POINTS}`, () =>
      logGrid(pLo, pHi, ISENTROPE_POINTS),
    );
    const T = temperatureOf(point);
    const spec = pressureEnthalpyChart(
      {
        ...(dome ? { saturation: dome.saturation, critical: dome.critical } : {}),
        isotherms: [
          { ...isothermOnPressureEnthalpy(binding, T, pressures), label: "through the point" },
        ],
        isentropes: [isentropeOnPressureEnthalpy(binding, entropyOf(point), fewPressures)],
      },
      {
        units: state.units,
        molarMassKgPerMol: molarMass(state),
        pressureRangePa: state.pressureRangePa,
        enthalpyRangeJPerMol: enthalpyRange(state, fluids),
        width: state.width,
        height: state.height,
        title: state.title ?? "Pressure-enthalpy diagram",
        subtitle: `${fluidSubtitle(state, fluids)}; h = 0 for the ideal gas at 25 degC, 1 bar`,
      },
    );
    return withProcessPath(spec, [
      {
        label: "state point",
        pressurePa: state.pressurePa,
        enthalpyJPerMol: state.enthalpyJPerMol,
      },
    ]);
  },

  table(state, fluids) {
    const point = pointState(state, fluids);
    const M = molarMass(state);
    const row = (name: string, s: FluidState, quality?: number) => ({
      name,
      phase: s.phase,
      temperatureK: s.temperatureK,
      pressurePa: s.pressurePa,
      quality,
      density: s.densityMolPerM3,
      h: s.molar.h,
      s: s.molar.s,
      Z: s.Z,
      cp: s.molar.cp,
      w: s.speedOfSoundMPerS,
      jt: s.jouleThomsonKPerPa,
    });
    const rows =
      point.kind === "two-phase"
        ? [
            {
              name: "state point",
              phase: "two-phase",
              temperatureK: point.temperatureK,
              pressurePa: point.pressurePa,
              quality: point.quality,
              density: point.densityMolPerM3,
              h: point.molar.h,
              s: point.molar.s,
            },
            row("saturated liquid", point.liquid, 0),
            row("saturated vapour", point.vapor, 1),
          ]
        : [row("state point", point.state)];
    const columns: TableColumn[] = [
      { key: "name", label: "State", text: true },
      { key: "phase", label: "Phase", text: true },
      { key: "temperatureK", label: "T", quantity: "temperature" },
      { key: "pressurePa", label: "P", quantity: "pressure" },
      { key: "quality", label: "Vapour fraction", quantity: "dimensionless", digits: 3 },
      { key: "density", label: "ρ", quantity: M ? "massDensity" : "molarDensity" },
      { key: "h", label: "h", quantity: M ? "massEnergy" : "molarEnergy" },
      { key: "s", label: "s", quantity: M ? "massEntropy" : "molarEntropy" },
      { key: "Z", label: "Z", quantity: "dimensionless", digits: 4 },
      { key: "cp", label: "cp", quantity: M ? "massEntropy" : "molarEntropy" },
      { key: "w", label: "Speed of sound", quantity: "speed", digits: 4 },
      { key: "jt", label: "μJT", unit: "K/MPa", digits: 3 },
    ];
    return tableHtml(rows, columns, {
      units: state.units,
      ...(M ? { molarMassKgPerMol: M } : {}),
      note: `${fluids.fluid(state.model).name}; reference state: ${EXPLORER_REFERENCE_TEXT}.`,
    });
  },

  status(state, fluids) {
    const point = pointState(state, fluids);
    const dome = fluids.dome(state.model);
    const where =
      point.kind === "two-phase"
        ? `inside the dome, vapour fraction ${point.quality.toFixed(3)}`
        : phaseWord(point.state.phase);
    const critical = dome
      ? `; critical point ${formatQuantity(dome.critical.temperatureK, "temperature", state.units)}, ${formatQuantity(dome.critical.pressurePa, "pressure", state.units)}`
      : "";
    return `State point: ${where} at ${formatQuantity(temperatureOf(point), "temperature", state.units)}${critical}. Drag on the diagram to move it. Reference state: ${EXPLORER_REFERENCE_TEXT}.`;
  },
};
