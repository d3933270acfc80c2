/**
 * Phase-envelope cases: the whole envelope of the ten-component rich gas of pr-mix10-TP
 * (Peng-Robinson), from 1 bar on the dew line round the critical point to 1 bar on the bubble
 * line, with the default options (tangent-plane check at every point, critical point checked by
 * Heidemann-Khalil), and without the two checks (the continuation alone).
 */
import { defineFluid } from "../../src/fluid/defineFluid.js";
import { phaseEnvelope } from "../../src/phase/envelope/phaseEnvelope.js";
import type { BenchCase } from "../harness.js";
import { TEN, X10 } from "./richGas.js";

export const envelopeCases: BenchCase[] = [
  {
    name: "envelope-10",
    description:
      "phase envelope of the ten-component gas of pr-mix10-TP (PR), 1 bar to 1 bar through the critical point, default options",
    targetSeconds: 50e-3,
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      return function envelope10() {
        const e = phaseEnvelope(fluid, X10);
        if (!e.complete) throw new Error(`envelope-10 did not close: ${e.stoppedBecause}`);
        return e;
      };
    },
  },
  {
    name: "envelope-10-trace-only",
    description:
      "diagnostic: envelope-10 without the tangent-plane check of the points and without the Heidemann-Khalil check",
    setup() {
      const fluid = defineFluid({ components: TEN, model: "peng-robinson" });
      return function envelope10TraceOnly() {
        return phaseEnvelope(fluid, X10, { stabilityStride: 0, checkCritical: false });
      };
    },
  },
];
