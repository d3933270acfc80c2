/**
 * The fluids an explorer switches between, built once per model and kept with what is expensive
 * and does not change while a slider moves (the saturation dome, the critical point). One cache
 * per explorer on the page; a slider move then costs only the curve it redraws.
 *
 * All models of one explorer share one reference state (EXPLORER_REFERENCE_STATE: h = 0 and s = 0
 * for each pure ideal gas at 25 degC and 1 bar), so that the numbers of two models of the same state
 * differ only by the models' physics, not by each model's own zero (a reference equation's
 * publication convention, a cubic model's formation basis).
 *
 * Browser-safe.
 */
import { zeroAtIdealGas } from "../idealgas/shiftedMixture.js";
import type { Component } from "../components/types.js";
import { InputError } from "../errors.js";
import { defineFluid } from "../fluid/defineFluid.js";
import { referenceFluidIds } from "../eos/multiparameter/index.js";
import { referenceFluid } from "../fluid/referenceFluids.js";
import { referenceFluidBinding } from "../state/referenceStates.js";
import { isModelId } from "../eos/createModel.js";
import { saturationFromModel, type SampledDome } from "../charts/sample/saturationFromModel.js";
import { tryPoint } from "../charts/sample/sampleGuard.js";
import type { FluidBinding } from "../state/types.js";
import { zeroAtReferenceState } from "../idealgas/referenceState.js";
import type { ExplorerModelId } from "./explorerState.js";

/** A model of the explorer's components, with its display name. */
export interface ExplorerFluid {
  readonly id: ExplorerModelId;
  /** Model name, e.g. "Peng-Robinson (1976)". */
  readonly name: string;
  readonly binding: FluidBinding;
  /** Lowest temperature of the dome, K (a reference equation's triple point). Default: 0.55 Tc. */
  readonly lowestSaturationK?: number;
}

/** Temperature of the explorers' shared zero, K (25 degC). */
const T0_K = 298.15;
/** Pressure of the explorers' shared zero, Pa (1 bar). */
const P0_PA = 1e5;

/** The reference state every model of an explorer is shifted to. */
export const EXPLORER_REFERENCE_STATE = zeroAtReferenceState(T0_K, P0_PA);

/** The shared reference state in words, for captions, notes and status lines. */
export const EXPLORER_REFERENCE_TEXT =
  "h = 0 and s = 0 for the ideal gas at 25 degC and 1 bar, for every model";

/**
 * The binding with its ideal gas shifted so that each pure ideal gas has h = 0 and s = 0 at T0, P0
 * (whatever basis the model came with). The shifts are constants per component, linear in the
 * mole fractions: every difference between states of one model is unchanged, and so are phase
 * equilibria (both phases see the same shift of g at one T and composition).
 */
export function onExplorerReferenceState(binding: FluidBinding): FluidBinding {
  return {
    model: binding.model,
    idealGas: zeroAtIdealGas(binding.idealGas, T0_K, P0_PA),
    molarMassesKgPerMol: binding.molarMassesKgPerMol,
    ...(binding.departureMethod ? { departureMethod: binding.departureMethod } : {}),
  };
}

/** Is a reference equation shipped for this (pure) fluid? */
export function hasReferenceEquation(components: readonly Component[]): boolean {
  return components.length === 1 && referenceFluidIds().includes(components[0].id);
}

/** Checks a model id against the components: built-in ids, or "reference" for a pure fluid that has one. */
export function checkExplorerModelId(
  id: unknown,
  components: readonly Component[],
  input = "model",
): ExplorerModelId {
  if (id === "reference") {
    if (!hasReferenceEquation(components)) {
      throw new InputError({
        input,
        unit: "-",
        validRange: `"reference" only for a pure fluid with a reference equation (${referenceFluidIds().join(", ")})`,
        received: `"reference" for ${components.map((c) => c.id).join(", ")}`,
      });
    }
    return "reference";
  }
  if (typeof id !== "string" || !isModelId(id)) {
    throw new InputError({
      input,
      unit: "-",
      validRange: 'a built-in model id (e.g. "peng-robinson") or "reference"',
      received: id,
    });
  }
  return id;
}

/** Per-explorer cache of fluids and domes. */
export class ExplorerFluids {
  private readonly fluids = new Map<ExplorerModelId, ExplorerFluid>();
  private readonly domes = new Map<ExplorerModelId, SampledDome | null>();
  private readonly memo = new Map<string, unknown>();

  constructor(readonly components: readonly Component[]) {}

  /** The fluid of a model (built on first use). */
  fluid(id: ExplorerModelId): ExplorerFluid {
    let f = this.fluids.get(id);
    if (!f) {
      if (id === "reference") {
        const ref = referenceFluid(this.components[0].id);
        f = {
          id,
          name: ref.info.name,
          binding: onExplorerReferenceState(referenceFluidBinding(ref)),
          lowestSaturationK: ref.triple.temperatureK,
        };
      } else {
        const fluid = defineFluid({ components: this.components, model: id });
        f = { id, name: fluid.model.info.name, binding: onExplorerReferenceState(fluid) };
      }
      this.fluids.set(id, f);
    }
    return f;
  }

  /**
   * The saturation dome of a pure fluid's model, with enthalpy and entropy (null for a mixture or
   * a model without a vapour-liquid critical point, e.g. the ideal gas).
   */
  dome(id: ExplorerModelId): SampledDome | null {
    if (!this.domes.has(id)) {
      const fluid = this.fluid(id);
      const Tc = this.components[0].criticalTemperatureK;
      // start at the triple point where the equation has one (it refuses colder states)
      const from =
        fluid.lowestSaturationK !== undefined
          ? Math.max(0.55, (fluid.lowestSaturationK * 1.0005) / Tc)
          : 0.55;
      const dome =
        this.components.length === 1
          ? (tryPoint(() =>
              saturationFromModel(fluid.binding, { points: 40, fromReducedTemperature: from }),
            ) ?? null)
          : null;
      this.domes.set(id, dome);
    }
    return this.domes.get(id) ?? null;
  }

  /** Any other value that depends only on the model: computed once under `key`. */
  once<T>(key: string, compute: () => T): T {
    if (!this.memo.has(key)) this.memo.set(key, compute());
    return this.memo.get(key) as T;
  }
}
