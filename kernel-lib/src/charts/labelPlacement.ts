/**
 * Placement of guide-line labels (internal): Vega-Lite has no overlap avoidance for text marks, so
 * the builders place the labels of guide lines (isentropes on P-h) themselves. Each guide label
 * row carries candidate positions along its line (`along`); the first candidate whose text box
 * overlaps no fixed label or marker (critical point, process-path states) and no label placed
 * before it, and lies inside the plot, is used; a label with no free candidate is left out (the
 * line keeps its tooltip). Text boxes are estimated from the font size (0.62 em per character,
 * 0.68 em bold: a bound for the sans-serif fonts of the theme, common practice, no source).
 *
 * Rows take part through a `labelRole` field: "guide" (movable), "fixed" (obstacle text or marker),
 * "guide-halo" (the halo layer drawn under a guide layer: it follows that layer's placement),
 * "point-label" (a label beside its point, one layer per candidate slot: pointLabels.ts). Point
 * labels take the slot that stays inside the plot, overlaps no label or marker, and is crossed by
 * the fewest drawn line segments (an isotherm, the tie line, the path itself).
 */
import type { ChartSpec } from "./chartSpec.js";
import { DEFAULT_HEIGHT, DEFAULT_WIDTH } from "./theme.js";

type Spec = Record<string, unknown>;
type Row = Record<string, unknown>;
interface Box {
  x0: number;
  x1: number;
  y0: number;
  y1: number;
}

/** Fractions along a guide line tried in turn (the first one shifted per line by the builder). */
export const LABEL_FRACTIONS: readonly number[] = [0.6, 0.72, 0.84, 0.48, 0.36, 0.92, 0.24, 0.12];

/**
 * Re-places the labels of a single-view layered spec so they collide with nothing: first the
 * point labels (critical point, process-path states: a slot around each point, see
 * pointLabels.ts), then the "guide" labels along their lines.
 */
export function placeGuideLabels(spec: ChartSpec): void {
  const layers = (spec as Spec)["layer"];
  if (!Array.isArray(layers)) return;
  const width = typeof spec.width === "number" ? spec.width : DEFAULT_WIDTH;
  const height = typeof spec.height === "number" ? spec.height : DEFAULT_HEIGHT;
  const toPx = pixelMaps(layers as Spec[], width, height);
  if (!toPx) return;
  const obstacles: Box[] = [];
  const segments: Segment[] = [];
  const guides: { layer: Spec; rows: Row[] }[] = [];
  const halos: Spec[] = [];
  const pointGroups = new Map<string, Spec[]>();
  for (const layer of layers as Spec[]) {
    const rows = dataRows(layer);
    const mark = markOf(layer);
    if (mark["type"] === "line" && mark["strokeWidth"] !== 0) {
      segments.push(...lineSegments(layer, rows, toPx));
    }
    const role = rows.find((r) => typeof r["labelRole"] === "string")?.["labelRole"];
    if (role === "guide") {
      guides.push({ layer, rows });
      continue;
    }
    if (role === "guide-halo") {
      halos.push(layer);
      continue;
    }
    if (role === "point-label") {
      const group = String(rows[0]["labelGroup"] ?? "");
      const list = pointGroups.get(group) ?? [];
      if (list.length === 0) {
        for (const r of rows) {
          const p = toPx(r["x"], r["y"]);
          if (p) obstacles.push({ x0: p.x - 6, x1: p.x + 6, y0: p.y - 6, y1: p.y + 6 });
        }
      }
      list.push(layer);
      pointGroups.set(group, list);
      continue;
    }
    if (role !== "fixed") continue;
    for (const r of rows) {
      const p = toPx(r["x"], r["y"]);
      if (!p) continue;
      if (mark["type"] === "text") obstacles.push(textBox(p, mark, textOf(layer, r)));
      else obstacles.push({ x0: p.x - 6, x1: p.x + 6, y0: p.y - 6, y1: p.y + 6 });
    }
  }
  for (const group of pointGroups.values()) {
    const rows = dataRows(group[0]);
    rows.forEach((r, i) => {
      const p = toPx(r["x"], r["y"]);
      if (!p) return;
      let best = { slot: 0, score: Infinity, box: undefined as Box | undefined };
      group.forEach((layer, k) => {
        const box = textBox(p, markOf(layer), textOf(layer, r));
        const outside = box.x0 < 0 || box.x1 > width || box.y0 < 0 || box.y1 > height;
        const hits = obstacles.filter((o) => overlaps(o, box)).length;
        const crossings = segments.filter((s) => crosses(s, box)).length;
        const score = (outside ? 1e6 : 0) + 1e3 * hits + crossings;
        if (score < best.score) best = { slot: slotOf(layer, k), score, box };
      });
      if (best.box) obstacles.push(best.box);
      for (const layer of group) {
        const row = dataRows(layer)[i];
        if (row) row["labelSlot"] = best.slot;
      }
    });
  }
  for (const { layer, rows } of guides) {
    const mark = markOf(layer);
    const kept: Row[] = [];
    for (const r of rows) {
      const along = Array.isArray(r["along"]) ? (r["along"] as [number, number][]) : [];
      for (const [x, y] of along) {
        const p = toPx(x, y);
        if (!p) continue;
        const box = textBox(p, mark, textOf(layer, r));
        const inside = box.x0 >= 0 && box.x1 <= width && box.y0 >= 0 && box.y1 <= height;
        if (inside && !obstacles.some((o) => overlaps(o, box))) {
          obstacles.push(box);
          kept.push({ ...r, x, y });
          break;
        }
      }
    }
    (layer["data"] as { values: Row[] }).values = kept;
  }
  // The k-th halo layer sits under the k-th guide layer: same rows, its own role.
  halos.forEach((halo, k) => {
    const placed = guides[k] ? dataRows(guides[k].layer) : [];
    (halo["data"] as { values: Row[] }).values = placed.map((r) => ({
      ...r,
      labelRole: "guide-halo",
    }));
  });
}

