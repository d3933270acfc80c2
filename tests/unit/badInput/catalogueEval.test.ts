/**
 * Bad-input catalogue, part 1: `isochor eval` through its command function with a fake IO.
 * A malformed request is refused whole (exit 2, {"error": {"code": "bad-request", "path"}}, the
 * message naming the field); a physically bad state becomes that state's error entry with the
 * library's typed code and a message naming the input. Nothing is silent, nothing hangs.
 */
import { describe, expect, it } from "vitest";
import { evalCommand } from "../../../kernel-lib/src/cli/eval.js";
import { fakeIo } from "../eval/fakeIo.js";

const base = { model: "peng-robinson", components: ["methane"], states: [{ T: 300, P: 1e5 }] };

interface RequestCase {
  name: string;
  /** The request: an object (sent as JSON) or raw text. */
  request: unknown;
  path: string;
  /** What the message must name. */
  names: RegExp;
}

const requestCases: RequestCase[] = [
  { name: "not JSON", request: "{model:", path: "$", names: /not valid JSON/ },
  { name: "empty input", request: "", path: "$", names: /not valid JSON/ },
  { name: "a JSON array", request: [], path: "$", names: /request object/ },
  { name: "a JSON number", request: 42, path: "$", names: /request object, got 42/ },
  { name: "JSON null", request: null, path: "$", names: /request object, got null/ },
  { name: "unknown field", request: { ...base, temp: 1 }, path: "$.temp", names: /unknown field/ },
  {
    name: "model missing",
    request: { ...base, model: undefined },
    path: "$.model",
    names: /model/,
  },
  { name: "model a number", request: { ...base, model: 7 }, path: "$.model", names: /got 7/ },
  {
    name: "unknown model",
    request: { ...base, model: "peng-robinsonn" },
    path: "$.model",
    names: /"peng-robinsonn"/,
  },
  {
    name: "components empty",
    request: { ...base, components: [] },
    path: "$.components",
    names: /non-empty/,
  },
  {
    name: "components a string",
    request: { ...base, components: "methane" },
    path: "$.components",
    names: /"methane"/,
  },
  {
    name: "component null",
    request: { ...base, components: [null] },
    path: "$.components[0]",
    names: /got null/,
  },
  {
    name: "component blank",
    request: { ...base, components: ["  "] },
    path: "$.components[0]",
    names: /non-blank/,
  },
  {
    name: "unknown component",
    request: { ...base, components: ["unobtainium"] },
    path: "$.components[0]",
    names: /"unobtainium"/,
  },
  {
    name: "duplicate component",
    request: { ...base, components: ["methane", "CH4"], x: [0.5, 0.5] },
    path: "$.components[1]",
    names: /"methane".*"CH4"|"CH4".*"methane"/,
  },
  {
    name: "x missing for a mixture",
    request: { ...base, components: ["methane", "ethane"] },
    path: "$.x",
    names: /mole fractions/,
  },
  {
    name: "x wrong length",
    request: { ...base, components: ["methane", "ethane"], x: [1] },
    path: "$.x",
    names: /2 mole fractions/,
  },
  {
    name: "x entry a string",
    request: { ...base, components: ["methane", "ethane"], x: ["0.5", 0.5] },
    path: "$.x[0]",
    names: /"0.5"/,
  },
  {
    name: "x entry negative",
    request: { ...base, components: ["methane", "ethane"], x: [-0.5, 1.5] },
    path: "$.x[0]",
    names: /-0.5/,
  },
  {
    name: "x not summing to 1",
    request: { ...base, components: ["methane", "ethane"], x: [0.5, 0.6] },
    path: "$.x",
    names: /sum to 1/,
  },
  {
    name: "kij not a matrix",
    request: { ...base, components: ["methane", "ethane"], x: [0.5, 0.5], kij: 0.1 },
    path: "$.kij",
    names: /got 0\.1/,
  },
  {
    name: "kij row short",
    request: { ...base, components: ["methane", "ethane"], x: [0.5, 0.5], kij: [[0], [0, 0]] },
    path: "$.kij[0]",
    names: /row of 2/,
  },
  {
    name: "kij entry null",
    request: {
      ...base,
      components: ["methane", "ethane"],
      x: [0.5, 0.5],
      kij: [
        [0, null],
        [0, 0],
      ],
    },
    path: "$.kij[0][1]",
    names: /got null/,
  },
  {
    name: "constants wrong length",
    request: { ...base, constants: [] },
    path: "$.constants",
    names: /1 entries/,
  },
  {
    name: "constant unknown key",
    request: { ...base, constants: [{ Tcrit: 190 }] },
    path: "$.constants[0].Tcrit",
    names: /unknown field/,
  },
  {
    name: "constant Tc negative",
    request: { ...base, constants: [{ Tc: -190 }] },
    path: "$.constants[0].Tc",
    names: /-190/,
  },
  {
    name: "constant entry a number",
    request: { ...base, constants: [5] },
    path: "$.constants[0]",
    names: /got 5/,
  },
  {
    name: "departure unknown",
    request: { ...base, departure: "exact" },
    path: "$.departure",
    names: /"exact"/,
  },
  {
    name: "idealGas unknown",
    request: { ...base, idealGas: "nasa" },
    path: "$.idealGas",
    names: /"nasa"/,
  },
  { name: "phase unknown", request: { ...base, phase: "gas" }, path: "$.phase", names: /"gas"/ },
  {
    name: "checkStability a string",
    request: { ...base, checkStability: "yes" },
    path: "$.checkStability",
    names: /"yes"/,
  },
  {
    name: "reference unknown",
    request: { ...base, reference: "ashrae" },
    path: "$.reference",
    names: /"ashrae"/,
  },
  {
    name: "reference T negative",
    request: { ...base, reference: { kind: "zero-at", T: -1, P: 1e5 } },
    path: "$.reference.T",
    names: /-1/,
  },
  {
    // neither states nor "envelope": true (the envelope alone needs no states)
    name: "states missing",
    request: { ...base, states: undefined },
    path: "$",
    names: /"states".*"envelope": true/,
  },
  { name: "states empty", request: { ...base, states: [] }, path: "$.states", names: /non-empty/ },
  {
    name: "state a number",
    request: { ...base, states: [3] },
    path: "$.states[0]",
    names: /got 3/,
  },
  {
    name: "state unknown field",
    request: { ...base, states: [{ T: 300, p: 1e5 }] },
    path: "$.states[0].p",
    names: /unknown field/,
  },
  {
    name: "state T a string",
    request: { ...base, states: [{ T: "300", P: 1e5 }] },
    path: "$.states[0].T",
    names: /"300"/,
  },
  {
    name: "state T null (NaN in JSON writers)",
    request: { ...base, states: [{ T: null, P: 1e5 }] },
    path: "$.states[0].T",
    names: /got null/,
  },
  {
    name: "state without P or rho",
    request: { ...base, states: [{ T: 300 }] },
    path: "$.states[0]",
    names: /exactly one pair: \{T, P\}/,
  },
  {
    name: "state with P and rho",
    request: { ...base, states: [{ T: 300, P: 1e5, rho: 40 }] },
    path: "$.states[0]",
    names: /exactly one pair/,
  },
  {
    name: "saturated and quality",
    request: { ...base, states: [{ T: 150, saturated: "liquid", quality: 0 }] },
    path: "$.states[0]",
    names: /saturated or quality/,
  },
  {
    name: "saturated with T and P",
    request: { ...base, states: [{ T: 150, P: 1e6, saturated: "liquid" }] },
    path: "$.states[0]",
    names: /exactly one of T/,
  },
  {
    name: "saturated unknown",
    request: { ...base, states: [{ T: 150, saturated: "solid" }] },
    path: "$.states[0].saturated",
    names: /"solid"/,
  },
  // a mixture at given quality is no longer refused: it is a mixture saturation point
  // (tests/unit/eval/evalEquilibrium.test.ts)
  {
    name: "reference model, two components",
    request: { ...base, model: "reference", components: ["water", "methane"], x: [0.5, 0.5] },
    path: "$.components",
    names: /one component/,
  },
  {
    name: "reference model, no equation",
    request: { ...base, model: "reference", components: ["ethane"] },
    path: "$.components[0]",
    names: /"ethane"/,
  },
  {
    name: "reference model with kij",
    request: { ...base, model: "reference", components: ["water"], kij: [[0]] },
    path: "$.kij",
    names: /not accepted/,
  },
  {
    name: "a 1 MB component name (clipped, quick)",
    request: { ...base, components: ["z".repeat(1 << 20)] },
    path: "$.components[0]",
    names: /1048576 characters/,
  },
];

