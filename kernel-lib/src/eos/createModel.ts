/**
 * Models by name: the one place that maps the `isochor eval` model ids to constructors.
 */
import { InputError, UnknownNameError } from "../errors.js";
import { editDistance } from "../numerics/editDistance.js";
import type { ModelComponent } from "./modelComponent.js";
import type { ModelWithPressure } from "./pressureFunction.js";
import type { ResidualModel } from "./types.js";
import { createCubicModel } from "./cubic/cubicModel.js";
import { isCubicModelId, CUBIC_FAMILIES, type CubicModelId } from "./cubic/cubicFamilies.js";
import { createIdealGasModel } from "./idealGasModel.js";
import { createVirialModel } from "./virial/virialModel.js";
import { createLeeKeslerModel } from "./leeKesler/leeKeslerModel.js";
import {
  penelouxShift,
  rackettShift,
  RACKETT_TRANSLATION_LABEL,
  withVolumeTranslation,
} from "./volumeTranslation.js";

/** Every built-in model id (the `isochor eval` names). */
export type ModelId = "ideal-gas" | "virial" | "lee-kesler" | CubicModelId;

/** All built-in model ids. */
export const MODEL_IDS: readonly ModelId[] = [
  "ideal-gas",
  "virial",
  "van-der-waals",
  "redlich-kwong",
  "soave-redlich-kwong",
  "peng-robinson",
  "peng-robinson-1978",
  "lee-kesler",
];

/** Options of {@link createModel}. */
export interface CreateModelOptions {
  /** Binary interaction matrix (N x N). Default: eos/data/kij.json, zero where unknown. */
  kij?: readonly (readonly number[])[];
  /**
   * Peneloux volume translation: "peneloux" for the correlation (SRK and PR families only),
   * "rackett" for shifts fitted to the Rackett saturated-liquid volume at Tr = 0.7 (any cubic;
   * eos/volumeTranslation.ts), or per-component shifts c_i in m3/mol. Default: none.
   */
  volumeTranslation?: "peneloux" | "rackett" | readonly number[];
}

/** Type guard: is this a built-in model id? */
export function isModelId(id: string): id is ModelId {
  return (MODEL_IDS as readonly string[]).includes(id);
}

/**
 * Builds a built-in model by id for these components.
 *
 * @throws UnknownNameError for an unknown id (with the closest names).
 * @example
 * ```ts
 * const pr = createModel("peng-robinson", [getComponent("methane"), getComponent("ethane")]);
 * ```
 */
export function createModel(
  id: string,
  components: readonly ModelComponent[],
  options: CreateModelOptions = {},
): ModelWithPressure {
  if (!isModelId(id)) {
    const suggestions = MODEL_IDS.map((m) => ({ m, d: editDistance(id, m) }))
      .sort((p, q) => p.d - q.d)
      .slice(0, 3)
      .map((e) => e.m);
    throw new UnknownNameError("model", String(id), suggestions);
  }
  let model: ModelWithPressure;
  if (id === "ideal-gas") model = createIdealGasModel(components);
  else if (id === "virial") model = createVirialModel(components, { kij: options.kij });
  else if (id === "lee-kesler") model = createLeeKeslerModel(components, { kij: options.kij });
  else model = createCubicModel(id, components, { kij: options.kij });
  const vt = options.volumeTranslation;
  if (vt === undefined) return model;
  let shifts: readonly number[];
  if (vt === "rackett") {
    if (!isCubicModelId(id)) {
      throw new InputError({
        input: "volumeTranslation",
        unit: "-",
        validRange: `"rackett" only with a cubic model (van-der-waals, redlich-kwong, soave-redlich-kwong, peng-robinson, peng-robinson-1978)`,
        received: `"rackett" with ${id}`,
      });
    }
    const cubicId: CubicModelId = id;
    shifts = components.map((c) => rackettShift(cubicId, c));
    return withVolumeTranslation(model, shifts, RACKETT_TRANSLATION_LABEL) as ModelWithPressure;
  }
  if (vt === "peneloux") {
    if (
      !isCubicModelId(id) ||
      (CUBIC_FAMILIES[id].interactionFamily !== "peng-robinson" && id !== "soave-redlich-kwong")
    ) {
      throw new InputError({
        input: "volumeTranslation",
        unit: "-",
        validRange: `"peneloux" only with soave-redlich-kwong, peng-robinson or peng-robinson-1978 (or give the shifts in m3/mol)`,
        received: `"peneloux" with ${id}`,
      });
    }
    const family = id === "soave-redlich-kwong" ? "soave-redlich-kwong" : "peng-robinson";
    shifts = components.map((c) => penelouxShift(family, c));
  } else {
    shifts = vt;
  }
  return withVolumeTranslation(model, shifts) as ModelWithPressure;
}

/** Re-exported for callers that only need the interface. */
export type { ResidualModel };
