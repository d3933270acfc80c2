/**
 * One-dimensional hindered internal rotor: exact energy levels by diagonalising the Hamiltonian
 *
 *   H = -B d^2/dphi^2 + V0/2 (1 - cos(n phi)),   B = h^2 / (8 pi^2 I_red)  (as cm^-1 here)
 *
 * in the free-rotor basis exp(i m phi)/sqrt(2 pi), m = -M..M. The matrix elements are
 *   <m|H|m> = B m^2 + V0/2,   <m +- n|H|m> = -V0/4,
 * so the matrix splits into n independent tridiagonal blocks (m = r, r +- n, r +- 2n, ... for
 * r = 0..n-1), each diagonalised with implicit QL (tridiagonalEigenvalues.ts). This is the
 * standard variational treatment of the 1-D torsion (a Mathieu equation); the hindered-rotor
 * literature, approximations included, is reviewed by McClurg, Flagan & Goddard, J. Chem. Phys.
 * 106 (1997) 6675 (citation from memory).
 *
 * Partition function q = (1/sigma_int) sum_i exp(-(E_i - E_0)/kB T), energies from the ground
 * level (like the harmonic oscillator measured from its zero-point level); thermodynamic functions
 * by levelSum.ts. Dividing the full level sum by sigma_int is the usual high-temperature treatment
 * of the nuclear-spin symmetry of the top (Pitzer & Gwinn, J. Chem. Phys. 10 (1942) 428).
 *
 * Limits (checked in tests): V0 -> 0 gives the free rotor, E = B m^2, whose classical partition
 * function is sqrt(pi kB T / B)/sigma_int; V0 -> large gives n nearly degenerate harmonic wells of
 * wavenumber nu = n sqrt(V0 B) (expand V to second order: k = n^2 V0 / 2), so q -> (n/sigma_int) q_HO.
 *
 * Basis size: M is chosen so that B M^2 exceeds V0 + `cutoff` kB T_max; eigenvalues near the top
 * of a truncated basis are inaccurate, but they carry Boltzmann factors below e^-cutoff at T_max.
 * The levels depend only on the molecule, so they are computed once per rotor (memoised in a
 * small module-level cache keyed by the rotor constants and basis options; the cache holds pure
 * results only, so cells run out of order cannot see stale state).
 */
import { InputError } from "../../errors.js";
import { levelSumContribution } from "./levelSum.js";
import { rotationalConstantFromMoment, wavenumberToKelvin } from "./spectroscopicUnits.js";
import { tridiagonalEigenvalues } from "../../numerics/tridiagonalEigenvalues.js";
import type { InternalRotor, ThermoContribution } from "./types.js";

/** Options of the hindered-rotor level computation. */
export interface HinderedRotorOptions {
  /** Highest temperature the levels must serve, K. Default 3000. */
  readonly maxTemperatureK?: number;
  /** Levels up to V0 + cutoff * kB * maxTemperatureK are converged. Default 50. */
  readonly cutoff?: number;
  /** Override the basis half-width M (basis m = -M..M). Default: from the cutoff rule. */
  readonly basisHalfWidth?: number;
}

/** Precomputed hindered rotor. */
export interface HinderedRotorModel {
  /** The rotor constants. */
  readonly rotor: InternalRotor;
  /** Internal rotational constant B = h / (8 pi^2 c I_red), cm^-1. */
  readonly rotationalConstantInvCm: number;
  /** Energy levels above the ground level, cm^-1, ascending (first is 0). */
  readonly levelsInvCm: Float64Array;
  /** Basis half-width M used. */
  readonly basisHalfWidth: number;
  /** Total QL sweeps used by the eigenvalue solver over all blocks. */
  readonly iterations: number;
  /** Thermodynamic contribution at temperature T (K). */
  contribution(temperatureK: number): ThermoContribution;
}

/**
 * Harmonic-limit wavenumber of the torsion, nu = n sqrt(V0 B), cm^-1 (V0 and B in cm^-1).
 * From V(phi) ~ V0 n^2 phi^2 / 4 near the minimum.
 */
export function hinderedRotorHarmonicWavenumber(rotor: InternalRotor): number {
  const b = rotationalConstantFromMoment(rotor.reducedMomentAmuA2);
  return rotor.fold * Math.sqrt(rotor.barrierInvCm * b);
}

