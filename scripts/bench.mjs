// `npm run bench`: bundles kernel-lib/bench/run.ts and runs it, passing any arguments on (e.g.
// `npm run bench -- pr- --processes 5` to select cases and change the number of fresh processes
// per case; see run.ts).
import { bundleAndRun } from "./bundleAndRun.mjs";

bundleAndRun("run.ts");
