/**
 * The two-phase region of a mixture for the P-h and T-s diagrams: the phase envelope of the feed
 * (phase/envelope/phaseEnvelope.ts, Michelsen's continuation) with the feed's own state at each
 * point, the stable root of z at (T, P) (state/stateAtTP): on the bubble line the saturated liquid
 * at z, on the dew line the saturated vapour at z. The critical point carries the state of z there.
 * Lines of constant vapour fraction come from the envelope's quality lines, each point flashed at
 * its (T, P) (phase/flash/flashTP.ts, verified) and given the feed's overall h and s (the
 * amount-weighted phases); a point whose flash does not return two phases with that vapour
 * fraction (the lighter phase's amount, to 1e-6) is left out and counted in the notes.
 */
import { InputError, OutOfRangeError } from "../../errors.js";
import { flashTP } from "../../phase/flash/flashTP.js";
import type { Equilibrium } from "../../phase/flash/types.js";
import {
  phaseEnvelope,
  type PhaseEnvelope,
  type PhaseEnvelopeOptions,
} from "../../phase/envelope/phaseEnvelope.js";
import { stateAtTP } from "../../state/stateAt.js";
import type { FluidBinding } from "../../state/types.js";
import type { ChartCriticalPoint } from "../saturationInput.js";
import type {
  ChartMixtureBoundaryPoint,
  ChartMixtureDome,
  ChartMixtureDomePoint,
} from "../mixtureDomeInput.js";
import { tryPoint } from "./sampleGuard.js";

/** Options of {@link mixtureDomeFromFluid}. */
export interface MixtureDomeSampleOptions {
  /** An envelope of the same feed already computed (e.g. `fluid.envelope(z, ...)`); default: traced here. */
  envelope?: PhaseEnvelope;
  /** Vapour fractions of the quality lines when the envelope is traced here. Default none. */
  vaporFractions?: readonly number[];
  /** Further options of the envelope traced here. */
  envelopeOptions?: PhaseEnvelopeOptions;
  /** Largest |beta(flash) - beta(line)| accepted on a quality line. Default 1e-6. */
  vaporFractionTolerance?: number;
}

/** A mixture dome with the envelope it came from. */
export interface SampledMixtureDome {
  /** Pass as `mixtureDome` to pressureEnthalpyChart or temperatureEntropyChart. */
  mixtureDome: ChartMixtureDome;
  envelope: PhaseEnvelope;
}

function overall(eq: Equilibrium): { h: number; s: number } {
  let h = 0;
  let s = 0;
  for (const p of eq.phases) {
    h += p.amount * p.state.molar.h;
    s += p.amount * p.state.molar.s;
  }
  return { h, s };
}

/**
 * Samples the dome of the mixture z for the energy diagrams.
 * @example
 * ```ts
 * const { mixtureDome } = mixtureDomeFromFluid(gas, z, { vaporFractions: [0.25, 0.5, 0.75] });
 * pressureEnthalpyChart({ mixtureDome }, { logP: true });
 * ```
 */
