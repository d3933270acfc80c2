/**
 * The shipped molecular constants (data/molecules.json, with citations per molecule), lookup by id
 * or formula, and validation of constants supplied by a user.
 */
import { editDistance } from "../../numerics/editDistance.js";
import { InputError, UnknownNameError } from "../../errors.js";
import table from "./data/molecules.json";
import type { MolecularConstants } from "./types.js";

function deepFreeze<T>(value: T): T {
  if (typeof value === "object" && value !== null && !Object.isFrozen(value)) {
    for (const v of Object.values(value)) deepFreeze(v);
    Object.freeze(value);
  }
  return value;
}

/** The shipped table, frozen so that no cell can change it for the rest of a session. */
const MOLECULES: readonly MolecularConstants[] = deepFreeze(
  (table as { molecules: MolecularConstants[] }).molecules,
);

/** Ids of the molecules shipped with the library, in table order. */
export function listMolecules(): readonly string[] {
  return MOLECULES.map((m) => m.id);
}

/**
 * Molecular constants by component id ("ethane") or formula ("C2H6"); case-insensitive for ids,
 * exact for formulas. Unknown names throw UnknownNameError with the closest ids.
 */
export function getMolecule(idOrFormula: string): MolecularConstants {
  if (typeof idOrFormula !== "string") {
    throw new InputError({
      input: "molecule",
      unit: "-",
      validRange: "a component id or formula string, or a MolecularConstants object",
      received: idOrFormula,
    });
  }
  const key = idOrFormula.trim();
  const found =
    MOLECULES.find((m) => m.id === key.toLowerCase()) ?? MOLECULES.find((m) => m.formula === key);
  if (found) return found;
  const ranked = MOLECULES.map((m) => ({
    id: m.id,
    d: Math.min(editDistance(key.toLowerCase(), m.id), editDistance(key, m.formula)),
  }))
    .sort((x, y) => x.d - y.d)
    .slice(0, 3)
    .map((x) => x.id);
  throw new UnknownNameError("molecule (statistical-mechanics data)", key, ranked);
}

function fail(input: string, unit: string, validRange: string, received: unknown): never {
  throw new InputError({ input, unit, validRange, received });
}

function isPositiveFinite(x: unknown): x is number {
  return typeof x === "number" && x > 0 && x < Infinity;
}

function isPositiveInteger(x: unknown): x is number {
  return typeof x === "number" && Number.isInteger(x) && x >= 1;
}

/**
 * Checks a MolecularConstants object (typically written by a user in a cell) and throws an
 * InputError naming the first bad field. Returns the object unchanged.
 */
