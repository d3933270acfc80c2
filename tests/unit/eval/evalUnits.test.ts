/**
 * `isochor eval` states given as quantities with units ("30 degC", "60 barg", "-350 kJ/kg"):
 * converted by the units module, with its rules and refusals, the JSON path named on a refusal.
 * 30 degC = 303.15 K and 60 barg = 6,101,325 Pa with the standard atmosphere 101325 Pa
 * (NIST SP 811, App. B: the definitions of the units).
 */
import { describe, expect, it } from "vitest";
import { evalCommand } from "../../../kernel-lib/src/cli/eval.js";
import { fakeIo } from "./fakeIo.js";
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";

const base = { model: "peng-robinson", components: ["methane"] };

async function evaluate(states: unknown[]) {
  const io = fakeIo(JSON.stringify({ ...base, states }));
  const code = await evalCommand([], io);
  return { code, io };
}

describe("isochor eval with units", () => {
  it("a state in degC and barg equals the same state in K and Pa", async () => {
    const a = await evaluate([{ T: "30 degC", P: "60 barg" }]);
    const b = await evaluate([{ T: 303.15, P: 6101325 }]);
    expect(a.code).toBe(0);
    const sa = JSON.parse(a.io.out).states[0];
    const sb = JSON.parse(b.io.out).states[0];
    expect(sa.h).toBeCloseTo(sb.h, 6);
    expect(sa.rho).toBeCloseTo(sb.rho, 9);
  });

  it("a (P, h) state with h in kJ/kg (through the molar mass of methane)", async () => {
    const ref = await evaluate([{ T: 303.15, P: 6101325 }]);
    const h = JSON.parse(ref.io.out).states[0].h as number;
    // the molar mass the request uses is the component table's (the conversion's own input)
    const hPerKg = h / getComponent("methane").molarMassKgPerMol / 1000;
    const r = await evaluate([{ P: "6.101325 MPa", h: `${hPerKg} kJ/kg` }]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.io.out).states[0].T).toBeCloseTo(303.15, 3);
  });

  it("refuses an ambiguous psi, a wrong dimension and a bare number string, with the path", async () => {
    for (const [state, path, words] of [
      [{ T: 300, P: "100 psi" }, "$.states[0].P", /psi/],
      [{ T: "300 bar", P: 1e5 }, "$.states[0].T", /bar/],
      [{ T: "300", P: 1e5 }, "$.states[0].T", /"300"/],
    ] as const) {
      const r = await evaluate([state]);
      expect(r.code).not.toBe(0);
      expect(r.io.err).toContain(path);
      expect(r.io.err).toMatch(words);
    }
  });
});
