/** `isochor eval`: request and response names (issue 4 item 6), per-state errors, malformed requests. */
import { describe, expect, it } from "vitest";
import { evalCommand, runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { fakeIo } from "./fakeIo.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";

const request = {
  model: "peng-robinson",
  components: ["methane", "ethane"],
  x: [0.9, 0.1],
  departure: "closed-form",
  reference: "formation",
  idealGas: "correlation",
  phase: "stable",
  states: [
    { T: 300, P: 5e6 },
    { T: 300, rho: 2000 },
    { T: -5, P: 1e5 },
  ],
};

describe("isochor eval", () => {
  it("answers the request shape with the response names, SI molar", async () => {
    const io = fakeIo(JSON.stringify(request));
    const code = await evalCommand([], io);
    expect(code).toBe(0);
    const res = JSON.parse(io.out);
    expect(res.states).toHaveLength(3);
    const s0 = res.states[0];
    for (const key of [
      "T",
      "P",
      "rho",
      "Z",
      "phase",
      "h",
      "s",
      "u",
      "cp",
      "cv",
      "w",
      "jt",
      "lnPhi",
      "residual",
      "residualTV",
    ]) {
      expect(s0).toHaveProperty(key);
    }
    expect(Object.keys(s0.residual).sort()).toEqual(["a", "g", "h", "s", "u"]);
    expect(Object.keys(s0.residualTV).sort()).toEqual(["a", "g", "s"]);
    // same numbers as the library
    const fluid = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    const s = fluid.stateAtTP(300, 5e6, [0.9, 0.1]);
    expect(s0.h).toBe(s.molar.h);
    expect(s0.Z).toBe(s.Z);
    expect(s0.lnPhi).toEqual(s.lnPhi);
    expect(res.states[1].rho).toBe(2000);
    // one bad state: an error entry, the batch goes on
    expect(res.states[2].error.code).toBe("bad-input");
    expect(res.states[2].error.message).toMatch(/temperatureK/);
  });

  it("reads a request file; numeric departures agree with closed form", async () => {
    const fs = await import("node:fs");
    const os = await import("node:os");
    const path = await import("node:path");
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "isochor-eval-")), "req.json");
    fs.writeFileSync(
      file,
      JSON.stringify({ ...request, departure: "numeric", states: [{ T: 300, P: 5e6 }] }),
    );
    const io = fakeIo("");
    expect(await evalCommand([file], io)).toBe(0);
    const numeric = JSON.parse(io.out).states[0];
    const closed = runEvalRequest({ ...request, states: [{ T: 300, P: 5e6 }] }).states[0] as {
      h: number;
    };
    expect(Math.abs(numeric.h - closed.h)).toBeLessThan(1e-6);
  });

  it("phase requests that cannot be met give error entries with code phase-unavailable", () => {
    const res = runEvalRequest({
      model: "peng-robinson",
      components: ["propane"],
      phase: "liquid",
      states: [{ T: 500, P: 1e5 }],
    });
    expect((res.states[0] as { error: { code: string } }).error.code).toBe("phase-unavailable");
  });

  const malformed: [string, unknown, string][] = [
    ["not an object", [1, 2], "$"],
    ["unknown model", { ...request, model: "peng-robinsn" }, "$.model"],
    ["unknown field", { ...request, temperature: 3 }, "$.temperature"],
    ["x of wrong length", { ...request, x: [1] }, "$.x"],
    ["x not summing to 1", { ...request, x: [0.5, 0.6] }, "$.x"],
    ["a string temperature", { ...request, states: [{ T: "300", P: 1e5 }] }, "$.states[0].T"],
    ["P and rho both", { ...request, states: [{ T: 300, P: 1e5, rho: 3 }] }, "$.states[0]"],
    ["no pressure or density", { ...request, states: [{ T: 300 }] }, "$.states[0]"],
    ["a bad kij row", { ...request, kij: [[0, 0.1], [0.1]] }, "$.kij[1]"],
    [
      "an unknown component",
      { ...request, components: ["methane", "unobtainium"] },
      "$.components[1]",
    ],
    ["an unknown constant", { ...request, constants: [{ Tk: 3 }, null] }, "$.constants[0].Tk"],
    ["a bad phase", { ...request, phase: "solid" }, "$.phase"],
    ["a string checkStability", { ...request, checkStability: "yes" }, "$.checkStability"],
    ["empty states", { ...request, states: [] }, "$.states"],
  ];
  for (const [label, body, path] of malformed) {
    it(`refuses ${label} with the JSON path ${path} and exit code 2`, async () => {
      const io = fakeIo(JSON.stringify(body));
      const code = await evalCommand([], io);
      expect(code).toBe(2);
      const res = JSON.parse(io.out);
      expect(res.error.code).toBe("bad-request");
      expect(res.error.path).toBe(path);
      expect(io.err).toContain(path);
    });
  }
  it("refuses invalid JSON", async () => {
    const io = fakeIo("{ not json");
    expect(await evalCommand([], io)).toBe(2);
    expect(JSON.parse(io.out).error.path).toBe("$");
  });
  it("checkStability (default true) reports a split in the state's warnings, false skips it", () => {
    // 70 % methane, 30 % n-butane at 280 K, 20 bar must drop liquid: the n-butane partial
    // pressure, 6 bar, is far above its vapour pressure there (tests/unit/phase/stability.test.ts)
    const body = {
      model: "peng-robinson",
      components: ["methane", "n-butane"],
      x: [0.7, 0.3],
      states: [
        { T: 280, P: 20e5 },
        { T: 400, P: 5e5 },
      ],
    };
    const checked = runEvalRequest({ ...body, checkStability: true });
    const [cold, hot] = checked.states as { warnings?: string[] }[];
    expect(cold.warnings?.some((w) => /not stable as one phase/.test(w))).toBe(true);
    expect(hot.warnings ?? []).toEqual([]);
    // the default tests a mixture state: none comes back single-phase inside the dome unwarned
    const byDefault = runEvalRequest(body).states[0] as { warnings?: string[] };
    expect(byDefault.warnings?.some((w) => /not stable as one phase/.test(w))).toBe(true);
    const unchecked = runEvalRequest({ ...body, checkStability: false }).states[0] as {
      warnings?: string[];
    };
    expect(unchecked.warnings ?? []).toEqual([]);
  });
  it("constants override the table (Tc changes Z)", () => {
    const base = runEvalRequest({
      model: "soave-redlich-kwong",
      components: ["methane"],
      states: [{ T: 250, P: 5e6 }],
    });
    const over = runEvalRequest({
      model: "soave-redlich-kwong",
      components: ["methane"],
      constants: [{ Tc: 200, Pc: 4.6e6, omega: 0.011, M: 0.016 }],
      states: [{ T: 250, P: 5e6 }],
    });
    expect((base.states[0] as { Z: number }).Z).not.toBe((over.states[0] as { Z: number }).Z);
  });
});

