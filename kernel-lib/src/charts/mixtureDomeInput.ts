/**
 * The two-phase region of a mixture as the P-h and T-s builders take it (SI, per mole of feed).
 * A mixture boils over a range: at one pressure its bubble point (the feed all liquid) and its dew
 * point (the feed all vapour) lie at different temperatures, so the dome is not a set of rows with
 * a liquid and a vapour at one T (ChartSaturationRow) but the envelope's boundary in trace order:
 * each point the feed itself, saturated (the liquid at z on the bubble line, the vapour at z on the
 * dew line). Lines of constant vapour fraction carry the feed's overall h and s there (the
 * amount-weighted phases), since the lever rule between bubble and dew points does not hold for a
 * mixture. `mixtureDomeFromFluid` (charts/sample) fills this from a fluid and a feed.
 */
import { InputError } from "../errors.js";
import { requireFinite, requirePositive } from "../validate.js";
import type { ChartCriticalPoint } from "./saturationInput.js";
import { checkCritical } from "./saturationInput.js";

/** A saturated state of the whole feed (SI per mole). */
export interface ChartMixtureDomePoint {
  /** K */
  readonly temperatureK: number;
  /** Pa */
  readonly pressurePa: number;
  /** Molar enthalpy of the feed, J/mol. */
  readonly enthalpyJPerMol?: number;
  /** Molar entropy of the feed, J/(mol K). */
  readonly entropyJPerMolK?: number;
}

/** A point of the boundary: which line it is on, and which traced piece it belongs to. */
export interface ChartMixtureBoundaryPoint extends ChartMixtureDomePoint {
  /** "bubble": the feed is the saturated liquid; "dew": the feed is the saturated vapour. */
  readonly kind: "bubble" | "dew";
  /** Piece of the boundary (0, or 1 for the second piece of an envelope that did not close). */
  readonly segment: number;
}

/** The dome of a mixture. */
export interface ChartMixtureDome {
  /** Boundary points in trace order (dew line, critical point, bubble line, as the envelope runs). */
  readonly boundary: readonly ChartMixtureBoundaryPoint[];
  /** The mixture critical point, with the feed's h and s there. */
  readonly critical?: ChartCriticalPoint;
  /** Lines of constant vapour fraction, the feed's overall h and s. */
  readonly qualityLines?: readonly {
    readonly vaporFraction: number;
    readonly points: readonly ChartMixtureDomePoint[];
  }[];
  /** True when the boundary closes (one piece from low pressure to low pressure, no point left out). */
  readonly complete: boolean;
  /** Notes for the chart (e.g. where and why an incomplete envelope stopped). */
  readonly notes?: readonly string[];
}

/** Checks a mixture dome: T and P positive, h and s finite when given, kinds and segments valid. */
export function checkMixtureDome(dome: ChartMixtureDome | undefined): ChartMixtureDome | undefined {
  if (dome === undefined) return undefined;
  if (!(dome && Array.isArray(dome.boundary))) {
    throw new InputError({
      input: "mixtureDome",
      unit: "-",
      validRange: "an object with a boundary array (mixtureDomeFromFluid)",
      received: dome,
    });
  }
  const point = (name: string, p: ChartMixtureDomePoint): void => {
    requirePositive(`${name}.temperatureK`, p.temperatureK, "K");
    requirePositive(`${name}.pressurePa`, p.pressurePa, "Pa");
    if (p.enthalpyJPerMol !== undefined)
      requireFinite(`${name}.enthalpyJPerMol`, p.enthalpyJPerMol, "J/mol");
    if (p.entropyJPerMolK !== undefined)
      requireFinite(`${name}.entropyJPerMolK`, p.entropyJPerMolK, "J/(mol K)");
  };
  dome.boundary.forEach((p, i) => {
    point(`mixtureDome.boundary[${i}]`, p);
    if (!(p.kind === "bubble" || p.kind === "dew")) {
      throw new InputError({
        input: `mixtureDome.boundary[${i}].kind`,
        unit: "-",
        validRange: '"bubble" or "dew"',
        received: p.kind,
      });
    }
    if (!(Number.isInteger(p.segment) && p.segment >= 0)) {
      throw new InputError({
        input: `mixtureDome.boundary[${i}].segment`,
        unit: "-",
        validRange: "an integer >= 0",
        received: p.segment,
      });
    }
  });
  checkCritical(dome.critical);
  (dome.qualityLines ?? []).forEach((line, i) => {
    if (!(line.vaporFraction > 0 && line.vaporFraction < 1)) {
      throw new InputError({
        input: `mixtureDome.qualityLines[${i}].vaporFraction`,
        unit: "mol/mol",
        validRange: "strictly between 0 and 1",
        received: line.vaporFraction,
      });
    }
    line.points.forEach((p, k) => point(`mixtureDome.qualityLines[${i}].points[${k}]`, p));
  });
  return dome;
}
