// `npm run campaign`: bundles kernel-lib/bench/flashCampaign.ts (the robustness campaign of the
// mixture flashes) and runs it, passing any arguments on (e.g. `npm run campaign -- --count 1000`;
// see flashCampaign.ts).
import { bundleAndRun } from "./bundleAndRun.mjs";

bundleAndRun("flashCampaign.ts");