describe("isochor eval: malformed requests are refused whole with the JSON path", () => {
  for (const c of requestCases) {
    it(c.name, async () => {
      const text = typeof c.request === "string" ? c.request : JSON.stringify(c.request);
      const io = fakeIo(text);
      const code = await evalCommand([], io);
      expect(code).toBe(2);
      const out = JSON.parse(io.out) as { error: { code: string; message: string; path: string } };
      expect(out.error.code).toBe("bad-request");
      expect(out.error.path).toBe(c.path);
      expect(out.error.message).toMatch(c.names);
      expect(out.error.message.length).toBeLessThan(2000);
      expect(io.err).toMatch(/^isochor eval: /);
    });
  }
});

interface StateCase {
  name: string;
  request?: Record<string, unknown>;
  state: Record<string, unknown>;
  code: string;
  names: RegExp;
  /** A good state of the same request (default T = 300 K, P = 1 bar). */
  good?: { T: number; P: number };
}

const stateCases: StateCase[] = [
  { name: "T = 0", state: { T: 0, P: 1e5 }, code: "bad-input", names: /temperatureK.*received 0/ },
  { name: "T < 0", state: { T: -5, P: 1e5 }, code: "bad-input", names: /temperatureK/ },
  { name: "P < 0", state: { T: 300, P: -1 }, code: "bad-input", names: /pressurePa.*-1/ },
  { name: "rho = 0", state: { T: 300, rho: 0 }, code: "bad-input", names: /densityMolPerM3/ },
  {
    name: "P = 1e15 Pa",
    state: { T: 300, P: 1e15 },
    code: "out-of-range",
    names: /pressurePa.*1000000000000000/,
  },
  {
    name: "T = 1e308 K",
    state: { T: 1e308, P: 1e5 },
    code: "out-of-range",
    names: /temperatureK.*1e\+308/,
  },
  {
    name: "T = 5e-324 K",
    state: { T: 5e-324, P: 1e5 },
    code: "out-of-range",
    names: /temperatureK.*5e-324/,
  },
  { name: "T = 1e6 K", state: { T: 1e6, P: 1e5 }, code: "out-of-range", names: /temperatureK/ },
  {
    name: "rho above 1/b",
    state: { T: 300, rho: 1e6 },
    code: "out-of-range",
    names: /densityMolPerM3.*1000000/,
  },
  {
    name: "quality above 1",
    state: { T: 150, quality: 1.5 },
    code: "bad-input",
    names: /quality.*1\.5/,
  },
  {
    name: "quality negative",
    state: { P: 1e6, quality: -0.1 },
    code: "bad-input",
    names: /quality.*-0\.1/,
  },
  {
    name: "saturated above Tc",
    state: { T: 250, saturated: "liquid" },
    code: "phase-unavailable",
    names: /T = 250 K.*critical temperature/,
  },
  {
    name: "saturated above Pc",
    state: { P: 1e8, saturated: "vapor" },
    code: "phase-unavailable",
    names: /P = 100000000 Pa.*critical pressure/,
  },
  {
    name: "saturated at T = 0",
    state: { T: 0, saturated: "vapor" },
    code: "bad-input",
    names: /temperatureK/,
  },
  {
    name: "liquid asked where only vapour exists",
    request: { ...base, phase: "liquid" },
    state: { T: 400, P: 1e5 },
    code: "phase-unavailable",
    names: /liquid/,
    good: { T: 120, P: 1e6 },
  },
  {
    name: "reference water below the triple point",
    request: { ...base, model: "reference", components: ["water"] },
    state: { T: 200, P: 1e5 },
    code: "phase-unavailable",
    names: /T = 200 K.*triple point/,
  },
  {
    name: "reference CO2 saturated far below the triple-point pressure",
    request: { ...base, model: "reference", components: ["carbon-dioxide"] },
    state: { P: 1, saturated: "liquid" },
    code: "phase-unavailable",
    names: /P = 1 Pa.*triple point/,
  },
  {
    name: "reference water beyond its extrapolation range",
    request: { ...base, model: "reference", components: ["water"] },
    state: { T: 6000, P: 1e5 },
    code: "out-of-range",
    names: /temperatureK|6000/,
  },
];

describe("isochor eval: a bad state is that state's error entry, the batch goes on", () => {
  for (const c of stateCases) {
    it(c.name, async () => {
      const good = c.good ?? { T: 300, P: 1e5 };
      const request = { ...(c.request ?? base), states: [c.state, good] };
      const io = fakeIo(JSON.stringify(request));
      expect(await evalCommand([], io)).toBe(0);
      const res = JSON.parse(io.out) as {
        states: ({ error: { code: string; message: string } } | { T: number })[];
      };
      const bad = res.states[0] as { error: { code: string; message: string } };
      expect(bad.error.code).toBe(c.code);
      expect(bad.error.message).toMatch(c.names);
      expect(res.states[1]).toHaveProperty("T", good.T);
    });
  }
  it("a UTF-8 byte-order mark before valid JSON is accepted", async () => {
    const io = fakeIo("\uFEFF" + JSON.stringify(base));
    expect(await evalCommand([], io)).toBe(0);
    expect(JSON.parse(io.out).states[0].T).toBe(300);
  });
});

export const EVAL_CASES = requestCases.length + stateCases.length;
