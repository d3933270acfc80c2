/**
 * Vessel depressurisation (blowdown) and filling over time: the mass and energy balances of the
 * contents and of a lumped wall, integrated in time with the contents at equilibrium at every
 * step.
 *
 * State vector: moles of each component n_i (mol), internal energy of the contents U (J), wall
 * temperature T_w (K), and three running totals (net mass out, kg; net enthalpy out, J; external
 * heat in, J) so the balances can be closed at the end. The balances (an open system of fixed
 * volume V, kinetic energy neglected):
 *   dn_i/dt = - sum_outlets ndot_k x_k,i + ndot_in z_in,i
 *   dU/dt   = - sum_outlets ndot_k h0_k + ndot_in h0_in + Q_in
 *   m_w c_w dT_w/dt = Q_ext - Q_in
 * where h0 is the molar enthalpy of the stream leaving (or entering) at its stagnation state,
 * Q_in = sum over phases h_phase A_wetted,phase (T_w - T) (heatTransfer.ts) and ndot from the
 * orifice flux of the fluid's own isentropic expansion (orifice.ts).
 *
 * At every evaluation the contents are found from (u = U/n, rho = n/V, z): the single-phase
 * route solves u(T, rho) = u by Newton's method on T (cv the slope) at fixed density; once an
 * accepted step finds the contents or an outlet throat no longer stable as one phase (the
 * isothermal flash, phase/flash), the crossing is located by bisection on the integrator's dense
 * output and the run continues from there with the (u, v) flash (all phases, flashUV) and the
 * equilibrium orifice route. Integration: Dormand-Prince RK5(4) with events (numerics/).
 */
import { InputError, SolverError, type ResultWarning } from "../../errors.js";
import type { Fluid } from "../../fluid/defineFluid.js";
import { integrateDormandPrince, type OdeEvent } from "../../numerics/dormandPrince.js";
import type { PhaseKind } from "../../phase/flash/types.js";
import type { FluidState } from "../../state/types.js";
import { VESSEL_CAUTIONS, VESSEL_NOT_MODELLED } from "./cautions.js";
import { contentsFlash } from "./contentsFlash.js";
import { vesselGeometry, type VesselGeometry } from "./geometry.js";
import { airAt, naturalConvectionCoefficient, type ContentsTransport } from "./heatTransfer.js";
import {
  isIdealGasModel,
  isStableSinglePhase,
  orificeMassFlux,
  type OrificeFlux,
  type StagnationState,
} from "./orifice.js";
import type { OutletSpec, VesselOptions, VesselResult, VesselSpec, WallHeatSpec } from "./types.js";

const ATM = 101325;

interface Phase {
  kind: PhaseKind;
  amount: number;
  state: FluidState;
}

/** The contents at one state vector. */
interface Contents {
  nTotal: number;
  z: number[];
  T: number;
  P: number;
  rho: number;
  u: number;
  massKg: number;
  phases: Phase[];
  liquidFraction: number;
  liquidVolumeM3: number;
}

/** One evaluation of the right-hand side with what it found. */
interface Evaluation {
  contents: Contents;
  dy: number[];
  outletFlux: (OrificeFlux | undefined)[];
  massFlowOut: number;
}

function bad(
  input: string,
  unit: string,
  validRange: string,
  received: unknown,
  hint?: string,
): never {
  throw new InputError({ input, unit, validRange, received, hint });
}

function checkComposition(input: string, x: readonly number[] | undefined, n: number): number[] {
  if (x === undefined) {
    if (n === 1) return [1];
    bad(input, "mol/mol", `${n} mole fractions`, x);
  }
  if (!(Array.isArray(x) && x.length === n && x.every((v) => v >= 0 && Number.isFinite(v)))) {
    bad(input, "mol/mol", `${n} non-negative mole fractions`, x);
  }
  const s = x.reduce((a, b) => a + b, 0);
  if (!(Math.abs(s - 1) < 1e-6)) bad(input, "mol/mol", "mole fractions summing to 1", x);
  return x.map((v) => v / s);
}

/** The wall's mass (kg) and heat capacity (J/(kg K)), every field checked. */
function checkWall(
  w: VesselSpec["wall"],
  innerAreaM2: number,
): { massKg: number; heatCapacityJPerKgK: number } {
  if (typeof w !== "object" || w === null) {
    bad("spec.wall", "-", "{ thicknessM, densityKgPerM3?, heatCapacityJPerKgK?, massKg? }", w);
  }
  if (!(w.thicknessM > 0)) bad("spec.wall.thicknessM", "m", "> 0", w.thicknessM);
  const rhoW = w.densityKgPerM3 ?? 7850;
  if (!(rhoW > 0)) bad("spec.wall.densityKgPerM3", "kg/m3", "> 0", rhoW);
  const cp = w.heatCapacityJPerKgK ?? 470;
  if (!(cp > 0)) bad("spec.wall.heatCapacityJPerKgK", "J/(kg K)", "> 0", cp);
  if (w.massKg !== undefined && !(w.massKg > 0)) bad("spec.wall.massKg", "kg", "> 0", w.massKg);
  const massKg = w.massKg ?? rhoW * w.thicknessM * innerAreaM2;
  if (!(massKg > 0 && Number.isFinite(massKg))) {
    bad("spec.wall.massKg", "kg", "> 0 (thickness x inner area x density)", massKg);
  }
  return { massKg, heatCapacityJPerKgK: cp };
}

function sum(a: readonly number[]): number {
  let s = 0;
  for (const v of a) s += v;
  return s;
}

