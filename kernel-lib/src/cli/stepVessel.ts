/**
 * The "vessel" kind of `isochor step`: a request with the fluid fields of `isochor eval`, "inlet"
 * as the initial contents (T, P; no flow) and "step": {"kind": "vessel", "volume": m3, "wall":
 * {...}, "outlet": {"diameter": m, "dischargeCoefficient", "backPressure": Pa}, "heat":
 * "adiabatic" | {...}, "until": {"P": Pa} | {"time": s}} runs simulateVessel
 * (process/vessel/) and returns the time series, the minimum temperatures, the warnings and the
 * cautions. The command itself (reading the file, --csv, exit codes) lives with `isochor step`;
 * this module gives it `vesselStepFromRequest` and `vesselSeriesCsv`.
 *
 * Step fields beyond the (added, never renamed): "wall": {"thickness": m, "density":
 * kg/m3, "heatCapacity": J/(kg K), "mass": kg}; "heat": {"inside": "natural-convection" |
 * {"coefficient": W/(m2 K)}, "outside": {"kind": "air", "ambientT": K} | {"kind":
 * "coefficient", "coefficient": W/(m2 K), "ambientT": K} | {"kind": "heat-flux", "flux": W/m2,
 * "basis": text} | {"kind": "insulated"}}; "minimumDesignMetalTemperature": K; "shape": a
 * VesselShape of process/vessel/geometry.ts instead of "volume".
 *
 * An adiabatic run does not model the wall: its response has "Twall": null in "series" and in
 * "minimum", "wallModelled": false, and an empty Twall_K column in the CSV.
 */
import { InputError, RequestError, UnknownNameError, type ResultWarning } from "../errors.js";
import { defineFluid } from "../fluid/defineFluid.js";
import { parseEvalRequest } from "./evalRequest.js";
import { simulateVessel } from "../process/vessel/simulateVessel.js";
import type { VesselShape } from "../process/vessel/geometry.js";
import type { VesselSpec, WallHeatSpec, WallSpec } from "../process/vessel/types.js";

/** The response of a vessel step. */
export interface VesselStepResponse {
  readonly kind: "vessel";
  readonly series: {
    readonly time: readonly number[];
    readonly P: readonly number[];
    readonly T: readonly number[];
    /** Wall temperature, K; null for an adiabatic run (the wall is not modelled). */
    readonly Twall: readonly number[] | null;
    readonly mass: readonly number[];
    readonly massFlow: readonly number[];
    readonly liquidFraction: readonly number[];
  };
  /** Twall: the coldest wall temperature, K; null for an adiabatic run. */
  readonly minimum: { readonly T: number; readonly time: number; readonly Twall: number | null };
  /** False for an adiabatic run: the wall is not modelled, "Twall" is null. */
  readonly wallModelled: boolean;
  /** Time to the target pressure, s (null when it was not reached). */
  readonly timeToTarget: number | null;
  readonly stoppedBecause: string;
  /** Net mass released, kg. */
  readonly massReleased: number;
  readonly balance: { readonly massRelativeError: number; readonly energyRelativeError: number };
  readonly cautions: readonly string[];
  readonly notModelled: readonly string[];
  readonly warnings: readonly ResultWarning[];
  readonly model: string;
}

type Obj = Record<string, unknown>;

