// Every eval result says which zero of h, s and u it uses (issue 5: "says so in every result").
import { describe, expect, it } from "vitest";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";

function firstState(request: unknown): Record<string, unknown> {
  const [state] = runEvalRequest(request).states;
  expect(state).not.toHaveProperty("error");
  return state as unknown as Record<string, unknown>;
}

describe("eval responses name their reference state", () => {
  it("a cubic model on the default formation basis", () => {
    const s = firstState({
      model: "peng-robinson",
      components: ["methane"],
      states: [{ T: 300, P: 5e6 }],
    });
    expect(s.referenceState).toMatch(/^formation basis/);
  });

  it("a user-chosen zero", () => {
    const s = firstState({
      model: "peng-robinson",
      components: ["methane"],
      reference: { kind: "zero-at", T: 273.15, P: 101325 },
      states: [{ T: 300, P: 5e6 }],
    });
    expect(s.referenceState).toMatch(/h = 0 and s = 0 .* 273\.15 K and 101325 Pa/);
  });

  it("a reference equation in its publication's convention, single-phase and inside the dome", () => {
    const single = firstState({
      model: "reference",
      components: ["water"],
      states: [{ T: 500, P: 1e6 }],
    });
    expect(single.referenceState).toMatch(/^fluid convention/);
    const wet = firstState({
      model: "reference",
      components: ["water"],
      states: [{ T: 450, quality: 0.3 }],
    });
    expect(wet.phase).toBe("two-phase");
    expect(wet.referenceState).toBe(single.referenceState);
  });
});
