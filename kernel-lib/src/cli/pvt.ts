/**
 * `isochor pvt <file.csv>`: departure functions from measured P-V-T data, the whole route of
 * pvt/departuresFromPvt.ts on one CSV file. JSON on stdout (shape fixed by issue 6 item 8):
 *
 *   {"isotherms": [{"T": K, "points": [{"rho": mol/m3, "P": Pa,
 *        "residual": {"s","u","a","h","g"}, "uncertainty": {"s","u","a","h","g"}}]}],
 *    "virial": {"B": [m3/mol per isotherm], "uB": [...]},
 *    "diagnostics": [{"code", "severity", "message"}]}
 *
 * SI molar (J/mol, J/(mol K)); s and a relative to the ideal gas at the same T and density, u and
 * h (the same in both conventions), g at the same T and pressure (R T ln phi), as the engine's
 * `residual` block. "P" is the smoothed pressure at the state. Standard uncertainties (k = 1).
 * virial.B[k] and uB[k] belong to isotherms[k] (B depends on T). A readable summary goes to stderr.
 * Exit codes: 0 done; 1 the file or the data were refused (message on stderr, nothing on stdout);
 * 2 usage error.
 */
import * as path from "node:path";
import { getComponent } from "../components/index.js";
import { IsochorError } from "../errors.js";
import { departuresFromPvt } from "../pvt/departuresFromPvt.js";
import type { PvtRouteOptions, PvtRouteResult } from "../pvt/departuresFromPvt.js";
import { readPvtCsvFile } from "../pvt/readPvtCsvFile.js";
import { parseCliArgs } from "./cliArgs.js";
import type { CliIo } from "./io.js";

const USAGE = `usage: isochor pvt <file.csv> [options]

Residual (departure) properties from measured P-V-T data: isochore fits, low-density bridge,
integration along isotherms, uncertainties. CSV headers: T [unit], rho [unit] (or v [unit]),
P [unit], optional u(T) [unit], u(rho) [unit] (or u(v)), u(P) [unit]; '#' lines are comments.

options:
  --component <id>     component: its molar mass (mass-based densities) and critical temperature
  --M <kg/mol>         molar mass, kg/mol (instead of --component)
  --route <r>          auto (default), isochores, or surface
  --isotherms <T,...>  isotherms to report, K (default: the measured temperatures)
  --seed <n>           Monte Carlo seed (default 20261201)
  --samples <n>        Monte Carlo samples (default 200; 0 = linearised only)
  -h, --help           show this help

units: the CSV's own, one per column header (e.g. "T [K]", "rho [kg/m3]", "P [MPa]"). Output on
  stdout is SI molar JSON: T in K, rho in mol/m3, P in Pa, residual and uncertainty s in J/(mol K),
  u, a, h, g in J/mol; virial B and uB in m3/mol. A readable summary goes to stderr.

example:
  npx isochor pvt notebooks/data/corvid-k320-co2-pvt.csv --component carbon-dioxide --samples 100
`;

interface Args {
  file: string;
  molarMassKgPerMol?: number;
  route: PvtRouteOptions;
}

const OPTIONS = {
  component: { needs: "an id" },
  M: { needs: "a molar mass in kg/mol" },
  route: { needs: "auto, isochores or surface" },
  isotherms: { needs: "temperatures in K, comma-separated" },
  seed: { needs: "an integer" },
  samples: { needs: "an integer" },
} as const;

/** A number written as a plain decimal (no hex, no blanks, no "Infinity"); else NaN. */
function decimal(v: string | undefined): number {
  return v !== undefined && /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(v)
    ? Number(v)
    : Number.NaN;
}

function parseArgs(argv: string[]): Args | { error: string } | "help" {
  const args = parseCliArgs(argv, OPTIONS);
  if (args === "help" || "error" in args) return args;
  const v = args.values;
  const route: PvtRouteOptions = {};
  let molarMassKgPerMol: number | undefined;
  if (v.M !== undefined) {
    const m = decimal(v.M);
    if (!(m > 0 && m <= 5))
      return { error: "--M needs a molar mass in kg/mol, > 0 and <= 5 (e.g. 0.04401 for CO2)" };
    molarMassKgPerMol = m;
  }
  if (v.route !== undefined) {
    const r = v.route;
    if (r !== "auto" && r !== "isochores" && r !== "surface")
      return { error: "--route must be auto, isochores or surface" };
    route.route = r;
  }
  if (v.isotherms !== undefined) {
    const list = v.isotherms.split(",").map((s) => decimal(s.trim()));
    if (list.length === 0 || !list.every((t) => t > 0 && t < Infinity))
      return { error: "--isotherms needs temperatures in K, > 0, comma-separated" };
    route.isothermsK = list;
  }
  if (v.seed !== undefined) {
    const s = decimal(v.seed);
    if (!(Number.isInteger(s) && s >= 0 && s < 2 ** 32))
      return { error: "--seed needs an integer in [0, 2^32)" };
    route.seed = s;
  }
  if (v.samples !== undefined) {
    const s = decimal(v.samples);
    if (!(Number.isInteger(s) && s >= 0 && s <= 100000))
      return { error: "--samples needs an integer from 0 to 100000" };
    route.monteCarloSamples = s;
  }
  if (args.positionals.length > 1) return { error: "give one CSV file" };
  const file = args.positionals[0];
  if (file === undefined) return { error: "give a CSV file" };
  if (v.component !== undefined) {
    if (v.component === "") return { error: "--component needs an id" };
    if (molarMassKgPerMol !== undefined)
      return { error: "give either --component or --M, not both" };
    try {
      const c = getComponent(v.component);
      molarMassKgPerMol = c.molarMassKgPerMol;
      route.criticalTemperatureK = c.criticalTemperatureK;
    } catch (e) {
      return { error: e instanceof Error ? e.message : String(e) };
    }
  }
  return { file, molarMassKgPerMol, route };
}

