/**
 * Stage 3 of the P-V-T route: the isotherms to report and their nodes. Isochore route: the nodes
 * of an isotherm are the isochores whose fits cover its temperature; the isotherm stops before a
 * measured isochore that does not cover it (a density gap, where an isochoric campaign usually
 * meets the two-phase region, unless `integrateAcrossGaps`) and before the smoothed pressure stops
 * rising with density (mechanical instability: the two-phase region). Surface route: the nodes
 * are the measured densities of each temperature cluster.
 */
import { dPdRho } from "../state/properties.js";
import { clusterTemperatures } from "./groupIsochores.js";
import type { IsochoreFit } from "./isochoreFit.js";
import type { RouteContext } from "./routeContext.js";
import { surfaceDerivatives } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

/** The isotherms and, per isotherm, its nodes (isochore indices, or point indices on the surface route). */
export interface IsothermPlan {
  temperaturesK: number[];
  nodeSets: number[][];
}

/**
 * Isochore route: isotherms from `options.isothermsK` or the clustered measured temperatures, each
 * with the isochores (ascending density, as the fits are) that cover it up to the first gap or
 * two-phase sign; isotherms with fewer than `minIsothermNodes` nodes are skipped with a message.
 */
export function planIsochoreIsotherms(
  context: RouteContext,
  fits: readonly IsochoreFit[],
): IsothermPlan {
  const { options, diagnostics } = context;
  const tolT = options.isothermToleranceK ?? 0.05;
  const minNodes = options.minIsothermNodes ?? 3;
  const candidates = options.isothermsK
    ? options.isothermsK.map((t) => ({ temperatureK: t }))
    : clusterTemperatures(context.temperatureK, tolT);
  const plan: IsothermPlan = { temperaturesK: [], nodeSets: [] };
  const density = (k: number): number => fits[k].densityMolPerM3;
  for (const c of candidates) {
    const t = c.temperatureK;
    let idx: number[] = [];
    fits.forEach((f, k) => {
      if (t >= f.minTemperatureK - tolT && t <= f.maxTemperatureK + tolT) idx.push(k);
    });
    // Gap check: an isochore between two nodes that was not measured at this T (its data lie
    // elsewhere in T) marks a region the campaign could not reach in one phase at T. The fits are
    // in ascending density, so the isochores between two nodes are those between their indices.
    if (!options.integrateAcrossGaps) {
      for (let j = 1; j < idx.length; j++) {
        if (idx[j] - idx[j - 1] > 1) {
          const lo = density(idx[j - 1]);
          const hi = density(idx[j]);
          const m = fits[idx[j - 1] + 1];
          diagnostics.push({
            code: "two-phase",
            severity: "refusal",
            message:
              `isotherm ${t.toFixed(2)} K: the isochore at ${m.densityMolPerM3.toPrecision(5)} mol/m3 lies between the nodes ${lo.toPrecision(5)} and ${hi.toPrecision(5)} mol/m3 but was measured only from ${m.minTemperatureK.toFixed(2)} to ${m.maxTemperatureK.toFixed(2)} K, ` +
              `so at ${t.toFixed(2)} K the fluid there was probably two-phase; departures above ${lo.toPrecision(5)} mol/m3 are not reported at this temperature (the data cannot be integrated through the dome). ` +
              "Reach liquid states with departuresAroundCriticalPoint (measured or modelled cv) or departuresAcrossDome (measured saturation data), or pass integrateAcrossGaps if the gap is only a gap in the campaign",
          });
          idx = idx.slice(0, j);
          break;
        }
      }
    }
    if (
      options.criticalTemperatureK !== undefined &&
      t < options.criticalTemperatureK &&
      idx.length > 1
    ) {
      let gap = 0;
      let at = 0;
      for (let j = 1; j < idx.length; j++) {
        const r = density(idx[j]) / density(idx[j - 1]);
        if (r > gap) {
          gap = r;
          at = j;
        }
      }
      diagnostics.push({
        code: "below-critical",
        severity: "warning",
        message:
          `isotherm ${t.toFixed(2)} K is below the critical temperature ${options.criticalTemperatureK} K: the route checks that P rises with density and that no measured isochore is missing at this T, but cannot see a dome between two nodes with nothing measured in between; ` +
          `make sure the widest density step (${density(idx[at - 1]).toPrecision(5)} to ${density(idx[at]).toPrecision(5)} mol/m3) does not straddle the saturated densities`,
      });
    }
    // Two-phase check: the smoothed pressure must rise with density along the isotherm.
    const Ps = idx.map((k) => fits[k].evaluate(t).pressurePa);
    let cut = idx.length;
    for (let j = 1; j < Ps.length; j++) {
      if (!(Ps[j] > Ps[j - 1])) {
        cut = j;
        break;
      }
    }
    if (cut < idx.length) {
      const r0 = density(idx[cut - 1]);
      const r1 = density(idx[cut]);
      diagnostics.push({
        code: "two-phase",
        severity: "refusal",
        message:
          `isotherm ${t.toFixed(2)} K: the pressure does not rise between ${r0.toPrecision(5)} and ${r1.toPrecision(5)} mol/m3, so the isotherm appears to cross the two-phase region (or the data there contradict mechanical stability); ` +
          `departures above ${r0.toPrecision(5)} mol/m3 are not reported at this temperature: the data cannot be integrated through the dome. ` +
          "For states beyond it, integrate at a supercritical temperature and come down the isochore with a measured or modelled cv (departuresAroundCriticalPoint), or cross the dome with measured saturation data (departuresAcrossDome)",
      });
      idx = idx.slice(0, cut);
    }
    if (idx.length < minNodes) {
      diagnostics.push({
        code: "isotherm-skipped",
        severity: options.isothermsK ? "refusal" : "info",
        message: `isotherm ${t.toFixed(2)} K: only ${idx.length} isochore(s) cover it (at least ${minNodes} needed); not integrated`,
      });
      continue;
    }
    plan.temperaturesK.push(t);
    plan.nodeSets.push(idx);
  }
  return plan;
}

