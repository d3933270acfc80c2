/**
 * An ideal-gas mixture with a new zero: each component's h and s moved by a constant
 * (dh_k J/mol, ds_k J/(mol K)), linear in the mole fractions, so that u, a and g follow
 * (u += dh, a and g += dh - T ds) and every difference between states at one composition is
 * unchanged. Used by the saturated-liquid conventions (fluid/saturatedLiquidReference.ts) and by
 * the explorers' common zero (explorers/explorerFluids.ts); zeroAtIdealGas puts any ideal part
 * on a "zero-at" basis (fluid/sharedReferenceState.ts: several models on one zero).
 */
import type { IdealGasMixture, IdealGasProperties, ReferenceState } from "./types.js";
import { zeroAtReferenceState } from "./referenceState.js";

/** `inner` with component k shifted by dh[k] and ds[k]; results carry `reference`. */
export function shiftedIdealGas(
  inner: IdealGasMixture,
  dh: Float64Array,
  ds: Float64Array,
  reference: ReferenceState,
): IdealGasMixture {
  const n = dh.length;
  return {
    components: inner.components,
    referenceState: reference,
    at(temperatureK: number, pressurePa: number, x: readonly number[]): IdealGasProperties {
      const base = inner.at(temperatureK, pressurePa, x);
      let DH = 0;
      let DS = 0;
      for (let k = 0; k < n; k++) {
        DH += x[k] * dh[k];
        DS += x[k] * ds[k];
      }
      const TDS = temperatureK * DS;
      return {
        ...base,
        h: base.h + DH,
        s: base.s + DS,
        u: base.u + DH,
        a: base.a + DH - TDS,
        g: base.g + DH - TDS,
        referenceState: reference,
      };
    },
  };
}

/**
 * `inner` moved to the "zero-at" basis: each pure ideal gas has h = 0 and s = 0 at temperatureK
 * and pressurePa, whatever zero `inner` had (a reference equation's publication convention, the
 * formation basis, a saturated-liquid convention). Two models' ideal parts shifted this way agree
 * exactly at (T0, P0), so their states there differ only by their residual parts.
 */
export function zeroAtIdealGas(
  inner: IdealGasMixture,
  temperatureK: number,
  pressurePa: number,
): IdealGasMixture {
  const reference = zeroAtReferenceState(temperatureK, pressurePa);
  const n = inner.components.length;
  const dh = new Float64Array(n);
  const ds = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const pure = Array.from({ length: n }, (_, i) => (i === k ? 1 : 0));
    const zero = inner.at(temperatureK, pressurePa, pure);
    dh[k] = -zero.h;
    ds[k] = -zero.s;
  }
  return shiftedIdealGas(inner, dh, ds, reference);
}
