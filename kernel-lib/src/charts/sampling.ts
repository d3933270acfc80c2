/**
 * Sampling helpers for charts: where to put the points of a curve so that its shape comes out.
 *
 * Isotherms are sampled in DENSITY, not pressure: pressure is a single-valued function of density
 * (even inside a van der Waals loop), and a liquid isotherm that rises almost vertically in
 * pressure is still resolved when the density steps are small. The grid is geometric at low
 * density (the dilute gas spans decades of volume) and uniform at high density (the liquid).
 *
 * Long curves are thinned with "Largest-Triangle-Three-Buckets" (S. Steinarsson, "Downsampling
 * Time Series for Visual Representation", MSc thesis, University of Iceland, 2013, ch. 4.2), which
 * keeps peaks and corners that uniform decimation would cut.
 */
import { InputError } from "../errors.js";
import { requireFinite, requirePositive } from "../validate.js";

/** n points evenly spaced from start to stop inclusive (n >= 2). */
export function linearGrid(start: number, stop: number, n: number): number[] {
  requireFinite("start", start, "-");
  requireFinite("stop", stop, "-");
  requireCount("n", n, 2);
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(i === n - 1 ? stop : start + ((stop - start) * i) / (n - 1));
  return out;
}

/** n points evenly spaced in log10 from start to stop inclusive (both > 0, n >= 2). */
export function logGrid(start: number, stop: number, n: number): number[] {
  requirePositive("start", start, "-");
  requirePositive("stop", stop, "-");
  requireCount("n", n, 2);
  const a = Math.log(start);
  const b = Math.log(stop);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    out.push(i === 0 ? start : i === n - 1 ? stop : Math.exp(a + ((b - a) * i) / (n - 1)));
  }
  return out;
}

/** Options of {@link isothermDensityGrid}. */
export interface DensityGridOptions {
  /** Number of points. Default 240. */
  points?: number;
  /** Lowest density as a fraction of the maximum density. Default 1e-4 (a dilute gas). */
  minFraction?: number;
  /** Highest density as a fraction of the maximum density. Default 0.96 (dense liquid). */
  maxFraction?: number;
  /** Density (fraction of the maximum) where geometric spacing hands over to uniform. Default 0.08. */
  switchFraction?: number;
}

/**
 * Density grid for one isotherm, ascending, mol/m3: geometric from `minFraction * maxDensity` to
 * `switchFraction * maxDensity` (a third of the points), uniform from there to
 * `maxFraction * maxDensity` (the rest), so gas, two-phase loop and liquid all get resolved.
 * @param maxDensityMolPerM3 The model's largest density (e.g. 1/b of a cubic), mol/m3.
 * @example isothermDensityGrid(1 / 2.68e-5, { points: 300 }) // 300 densities for methane (PR)
 */
export function isothermDensityGrid(
  maxDensityMolPerM3: number,
  options: DensityGridOptions = {},
): number[] {
  requirePositive("maxDensityMolPerM3", maxDensityMolPerM3, "mol/m3");
  const points = options.points ?? 240;
  const minF = options.minFraction ?? 1e-4;
  const maxF = options.maxFraction ?? 0.96;
  const switchF = options.switchFraction ?? 0.08;
  requireCount("points", points, 6);
  if (!(minF > 0 && minF < switchF && switchF < maxF && maxF <= 1)) {
    throw new InputError({
      input: "minFraction, switchFraction, maxFraction",
      unit: "-",
      validRange: "0 < minFraction < switchFraction < maxFraction <= 1",
      received: [minF, switchF, maxF],
    });
  }
  const nLow = Math.max(3, Math.round(points / 3));
  const low = logGrid(minF, switchF, nLow);
  const high = linearGrid(switchF, maxF, points - nLow + 1).slice(1);
  return [...low, ...high].map((f) => f * maxDensityMolPerM3);
}

/**
 * Thins a curve to at most `maxPoints` points by Largest-Triangle-Three-Buckets, keeping the first
 * and last points. Points are kept in their order; the curve is returned unchanged when short.
 */
export function thinCurve<T>(
  points: readonly T[],
  maxPoints: number,
  x: (p: T) => number,
  y: (p: T) => number,
): T[] {
  requireCount("maxPoints", maxPoints, 3);
  const n = points.length;
  if (n <= maxPoints) return points.slice();
  const out: T[] = [points[0]];
  const bucket = (n - 2) / (maxPoints - 2);
  let a = 0;
  for (let i = 0; i < maxPoints - 2; i++) {
    // Average of the next bucket: the third vertex of the triangle.
    const nextStart = Math.floor((i + 1) * bucket) + 1;
    const nextEnd = Math.min(Math.floor((i + 2) * bucket) + 1, n);
    let avgX = 0;
    let avgY = 0;
    for (let j = nextStart; j < nextEnd; j++) {
      avgX += x(points[j]);
      avgY += y(points[j]);
    }
    const count = Math.max(1, nextEnd - nextStart);
    avgX /= count;
    avgY /= count;
    const start = Math.floor(i * bucket) + 1;
    const end = Math.floor((i + 1) * bucket) + 1;
    const ax = x(points[a]);
    const ay = y(points[a]);
    let best = start;
    let bestArea = -1;
    for (let j = start; j < end; j++) {
      const area = Math.abs((ax - avgX) * (y(points[j]) - ay) - (ax - x(points[j])) * (avgY - ay));
      if (area > bestArea) {
        bestArea = area;
        best = j;
      }
    }
    out.push(points[best]);
    a = best;
  }
  out.push(points[n - 1]);
  return out;
}

function requireCount(input: string, n: number, min: number): void {
  if (!(Number.isInteger(n) && n >= min)) {
    throw new InputError({ input, unit: "-", validRange: `an integer >= ${min}`, received: n });
  }
}
