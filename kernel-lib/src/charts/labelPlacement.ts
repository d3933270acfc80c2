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
 * "guide-halo" (the halo layer drawn under a guide layer: it follows that layer's placement).
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

/** Re-places the "guide" labels of a single-view layered spec so they collide with nothing. */
export function placeGuideLabels(spec: ChartSpec): void {
  const layers = (spec as Spec)["layer"];
  if (!Array.isArray(layers)) return;
  const width = typeof spec.width === "number" ? spec.width : DEFAULT_WIDTH;
  const height = typeof spec.height === "number" ? spec.height : DEFAULT_HEIGHT;
  const toPx = pixelMaps(layers as Spec[], width, height);
  if (!toPx) return;
  const obstacles: Box[] = [];
  const guides: { layer: Spec; rows: Row[] }[] = [];
  const halos: Spec[] = [];
  for (const layer of layers as Spec[]) {
    const rows = dataRows(layer);
    const role = rows.find((r) => typeof r["labelRole"] === "string")?.["labelRole"];
    if (role === "guide") {
      guides.push({ layer, rows });
      continue;
    }
    if (role === "guide-halo") {
      halos.push(layer);
      continue;
    }
    if (role !== "fixed") continue;
    const mark = markOf(layer);
    for (const r of rows) {
      const p = toPx(r["x"], r["y"]);
      if (!p) continue;
      if (mark["type"] === "text") obstacles.push(textBox(p, mark, textOf(layer, r)));
      else obstacles.push({ x0: p.x - 6, x1: p.x + 6, y0: p.y - 6, y1: p.y + 6 });
    }
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
  const baseline = p.y + dy; // alphabetic baseline: the text sits above it
  return { x0: x0 - 1, x1: x0 + w + 1, y0: baseline - size, y1: baseline + 0.25 * size };
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
  const axis = (channel: "x" | "y") => {
    let log = false;
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
    return (v: number) => (f(v) - f(lo)) / (f(hi) - f(lo));
  };
  const fx = axis("x");
  const fy = axis("y");
  if (!fx || !fy) return undefined;
  return (x, y) => {
    if (typeof x !== "number" || typeof y !== "number") return undefined;
    const px = fx(x) * width;
    const py = (1 - fy(y)) * height;
    return Number.isFinite(px) && Number.isFinite(py) ? { x: px, y: py } : undefined;
  };
}
