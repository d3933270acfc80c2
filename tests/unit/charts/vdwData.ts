/**
 * Test data: van der Waals isotherms in reduced form, Pr = 8 Tr / (3 vr - 1) - 3 / vr^2
 * (van der Waals 1873; the reduced form as in any thermodynamics text, e.g. Callen,
 * "Thermodynamics and an Introduction to Thermostatistics", 2nd ed., 1985, eq. 3.41 with
 * reduced variables), scaled to a fluid with Tc = 190.6 K, Pc = 4.599 MPa (methane-like, used only
 * as a scale). The charts only draw these numbers; no physics is asserted on them here.
 */
export const TC = 190.6;
export const PC = 4.599e6;
export const R = 8.314462618;
/** vdW critical molar volume vc = 3 R Tc / (8 Pc). */
export const VC = (3 * R * TC) / (8 * PC);

export function vdwPressureReduced(tr: number, vr: number): number {
  return (8 * tr) / (3 * vr - 1) - 3 / (vr * vr);
}

/** Isotherm points sampled in density, from vr = 0.36 to vr = 50. */
export function vdwIsotherm(
  tr: number,
  n = 120,
): { densityMolPerM3: number; pressurePa: number }[] {
  const out: { densityMolPerM3: number; pressurePa: number }[] = [];
  const rhoMax = 1 / (0.36 * VC);
  const rhoMin = 1 / (50 * VC);
  for (let i = 0; i < n; i++) {
    const rho = rhoMin + ((rhoMax - rhoMin) * i) / (n - 1);
    const vr = 1 / (rho * VC);
    out.push({ densityMolPerM3: rho, pressurePa: vdwPressureReduced(tr, vr) * PC });
  }
  return out;
}