/**
 * Surface route: one isotherm per temperature cluster (or per requested temperature, over all the
 * measured densities), nodes at the distinct measured densities, ascending; warns where an isotherm
 * lies outside the fitted temperatures or where the surface is mechanically unstable.
 */
export function planSurfaceIsotherms(context: RouteContext, surface: VirialSurface): IsothermPlan {
  const { options, diagnostics, densityMolPerM3: rho, gasConstant: R } = context;
  const tolT = options.isothermToleranceK ?? 0.05;
  const all = context.points.map((_, i) => i);
  const clusters = options.isothermsK
    ? options.isothermsK.map((t) => ({ temperatureK: t, members: all }))
    : clusterTemperatures(context.temperatureK, tolT);
  const plan: IsothermPlan = { temperaturesK: [], nodeSets: [] };
  for (const c of clusters) {
    const firstAt = new Map<number, number>();
    for (const i of c.members) if (!firstAt.has(rho[i])) firstAt.set(rho[i], i);
    if (firstAt.size < 1) continue;
    const densities = [...firstAt.keys()].sort((a, b) => a - b);
    plan.temperaturesK.push(c.temperatureK);
    plan.nodeSets.push(densities.map((d) => firstAt.get(d) ?? -1));
  }
  const { minTemperatureK: tLo, maxTemperatureK: tHi } = surface.range;
  for (const t of plan.temperaturesK) {
    if (!(t >= tLo - tolT && t <= tHi + tolT)) {
      diagnostics.push({
        code: "extrapolated",
        severity: "warning",
        message: `isotherm ${t.toFixed(2)} K lies outside the measured temperatures (${tLo.toFixed(2)} to ${tHi.toFixed(2)} K): its departures are an extrapolation of the surface fit`,
      });
    }
  }
  plan.temperaturesK.forEach((t, k) => {
    const bad = plan.nodeSets[k].filter(
      (i) => !(dPdRho(t, surfaceDerivatives(surface, t, rho[i]), R) > 0),
    );
    if (bad.length > 0) {
      diagnostics.push({
        code: "two-phase",
        severity: "warning",
        message: `isotherm ${t.toFixed(2)} K: the fitted surface has (dP/drho)_T <= 0 at ${bad.length} node(s): mechanically unstable; the isotherm may cross the two-phase region and those departures are not meaningful`,
      });
    }
  });
  return plan;
}