/** The JSON response of issue 6 item 8. */
export function pvtResponse(result: PvtRouteResult): unknown {
  const pick = (d: { s: number; u: number; a: number; h: number; g: number }) => ({
    s: d.s,
    u: d.u,
    a: d.a,
    h: d.h,
    g: d.g,
  });
  const mc = result.uncertaintyMethod.monteCarlo;
  const conventions = {
    code: "conventions",
    severity: "info",
    message:
      "SI molar (J/mol, J/(mol K), m3/mol); s and a relative to the ideal gas at the same T and density; u and h (same in both conventions); g at the same T and pressure (R T ln phi); " +
      `P is the smoothed pressure; uncertainties are standard (k = 1): ${mc ? `Monte Carlo, seed ${mc.seed}, ${mc.samples} samples` : "linearised"}, combined with the method estimates (quadrature, low-density bridge, fit order); ` +
      `weights ${result.uncertaintyMethod.sigmaSource === "stated" ? "from the stated u(P), u(T), u(rho)" : "equal, scale from the scatter (no u(P) column)"}; route "${result.route}"; virial.B[k] belongs to isotherms[k]`,
  };
  return {
    isotherms: result.isotherms.map((iso) => ({
      T: iso.temperatureK,
      points: iso.states.map((s) => ({
        rho: s.densityMolPerM3,
        P: s.pressurePa,
        residual: pick(s.residual),
        uncertainty: pick(s.uncertainty),
      })),
    })),
    virial: { B: result.isotherms.map((i) => i.B), uB: result.isotherms.map((i) => i.uB) },
    diagnostics: [
      conventions,
      ...result.diagnostics.map((d) => ({
        code: d.code,
        severity: d.severity,
        message: d.message,
      })),
    ],
  };
}

function summary(file: string, nPoints: number, result: PvtRouteResult): string {
  const lines = [
    `isochor pvt: ${file}: ${nPoints} points, route "${result.route}", ${result.isotherms.length} isotherm(s)`,
  ];
  if (result.setAside.length > 0)
    lines.push(
      `  set aside: ${result.setAside.map((s) => `line ${s.line} (${s.reason})`).join("; ")}`,
    );
  for (const iso of result.isotherms) {
    const last = iso.states[iso.states.length - 1];
    lines.push(
      `  T = ${iso.temperatureK.toFixed(2)} K: ${iso.states.length} densities; B = ${(iso.B * 1e6).toFixed(2)} +/- ${(iso.uB * 1e6).toFixed(2)} cm3/mol` +
        (last
          ? `; at ${last.densityMolPerM3.toPrecision(5)} mol/m3: h_res = ${last.residual.h.toFixed(1)} +/- ${last.uncertainty.h.toFixed(1)} J/mol, s_res = ${last.residual.s.toFixed(3)} +/- ${last.uncertainty.s.toFixed(3)} J/(mol K)`
          : ""),
    );
  }
  for (const d of result.diagnostics.filter((x) => x.severity !== "info"))
    lines.push(`  ${d.severity}: ${d.message}`);
  const mc = result.uncertaintyMethod.monteCarlo;
  lines.push(
    `  uncertainties: ${mc ? `Monte Carlo seed ${mc.seed}, ${mc.samples} samples` : "linearised"} (k = 1)`,
  );
  return lines.join("\n") + "\n";
}

export async function pvtCommand(argv: string[], io: CliIo): Promise<number> {
  const args = parseArgs(argv);
  if (args === "help") {
    io.stdout(USAGE);
    return 0;
  }
  if ("error" in args) {
    io.stderr(`isochor pvt: ${args.error}\n${USAGE}`);
    return 2;
  }
  const file = path.resolve(io.cwd, args.file);
  try {
    const dataset = readPvtCsvFile(file, { molarMassKgPerMol: args.molarMassKgPerMol });
    const result = departuresFromPvt(dataset, args.route);
    io.stdout(JSON.stringify(pvtResponse(result), null, 2) + "\n");
    io.stderr(summary(args.file, dataset.points.length, result));
    return 0;
  } catch (e) {
    if (e instanceof IsochorError) {
      io.stderr(`isochor pvt: ${e.message}\n`);
      return 1;
    }
    throw e;
  }
}