/**
 * Simulates the depressurisation (outlets) or the filling (a supply) of a vessel.
 *
 * @example
 * ```ts
 * const gas = defineFluid({ components: ["methane"] });
 * const run = simulateVessel({
 *   fluid: gas,
 *   shape: { kind: "vertical-cylinder", diameterM: 1, lengthM: 3 },
 *   initial: { temperatureK: 298.15, pressurePa: 100e5 },
 *   outlets: [{ diameterM: 0.02, dischargeCoefficient: 0.8, backPressurePa: 1e5 }],
 *   until: { pressurePa: 8e5 },
 * });
 * run.minimum.temperatureK; // the coldest contents temperature, K
 * run.cautions; // read them
 * ```
 * @throws InputError for bad input (named, with its valid range); SolverError when a state or
 *   the integration cannot be found (saying what was tried).
 */
export function simulateVessel(spec: VesselSpec, options: VesselOptions = {}): VesselResult {
  if (typeof spec !== "object" || spec === null) bad("spec", "-", "a VesselSpec object", spec);
  const fluid: Fluid = spec.fluid;
  if (!(fluid && typeof fluid.flashUV === "function")) {
    bad("spec.fluid", "-", "a fluid from defineFluid", fluid);
  }
  const nc = fluid.componentIds.length;
  const M = fluid.molarMassesKgPerMol;
  const geometry: VesselGeometry = vesselGeometry(spec.shape);
  const V = geometry.volumeM3;
  const idealGas = isIdealGasModel(fluid);
  const warnings: ResultWarning[] = geometry.notes.map((n) => ({
    code: "model-limitation" as const,
    message: n,
  }));
  const rtol = options.relativeTolerance ?? 1e-6;
  if (!(rtol > 0 && rtol < 0.01)) bad("options.relativeTolerance", "-", "> 0 and < 0.01", rtol);

  // ---- initial contents -------------------------------------------------------------------
  const init = spec.initial;
  if (typeof init !== "object" || init === null) bad("spec.initial", "-", "initial contents", init);
  if (!(init.temperatureK > 0)) bad("spec.initial.temperatureK", "K", "> 0", init.temperatureK);
  if (!(init.pressurePa > 0)) bad("spec.initial.pressurePa", "Pa", "> 0", init.pressurePa);
  let n0: number[];
  let liquidLayer = false;
  if ("liquid" in init && init.liquid !== undefined) {
    const y = checkComposition("spec.initial.vapor.y", init.vapor?.y, nc);
    const x = checkComposition("spec.initial.liquid.x", init.liquid.x, nc);
    const level = init.liquid.levelM;
    if (!(level > 0 && level < geometry.heightM)) {
      bad(
        "spec.initial.liquid.levelM",
        "m",
        `> 0 and below the inner height ${geometry.heightM} m`,
        level,
      );
    }
    const VL = geometry.liquidVolumeAt(level);
    const gas = fluid.stateAtTP(init.temperatureK, init.pressurePa, y, { phase: "vapor" });
    const liq = fluid.stateAtTP(init.temperatureK, init.pressurePa, x, { phase: "liquid" });
    const nV = gas.densityMolPerM3 * (V - VL);
    const nL = liq.densityMolPerM3 * VL;
    n0 = y.map((yi, i) => nV * yi + nL * x[i]);
    liquidLayer = true;
  } else {
    const z = checkComposition("spec.initial.z", (init as { z?: readonly number[] }).z, nc);
    const st = fluid.stateAtTP(init.temperatureK, init.pressurePa, z);
    if (
      !idealGas &&
      !isStableSinglePhase(fluid, init.temperatureK, init.pressurePa, z, st.densityMolPerM3)
    ) {
      bad(
        "spec.initial",
        "-",
        "a state stable as one phase at the given T and P, or a gas over a liquid layer ({ vapor: { y }, liquid: { x, levelM } })",
        { temperatureK: init.temperatureK, pressurePa: init.pressurePa },
        "the fluid splits into phases at this temperature and pressure (isothermal flash): give the liquid level and the compositions of both phases",
      );
    }
    n0 = z.map((zi) => zi * st.densityMolPerM3 * V);
  }
  const nTot0 = sum(n0);

  // ---- outlets and supply -----------------------------------------------------------------
  const outlets: Required<OutletSpec>[] = (spec.outlets ?? []).map((o, k) => {
    const d = o.diameterM;
    const maxD =
      geometry.shape.kind === "volume"
        ? Math.cbrt((4 * V) / (3 * Math.PI))
        : (geometry.shape as { diameterM: number }).diameterM;
    if (!(d > 0 && d < maxD)) {
      bad(
        `spec.outlets[${k}].diameterM`,
        "m",
        `> 0 and smaller than the vessel's diameter ${maxD.toPrecision(4)} m`,
        d,
      );
    }
    const cd = o.dischargeCoefficient;
    if (!(cd > 0 && cd <= 1))
      bad(`spec.outlets[${k}].dischargeCoefficient`, "-", "> 0 and <= 1", cd);
    const pb = o.backPressurePa ?? ATM;
    if (!(pb > 0 && pb < init.pressurePa)) {
      bad(
        `spec.outlets[${k}].backPressurePa`,
        "Pa",
        `> 0 and below the initial vessel pressure ${init.pressurePa} Pa`,
        pb,
      );
    }
    const draws = o.draws ?? "vapor";
    if (!(draws === "vapor" || draws === "liquid" || draws === "mixture")) {
      bad(`spec.outlets[${k}].draws`, "-", '"vapor", "liquid" or "mixture"', draws);
    }
    return { diameterM: d, dischargeCoefficient: cd, backPressurePa: pb, draws };
  });
  const supplySpec = spec.supply;
  let supply: { stag: StagnationState; areaCd: number; z: number[] } | undefined;
  if (supplySpec !== undefined) {
    const zs = checkComposition("spec.supply.z", supplySpec.z, nc);
    if (!(supplySpec.temperatureK > 0))
      bad("spec.supply.temperatureK", "K", "> 0", supplySpec.temperatureK);
    if (!(supplySpec.pressurePa > init.pressurePa)) {
      bad(
        "spec.supply.pressurePa",
        "Pa",
        `above the initial vessel pressure ${init.pressurePa} Pa`,
        supplySpec.pressurePa,
      );
    }
    if (!(supplySpec.diameterM > 0)) bad("spec.supply.diameterM", "m", "> 0", supplySpec.diameterM);
    const cd = supplySpec.dischargeCoefficient;
    if (!(cd > 0 && cd <= 1)) bad("spec.supply.dischargeCoefficient", "-", "> 0 and <= 1", cd);
    const st = fluid.stateAtTP(supplySpec.temperatureK, supplySpec.pressurePa, zs);
    supply = {
      z: zs,
      areaCd: (cd * Math.PI * supplySpec.diameterM ** 2) / 4,
      stag: {
        pressurePa: supplySpec.pressurePa,
        temperatureK: supplySpec.temperatureK,
        x: zs,
        enthalpyJPerMol: st.molar.h,
        entropyJPerMolK: st.molar.s,
        molarMassKgPerMol: st.molarMassKgPerMol,
      },
    };
  }
  if (outlets.length === 0 && supply === undefined) {
    bad(
      "spec.outlets",
      "-",
      "at least one outlet (depressurisation) or a supply (filling)",
      spec.outlets,
    );
  }
  if (outlets.length > 0 && supply !== undefined) {
    bad(
      "spec.supply",
      "-",
      "absent when outlets are given (one run either empties or fills the vessel)",
      "both given",
    );
  }
  const filling = supply !== undefined;

  // ---- heat -------------------------------------------------------------------------------
  const heat = spec.heat ?? "adiabatic";
  // a wall given is checked even when the run is adiabatic (where it is not used)
  if (spec.wall !== undefined) checkWall(spec.wall, geometry.innerAreaM2);
  let wallHeat: WallHeatSpec | undefined;
  let transport: ((state: FluidState) => ContentsTransport) | undefined;
  let wallMass = 0;
  let wallCp = 0;
  if (heat !== "adiabatic") {
    if (!(typeof heat === "object" && heat !== null && heat.kind === "wall")) {
      bad("spec.heat", "-", '"adiabatic" or { kind: "wall", inside, outside, transport }', heat);
    }
    wallHeat = heat;
    const w = spec.wall;
    if (w === undefined)
      bad(
        "spec.wall",
        "-",
        "a wall (thicknessM, density, heat capacity) when heat is exchanged through it",
        w,
      );
    ({ massKg: wallMass, heatCapacityJPerKgK: wallCp } = checkWall(w, geometry.innerAreaM2));
    if (w.massKg === undefined) {
      warnings.push({
        code: "model-limitation",
        message:
          "wall mass = thickness x inner area x density (thin wall; nozzles and supports not counted)",
      });
    }
    const inside = heat.inside ?? "natural-convection";
    if (inside === "natural-convection") {
      if (heat.transport === undefined && typeof fluid.transportOfState === "function") {
        transport = (st) => fluid.transportOfState(st);
        warnings.push({
          code: "model-limitation",
          message:
            "inside heat transfer: viscosity and thermal conductivity of the contents from the fluid's transport method (Chung et al. 1988, Ind. Eng. Chem. Res. 27, 671-679, or the IAPWS releases for water), in natural-convection correlations (Churchill and Chu 1975) uncertain by tens of percent",
        });
      } else {
        transport = heat.transport;
      }
      if (typeof transport !== "function") {
        bad(
          "spec.heat.transport",
          "-",
          "a function (state) => { viscosityPaS, thermalConductivityWPerMK } for natural convection inside",
          heat.transport,
          "or give heat.inside = { coefficientWPerM2K }",
        );
      }
    } else if (!(inside.coefficientWPerM2K >= 0)) {
      bad("spec.heat.inside.coefficientWPerM2K", "W/(m2 K)", ">= 0", inside.coefficientWPerM2K);
    }
    const out = heat.outside;
    if (!(typeof out === "object" && out !== null))
      bad("spec.heat.outside", "-", "an outside condition", out);
    if (out.kind === "air" || out.kind === "coefficient") {
      if (!(out.ambientK > 150 && out.ambientK < 400))
        bad("spec.heat.outside.ambientK", "K", "150 to 400 K", out.ambientK);
      if (out.kind === "coefficient" && !(out.coefficientWPerM2K >= 0)) {
        bad("spec.heat.outside.coefficientWPerM2K", "W/(m2 K)", ">= 0", out.coefficientWPerM2K);
      }
    } else if (out.kind === "heat-flux") {
      if (!Number.isFinite(out.fluxWPerM2))
        bad("spec.heat.outside.fluxWPerM2", "W/m2", "finite", out.fluxWPerM2);
      if (!(typeof out.basis === "string" && out.basis.trim().length > 0)) {
        bad(
          "spec.heat.outside.basis",
          "-",
          "the basis of the heat flux in words (e.g. the standard and its formula)",
          out.basis,
        );
      }
      warnings.push({
        code: "model-limitation",
        message: `external heat flux ${out.fluxWPerM2} W/m2 on the whole outer surface; basis as given by the user: ${out.basis}`,
      });
    } else if (out.kind !== "insulated") {
      bad(
        "spec.heat.outside.kind",
        "-",
        '"air", "coefficient", "heat-flux" or "insulated"',
        (out as { kind?: unknown }).kind,
      );
    }
  }

  // ---- until ------------------------------------------------------------------------------
  const until = spec.until;
  if (!(
    typeof until === "object" &&
    until !== null &&
    (until.pressurePa !== undefined || until.timeS !== undefined)
  )) {
    bad(
      "spec.until",
      "-",
      "a stop criterion: { pressurePa } (target pressure, Pa) and/or { timeS } (s)",
      until,
    );
  }
  const pbMax = outlets.length > 0 ? Math.max(...outlets.map((o) => o.backPressurePa)) : 0;
  if (until.pressurePa !== undefined) {
    const pt = until.pressurePa;
    if (!filling && !(pt > pbMax && pt < init.pressurePa)) {
      bad(
        "spec.until.pressurePa",
        "Pa",
        `between the back pressure ${pbMax} Pa and the initial pressure ${init.pressurePa} Pa`,
        pt,
      );
    }
    if (filling && !(pt > init.pressurePa && pt < supply!.stag.pressurePa)) {
      bad(
        "spec.until.pressurePa",
        "Pa",
        `between the initial pressure ${init.pressurePa} Pa and the supply pressure ${supply!.stag.pressurePa} Pa`,
        pt,
      );
    }
  }
  if (until.timeS !== undefined && !(until.timeS > 0 && Number.isFinite(until.timeS)))
    bad("spec.until.timeS", "s", "> 0 and finite", until.timeS);
  const tEnd = until.timeS ?? options.maxTimeS ?? 1e6;
  const mdmt = spec.minimumDesignMetalTemperatureK;
  if (mdmt !== undefined && !(mdmt > 0))
    bad("spec.minimumDesignMetalTemperatureK", "K", "> 0", mdmt);

  // ---- contents at a state vector -----------------------------------------------------------
  let mode: "single-phase" | "equilibrium" = "single-phase";
  let guessT = init.temperatureK;
  let guessP = init.pressurePa;
  const flashOptions = options.flash ?? {};
  const uvSolver = contentsFlash(fluid, 1e-9, flashOptions);
  const contentsCache: { key: string; c: Contents }[] = [];
  const contentsAt = (y: readonly number[]): Contents => {
    const key = `${mode}|${y.slice(0, nc + 1).join(",")}`;
    for (const e of contentsCache) if (e.key === key) return e.c;
    const c = contentsFresh(y);
    contentsCache.unshift({ key, c });
    if (contentsCache.length > 8) contentsCache.pop();
    return c;
  };
  const contentsFresh = (y: readonly number[]): Contents => {
    const n = y.slice(0, nc);
    for (let i = 0; i < nc; i++) {
      if (!(n[i] >= 0)) {
        if (n[i] > -1e-12 * nTot0) n[i] = 0;
        else
          throw new SolverError(
            "vessel contents",
            `negative amount of ${fluid.componentIds[i]} (${n[i]} mol) at a trial step`,
          );
      }
    }
    const nTotal = sum(n);
    if (!(nTotal > 0))
      throw new SolverError("vessel contents", "the vessel is empty (no moles left)");
    const z = n.map((v) => v / nTotal);
    const rho = nTotal / V;
    const u = y[nc] / nTotal;
    let phases: Phase[];
    let T: number;
    let P: number;
    if (mode === "single-phase") {
      T = guessT;
      let st = fluid.stateAtTRho(T, rho, z);
      let k = 0;
      const scale = Math.max(Math.abs(u), 8.314 * T);
      for (;;) {
        const r = st.molar.u - u;
        if (Math.abs(r) <= 1e-12 * scale) break;
        if (!(st.molar.cv > 0) || k++ > 60) {
          throw new SolverError(
            "vessel contents (Newton on T at fixed density)",
            `no temperature with u = ${u} J/mol at rho = ${rho} mol/m3 after ${k} steps (last T = ${T} K, residual ${r} J/mol, cv = ${st.molar.cv})`,
          );
        }
        let dT = -r / st.molar.cv;
        if (Math.abs(dT) > 0.2 * T) dT = Math.sign(dT) * 0.2 * T;
        T += dT;
        st = fluid.stateAtTRho(T, rho, z);
      }
      P = st.pressurePa;
      phases = [{ kind: st.phase === "liquid" ? "liquid" : "vapor", amount: 1, state: st }];
    } else {
      const eq =
        z.filter((v) => v > 0).length === 1
          ? fluid.flashUV(u, rho, z, {
              ...flashOptions,
              initialGuessK: guessT,
              initialGuessPa: guessP,
            })
          : uvSolver.solve(u, rho, z, guessT, guessP);
      T = eq.temperatureK;
      P = eq.pressurePa;
      phases = eq.phases.map((p) => ({ kind: p.kind, amount: p.amount, state: p.state }));
    }
    let liquidFraction = 0;
    let liquidVolumeM3 = 0;
    for (const p of phases) {
      if (p.kind !== "vapor") {
        liquidFraction += p.amount;
        liquidVolumeM3 += (p.amount * nTotal) / p.state.densityMolPerM3;
      }
    }
    let massKg = 0;
    for (let i = 0; i < nc; i++) massKg += n[i] * M[i];
    return { nTotal, z, T, P, rho, u, massKg, phases, liquidFraction, liquidVolumeM3 };
  };

  const stagnationOf = (c: Contents, draws: OutletSpec["draws"]): StagnationState => {
    if (draws === "mixture" || c.phases.length === 1) {
      const p0 = c.phases[0].state;
      if (c.phases.length === 1) {
        return {
          pressurePa: c.P,
          temperatureK: c.T,
          x: c.z,
          enthalpyJPerMol: p0.molar.h,
          entropyJPerMolK: p0.molar.s,
          molarMassKgPerMol: p0.molarMassKgPerMol,
        };
      }
      let h = 0;
      let s = 0;
      let mm = 0;
      for (const p of c.phases) {
        h += p.amount * p.state.molar.h;
        s += p.amount * p.state.molar.s;
        mm += p.amount * p.state.molarMassKgPerMol;
      }
      return {
        pressurePa: c.P,
        temperatureK: c.T,
        x: c.z,
        enthalpyJPerMol: h,
        entropyJPerMolK: s,
        molarMassKgPerMol: mm,
      };
    }
    const pick =
      draws === "liquid"
        ? c.phases.reduce((a, b) => (b.state.densityMolPerM3 > a.state.densityMolPerM3 ? b : a))
        : (c.phases.find((p) => p.kind === "vapor") ?? c.phases[0]);
    const st = pick.state;
    return {
      pressurePa: c.P,
      temperatureK: c.T,
      x: st.x,
      enthalpyJPerMol: st.molar.h,
      entropyJPerMolK: st.molar.s,
      molarMassKgPerMol: st.molarMassKgPerMol,
    };
  };

  // heat flow from the wall into the contents, W
  const heatIn = (c: Contents, Tw: number): number => {
    if (wallHeat === undefined) return 0;
    const inside = wallHeat.inside ?? "natural-convection";
    const level = c.liquidVolumeM3 > 0 ? geometry.levelOf(Math.min(c.liquidVolumeM3, V)) : 0;
    const aLiquid = c.liquidVolumeM3 > 0 ? geometry.wettedAreaAt(level) : 0;
    const aGas = Math.max(0, geometry.innerAreaM2 - aLiquid);
    const dT = Tw - c.T;
    if (inside !== "natural-convection")
      return inside.coefficientWPerM2K * geometry.innerAreaM2 * dT;
    if (dT === 0) return 0;
    let q = 0;
    const vapor = c.phases.find((p) => p.kind === "vapor");
    const liquid = c.phases.find((p) => p.kind !== "vapor");
    for (const [phase, area] of [
      [vapor ?? (c.liquidVolumeM3 > 0 ? undefined : c.phases[0]), aGas],
      [liquid, aLiquid],
    ] as const) {
      if (phase === undefined || !(area > 0)) continue;
      const st = phase.state;
      const tp: ContentsTransport = transport!(st);
      const coeff = naturalConvectionCoefficient(
        geometry.surface,
        {
          densityKgPerM3: st.densityKgPerM3,
          cpJPerKgK: st.mass.cp,
          expansivityPerK: st.thermalExpansionPerK,
          viscosityPaS: tp.viscosityPaS,
          thermalConductivityWPerMK: tp.thermalConductivityWPerMK,
        },
        dT,
        geometry.convectionLengthM,
      );
      q += coeff * area * dT;
    }
    return q;
  };

  // heat flow from outside into the wall, W (outer area taken equal to the inner area: thin wall)
  const heatExt = (Tw: number): number => {
    if (wallHeat === undefined) return 0;
    const out = wallHeat.outside;
    const A = geometry.innerAreaM2;
    if (out.kind === "insulated") return 0;
    if (out.kind === "heat-flux") return out.fluxWPerM2 * A;
    if (out.kind === "coefficient") return out.coefficientWPerM2K * A * (out.ambientK - Tw);
    const dT = out.ambientK - Tw;
    if (dT === 0) return 0;
    const air = airAt(0.5 * (out.ambientK + Tw));
    return (
      naturalConvectionCoefficient(geometry.surface, air, dT, geometry.convectionLengthM) * A * dT
    );
  };

  // ---- right-hand side ----------------------------------------------------------------------
  // the single-phase route fails when a trial step's isentrope enters the two-phase region: that
  // evaluation takes the equilibrium route (the accepted-step check then changes the mode)
  const throatHints = new Map<number, number>();
  const throatTHints = new Map<number, number>();
  const throatLnKHints = new Map<number, readonly number[]>();
  // outlets (index; -1 the supply) whose flux took the equilibrium route in the "auto" mode
  const equilibriumOutlets = new Set<number>();
  const fluxOf = (
    stag: StagnationState,
    back: number,
    route: "single-phase" | "auto",
    which: number,
  ): OrificeFlux => {
    const opts = {
      throatRatioHint: throatHints.get(which),
      throatTemperatureRatioHint: throatTHints.get(which),
      throatLnKHint: throatLnKHints.get(which),
      pressureTolerance: 1e-6,
      flash: flashOptions,
    };
    let flux: OrificeFlux;
    if (route === "auto" && equilibriumOutlets.has(which)) {
      // the previous evaluation needed the equilibrium route (a two-phase expansion): the
      // single-phase attempt of "auto" would fail its stability check again; the equilibrium
      // route is the general one (it also covers a single-phase expansion)
      flux = orificeMassFlux(fluid, stag, back, { ...opts, route: "equilibrium" });
    } else if (route === "auto" || idealGas) {
      flux = orificeMassFlux(fluid, stag, back, { ...opts, route });
    } else {
      try {
        flux = orificeMassFlux(fluid, stag, back, { ...opts, route: "single-phase" });
      } catch (e) {
        if (!(e instanceof SolverError || e instanceof InputError)) throw e;
        flux = orificeMassFlux(fluid, stag, back, { ...opts, route: "equilibrium" });
      }
    }
    if (flux.choked) throatHints.set(which, flux.throatPressurePa / stag.pressurePa);
    if (flux.choked) throatTHints.set(which, flux.throatTemperatureK / stag.temperatureK);
    if (flux.throatLnK !== undefined) throatLnKHints.set(which, flux.throatLnK);
    if (route === "auto" && flux.route === "equilibrium") equilibriumOutlets.add(which);
    return flux;
  };
  const cache: { key: string; ev: Evaluation }[] = [];
  const evaluate = (y: readonly number[]): Evaluation => {
    const key = `${mode}|${y.join(",")}`;
    for (const e of cache) if (e.key === key) return e.ev;
    const c = contentsAt(y);
    guessT = c.T;
    guessP = c.P;
    const Tw = wallHeat === undefined ? init.temperatureK : y[nc + 1];
    const dy = new Array<number>(nc + 5).fill(0);
    const route = idealGas ? "single-phase" : mode === "single-phase" ? "single-phase" : "auto";
    const outletFlux: (OrificeFlux | undefined)[] = [];
    let massOut = 0;
    let hOut = 0;
    for (const o of outlets) {
      if (!(c.P > o.backPressurePa * (1 + 1e-9))) {
        outletFlux.push(undefined);
        continue;
      }
      const stag = stagnationOf(c, o.draws);
      const flux = fluxOf(stag, o.backPressurePa, route, outletFlux.length);
      outletFlux.push(flux);
      const mdot =
        (o.dischargeCoefficient * Math.PI * o.diameterM ** 2 * flux.massFluxKgPerM2S) / 4;
      const ndot = mdot / stag.molarMassKgPerMol;
      for (let i = 0; i < nc; i++) dy[i] -= ndot * stag.x[i];
      massOut += mdot;
      hOut += ndot * stag.enthalpyJPerMol;
    }
    if (supply !== undefined && supply.stag.pressurePa > c.P * (1 + 1e-9)) {
      const flux = fluxOf(supply.stag, c.P, route, -1);
      outletFlux.push(flux);
      const mdot = supply.areaCd * flux.massFluxKgPerM2S;
      const ndot = mdot / supply.stag.molarMassKgPerMol;
      for (let i = 0; i < nc; i++) dy[i] += ndot * supply.z[i];
      massOut -= mdot;
      hOut -= ndot * supply.stag.enthalpyJPerMol;
    }
    const qIn = heatIn(c, Tw);
    const qExt = heatExt(Tw);
    dy[nc] = -hOut + qIn;
    dy[nc + 1] = wallHeat === undefined ? 0 : (qExt - qIn) / (wallMass * wallCp);
    dy[nc + 2] = massOut;
    dy[nc + 3] = hOut;
    dy[nc + 4] = qExt;
    const ev: Evaluation = { contents: c, dy, outletFlux, massFlowOut: massOut };
    cache.unshift({ key, ev });
    if (cache.length > 8) cache.pop();
    return ev;
  };

  // single-phase assumptions still hold at y? `screened`: the stability tests from Wilson's
  // starts only (flashTP extraTrials "none"), for the bisection of a phase boundary: a "false"
  // is still a proof (a verified split, or a more stable root), a "true" is verified afterwards
  const wilsonOnly: typeof flashOptions = { ...flashOptions, extraTrials: "none" };
  const singlePhaseHolds = (y: readonly number[], screened = false): boolean => {
    if (idealGas) return true;
    const ev = evaluate(y);
    const c = ev.contents;
    const testFlash = screened ? wilsonOnly : flashOptions;
    if (!isStableSinglePhase(fluid, c.T, c.P, c.z, c.rho, testFlash)) return false;
    for (let k = 0; k < ev.outletFlux.length; k++) {
      const f = ev.outletFlux[k];
      if (f === undefined) continue;
      if (f.route === "equilibrium") return false;
      // the throat state of the single-phase route: stable as one phase there? (the fluxes are
      // the outlets' in order, then the supply's)
      const stag = k < outlets.length ? stagnationOf(c, outlets[k].draws) : supply!.stag;
      const rhoThroat = f.throatDensityKgPerM3 / stag.molarMassKgPerMol;
      if (
        !isStableSinglePhase(
          fluid,
          f.throatTemperatureK,
          f.throatPressurePa,
          stag.x,
          rhoThroat,
          testFlash,
        )
      ) {
        return false;
      }
    }
    return true;
  };

  // ---- initial state vector -----------------------------------------------------------------
  let U0: number;
  {
    // the contents' internal energy at the initial (T, P) of each part
    if (liquidLayer) {
      const li = init as {
        vapor: { y: readonly number[] };
        liquid: { x: readonly number[]; levelM: number };
      };
      const y = checkComposition("spec.initial.vapor.y", li.vapor.y, nc);
      const x = checkComposition("spec.initial.liquid.x", li.liquid.x, nc);
      const VL = geometry.liquidVolumeAt(li.liquid.levelM);
      const gas = fluid.stateAtTP(init.temperatureK, init.pressurePa, y, { phase: "vapor" });
      const liq = fluid.stateAtTP(init.temperatureK, init.pressurePa, x, { phase: "liquid" });
      U0 = gas.densityMolPerM3 * (V - VL) * gas.molar.u + liq.densityMolPerM3 * VL * liq.molar.u;
      mode = "equilibrium";
    } else {
      const st = fluid.stateAtTP(
        init.temperatureK,
        init.pressurePa,
        n0.map((v) => v / nTot0),
      );
      U0 = nTot0 * st.molar.u;
    }
  }
  const Tw0 = init.temperatureK;
  const y0 = [...n0, U0, Tw0, 0, 0, 0];
  const first = evaluate(y0);
  if (liquidLayer) {
    const c = first.contents;
    if (
      Math.abs(c.P - init.pressurePa) > 0.01 * init.pressurePa ||
      Math.abs(c.T - init.temperatureK) > 0.5
    ) {
      warnings.push({
        code: "model-limitation",
        message: `the given gas and liquid are not in equilibrium: brought to equilibrium at the same volume and energy, the contents start at ${(c.P / 1e5).toPrecision(5)} bar, ${c.T.toFixed(2)} K (given ${(init.pressurePa / 1e5).toPrecision(5)} bar, ${init.temperatureK.toFixed(2)} K)`,
      });
    }
  }
  if (!filling && !(first.contents.P > pbMax)) {
    bad(
      "spec.outlets.backPressurePa",
      "Pa",
      `below the initial vessel pressure ${first.contents.P} Pa`,
      pbMax,
    );
  }
  const E0 = U0 + wallMass * wallCp * Tw0;
  const m0 = first.contents.massKg;
  const pTarget = until.pressurePa;

  // ---- events -------------------------------------------------------------------------------
  const pOf = (y: readonly number[]): number => contentsAt(y).P;
  const events: OdeEvent[] = [];
  if (pTarget !== undefined) {
    events.push({
      name: "target-pressure",
      g: (_t, y) => (pOf(y) - pTarget) / pTarget,
      direction: filling ? 1 : -1,
    });
  }
  if (!filling) {
    events.push({
      name: "equalised",
      g: (_t, y) => pOf(y) / (pbMax * (1 + 1e-3)) - 1,
      direction: -1,
    });
    events.push({ name: "empty", g: (_t, y) => sum(y.slice(0, nc)) / nTot0 - 1e-6, direction: -1 });
  } else {
    const ps = supply!.stag.pressurePa;
    events.push({ name: "equalised", g: (_t, y) => 1 - pOf(y) / (ps * (1 - 1e-3)), direction: -1 });
  }

  // ---- integrate, switching to the equilibrium route at a phase boundary ---------------------
  const ts: number[] = [0];
  const ys: number[][] = [y0];
  const recorded: Evaluation[] = [first];
  let accepted = 0;
  let rejected = 0;
  let evaluations = 0;
  let stoppedBecause: VesselResult["stoppedBecause"] = "time";
  let t = 0;
  let y = y0;
  const maxSteps = options.maxSteps ?? 20000;
  const atol = y0.map((v, i) =>
    i < nc
      ? 1e-9 * nTot0
      : i === nc
        ? 1e-9 * Math.max(Math.abs(U0), 1)
        : i === nc + 1
          ? 1e-9 * Tw0
          : 1e-9 * Math.max(m0, Math.abs(U0), 1),
  );
  const p0 = first.contents.P;
  let progressSteps = 0;
  // the evaluation at each accepted point, kept when the step is accepted (evaluating the
  // points again after the run would start each contents solve from the run's last state)
  const stepEvals = new Map<readonly number[], Evaluation>();
  for (let round = 0; round < 3; round++) {
    let phaseBoundary = false;
    const r = integrateDormandPrince((_t, yy) => evaluate(yy).dy, t, y, tEnd, {
      relativeTolerance: rtol,
      absoluteTolerance: atol,
      maxSteps: Math.max(1, maxSteps - accepted - rejected),
      events,
      onStep: (tt, yy) => {
        stepEvals.set(yy, evaluate(yy));
        if (mode === "single-phase" && !singlePhaseHolds(yy)) {
          phaseBoundary = true;
          return false;
        }
        if (options.onProgress) {
          const P = pOf(yy);
          const byP = pTarget !== undefined ? Math.abs(P - p0) / Math.abs(pTarget - p0) : 0;
          const byT = until.timeS !== undefined ? tt / until.timeS : 0;
          options.onProgress({
            timeS: tt,
            pressurePa: P,
            steps: ++progressSteps,
            fraction: Math.min(1, Math.max(byP, byT)),
          });
        }
        return true;
      },
    });
    evaluations += r.evaluations;
    rejected += r.rejectedSteps;
    if (phaseBoundary) {
      // the last accepted point is past the boundary: bisect on the dense output
      const n = r.t.length;
      // (the trials screened by Wilson's starts, the point found then verified with the full
      // tests; if that fails, the bisection is repeated below it with the full tests)
      const bisect = (a: number, b: number, screened: boolean): number => {
        let lo = a;
        let hi = b;
        for (let k = 0; k < 14; k++) {
          const mid = 0.5 * (lo + hi);
          if (singlePhaseHolds(r.at(mid), screened)) lo = mid;
          else hi = mid;
        }
        return lo;
      };
      let lo = r.t[n - 2];
      if ((flashOptions.extraTrials ?? "auto") === "none") lo = bisect(lo, r.t[n - 1], false);
      else {
        const screenedLo = bisect(lo, r.t[n - 1], true);
        if (screenedLo === lo || singlePhaseHolds(r.at(screenedLo))) lo = screenedLo;
        else lo = bisect(lo, screenedLo, false);
      }
      for (let k = 1; k < n - 1; k++) {
        ts.push(r.t[k]);
        ys.push(r.y[k].slice());
        recorded.push(stepEvals.get(r.y[k]) ?? evaluate(r.y[k]));
      }
      accepted += r.acceptedSteps - 1;
      t = lo;
      y = r.at(lo);
      if (t > ts[ts.length - 1]) {
        ts.push(t);
        ys.push(y);
        recorded.push(evaluate(y));
      }
      mode = "equilibrium";
      cache.length = 0;
      contentsCache.length = 0;
      continue;
    }
    for (let k = 1; k < r.t.length; k++) {
      ts.push(r.t[k]);
      ys.push(r.y[k].slice());
      recorded.push(stepEvals.get(r.y[k]) ?? evaluate(r.y[k]));
    }
    accepted += r.acceptedSteps;
    if (r.stoppedBecause === "event") {
      const last = r.events[r.events.length - 1];
      stoppedBecause = last.name as VesselResult["stoppedBecause"];
    } else {
      stoppedBecause = "time";
    }
    break;
  }

  // ---- results ------------------------------------------------------------------------------
  const yEnd = ys[ys.length - 1];
  const cEnd = recorded[recorded.length - 1].contents;
  const uEnd =
    cEnd.phases.length === 1
      ? cEnd.phases[0].state.molar.u
      : cEnd.phases.reduce((a, p) => a + p.amount * p.state.molar.u, 0);
  const UfromState = cEnd.nTotal * uEnd;
  const TwEnd = yEnd[nc + 1];
  const Hout = yEnd[nc + 3];
  const Qext = yEnd[nc + 4];
  const energyScale = Math.max(Math.abs(U0), Math.abs(Hout), Math.abs(Qext));
  const energyErr =
    Math.abs(UfromState + wallMass * wallCp * TwEnd + Hout - Qext - E0) / energyScale;
  const massErr = Math.abs(cEnd.massKg + yEnd[nc + 2] - m0) / m0;

  const series = {
    timeS: ts,
    pressurePa: recorded.map((e) => e.contents.P),
    temperatureK: recorded.map((e) => e.contents.T),
    wallTemperatureK: wallHeat === undefined ? undefined : ys.map((v) => v[nc + 1]),
    massKg: recorded.map((e) => e.contents.massKg),
    massFlowKgPerS: recorded.map((e) => e.massFlowOut),
    liquidFraction: recorded.map((e) => e.contents.liquidFraction),
    liquidVolumeM3: recorded.map((e) => e.contents.liquidVolumeM3),
    phaseCount: recorded.map((e) => e.contents.phases.length),
    choked: recorded.map((e) => e.outletFlux[0]?.choked ?? false),
  };
  let iMin = 0;
  let iMax = 0;
  let iwMin = 0;
  const wallT = series.wallTemperatureK;
  for (let k = 1; k < ts.length; k++) {
    if (series.temperatureK[k] < series.temperatureK[iMin]) iMin = k;
    if (series.temperatureK[k] > series.temperatureK[iMax]) iMax = k;
    if (wallT !== undefined && wallT[k] < wallT[iwMin]) iwMin = k;
  }
  const phaseChanges: VesselResult["phaseChanges"][number][] = [];
  for (let k = 1; k < ts.length; k++) {
    const a = series.phaseCount[k - 1];
    const b = series.phaseCount[k];
    if (a !== b) {
      phaseChanges.push({
        timeS: ts[k],
        from: a,
        to: b,
        note:
          b > a
            ? `the contents became ${b}-phase (a saturation line was crossed); liquid ${(series.liquidFraction[k] * 100).toPrecision(3)} mol % at ${ts[k].toPrecision(4)} s`
            : `the contents became ${b}-phase`,
      });
    }
  }
  const cautions = [...VESSEL_CAUTIONS];
  if (wallHeat === undefined) {
    cautions.push(
      "Adiabatic run: the wall is not modelled (no wall temperature is reported); the contents' minimum temperature is the bound to compare with the metal's limits, and heat from the wall would make the contents warmer than shown.",
    );
  }
  if (mdmt !== undefined) {
    const coldest =
      wallT === undefined
        ? series.temperatureK[iMin]
        : Math.min(series.temperatureK[iMin], wallT[iwMin]);
    if (coldest < mdmt) {
      cautions.unshift(
        `The minimum temperature ${coldest.toFixed(1)} K (${(coldest - 273.15).toFixed(1)} degC) is BELOW the minimum design metal temperature ${mdmt.toFixed(1)} K (${(mdmt - 273.15).toFixed(1)} degC): refer to the responsible licensed engineer before any blowdown of this vessel.`,
      );
    }
  }
  if (accepted + rejected >= maxSteps) {
    warnings.push({
      code: "accuracy",
      message: `stopped after ${maxSteps} integration steps (options.maxSteps)`,
    });
  }
  return {
    kind: filling ? "filling" : "depressurisation",
    series,
    minimum:
      wallT === undefined
        ? { temperatureK: series.temperatureK[iMin], timeS: ts[iMin] }
        : {
            temperatureK: series.temperatureK[iMin],
            timeS: ts[iMin],
            wallTemperatureK: wallT[iwMin],
            wallTimeS: ts[iwMin],
          },
    wallModelled: wallT !== undefined,
    maximum: { temperatureK: series.temperatureK[iMax], timeS: ts[iMax] },
    timeToTargetS: stoppedBecause === "target-pressure" ? ts[ts.length - 1] : undefined,
    stoppedBecause,
    massReleasedKg: yEnd[nc + 2],
    balance: {
      massRelativeError: massErr,
      energyRelativeError: energyErr,
      energyScaleJ: energyScale,
    },
    phaseChanges,
    volumeM3: V,
    wallMassKg: wallHeat === undefined ? undefined : wallMass,
    minimumDesignMetalTemperatureK: mdmt,
    cautions,
    notModelled: VESSEL_NOT_MODELLED,
    warnings,
    model: fluid.model.info,
    integration: {
      method: "Dormand-Prince RK5(4) (J. Comput. Appl. Math. 6 (1980) 19-26) with event location",
      acceptedSteps: accepted,
      rejectedSteps: rejected,
      evaluations,
      relativeTolerance: rtol,
    },
  };
}
