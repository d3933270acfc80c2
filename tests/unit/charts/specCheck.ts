/**
 * Test helpers: validate a spec against the Vega-Lite JSON schema shipped in the vega-lite
 * package, compile it with vega-lite's own compiler, and render it to SVG with vega (no canvas).
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import Ajv from "ajv";
import type { ChartSpec } from "../../../kernel-lib/src/charts/chartSpec.js";

// The exports map hides the schema file; the package is hoisted to the root node_modules.
const schemaPath = fileURLToPath(
  new URL("../../../node_modules/vega-lite/build/vega-lite-schema.json", import.meta.url),
);
const schema = JSON.parse(readFileSync(schemaPath, "utf8")) as object;
const ajv = new Ajv({
  allowUnionTypes: true,
  strict: false,
  allErrors: false,
  validateFormats: false,
});
const validate = ajv.compile(schema);

/** Errors of the schema validation (empty when the spec is valid). */
export function schemaErrors(spec: ChartSpec): string[] {
  const plain = JSON.parse(JSON.stringify(spec)) as unknown;
  if (validate(plain)) return [];
  return (validate.errors ?? []).map((e) => `${e.instancePath} ${e.message ?? ""}`);
}

/** Compiles with vega-lite and returns the Vega spec and the compiler's warnings. */
export async function compileSpec(spec: ChartSpec): Promise<{ vega: object; warnings: string[] }> {
  const vl = await import("vega-lite");
  const warnings: string[] = [];
  const logger = {
    level: () => logger,
    error: (...m: unknown[]) => {
      throw new Error(m.map(String).join(" "));
    },
    warn: (...m: unknown[]) => {
      warnings.push(m.map(String).join(" "));
      return logger;
    },
    info: () => logger,
    debug: () => logger,
  };
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const out = vl.compile(JSON.parse(JSON.stringify(spec)), { logger: logger as any });
  return { vega: out.spec, warnings };
}

/** Renders to an SVG string with vega's headless view (renderer "none"). */
export async function renderSvgText(spec: ChartSpec): Promise<string> {
  const { vega } = await compileSpec(spec);
  const v = await import("vega");
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  const view = new v.View(v.parse(vega as any), { renderer: "none" });
  const svg = await view.toSVG();
  view.finalize();
  return svg;
}

/** Deep copy with every float rounded to `digits` significant figures (for snapshots). */
export function roundFloats(value: unknown, digits = 5): unknown {
  if (typeof value === "number")
    return Number.isInteger(value) ? value : Number(value.toPrecision(digits));
  if (Array.isArray(value)) return value.map((v) => roundFloats(v, digits));
  if (value && typeof value === "object") {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = roundFloats(v, digits);
    return out;
  }
  return value;
}

/** All layers of a spec, flattened (layer, concat, vconcat, hconcat). */
export function allLayers(spec: Record<string, unknown>): Record<string, unknown>[] {
  const out: Record<string, unknown>[] = [];
  const visit = (s: Record<string, unknown>) => {
    for (const key of ["layer", "concat", "vconcat", "hconcat"]) {
      const children = s[key] as Record<string, unknown>[] | undefined;
      if (children) children.forEach(visit);
    }
    if (s["mark"]) out.push(s);
  };
  visit(spec);
  return out;
}
