import { describe, expect, it } from "vitest";
import { stagedProgress } from "../../../kernel-lib/src/progress/stagedProgress.js";
import type { ProgressSnapshot } from "../../../kernel-lib/src/progress/progressTypes.js";

describe("stagedProgress", () => {
  it("shows one display per stage, finishing each when the next starts", () => {
    const shown: ProgressSnapshot[] = [];
    let t = 0;
    const p = stagedProgress({
      label: "route",
      sink: { show: (s) => void shown.push(s) },
      now: () => t,
    });
    for (let i = 1; i <= 3; i++) {
      t += 10;
      p.onProgress({ stage: "fits", done: i, total: 3, unit: "isochores" });
    }
    for (let i = 1; i <= 2; i++) {
      t += 10;
      p.onProgress({ stage: "Monte Carlo", done: i, total: 2, unit: "samples" });
    }
    p.finish();
    const ends = shown.filter((s) => s.status === "done");
    expect(ends.map((s) => s.label)).toEqual(["route: fits", "route: Monte Carlo"]);
    expect(ends.map((s) => [s.done, s.total, s.unit])).toEqual([
      [3, 3, "isochores"],
      [2, 2, "samples"],
    ]);
  });

  it("marks the running stage failed", () => {
    const shown: ProgressSnapshot[] = [];
    const p = stagedProgress({ sink: { show: (s) => void shown.push(s) }, now: () => 0 });
    p.onProgress({ stage: "fits", done: 1, total: 4, unit: "isochores" });
    p.fail(new Error("rank-deficient"));
    expect(shown.at(-1)?.status).toBe("failed");
    expect(shown.at(-1)?.failure).toBe("rank-deficient");
  });
});
