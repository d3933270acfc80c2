/**
 * Threshold for flagging among many checks: with N standardised comparisons, flag |z| above the
 * value whose two-sided normal tail is alpha / N (Bonferroni's correction, Bonferroni 1936; e.g.
 * Miller, Simultaneous Statistical Inference, 2nd ed., 1981, §1.3), so that the chance of any false
 * flag across the family stays near alpha. The normal tail uses the asymptotic series
 * Q(z) ~ phi(z)/z (1 - 1/z^2 + 3/z^4 - 15/z^6) (Abramowitz & Stegun 26.2.12), accurate to better
 * than 1 % for z >= 3, solved by bisection. Never below `floor` (3 by default).
 */
export function familyThreshold(checks: number, alpha = 0.05, floor = 3): number {
  if (!(checks >= 1)) return floor;
  const target = alpha / (2 * checks);
  const tail = (z: number) => {
    const phi = Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
    const z2 = z * z;
    return (phi / z) * (1 - 1 / z2 + 3 / (z2 * z2) - 15 / (z2 * z2 * z2));
  };
  let lo = 2.5;
  let hi = 10;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (tail(mid) > target) lo = mid;
    else hi = mid;
  }
  return Math.max(floor, 0.5 * (lo + hi));
}
