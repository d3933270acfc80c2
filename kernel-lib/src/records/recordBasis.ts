/**
 * The basis of a result or chart (the model entry and inputs it was computed from): checked against
 * the record's entries, and written as text (Markdown) or as links to the entries (HTML).
 */
import { InputError } from "../errors.js";
import type { RecordBasis, RecordedInput, ResolvedBasis } from "./recordContent.js";
import type { ModelEntry } from "./modelEntry.js";

/**
 * Resolves a basis to ids, refusing a model or input that is not an entry of the record.
 * @param where The option's name in messages, e.g. "options" or "rowBasis(row 2)".
 */
export function resolveBasis(
  basis: RecordBasis,
  where: string,
  models: readonly ModelEntry[],
  inputs: readonly RecordedInput[],
): ResolvedBasis {
  let modelId: string | undefined;
  if (basis.model !== undefined) {
    const id = typeof basis.model === "string" ? basis.model : basis.model?.id;
    if (!models.some((m) => m.id === id)) {
      throw new InputError({
        input: `${where}.model`,
        unit: "-",
        validRange: `a model of this record (${models.map((m) => m.id).join(", ") || "none yet: call model() first"})`,
        received: id ?? basis.model,
      });
    }
    modelId = id;
  }
  const inputIds: string[] = [];
  if (basis.inputs !== undefined) {
    if (!Array.isArray(basis.inputs)) {
      throw new InputError({
        input: `${where}.inputs`,
        unit: "-",
        validRange: "an array of inputs",
        received: basis.inputs,
      });
    }
    basis.inputs.forEach((input, i) => {
      const id = typeof input === "string" ? input : (input as RecordedInput | null)?.id;
      if (!inputs.some((r) => r.id === id)) {
        throw new InputError({
          input: `${where}.inputs[${i}]`,
          unit: "-",
          validRange: `an input of this record (${inputs.map((r) => r.id).join(", ") || "none yet: call input() first"})`,
          received: id ?? input,
        });
      }
      if (!inputIds.includes(id as string)) inputIds.push(id as string);
    });
    inputIds.sort((a, b) => Number(a.slice(1)) - Number(b.slice(1)));
  }
  return { modelId, inputIds };
}

/** The basis in words: "M1; I1, I2". */
export function basisText(basis: ResolvedBasis): string {
  const parts = [basis.modelId, basis.inputIds.join(", ")].filter(
    (s) => s !== undefined && s !== "",
  );
  return parts.length > 0 ? parts.join("; ") : "–";
}

/** The basis as links to the record's model and input entries (ids are generated, never user text). */
export function basisLinks(anchor: string, basis: ResolvedBasis): string {
  const link = (id: string) => `<a href="#${anchor}-${id}">${id}</a>`;
  const parts: string[] = [];
  if (basis.modelId !== undefined) parts.push(link(basis.modelId));
  if (basis.inputIds.length > 0) parts.push(basis.inputIds.map(link).join(", "));
  return parts.length > 0 ? `<span class="calc-basis-cell">${parts.join("; ")}</span>` : "–";
}
