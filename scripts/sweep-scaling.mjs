// `npm run bench:scaling`: bundles kernel-lib/bench/sweepScaling.ts (1 worker against all cores
// on a warmed sweep pool, alternating in one process) and runs it, passing any arguments on
// (e.g. `npm run bench:scaling -- --rounds 8 --cold`; see sweepScaling.ts).
import { bundleAndRun } from "./bundleAndRun.mjs";

bundleAndRun("sweepScaling.ts");
