/**
 * Loads vega and vega-lite in Node. Both are ES modules with top-level await, so `require` fails:
 * they are loaded once with a real dynamic `import()` (kept as such by module "nodenext") and cached.
 * Their types stay inside this folder; the public API uses VegaLiteSpec.
 */
import type * as VegaModule from "vega";
import type * as VegaLiteModule from "vega-lite";

export interface VegaModules {
  vega: typeof VegaModule;
  vegaLite: typeof VegaLiteModule;
}

let cached: Promise<VegaModules> | undefined;

export function loadVega(): Promise<VegaModules> {
  cached ??= Promise.all([import("vega"), import("vega-lite")]).then(([vega, vegaLite]) => ({
    vega,
    vegaLite,
  }));
  return cached;
}
