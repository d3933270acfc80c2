/**
 * Groups points into isochores: points sorted by density are chained while each stays within a
 * relative tolerance of the group's first density. Isochoric cells stretch a little with T and P,
 * so a file may list slightly different densities along one filling; each point's pressure is then
 * moved to the group's mean density with the local (dP/drho)_T before the isochore fit (a
 * first-order correction, stated in the route's diagnostics when it exceeds u(P)).
 */
export interface IsochoreGroup {
  /** Mean density of the group, mol/m3. */
  densityMolPerM3: number;
  /** Indices into the point list. */
  members: number[];
}

/** Groups point indices by density (see the header); groups come in ascending density. */
export function groupIsochores(
  densities: readonly number[],
  relativeTolerance: number,
): IsochoreGroup[] {
  const order = densities.map((_, i) => i).sort((a, b) => densities[a] - densities[b]);
  const groups: IsochoreGroup[] = [];
  let current: number[] = [];
  let first = 0;
  const flush = () => {
    if (current.length > 0) {
      const mean = current.reduce((s, i) => s + densities[i], 0) / current.length;
      groups.push({ densityMolPerM3: mean, members: current });
    }
  };
  for (const i of order) {
    const d = densities[i];
    if (current.length > 0 && d <= first * (1 + relativeTolerance)) current.push(i);
    else {
      flush();
      current = [i];
      first = d;
    }
  }
  flush();
  return groups;
}

/** Clusters temperatures (sorted) whose neighbours lie within `toleranceK`; returns cluster means. */
export function clusterTemperatures(
  temperaturesK: readonly number[],
  toleranceK: number,
): { temperatureK: number; members: number[] }[] {
  const order = temperaturesK.map((_, i) => i).sort((a, b) => temperaturesK[a] - temperaturesK[b]);
  const out: { temperatureK: number; members: number[] }[] = [];
  let cur: number[] = [];
  const flush = () => {
    if (cur.length > 0)
      out.push({
        temperatureK: cur.reduce((s, i) => s + temperaturesK[i], 0) / cur.length,
        members: cur,
      });
  };
  for (const i of order) {
    const t = temperaturesK[i];
    const last = cur[cur.length - 1];
    if (last !== undefined && t - temperaturesK[last] <= toleranceK) cur.push(i);
    else {
      flush();
      cur = [i];
    }
  }
  flush();
  return out;
}
