/**
 * isochor's own chart look ("Isochor paper"): warm paper background, ink-grey axes, hairline
 * dotted grid, left-aligned titles, and series told apart by colour AND dash pattern, so a chart
 * survives colour-blind eyes and black-and-white printing.
 *
 * Series colours are taken from Paul Tol's "muted" qualitative scheme, designed to stay distinct
 * under the common colour-vision deficiencies (P. Tol, "Colour Schemes", SRON/EPS/TN/09-002,
 * issue 3.2, 2021), in an order of our choosing. Heat maps use the "cividis" sequential map
 * (Nuñez, Anderton and Renslow, PLoS ONE 13 (2018) e0199239), built into Vega.
 */

/** Series colours, in the order series receive them. */
export const SERIES_COLORS: readonly string[] = [
  "#332288", // indigo
  "#cc6677", // rose
  "#44aa99", // teal
  "#882255", // wine
  "#999933", // olive
  "#88ccee", // cyan
  "#aa4499", // purple
  "#117733", // green
];

/** Dash patterns (Vega strokeDash arrays, px), paired with the colours by position. */
export const SERIES_DASHES: readonly (readonly number[])[] = [
  [1, 0],
  [7, 3],
  [2, 2],
  [9, 3, 2, 3],
  [4, 4],
  [12, 3],
  [2, 4, 6, 4],
  [1, 3],
];

/** Colours of the fixed elements of a diagram. */
export const INK = {
  /** Saturation dome, axes text. */
  dome: "#2b2a28",
  /** Fill of the two-phase region. */
  twoPhaseFill: "#ece6d6",
  /** Equal-area lobes. */
  equalArea: "#d9a441",
  /** Critical point marker. */
  critical: "#b0302a",
  /** Quality lines and other guides. */
  guide: "#8a857b",
  /** Isentropes on a P-h diagram. */
  isentrope: "#8c6d46",
  /** Process paths drawn over a diagram. */
  path: "#b0302a",
  /** Background of the plot. */
  paper: "#fcfbf7",
  /** Grid lines. */
  grid: "#e4e0d6",
} as const;

/** Fonts, with fallbacks that exist on a plain Linux machine (PNG export uses system fonts). */
export const FONT_FAMILY = "'Source Sans 3', 'Source Sans Pro', 'DejaVu Sans', Arial, sans-serif";

/** Sequential scheme name for heat maps (a Vega built-in). */
export const HEATMAP_SCHEME = "cividis";

/** Default plot size in CSS pixels. */
export const DEFAULT_WIDTH = 520;
export const DEFAULT_HEIGHT = 340;

/**
 * A spec with the project's look: a raw spec without a `config` block (written by hand, or by a
 * builder of another library) gets the theme; a spec that has one keeps it. Display and record
 * functions pass every spec through here, so all charts in a notebook and a record look alike.
 */
export function withTheme<S extends object>(spec: S): S {
  if ("config" in spec && (spec as { config?: unknown }).config !== undefined) return spec;
  return { ...spec, config: themeConfig() };
}

/** The Vega-Lite `config` block of every builder's spec (editable like any other field). */
export function themeConfig(): Record<string, unknown> {
  return {
    background: INK.paper,
    font: FONT_FAMILY,
    padding: 12,
    view: { stroke: "#b9b3a6", strokeWidth: 0.75 },
    title: {
      anchor: "start",
      fontSize: 15,
      fontWeight: 600,
      color: INK.dome,
      subtitleFontSize: 11.5,
      subtitleColor: "#6b665c",
      offset: 10,
    },
    axis: {
      domainColor: "#6b665c",
      tickColor: "#6b665c",
      tickSize: 4,
      labelColor: "#3d3a35",
      labelFontSize: 10.5,
      titleColor: INK.dome,
      titleFontSize: 11.5,
      titleFontWeight: 500,
      titlePadding: 8,
      gridColor: INK.grid,
      gridDash: [1, 2.5],
      gridWidth: 0.8,
    },
    legend: {
      orient: "right",
      labelFontSize: 10.5,
      titleFontSize: 11,
      titleFontWeight: 500,
      titleColor: INK.dome,
      symbolStrokeWidth: 2,
      symbolSize: 260,
      symbolType: "stroke",
      titleLimit: 260,
      labelLimit: 220,
    },
    line: { strokeWidth: 1.6, strokeCap: "round" },
    point: { filled: true, size: 36 },
    text: { fontSize: 10, color: INK.dome },
    concat: { spacing: 18 },
  };
}
