// Regenerates notebooks/data/corvid-k320-co2-pvt.csv (INVENTED / SYNTHETIC demo data) from
// corvidK320Campaign.ts: bundles the TypeScript with esbuild (a dev dependency) and runs it.
// Usage: node notebooks/data/generate-corvid-k320-co2-pvt.mjs
import { build } from "esbuild";
import { createRequire } from "node:module";
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { dirname, join } from "node:path";

const here = dirname(fileURLToPath(import.meta.url));
const result = await build({
  entryPoints: [join(here, "corvidK320Campaign.ts")],
  bundle: true,
  platform: "node",
  format: "cjs",
  write: false,
});
const module = { exports: {} };
new Function("module", "exports", "require", result.outputFiles[0].text)(
  module,
  module.exports,
  createRequire(import.meta.url),
);
const out = join(here, "corvid-k320-co2-pvt.csv");
writeFileSync(out, module.exports.corvidK320CampaignCsv());
console.log(`wrote ${out}`);