function dataRows(layer: Spec): Row[] {
  const values = (layer["data"] as { values?: unknown } | undefined)?.values;
  return Array.isArray(values) ? (values as Row[]) : [];
}

interface Segment {
  ax: number;
  ay: number;
  bx: number;
  by: number;
}

/** The slot a point-label layer shows (its filter on labelSlot), else its position. */
function slotOf(layer: Spec, k: number): number {
  const t = layer["transform"];
  const f = Array.isArray(t) ? (t[0] as { filter?: { equal?: unknown } }).filter : undefined;
  return typeof f?.equal === "number" ? f.equal : k;
}

/** Pixel segments of a line layer, one polyline per `detail` value, in `order`. */
function lineSegments(
  layer: Spec,
  rows: readonly Row[],
  toPx: (x: unknown, y: unknown) => { x: number; y: number } | undefined,
): Segment[] {
  const encoding = (layer["encoding"] as Record<string, Spec> | undefined) ?? {};
  const fx = encoding["x"]?.["field"];
  const fy = encoding["y"]?.["field"];
  if (typeof fx !== "string" || typeof fy !== "string") return [];
  const detail = encoding["detail"]?.["field"];
  const order = encoding["order"]?.["field"];
  const paths = new Map<unknown, Row[]>();
  for (const r of rows) {
    const key = typeof detail === "string" ? r[detail] : "";
    const list = paths.get(key) ?? [];
    list.push(r);
    paths.set(key, list);
  }
  const out: Segment[] = [];
  for (const list of paths.values()) {
    if (typeof order === "string") {
      list.sort((a, b) => (a[order] as number) - (b[order] as number));
    }
    let prev: { x: number; y: number } | undefined;
    for (const r of list) {
      const p = toPx(r[fx], r[fy]);
      if (p && prev) out.push({ ax: prev.x, ay: prev.y, bx: p.x, by: p.y });
      prev = p;
    }
  }
  return out;
}

/** Does a segment pass through a box (Liang-Barsky clipping)? */
function crosses(s: Segment, b: Box): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = s.bx - s.ax;
  const dy = s.by - s.ay;
  const edges: [number, number][] = [
    [-dx, s.ax - b.x0],
    [dx, b.x1 - s.ax],
    [-dy, s.ay - b.y0],
    [dy, b.y1 - s.ay],
  ];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const r = q / p;
    if (p < 0) {
      if (r > t1) return false;
      if (r > t0) t0 = r;
    } else {
      if (r < t0) return false;
      if (r < t1) t1 = r;
    }
  }
  return t0 <= t1;
}

function markOf(layer: Spec): Spec {
  const m = layer["mark"];
  return typeof m === "string" ? { type: m } : ((m as Spec | undefined) ?? {});
}

