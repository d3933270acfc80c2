/**
 * `npm run bench`: prints one JSON line per case, {"case", "secondsPerCall", "wallSecondsPerCall"}
 * (medians of repeated batches; secondsPerCall is process CPU time, see harness.ts), then the ratio of numeric to closed-form departures. Optional argument: a
 * substring to select cases.
 */
import { measure, consumed } from "./harness.js";
import { allCases } from "./cases/index.js";

const filter = process.argv[2];
const results = new Map<string, number>();
for (const c of allCases) {
  if (filter && !c.name.includes(filter)) continue;
  const fn = c.setup();
  const timing = measure(fn);
  const secondsPerCall = timing.cpu;
  results.set(c.name, secondsPerCall);
  process.stdout.write(
    JSON.stringify({ case: c.name, secondsPerCall, wallSecondsPerCall: timing.wall }) + "\n",
  );
  if (c.targetSeconds !== undefined) {
    const verdict = secondsPerCall <= c.targetSeconds ? "meets" : "MISSES";
    process.stderr.write(
      `  ${c.name}: ${(secondsPerCall * 1e6).toPrecision(4)} us per call, target ${(c.targetSeconds * 1e6).toPrecision(3)} us: ${verdict}\n`,
    );
  }
}
const numeric = results.get("departure-numeric");
const closed = results.get("departure-closed-form");
if (numeric !== undefined && closed !== undefined) {
  process.stdout.write(
    JSON.stringify({
      ratio: "departure-numeric / departure-closed-form",
      value: numeric / closed,
    }) + "\n",
  );
}
void consumed();