function checkRotor(rotor: InternalRotor, where: string): void {
  if (!(rotor.barrierInvCm >= 0 && rotor.barrierInvCm < Infinity)) {
    throw new InputError({
      input: `${where}.barrierInvCm`,
      unit: "cm^-1",
      validRange: "a finite number >= 0",
      received: rotor.barrierInvCm,
    });
  }
  if (!(Number.isInteger(rotor.fold) && rotor.fold >= 1)) {
    throw new InputError({
      input: `${where}.fold`,
      unit: "-",
      validRange: "an integer >= 1",
      received: rotor.fold,
    });
  }
  if (!(Number.isInteger(rotor.symmetryNumber) && rotor.symmetryNumber >= 1)) {
    throw new InputError({
      input: `${where}.symmetryNumber`,
      unit: "-",
      validRange: "an integer >= 1",
      received: rotor.symmetryNumber,
    });
  }
  if (!(rotor.reducedMomentAmuA2 > 0 && rotor.reducedMomentAmuA2 < Infinity)) {
    throw new InputError({
      input: `${where}.reducedMomentAmuA2`,
      unit: "amu Angstrom^2",
      validRange: "a finite number > 0",
      received: rotor.reducedMomentAmuA2,
    });
  }
}

const CACHE_LIMIT = 64;
const cache = new Map<string, HinderedRotorModel>();

/**
 * Diagonalise the hindered-rotor Hamiltonian once and return a model that evaluates cp, h, s.
 * Repeated calls with the same constants and options return the memoised model.
 */
export function buildHinderedRotor(
  rotor: InternalRotor,
  options: HinderedRotorOptions = {},
): HinderedRotorModel {
  checkRotor(rotor, "internalRotor");
  const key = JSON.stringify([
    rotor.barrierInvCm,
    rotor.fold,
    rotor.symmetryNumber,
    rotor.reducedMomentAmuA2,
    options.maxTemperatureK ?? null,
    options.cutoff ?? null,
    options.basisHalfWidth ?? null,
  ]);
  const hit = cache.get(key);
  if (hit) return hit;
  const model = diagonalise(rotor, options);
  if (cache.size >= CACHE_LIMIT) cache.clear();
  cache.set(key, model);
  return model;
}

function diagonalise(rotor: InternalRotor, options: HinderedRotorOptions): HinderedRotorModel {
  const maxT = options.maxTemperatureK ?? 3000;
  const cutoff = options.cutoff ?? 50;
  const b = rotationalConstantFromMoment(rotor.reducedMomentAmuA2);
  const v0 = rotor.barrierInvCm;
  const n = rotor.fold;
  const kTmaxInvCm = maxT / wavenumberToKelvin(1);
  const halfWidth =
    options.basisHalfWidth ?? Math.ceil(Math.sqrt((v0 + cutoff * kTmaxInvCm) / b)) + 2 * n;
  if (!(Number.isInteger(halfWidth) && halfWidth >= 1)) {
    throw new InputError({
      input: "options.basisHalfWidth",
      unit: "-",
      validRange: "an integer >= 1",
      received: halfWidth,
    });
  }
  const all: number[] = [];
  let iterations = 0;
  for (let r = 0; r < n; r++) {
    // m values congruent to r modulo n, in [-M, M], ascending.
    const first = -halfWidth + ((((r + halfWidth) % n) + n) % n);
    const ms: number[] = [];
    for (let m = first; m <= halfWidth; m += n) ms.push(m);
    if (ms.length === 0) continue;
    const diag = ms.map((m) => b * m * m + v0 / 2);
    const off = new Array<number>(ms.length - 1).fill(-v0 / 4);
    const result = tridiagonalEigenvalues(diag, off);
    iterations += result.iterations;
    for (const value of result.values) all.push(value);
  }
  all.sort((x, y) => x - y);
  const e0 = all[0];
  const levels = Float64Array.from(all, (x) => x - e0);
  const thetaK = Float64Array.from(levels, wavenumberToKelvin);
  const degeneracy = new Float64Array(levels.length).fill(1);
  const prefactor = 1 / rotor.symmetryNumber;
  return {
    rotor,
    rotationalConstantInvCm: b,
    levelsInvCm: levels,
    basisHalfWidth: halfWidth,
    iterations,
    contribution: (temperatureK: number) =>
      levelSumContribution({ thetaK, degeneracy, prefactor }, temperatureK),
  };
}