describe("isochor eval: ideal-gas routes and reference states", () => {
  it("the molecular route gives nearly the same h as the correlation route, and zero-at references zero h at (T0, P0) for the ideal gas", () => {
    const base = { model: "peng-robinson", components: ["methane"], states: [{ T: 300, P: 1e5 }] };
    const c = runEvalRequest({ ...base, idealGas: "correlation" }).states[0] as {
      h: number;
      cp: number;
    };
    const m = runEvalRequest({ ...base, idealGas: "molecular" }).states[0] as {
      h: number;
      cp: number;
    };
    // both routes reproduce JANAF cp of methane at 300 K within about 1 % (idealgas/ tests)
    expect(Math.abs(c.cp - m.cp) / c.cp).toBeLessThan(0.01);
    const z = runEvalRequest({ ...base, reference: { kind: "zero-at", T: 300, P: 1e5 } })
      .states[0] as {
      h: number;
      residual: { h: number };
    };
    // h = 0 + residual h at the reference point itself
    expect(z.h).toBeCloseTo(z.residual.h, 9);
  });
  it("refuses a bad reference object with its path", async () => {
    const io = fakeIo(
      JSON.stringify({ ...request, reference: { kind: "zero-at", T: -3, P: 1e5 } }),
    );
    expect(await evalCommand([], io)).toBe(2);
    expect(JSON.parse(io.out).error.path).toBe("$.reference.T");
  });
});
