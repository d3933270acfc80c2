/**
 * Tick values of logarithmic axes (internal). Vega's own log ticks put a label at 1, 2, 3, ... 9
 * of each decade and thin them by an overlap test that uses its estimated text widths; where the
 * rendering font is wider than the estimate (PNG export, DejaVu Sans) neighbours like "20 30 40"
 * still collide. So every log axis of a builder gets explicit values chosen from the data range:
 * 1-2-3-5 within a narrow range, 1-2-5 per decade up to 3.5 decades, one per decade up to 7,
 * every other decade beyond. Labels use the "~g" format (d3-format: no trailing zeros, never blank)
 * and keep a greedy overlap removal with a gap as a last guard. A common drafting practice for
 * log scales, no source.
 */

/** Tick values (display units) on a log axis from lo to hi (both > 0), ascending. */
export function logTickValues(lo: number, hi: number): number[] {
  if (!(lo > 0 && hi >= lo && Number.isFinite(hi))) return [];
  const decades = Math.log10(hi / lo);
  const mantissas = decades <= 1.2 ? [1, 1.5, 2, 3, 5, 7] : decades <= 3.5 ? [1, 2, 5] : [1];
  const step = decades > 7 ? 2 : 1;
  const out: number[] = [];
  const first = Math.floor(Math.log10(lo));
  const last = Math.ceil(Math.log10(hi));
  for (let k = first; k <= last; k++) {
    if (step === 2 && k % 2 !== 0) continue;
    for (const m of mantissas) {
      // Round to 12 significant figures: 10^-2 * 2 must print as 0.02, not 0.020000000000000004.
      const v = Number((m * Math.pow(10, k)).toPrecision(12));
      if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

/** The axis block of a log-scale encoding. */
export function logAxisBlock(values: readonly number[]): Record<string, unknown> {
  return { values: [...values], format: "~g", labelOverlap: "greedy", labelSeparation: 4 };
}

type Spec = Record<string, unknown>;
const CHANNELS = ["x", "y"] as const;

/**
 * Sets explicit tick values on every log-scaled x or y encoding of a spec body, per view: a view
 * (a layered spec, or each panel of a concat) takes the range of the channel's field over all its
 * layers (or the fixed scale domain), so all layers carry the same axis values. Changes `body`.
 * Axis settings already in the spec win, unless `refresh` (used when layers were added to a built
 * spec): then the tick values, format and overlap settings are recomputed and the rest kept.
 */
export function applyLogTicks(body: Spec, options: { refresh?: boolean } = {}): void {
  const concat = body["concat"] ?? body["hconcat"] ?? body["vconcat"];
  if (Array.isArray(concat)) {
    for (const panel of concat as Spec[]) applyLogTicks(panel, options);
    return;
  }
  const layers: Spec[] = Array.isArray(body["layer"]) ? (body["layer"] as Spec[]) : [body];
  for (const channel of CHANNELS) {
    let lo = Infinity;
    let hi = -Infinity;
    let domain: number[] | undefined;
    const logEncodings: Spec[] = [];
    for (const layer of layers) {
      const enc = (layer["encoding"] as Record<string, Spec> | undefined)?.[channel];
      const scale = enc?.["scale"] as { type?: string; domain?: number[] } | undefined;
      if (!enc || scale?.type !== "log") continue;
      logEncodings.push(enc);
      if (Array.isArray(scale.domain)) domain = scale.domain;
      const field = enc["field"];
      const values = (layer["data"] as { values?: Spec[] } | undefined)?.values;
      if (typeof field !== "string" || !Array.isArray(values)) continue;
      for (const row of values) {
        const v = row[field];
        if (typeof v === "number" && v > 0 && Number.isFinite(v)) {
          if (v < lo) lo = v;
          if (v > hi) hi = v;
        }
      }
    }
    if (logEncodings.length === 0) continue;
    if (domain) [lo, hi] = [Math.min(domain[0], domain[1]), Math.max(domain[0], domain[1])];
    const ticks = logTickValues(lo, hi);
    if (ticks.length < 2) continue; // too narrow for a useful list: leave it to Vega
    for (const enc of logEncodings) {
      const axis = enc["axis"];
      if (axis === null) continue; // an axis turned off stays off
      const own = (axis as Spec | undefined) ?? {};
      enc["axis"] = options.refresh
        ? { ...own, ...logAxisBlock(ticks) }
        : { ...logAxisBlock(ticks), ...own };
    }
  }
}