function textOf(layer: Spec, row: Row): string {
  const field = ((layer["encoding"] as Spec | undefined)?.["text"] as Spec | undefined)?.["field"];
  return typeof field === "string" ? String(row[field] ?? "") : "";
}

function textBox(p: { x: number; y: number }, mark: Spec, text: string): Box {
  const size = typeof mark["fontSize"] === "number" ? mark["fontSize"] : 10;
  const bold = mark["fontWeight"] === 600 || mark["fontWeight"] === "bold";
  const w = (bold ? 0.68 : 0.62) * size * text.length;
  const dx = typeof mark["dx"] === "number" ? mark["dx"] : 0;
  const dy = typeof mark["dy"] === "number" ? mark["dy"] : 0;
  const align = mark["align"] ?? "center";
  const x0 = p.x + dx - (align === "left" ? 0 : align === "right" ? w : w / 2);
  const y = p.y + dy;
  // Vega-Lite's default baseline for text is "middle".
  const baseline = mark["baseline"] ?? "middle";
  const [up, down] =
    baseline === "top"
      ? [0, 1.2]
      : baseline === "bottom"
        ? [1.2, 0]
        : baseline === "alphabetic"
          ? [1, 0.25]
          : [0.6, 0.6];
  return { x0: x0 - 1, x1: x0 + w + 1, y0: y - up * size, y1: y + down * size };
}

function overlaps(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

/** Data-to-pixel map of the view, from fixed scale domains or the extent of every layer's data. */
function pixelMaps(
  layers: readonly Spec[],
  width: number,
  height: number,
): ((x: unknown, y: unknown) => { x: number; y: number } | undefined) | undefined {
  const axis = (channel: "x" | "y", size: number) => {
    let log = false;
    let nice = true;
    let padding = 0;
    let domain: number[] | undefined;
    let lo = Infinity;
    let hi = -Infinity;
    for (const layer of layers) {
      const encoding = layer["encoding"] as Record<string, Spec> | undefined;
      for (const ch of [channel, `${channel}2`]) {
        const enc = encoding?.[ch];
        if (!enc) continue;
        const scale = enc["scale"] as { type?: string; domain?: number[] } | undefined;
        if (scale?.type === "log") log = true;
        if ((scale as { nice?: unknown } | undefined)?.nice === false) nice = false;
        const pad = (scale as { padding?: unknown } | undefined)?.padding;
        if (typeof pad === "number") padding = pad;
        if (Array.isArray(scale?.domain)) domain = scale.domain;
        const field = enc["field"];
        if (typeof field !== "string") continue;
        for (const r of dataRows(layer)) {
          const v = r[field];
          if (typeof v === "number" && Number.isFinite(v) && (!log || v > 0)) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
          }
        }
      }
    }
    if (domain) [lo, hi] = [Math.min(...domain), Math.max(...domain)];
    if (!(hi > lo) || (log && !(lo > 0))) return undefined;
    const f = (v: number) => (log ? Math.log(v) : v);
    // Vega: padding (px) widens the data domain first, then a linear scale is made "nice".
    const span = size - 2 * padding;
    if (!(span > 0)) return undefined;
    let a = f(lo) - ((f(hi) - f(lo)) * padding) / span;
    let b = f(hi) + ((f(hi) - f(lo)) * padding) / span;
    if (!domain && !log && nice) [a, b] = niceDomain(a, b);
    return (v: number) => (f(v) - a) / (b - a);
  };
  const fx = axis("x", width);
  const fy = axis("y", height);
  if (!fx || !fy) return undefined;
  return (x, y) => {
    if (typeof x !== "number" || typeof y !== "number") return undefined;
    const px = fx(x) * width;
    const py = (1 - fy(y)) * height;
    return Number.isFinite(px) && Number.isFinite(py) ? { x: px, y: py } : undefined;
  };
}

/** The domain a linear Vega scale with `nice: true` shows (d3's nice with 10 ticks). */
function niceDomain(lo: number, hi: number): [number, number] {
  let [a, b] = [lo, hi];
  for (let k = 0; k < 2; k++) {
    const raw = (b - a) / 10;
    const power = Math.pow(10, Math.floor(Math.log10(raw)));
    const e = raw / power;
    const step =
      (e >= Math.sqrt(50) ? 10 : e >= Math.sqrt(10) ? 5 : e >= Math.sqrt(2) ? 2 : 1) * power;
    [a, b] = [Math.floor(a / step) * step, Math.ceil(b / step) * step];
  }
  return [a, b];
}
