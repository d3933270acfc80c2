/**
 * `isochor eval` phase-equilibrium fields: "phase": "equilibrium", the (P, h), (P, s), (T, s) and
 * (u, rho) state forms, mixture states at given quality, and the request-level "envelope". The
 * checks are thermodynamic identities of the returned numbers (equal fugacity of the phases,
 * material balance, overall values as amount-weighted sums, round trips through the state
 * functions) and the envelope's own definitions (the cricondenbar is its highest pressure).
 */
import { describe, expect, it } from "vitest";
import { runEvalRequest } from "../../../kernel-lib/src/cli/eval.js";
import { parseEvalRequest } from "../../../kernel-lib/src/cli/evalRequest.js";
import { RequestError } from "../../../kernel-lib/src/errors.js";

interface PhaseEntry {
  kind: string;
  amount: number;
  x: number[];
  rho: number;
  h: number;
  s: number;
  u: number;
  lnPhi: number[];
}
interface Entry {
  T: number;
  P: number;
  h: number;
  s: number;
  u: number;
  rho: number;
  phase: string;
  quality: number;
  phases: PhaseEntry[];
  error?: { code: string; message: string };
}

const gas = {
  model: "peng-robinson",
  components: ["methane", "n-butane"],
  x: [0.6, 0.4],
};

function states(request: object): Entry[] {
  return runEvalRequest(request).states as unknown as Entry[];
}

/** max over components of |ln(x_i phi_i)| differences between every pair of phases. */
function fugacityGap(phases: PhaseEntry[]): number {
  let gap = 0;
  for (let a = 0; a < phases.length; a++) {
    for (let b = a + 1; b < phases.length; b++) {
      for (let i = 0; i < phases[a].x.length; i++) {
        if (!(phases[a].x[i] > 0)) continue;
        const fa = Math.log(phases[a].x[i]) + phases[a].lnPhi[i];
        const fb = Math.log(phases[b].x[i]) + phases[b].lnPhi[i];
        gap = Math.max(gap, Math.abs(fa - fb));
      }
    }
  }
  return gap;
}

describe("eval: equilibrium states", () => {
  it("splits a methane/n-butane mixture at 280 K, 40 bar into two verified phases", () => {
    const [e] = states({ ...gas, phase: "equilibrium", states: [{ T: 280, P: 40e5 }] });
    expect(e.error).toBeUndefined();
    expect(e.phase).toBe("two-phase");
    expect(e.phases.map((p) => p.kind)).toEqual(["vapor", "liquid"]);
    expect(fugacityGap(e.phases)).toBeLessThan(1e-9);
    const [v, l] = e.phases;
    expect(v.rho).toBeLessThan(l.rho);
    expect(v.amount + l.amount).toBeCloseTo(1, 12);
    for (let i = 0; i < 2; i++) {
      expect(v.amount * v.x[i] + l.amount * l.x[i]).toBeCloseTo(gas.x[i], 10);
    }
    expect(e.h).toBeCloseTo(v.amount * v.h + l.amount * l.h, 6);
    expect(1 / e.rho).toBeCloseTo(v.amount / v.rho + l.amount / l.rho, 12);
    expect(e.quality).toBe(v.amount);
  });

  it("keeps the single-phase fields for a one-phase equilibrium", () => {
    const [e] = states({ ...gas, phase: "equilibrium", states: [{ T: 400, P: 20e5 }] });
    const one = e as unknown as Entry & { cp: number; lnPhi: number[] };
    expect(e.phases).toHaveLength(1);
    expect(e.phase).toBe("vapor");
    expect(one.cp).toBeGreaterThan(0);
    expect(one.lnPhi).toHaveLength(2);
  });

  it("recovers T from (P, h), (P, s) and (T, s) of a two-phase state to 1e-6 K", () => {
    const [tp] = states({ ...gas, phase: "equilibrium", states: [{ T: 280, P: 40e5 }] });
    const [ph, ps, ts] = states({
      ...gas,
      states: [
        { P: 40e5, h: tp.h },
        { P: 40e5, s: tp.s },
        { T: 280, s: tp.s },
      ],
    });
    expect(Math.abs(ph.T - 280)).toBeLessThan(1e-6);
    expect(Math.abs(ps.T - 280)).toBeLessThan(1e-6);
    expect(Math.abs(ts.P - 40e5) / 40e5).toBeLessThan(1e-6);
    for (const e of [ph, ps, ts]) expect(fugacityGap(e.phases)).toBeLessThan(1e-9);
  });

  it("finds the state of a closed vessel from (u, rho)", () => {
    const [tp] = states({ ...gas, phase: "equilibrium", states: [{ T: 280, P: 40e5 }] });
    const [uv] = states({ ...gas, states: [{ u: tp.u, rho: tp.rho }] });
    expect(uv.error).toBeUndefined();
    expect(Math.abs(uv.T - 280)).toBeLessThan(1e-5);
    expect(Math.abs(uv.P - 40e5) / 40e5).toBeLessThan(1e-6);
  });

  it("gives mixture bubble, dew and quality points at given T", () => {
    const [bubble, mid, dew] = states({
      ...gas,
      states: [
        { T: 280, saturated: "liquid" },
        { T: 280, quality: 0.5 },
        { T: 280, saturated: "vapor" },
      ],
    });
    // at fixed T the pressure falls from the bubble to the dew point
    expect(bubble.P).toBeGreaterThan(mid.P);
    expect(mid.P).toBeGreaterThan(dew.P);
    expect(mid.phase).toBe("two-phase");
    expect(mid.quality).toBeCloseTo(0.5, 12);
    for (const e of [bubble, mid, dew]) expect(fugacityGap(e.phases)).toBeLessThan(1e-9);
    // the bubble point's liquid is the feed
    const liquid = bubble.phases.find((p) => p.kind === "liquid")!;
    expect(liquid.x[0]).toBeCloseTo(0.6, 9);
  });

  it("takes a pure fluid inside the dome through (P, h)", () => {
    const [sat] = states({
      model: "reference",
      components: ["water"],
      states: [{ P: 1e5, quality: 0.3 }],
    });
    const [ph] = states({
      model: "reference",
      components: ["water"],
      states: [{ P: 1e5, h: sat.h }],
    });
    expect(ph.error).toBeUndefined();
    expect(ph.phase).toBe("two-phase");
    expect(ph.quality).toBeCloseTo(0.3, 8);
    expect(Math.abs(ph.T - sat.T)).toBeLessThan(1e-6);
  });
});