export function validateMolecularConstants(c: MolecularConstants): MolecularConstants {
  if (typeof c !== "object" || c === null) fail("molecule", "-", "an object", c);
  const id =
    typeof c.id === "string" && c.id.length > 0
      ? c.id
      : fail("id", "-", "a non-empty string", c.id);
  const p = (field: string) => `${id}.${field}`;
  if (typeof c.formula !== "string") fail(p("formula"), "-", "a string", c.formula);
  if (
    !Array.isArray(c.sources) ||
    c.sources.length === 0 ||
    !c.sources.every((x) => typeof x === "string")
  ) {
    fail(p("sources"), "-", "a non-empty array of citation strings", c.sources);
  }
  // Upper bound 1 kg/mol: catches g/mol by mistake even for H2 (2.016) and He (4.003).
  if (!isPositiveFinite(c.molarMassKgPerMol) || c.molarMassKgPerMol > 1) {
    fail(
      p("molarMassKgPerMol"),
      "kg/mol",
      "a finite number > 0 and <= 1 (kg/mol, not g/mol)",
      c.molarMassKgPerMol,
    );
  }
  if (!isPositiveInteger(c.symmetryNumber)) {
    fail(p("symmetryNumber"), "-", "an integer >= 1", c.symmetryNumber);
  }
  const rot = c.rotationalConstantsInvCm;
  const expected =
    c.geometry === "atom" ? 0 : c.geometry === "linear" ? 1 : c.geometry === "nonlinear" ? 3 : -1;
  if (expected < 0) fail(p("geometry"), "-", '"atom", "linear" or "nonlinear"', c.geometry);
  if (!Array.isArray(rot) || rot.length !== expected) {
    fail(
      p("rotationalConstantsInvCm"),
      "cm^-1",
      `an array of ${expected} constants for geometry "${c.geometry}"`,
      rot,
    );
  }
  rot.forEach((b, i) => {
    if (!isPositiveFinite(b))
      fail(p(`rotationalConstantsInvCm[${i}]`), "cm^-1", "a finite number > 0", b);
  });
  if (c.nuclearSpinWeights !== undefined) {
    if (c.geometry !== "linear") {
      fail(p("nuclearSpinWeights"), "-", "only for linear molecules", c.nuclearSpinWeights);
    }
    if (
      !isPositiveFinite(c.nuclearSpinWeights.even) ||
      !isPositiveFinite(c.nuclearSpinWeights.odd)
    ) {
      fail(
        p("nuclearSpinWeights"),
        "-",
        "even and odd weights, finite numbers > 0",
        c.nuclearSpinWeights,
      );
    }
  }
  const cd = c.centrifugalDistortionInvCm;
  if (cd !== undefined) {
    if (c.geometry !== "linear") {
      fail(p("centrifugalDistortionInvCm"), "cm^-1", "only for linear molecules", cd);
    }
    const b = rot[0];
    // dE/dx = B - 2 D x + 3 H x^2 > 0 for every x (no discriminant): the levels rise with J
    if (
      !Array.isArray(cd) ||
      cd.length !== 2 ||
      !(cd[0] >= 0 && cd[0] < 0.01 * b) ||
      !(cd[1] >= 0 && cd[1] < 0.01 * cd[0] + Number.MIN_VALUE) ||
      !(cd[0] * cd[0] < 3 * cd[1] * b)
    ) {
      fail(
        p("centrifugalDistortionInvCm"),
        "cm^-1",
        "[D, H] with 0 <= D < 0.01 B, 0 <= H < 0.01 D and D^2 < 3 H B (levels rising with J for every J)",
        cd,
      );
    }
  }
  const qd = c.quarticDistortion;
  if (qd !== undefined) {
    if (c.geometry !== "nonlinear") {
      fail(p("quarticDistortion"), "cm^-1", "only for nonlinear molecules", qd);
    }
    const keys = [
      "deltaJInvCm",
      "deltaJKInvCm",
      "deltaKInvCm",
      "smallDeltaJInvCm",
      "smallDeltaKInvCm",
    ] as const;
    const smallest = Math.min(...rot);
    for (const key of keys) {
      const v = (qd as unknown as Record<string, unknown>)[key];
      if (!(typeof v === "number" && Math.abs(v) < 0.01 * smallest)) {
        fail(p(`quarticDistortion.${key}`), "cm^-1", "a finite number, |value| < 0.01 C", v);
      }
    }
  }
  if (!Array.isArray(c.vibrations)) fail(p("vibrations"), "-", "an array", c.vibrations);
  const rotors = Array.isArray(c.internalRotors)
    ? c.internalRotors
    : fail(p("internalRotors"), "-", "an array", c.internalRotors);
  if (c.geometry !== "nonlinear" && rotors.length > 0) {
    fail(p("internalRotors"), "-", "empty unless the molecule is nonlinear", rotors);
  }
  c.vibrations.forEach((v, i) => {
    if (!isPositiveFinite(v.wavenumberInvCm)) {
      fail(
        p(`vibrations[${i}].wavenumberInvCm`),
        "cm^-1",
        "a finite number > 0",
        v.wavenumberInvCm,
      );
    }
    if (!isPositiveInteger(v.degeneracy)) {
      fail(p(`vibrations[${i}].degeneracy`), "-", "an integer >= 1", v.degeneracy);
    }
    if (
      v.internalRotorIndex !== undefined &&
      !(
        Number.isInteger(v.internalRotorIndex) &&
        v.internalRotorIndex >= 0 &&
        v.internalRotorIndex < rotors.length
      )
    ) {
      fail(
        p(`vibrations[${i}].internalRotorIndex`),
        "-",
        `an index into internalRotors (0 to ${rotors.length - 1})`,
        v.internalRotorIndex,
      );
    }
  });
  rotors.forEach((_, k) => {
    if (!c.vibrations.some((v) => v.internalRotorIndex === k)) {
      fail(
        p(`internalRotors[${k}]`),
        "-",
        "matched by one vibration with internalRotorIndex = " + k + " (the torsion it replaces)",
        "no such vibration",
      );
    }
  });
  const el = c.electronicLevels;
  if (!Array.isArray(el) || el.length === 0) {
    fail(p("electronicLevels"), "-", "a non-empty array with the ground level at 0 cm^-1", el);
  }
  el.forEach((l, i) => {
    if (!(typeof l.energyInvCm === "number" && l.energyInvCm >= 0 && l.energyInvCm < Infinity)) {
      fail(p(`electronicLevels[${i}].energyInvCm`), "cm^-1", "a finite number >= 0", l.energyInvCm);
    }
    if (!isPositiveFinite(l.degeneracy)) {
      fail(p(`electronicLevels[${i}].degeneracy`), "-", "a finite number > 0", l.degeneracy);
    }
  });
  if (!el.some((l) => l.energyInvCm === 0)) {
    fail(
      p("electronicLevels"),
      "cm^-1",
      "one level at 0 (the ground level)",
      el.map((l) => l.energyInvCm),
    );
  }
  return c;
}