function isObj(v: unknown): v is Obj {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

function num(o: Obj, key: string, path: string, required: boolean): number | undefined {
  const v = o[key];
  if (v === undefined && !required) return undefined;
  if (typeof v !== "number" || !Number.isFinite(v)) {
    throw new RequestError(`${path}.${key}`, `expected a finite number, got ${JSON.stringify(v)}`);
  }
  return v;
}

// where an input of simulateVessel came from in the request
const PATHS: readonly [RegExp, string][] = [
  [/^spec\.outlets\[0\]\.diameterM/, "$.step.outlet.diameter"],
  [/^spec\.outlets\[0\]\.dischargeCoefficient/, "$.step.outlet.dischargeCoefficient"],
  [/^spec\.outlets\[0\]\.backPressurePa/, "$.step.outlet.backPressure"],
  [/^spec\.outlets\.backPressurePa/, "$.step.outlet.backPressure"],
  [/^vessel\.shape\.volumeM3/, "$.step.volume"],
  [/^spec\.shape/, "$.step.shape"],
  [/^vessel\.shape/, "$.step.shape"],
  [/^spec\.wall\.thicknessM/, "$.step.wall.thickness"],
  [/^spec\.wall\.massKg/, "$.step.wall.mass"],
  [/^spec\.wall\.densityKgPerM3/, "$.step.wall.density"],
  [/^spec\.wall\.heatCapacityJPerKgK/, "$.step.wall.heatCapacity"],
  [/^spec\.wall/, "$.step.wall"],
  [/^spec\.heat/, "$.step.heat"],
  [/^spec\.until\.pressurePa/, "$.step.until.P"],
  [/^spec\.until\.timeS/, "$.step.until.time"],
  [/^spec\.until/, "$.step.until"],
  [/^spec\.initial\.temperatureK/, "$.inlet.T"],
  [/^spec\.initial\.pressurePa/, "$.inlet.P"],
  [/^spec\.initial/, "$.inlet"],
  [/^spec\.minimumDesignMetalTemperatureK/, "$.step.minimumDesignMetalTemperature"],
];

/**
 * Runs the vessel step of a parsed JSON request and returns the response object.
 * @throws RequestError with the JSON path of a bad field (the CLI exits 2).
 */
export function vesselStepFromRequest(request: unknown): VesselStepResponse {
  if (!isObj(request)) throw new RequestError("$", "expected a request object");
  const step = request["step"];
  if (!isObj(step) || step["kind"] !== "vessel") {
    throw new RequestError("$.step.kind", 'expected "vessel"');
  }
  const fluidFields: Obj = { envelope: true };
  for (const key of [
    "model",
    "components",
    "x",
    "kij",
    "constants",
    "reference",
    "idealGas",
    "departure",
  ]) {
    if (request[key] !== undefined) fluidFields[key] = request[key];
  }
  const parsed = parseEvalRequest(fluidFields);
  if (parsed.model === "reference") {
    throw new RequestError(
      "$.model",
      'a vessel needs an engine model (e.g. "peng-robinson"), not "reference"',
    );
  }
  let fluid;
  try {
    fluid = defineFluid({
      components: parsed.components,
      model: parsed.model,
      kij: parsed.kij,
      constants: parsed.constants,
      idealGas: parsed.idealGas,
      referenceState: parsed.reference,
      departure: parsed.departure,
    });
  } catch (e) {
    if (e instanceof UnknownNameError) {
      const i = parsed.components.indexOf(String(e.received));
      throw new RequestError(i >= 0 ? `$.components[${i}]` : "$", e.message);
    }
    if (e instanceof InputError) {
      const top = e.input.split(/[.[]/)[0];
      throw new RequestError(top in request ? `$.${e.input}` : "$", e.message);
    }
    throw e;
  }
  const inlet = request["inlet"];
  if (!isObj(inlet)) throw new RequestError("$.inlet", 'expected {"T": K, "P": Pa}');
  const T = num(inlet, "T", "$.inlet", true)!;
  const P = num(inlet, "P", "$.inlet", true)!;

  let shape: VesselShape;
  if (step["shape"] !== undefined) {
    if (!isObj(step["shape"])) throw new RequestError("$.step.shape", "expected a shape object");
    shape = step["shape"] as unknown as VesselShape;
  } else {
    shape = { kind: "volume", volumeM3: num(step, "volume", "$.step", true)! };
  }
  const outlet = step["outlet"];
  if (!isObj(outlet)) {
    throw new RequestError(
      "$.step.outlet",
      'expected {"diameter": m, "dischargeCoefficient", "backPressure": Pa}',
    );
  }
  const outlets = [
    {
      diameterM: num(outlet, "diameter", "$.step.outlet", true)!,
      dischargeCoefficient: num(outlet, "dischargeCoefficient", "$.step.outlet", true)!,
      backPressurePa: num(outlet, "backPressure", "$.step.outlet", false),
    },
  ];
  let wall: WallSpec | undefined;
  if (step["wall"] !== undefined) {
    const w = step["wall"];
    if (!isObj(w)) throw new RequestError("$.step.wall", 'expected {"thickness": m, ...}');
    wall = {
      thicknessM: num(w, "thickness", "$.step.wall", true)!,
      densityKgPerM3: num(w, "density", "$.step.wall", false),
      heatCapacityJPerKgK: num(w, "heatCapacity", "$.step.wall", false),
      massKg: num(w, "mass", "$.step.wall", false),
    };
  }
  let heat: "adiabatic" | WallHeatSpec = "adiabatic";
  const h = step["heat"];
  if (h !== undefined && h !== "adiabatic") {
    if (!isObj(h))
      throw new RequestError("$.step.heat", 'expected "adiabatic" or {"inside", "outside"}');
    const out = h["outside"];
    if (!isObj(out))
      throw new RequestError(
        "$.step.heat.outside",
        'expected {"kind": "air" | "coefficient" | "heat-flux" | "insulated", ...}',
      );
    const p = "$.step.heat.outside";
    let outside: WallHeatSpec["outside"];
    switch (out["kind"]) {
      case "air":
        outside = { kind: "air", ambientK: num(out, "ambientT", p, true)! };
        break;
      case "coefficient":
        outside = {
          kind: "coefficient",
          coefficientWPerM2K: num(out, "coefficient", p, true)!,
          ambientK: num(out, "ambientT", p, true)!,
        };
        break;
      case "heat-flux":
        outside = {
          kind: "heat-flux",
          fluxWPerM2: num(out, "flux", p, true)!,
          basis: String(out["basis"] ?? ""),
        };
        break;
      case "insulated":
        outside = { kind: "insulated" };
        break;
      default:
        throw new RequestError(
          `${p}.kind`,
          'expected "air", "coefficient", "heat-flux" or "insulated"',
        );
    }
    const ins = h["inside"];
    let inside: WallHeatSpec["inside"] = "natural-convection";
    if (ins !== undefined && ins !== "natural-convection") {
      if (!isObj(ins))
        throw new RequestError(
          "$.step.heat.inside",
          'expected "natural-convection" or {"coefficient": W/(m2 K)}',
        );
      inside = { coefficientWPerM2K: num(ins, "coefficient", "$.step.heat.inside", true)! };
    }
    heat = { kind: "wall", inside, outside };
  }
  const until = step["until"];
  if (!isObj(until)) throw new RequestError("$.step.until", 'expected {"P": Pa} or {"time": s}');
  const spec: VesselSpec = {
    fluid,
    shape,
    wall,
    initial: { temperatureK: T, pressurePa: P, z: parsed.x },
    outlets,
    heat,
    until: {
      pressurePa: num(until, "P", "$.step.until", false),
      timeS: num(until, "time", "$.step.until", false),
    },
    minimumDesignMetalTemperatureK: num(step, "minimumDesignMetalTemperature", "$.step", false),
  };
  let run;
  try {
    run = simulateVessel(spec);
  } catch (e) {
    if (e instanceof InputError) {
      const hit = PATHS.find(([re]) => re.test(e.input));
      throw new RequestError(hit ? hit[1] : "$.step", e.message);
    }
    throw e;
  }
  const s = run.series;
  return {
    kind: "vessel",
    series: {
      time: s.timeS,
      P: s.pressurePa,
      T: s.temperatureK,
      Twall: s.wallTemperatureK ?? null,
      mass: s.massKg,
      massFlow: s.massFlowKgPerS,
      liquidFraction: s.liquidFraction,
    },
    minimum: {
      T: run.minimum.temperatureK,
      time: run.minimum.timeS,
      Twall: run.minimum.wallTemperatureK ?? null,
    },
    wallModelled: run.wallModelled,
    timeToTarget: run.timeToTargetS ?? null,
    stoppedBecause: run.stoppedBecause,
    massReleased: run.massReleasedKg,
    balance: {
      massRelativeError: run.balance.massRelativeError,
      energyRelativeError: run.balance.energyRelativeError,
    },
    cautions: run.cautions,
    notModelled: run.notModelled,
    warnings: run.warnings,
    model: run.model.name,
  };
}

/**
 * The series of a vessel response as CSV (SI units in the header), for `--csv`. The Twall_K
 * column is empty for an adiabatic run (the wall is not modelled).
 */
export function vesselSeriesCsv(response: VesselStepResponse): string {
  const s = response.series;
  const head = "time_s,P_Pa,T_K,Twall_K,mass_kg,massFlow_kg_per_s,liquidFraction";
  const rows = s.time.map((t, k) =>
    [
      t,
      s.P[k],
      s.T[k],
      s.Twall === null ? "" : s.Twall[k],
      s.mass[k],
      s.massFlow[k],
      s.liquidFraction[k],
    ].join(","),
  );
  return [head, ...rows].join("\n") + "\n";
}