describe("eval: envelope", () => {
  it("returns the envelope with its critical point and cricondenbar", () => {
    const response = runEvalRequest({ ...gas, envelope: true }) as unknown as {
      states: unknown[];
      envelope: {
        points: { T: number; P: number; kind: string; incipient: number[] }[];
        critical: { T: number; P: number }[];
        cricondenbar: { T: number; P: number };
        cricondentherm: { T: number; P: number };
        complete: boolean;
      };
    };
    expect(response.states).toEqual([]);
    const env = response.envelope;
    expect(env.points.length).toBeGreaterThan(10);
    expect(env.points.some((p) => p.kind === "bubble")).toBe(true);
    expect(env.points.some((p) => p.kind === "dew")).toBe(true);
    const maxP = Math.max(...env.points.map((p) => p.P));
    const maxT = Math.max(...env.points.map((p) => p.T));
    expect(env.cricondenbar.P).toBeGreaterThanOrEqual(maxP * (1 - 1e-9));
    expect(env.cricondentherm.T).toBeGreaterThanOrEqual(maxT * (1 - 1e-9));
    expect(env.critical).toHaveLength(1);
    for (const p of env.points) expect(p.incipient.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 9);
  });

  it("says why there is no envelope for a pure fluid, as an error entry", () => {
    const response = runEvalRequest({
      model: "peng-robinson",
      components: ["methane"],
      envelope: true,
    }) as unknown as { envelope: { error: { code: string } } };
    expect(response.envelope.error.code).toBe("bad-input");
  });
});

describe("eval: equilibrium request checks", () => {
  it("refuses a state with three specifications, naming its path", () => {
    expect(() => parseEvalRequest({ ...gas, states: [{ T: 300, P: 1e5, h: 0 }] })).toThrowError(
      RequestError,
    );
    try {
      parseEvalRequest({ ...gas, states: [{ T: 300, P: 1e5, h: 0 }] });
    } catch (e) {
      expect((e as RequestError).path).toBe("$.states[0]");
    }
  });

  it("refuses a request with neither states nor envelope", () => {
    expect(() => parseEvalRequest({ ...gas })).toThrowError(/states/);
  });

  it("accepts phase equilibrium and the new state forms", () => {
    const r = parseEvalRequest({
      ...gas,
      phase: "equilibrium",
      states: [
        { P: 1e6, h: -1000 },
        { u: -2000, rho: 100 },
        { T: 300, s: -10 },
      ],
    });
    expect(r.states.map((s) => s.kind)).toEqual(["PH", "URho", "TS"]);
    expect(r.phase).toBe("equilibrium");
  });
});