export function mixtureDomeFromFluid(
  fluid: FluidBinding,
  z: readonly number[],
  options: MixtureDomeSampleOptions = {},
): SampledMixtureDome {
  const tolerance = options.vaporFractionTolerance ?? 1e-6;
  if (!(tolerance > 0 && tolerance < 0.5)) {
    throw new InputError({
      input: "options.vaporFractionTolerance",
      unit: "mol/mol",
      validRange: "0 < tolerance < 0.5",
      received: tolerance,
    });
  }
  const envelope =
    options.envelope ??
    phaseEnvelope(fluid, z, {
      ...options.envelopeOptions,
      vaporFractions: options.vaporFractions ?? options.envelopeOptions?.vaporFractions,
    });
  const feed = envelope.z;
  if (options.envelope !== undefined) {
    const same =
      feed.length === z.length &&
      feed.every((v, i) => Math.abs(v - z[i] / z.reduce((a, b) => a + b, 0)) < 1e-12);
    if (!same) {
      throw new InputError({
        input: "options.envelope",
        unit: "-",
        validRange: "the envelope of the same feed z",
        received: `an envelope of z = [${feed.join(", ")}]`,
      });
    }
  }
  const notes: string[] = [];
  let skipped = 0;
  const outOfRange: string[] = [];
  // the feed's state at an envelope point; a point outside a correlation's range (e.g. an
  // ideal-gas cp below its lowest temperature) is left out and named in the notes
  const feedState = (T: number, P: number) => {
    try {
      return tryPoint(() => stateAtTP(fluid, T, P, feed));
    } catch (e) {
      if (!(e instanceof OutOfRangeError)) throw e;
      if (outOfRange.length === 0) outOfRange.push(e.message);
      return undefined;
    }
  };
  const boundary: ChartMixtureBoundaryPoint[] = [];
  for (const p of envelope.points) {
    const s = feedState(p.T, p.P);
    if (s === undefined) {
      skipped++;
      continue;
    }
    boundary.push({
      temperatureK: p.T,
      pressurePa: p.P,
      kind: p.kind,
      segment: p.segment,
      enthalpyJPerMol: s.molar.h,
      entropyJPerMolK: s.molar.s,
    });
  }
  if (skipped > 0) {
    notes.push(
      `${skipped} envelope point(s) without a state of the feed were left out${outOfRange.length > 0 ? ` (first reason: ${outOfRange[0]})` : ""}`,
    );
  }
  let critical: ChartCriticalPoint | undefined;
  const c = envelope.critical[0];
  if (c !== undefined) {
    const s = feedState(c.T, c.P);
    critical = {
      temperatureK: c.T,
      pressurePa: c.P,
      ...(s ? { enthalpyJPerMol: s.molar.h, entropyJPerMolK: s.molar.s } : {}),
    };
  }
  const qualityLines = (envelope.qualityLines ?? []).map((line) => {
    const points: ChartMixtureDomePoint[] = [];
    let off = 0;
    let outside = 0;
    for (const q of line.points) {
      let eq: Equilibrium | undefined;
      try {
        eq = tryPoint(() => flashTP(fluid, q.T, q.P, feed));
      } catch (e) {
        if (!(e instanceof OutOfRangeError)) throw e;
        outside++;
        continue;
      }
      // the lighter phase comes first (near and above the critical pressure both phases may be
      // labelled liquids by density; the line's vapour fraction is the lighter phase's amount)
      if (eq === undefined || eq.phases.length !== 2) {
        off++;
        continue;
      }
      if (!(Math.abs(eq.phases[0].amount - line.vaporFraction) <= tolerance)) {
        off++;
        continue;
      }
      const o = overall(eq);
      points.push({
        temperatureK: q.T,
        pressurePa: q.P,
        enthalpyJPerMol: o.h,
        entropyJPerMolK: o.s,
      });
    }
    const label = Number(line.vaporFraction.toPrecision(12));
    if (off > 0) {
      notes.push(
        `vapour fraction ${label}: ${off} point(s) left out (the flash at its T and P did not return two phases with that vapour fraction)`,
      );
    }
    if (outside > 0) {
      notes.push(
        `vapour fraction ${label}: ${outside} point(s) left out (outside a correlation's range, e.g. an ideal-gas cp)`,
      );
    }
    return { vaporFraction: line.vaporFraction, points };
  });
  if (!envelope.complete && envelope.stoppedBecause) {
    notes.push(`phase envelope incomplete: ${envelope.stoppedBecause}`);
  }
  return {
    mixtureDome: {
      boundary,
      ...(critical ? { critical } : {}),
      qualityLines,
      // the fill needs the whole closed boundary
      complete: envelope.complete && skipped === 0,
      notes,
    },
    envelope,
  };
}
