/**
 * Isolines of a property sampled on a rectangular grid, by marching squares with linear
 * interpolation as implemented in d3-contour 4 (M. Bostock; method: W. E. Lorensen and
 * H. E. Cline, "Marching cubes", SIGGRAPH 1987, in its two-dimensional form).
 *
 * d3-contour returns closed polygons in grid-cell coordinates, where sample i sits at i + 0.5 and
 * the rings run along the padded border of the grid. An isoline is a polygon ring with the border
 * stretches removed; what remains is split into open polylines and mapped back to the physical
 * axes by interpolating between neighbouring grid values (in log space for a log-spaced axis).
 */
import { contours } from "d3-contour";
import { InputError } from "../errors.js";

/** A grid of samples: values[i][j] at xs[i], ys[j]. */
export interface IsolineGrid {
  readonly xs: readonly number[];
  readonly ys: readonly number[];
  readonly values: readonly (readonly number[])[];
}

/** One isoline: its level and its polylines in physical coordinates. */
export interface GridIsoline {
  readonly level: number;
  readonly lines: { x: number; y: number }[][];
}

/** Options of {@link gridIsolines}. */
export interface IsolineOptions {
  /** Interpolate the y positions in log space (for a log-spaced axis). Default false. */
  logY?: boolean;
  /** Interpolate the x positions in log space. Default false. */
  logX?: boolean;
}

/** Isolines of a sampled grid at the given levels (same unit as the values). */
export function gridIsolines(
  grid: IsolineGrid,
  levels: readonly number[],
  options: IsolineOptions = {},
): GridIsoline[] {
  const nx = grid.xs.length;
  const ny = grid.ys.length;
  if (!(nx >= 2 && ny >= 2)) {
    throw new InputError({
      input: "grid",
      unit: "-",
      validRange: "at least 2 x 2 samples",
      received: `${nx} x ${ny}`,
    });
  }
  if (grid.values.length !== nx || grid.values.some((col) => col.length !== ny)) {
    throw new InputError({
      input: "values",
      unit: "-",
      validRange: `an array of ${nx} arrays of ${ny} numbers`,
      received: `${grid.values.length} rows`,
    });
  }
  const flat = new Array<number>(nx * ny);
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) flat[i + j * nx] = grid.values[i][j];
  const polygons = contours()
    .size([nx, ny])
    .thresholds([...levels])(flat);
  const mapX = axisMap(grid.xs, options.logX ?? false);
  const mapY = axisMap(grid.ys, options.logY ?? false);
  return polygons.map((poly) => {
    const lines: { x: number; y: number }[][] = [];
    for (const polygon of poly.coordinates) {
      for (const ring of polygon) {
        let current: { x: number; y: number }[] = [];
        // Start after a border point if there is one, so a line is not cut at the ring's seam.
        const n = ring.length - 1; // last point repeats the first
        let start = 0;
        for (let k = 0; k < n; k++) {
          if (onBorder(ring[k], nx, ny)) {
            start = k;
            break;
          }
        }
        for (let step = 0; step <= n; step++) {
          const p = ring[(start + step) % n];
          if (onBorder(p, nx, ny)) {
            if (current.length >= 2) lines.push(current);
            current = [];
          } else {
            current.push({ x: mapX(p[0]), y: mapY(p[1]) });
          }
        }
        if (current.length >= 2) lines.push(current);
      }
    }
    return { level: poly.value, lines };
  });
}

function onBorder(p: number[], nx: number, ny: number): boolean {
  return p[0] <= 0 || p[0] >= nx || p[1] <= 0 || p[1] >= ny;
}

/** Maps a d3-contour coordinate (sample i at i + 0.5) to the physical axis. */
function axisMap(values: readonly number[], log: boolean): (c: number) => number {
  const v = log ? values.map(Math.log) : [...values];
  const n = v.length;
  return (c) => {
    const s = Math.min(Math.max(c - 0.5, 0), n - 1);
    const i = Math.min(Math.floor(s), n - 2);
    const f = s - i;
    const out = v[i] + f * (v[i + 1] - v[i]);
    return log ? Math.exp(out) : out;
  };
}
