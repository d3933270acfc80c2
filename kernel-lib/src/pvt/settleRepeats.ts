/**
 * Repeated points: the same temperature and density appearing more than once. A repeat whose
 * pressure agrees (identical, or within 3 combined standard uncertainties when u(P) is given) is
 * kept when it carries u(P) (a genuine repeat measurement, both enter the fit) or set aside and
 * listed when it is an exact copy without u(P); a repeat that disagrees is refused, naming both
 * lines. The 3-sigma threshold is common practice, no source.
 */
import { PvtFormatError } from "./pvtFormatError.js";
import type { PvtPoint, SetAsidePoint } from "./types.js";

function sameState(a: PvtPoint, b: PvtPoint): boolean {
  const close = (x: number, y: number) =>
    Math.abs(x - y) <= 1e-12 * Math.max(Math.abs(x), Math.abs(y));
  return close(a.temperatureK, b.temperatureK) && close(a.densityMolPerM3, b.densityMolPerM3);
}

/** Keeps, sets aside or refuses repeats of the same (T, density) (see the header). */
export function settleRepeats(
  points: readonly PvtPoint[],
  source: string,
  pressureHeader: string,
  pressureColumn: number,
): { kept: PvtPoint[]; setAside: SetAsidePoint[] } {
  const kept: PvtPoint[] = [];
  const setAside: SetAsidePoint[] = [];
  const byKey = new Map<string, PvtPoint[]>();
  for (const p of points) {
    const key = `${p.temperatureK.toPrecision(10)}|${p.densityMolPerM3.toPrecision(10)}`;
    const earlier = (byKey.get(key) ?? []).filter((q) => sameState(p, q));
    let keep = true;
    for (const q of earlier) {
      const dP = Math.abs(p.pressurePa - q.pressurePa);
      const withU = p.uPressurePa !== undefined && q.uPressurePa !== undefined;
      if (withU) {
        const uc = Math.hypot(p.uPressurePa ?? 0, q.uPressurePa ?? 0);
        if (dP > 3 * uc) {
          throw new PvtFormatError({
            source,
            line: p.line,
            column: pressureColumn,
            header: pressureHeader,
            expected: `a pressure consistent with line ${q.line} (same T and density) within 3 combined standard uncertainties (${(3 * uc).toPrecision(3)} Pa)`,
            found: `a difference of ${dP.toPrecision(3)} Pa`,
            hint: "check both lines; if both are genuine, enlarge u(P) to reflect the reproducibility",
          });
        }
      } else if (dP !== 0) {
        throw new PvtFormatError({
          source,
          line: p.line,
          column: pressureColumn,
          header: pressureHeader,
          expected: `the same pressure as line ${q.line} (same T and density) or a u(P) column to judge the repeat`,
          found: `${p.pressurePa} Pa against ${q.pressurePa} Pa`,
          hint: "add a u(P) column so repeats can be weighed, or average the repeats yourself",
        });
      } else {
        keep = false;
        setAside.push({
          line: p.line,
          temperatureK: p.temperatureK,
          densityMolPerM3: p.densityMolPerM3,
          pressurePa: p.pressurePa,
          reason: `exact copy of line ${q.line} (same T, density and P, no u(P)); counted once`,
        });
        break;
      }
    }
    if (keep) {
      kept.push(p);
      byKey.set(key, [...(byKey.get(key) ?? []), p]);
    }
  }
  return { kept, setAside };
}
