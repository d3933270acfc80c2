/**
 * Stage 6 of the P-V-T route: the diagnostics that look at the whole result. The Maxwell-consistency
 * check compares two independent smoothings of the same data: the isochoric slope of each isochore
 * fit against the global surface's (dP/dT)_rho at the same (T, rho). Where they differ by more than
 * the family threshold (familyThreshold.ts: at least 3 combined standard uncertainties, more when
 * many nodes are checked) the data contradict the smooth Helmholtz surface (a local step, a bad
 * isochore, or a surface order too low there).
 */
import { dPdTAtDensity } from "../eos/residualRelations.js";
import { familyThreshold } from "./familyThreshold.js";
import type { IsochoreFit } from "./isochoreFit.js";
import type { PvtDiagnostic } from "./pvtDiagnostic.js";
import type { IsothermPlan } from "./routeIsothermStage.js";
import type { SetAsidePoint } from "./types.js";
import { surfaceBasis, surfaceDerivatives, surfaceVariance } from "./virialSurface.js";
import type { VirialSurface } from "./virialSurface.js";

/** The Maxwell-consistency diagnostic of the isochore route (one entry). */
export function slopeConsistency(
  fits: readonly IsochoreFit[],
  surface: VirialSurface,
  plan: IsothermPlan,
  gasConstant: number,
): PvtDiagnostic {
  const flagged: string[] = [];
  let checked = 0;
  const zMax = familyThreshold(plan.nodeSets.reduce((acc, set) => acc + set.length, 0));
  plan.temperaturesK.forEach((t, k) => {
    for (const j of plan.nodeSets[k]) {
      const f = fits[j];
      const e = f.evaluate(t);
      const r = f.densityMolPerM3;
      const sS = dPdTAtDensity(r, surfaceDerivatives(surface, t, r), gasConstant);
      const gD = surfaceBasis(surface, "aD", t, r);
      const gDT = surfaceBasis(surface, "aDT", t, r);
      const g = gD.map((v, q) => r * gasConstant * (v + gDT[q]));
      const uS = Math.sqrt(surfaceVariance(surface, g));
      const u = Math.hypot(e.uSlopePaPerK, uS);
      checked++;
      if (u > 0 && Math.abs(e.slopePaPerK - sS) > zMax * u)
        flagged.push(
          `${t.toFixed(2)} K, ${r.toPrecision(5)} mol/m3 (${((e.slopePaPerK - sS) / u).toFixed(1)} u)`,
        );
    }
  });
  if (flagged.length === 0) {
    return {
      code: "maxwell-consistency",
      severity: "info",
      message: `isochoric slopes of the isochore fits agree with the global surface within ${zMax.toFixed(2)} u (family threshold for ${checked} checks) at all ${checked} nodes`,
    };
  }
  return {
    code: "maxwell-consistency",
    severity: "warning",
    message: `isochoric slopes disagree with the global surface by more than ${zMax.toFixed(2)} u (family threshold for ${checked} checks) at ${flagged.length} of ${checked} nodes: ${flagged.slice(0, 8).join("; ")}${flagged.length > 8 ? "; ..." : ""}. The data contradict a smooth Helmholtz surface there, or the surface order is too low`,
  };
}

/** One diagnostic listing points set aside (by the route or at import), or none. */
export function setAsideDiagnostic(
  points: readonly SetAsidePoint[],
  where: "by the route" | "at import",
): PvtDiagnostic | undefined {
  if (points.length === 0) return undefined;
  return {
    code: "set-aside",
    severity:
      where === "by the route" && points.some((s) => s.reason.startsWith("outlier"))
        ? "warning"
        : "info",
    message:
      `${points.length} point(s) set aside ${where}: ` +
      points.map((s) => `line ${s.line} (${s.reason})`).join("; "),
  };
}
