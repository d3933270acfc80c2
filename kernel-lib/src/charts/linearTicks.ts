/**
 * Tick spacing of linear axes (internal). Vega picks about one tick per 40 px and then hides
 * every other label that would overlap ("parity"), and again, which leaves labels at steps of
 * 80 or at -450, -350 when the labels are wide. Each linear x or y axis of a builder gets a
 * minimum tick step instead (Vega-Lite's `tickMinStep`), the smallest 1-2-5 step whose labels,
 * at their estimated width, fit with a gap between them; Vega's ticks stay at multiples of
 * that 1-2-5 step, so no label has to be hidden. Estimates: 0.62 em per character at the theme's
 * 10.5 px label size, a 14 px gap (a common drafting practice, no source).
 */
import { DEFAULT_HEIGHT, DEFAULT_WIDTH } from "./theme.js";

type Spec = Record<string, unknown>;

const LABEL_FONT_PX = 10.5;
const CHAR_PX = 0.62 * LABEL_FONT_PX;
const GAP_PX = 14;
/** Vertical room of one y label: its height and a gap. */
const Y_LABEL_PX = 1.2 * LABEL_FONT_PX + 14;

/** The smallest step of the 1-2-5 series that is at least `raw` (> 0). */
export function step125(raw: number): number {
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  for (const m of [1, 2, 5, 10]) {
    const step = Number((m * power).toPrecision(12));
    if (step >= raw * (1 - 1e-12)) return step;
  }
  return 10 * power;
}

/** Characters of the longest tick label from lo to hi at a step. */
function labelChars(lo: number, hi: number, step: number): number {
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  return Math.max(...[lo, hi].map((v) => Math.abs(v).toFixed(decimals).length + (v < 0 ? 1 : 0)));
}

/**
 * The minimum 1-2-5 tick step on a linear axis of `lengthPx` from lo to hi (display units), so
 * labels do not overlap; undefined for an empty or degenerate range.
 */
export function linearMinStep(
  lo: number,
  hi: number,
  lengthPx: number,
  horizontal: boolean,
): number | undefined {
  const span = hi - lo;
  if (!(span > 0 && Number.isFinite(span) && lengthPx > 0)) return undefined;
  let step = step125(span / 10);
  for (let k = 0; k < 3; k++) {
    const perLabel = horizontal ? labelChars(lo, hi, step) * CHAR_PX + GAP_PX : Y_LABEL_PX;
    step = step125((span * perLabel) / lengthPx);
  }
  return step;
}

/**
 * Sets `tickMinStep` on every linear quantitative x or y encoding of a spec body, per view (a
 * layered spec or each panel of a concat), from the range of the channel over all its layers or
 * the fixed domain. Axis settings already in the spec (values, tickCount, tickMinStep) win unless
 * `refresh`. Changes `body`.
 */
export function applyLinearTicks(
  body: Spec,
  size: { width?: unknown; height?: unknown } = {},
  options: { refresh?: boolean } = {},
): void {
  const concat = body["concat"] ?? body["hconcat"] ?? body["vconcat"];
  if (Array.isArray(concat)) {
    for (const panel of concat as Spec[]) applyLinearTicks(panel, panel, options);
    return;
  }
  const width =
    typeof size.width === "number"
      ? size.width
      : typeof body["width"] === "number"
        ? body["width"]
        : DEFAULT_WIDTH;
  const height =
    typeof size.height === "number"
      ? size.height
      : typeof body["height"] === "number"
        ? body["height"]
        : DEFAULT_HEIGHT;
  const layers: Spec[] = Array.isArray(body["layer"]) ? (body["layer"] as Spec[]) : [body];
  for (const channel of ["x", "y"] as const) {
    let lo = Infinity;
    let hi = -Infinity;
    let domain: number[] | undefined;
    const encodings: Spec[] = [];
    for (const layer of layers) {
      const all = layer["encoding"] as Record<string, Spec> | undefined;
      const enc = all?.[channel];
      if (!enc || enc["type"] !== "quantitative") continue;
      const scale = enc["scale"] as { type?: string; domain?: unknown } | undefined;
      if (scale?.type !== undefined && scale.type !== "linear") continue;
      encodings.push(enc);
      if (Array.isArray(scale?.domain) && scale.domain.every((v) => typeof v === "number")) {
        domain = scale.domain as number[];
      }
      const values = (layer["data"] as { values?: Spec[] } | undefined)?.values;
      if (!Array.isArray(values)) continue;
      for (const ch of [channel, `${channel}2`]) {
        const field = all?.[ch]?.["field"];
        if (typeof field !== "string") continue;
        for (const row of values) {
          const v = row[field];
          if (typeof v === "number" && Number.isFinite(v)) {
            if (v < lo) lo = v;
            if (v > hi) hi = v;
          }
        }
      }
    }
    if (encodings.length === 0) continue;
    if (domain) [lo, hi] = [Math.min(domain[0], domain[1]), Math.max(domain[0], domain[1])];
    const step = linearMinStep(lo, hi, channel === "x" ? width : height, channel === "x");
    if (step === undefined) continue;
    for (const enc of encodings) {
      const axis = enc["axis"];
      if (axis === null) continue;
      const own = (axis as Spec | undefined) ?? {};
      if (!options.refresh && ("values" in own || "tickCount" in own || "tickMinStep" in own))
        continue;
      enc["axis"] = { ...own, tickMinStep: step };
    }
  }
}
