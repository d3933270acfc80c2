import { describe, expect, it } from "vitest";
import { mapWithProgress, startProgress } from "../../../kernel-lib/src/progress/progress.js";
import {
  formatDuration,
  progressHtml,
  progressLine,
} from "../../../kernel-lib/src/progress/formatProgress.js";
import { streamSink } from "../../../kernel-lib/src/progress/progressSinks.js";
import type { ProgressSnapshot } from "../../../kernel-lib/src/progress/progressTypes.js";
import { InputError } from "../../../kernel-lib/src/errors.js";

/** A fake display sink that records what it was shown, and a clock the test moves. */
function fakes() {
  const shown: ProgressSnapshot[] = [];
  let t = 1000;
  return {
    shown,
    sink: { show: (s: ProgressSnapshot) => shown.push(s) },
    now: () => t,
    advance: (ms: number) => {
      t += ms;
    },
  };
}

describe("startProgress", () => {
  it("throttles to at most 10 updates per second, plus the first and the final", () => {
    const f = fakes();
    const p = startProgress({ label: "grid", total: 1000, sink: f.sink, now: f.now });
    for (let i = 0; i < 1000; i++) {
      f.advance(2); // 2 ms per item: 2 s in all
      p.tick();
    }
    p.finish();
    const running = f.shown.filter((s) => s.status === "running");
    // 2 s at <= 10 updates/s: the first (t = 0) and at most one per 100 ms after it.
    expect(running.length).toBeLessThanOrEqual(21);
    expect(running.length).toBeGreaterThanOrEqual(19);
    for (let i = 1; i < running.length; i++) {
      expect(running[i].elapsedSeconds - running[i - 1].elapsedSeconds).toBeGreaterThanOrEqual(
        0.1 - 1e-12,
      );
    }
    expect(f.shown.at(-1)!.status).toBe("done");
  });

  it("computes count, rate and time left", () => {
    const f = fakes();
    const p = startProgress({
      total: 400,
      unit: "states",
      sink: f.sink,
      now: f.now,
      maxUpdatesPerSecond: 1000,
    });
    f.advance(2000);
    p.tick(100);
    const s = f.shown.at(-1)!;
    expect(s.done).toBe(100);
    expect(s.ratePerSecond).toBeCloseTo(50, 12); // 100 items in 2 s
    expect(s.remainingSeconds).toBeCloseTo(6, 12); // 300 items left at 50/s
    expect(progressLine(s)).toBe("Computing: 100 of 400 states (25.0 %), 50.0/s, 6.0 s left");
  });

  it("collapses to a one-line summary and ignores ticks after the end", () => {
    const f = fakes();
    const p = startProgress({
      label: "Corvid Point sweep",
      total: 40000,
      unit: "states",
      sink: f.sink,
      now: f.now,
    });
    f.advance(3200);
    p.set(40000);
    p.finish();
    p.tick();
    p.finish();
    const last = f.shown.at(-1)!;
    expect(f.shown.filter((s) => s.status === "done").length).toBe(1);
    expect(progressLine(last)).toBe("Corvid Point sweep: 40,000 states in 3.2 s (12,500/s)");
    expect(progressHtml(last)).not.toContain('<div style="height');
  });

  it("reports failures", async () => {
    const f = fakes();
    await expect(
      mapWithProgress(
        [1, 2, 3],
        (x) => {
          if (x === 2) throw new Error("no root at 2");
          return x;
        },
        { sink: f.sink, now: f.now },
      ),
    ).rejects.toThrow("no root at 2");
    const last = f.shown.at(-1)!;
    expect(last.status).toBe("failed");
    expect(progressLine(last)).toMatch(/failed after 1 items .*: no root at 2$/);
  });

  it("mapWithProgress keeps order and finishes", async () => {
    const f = fakes();
    const out = await mapWithProgress([1, 2, 3], async (x) => x * x, { sink: f.sink, now: f.now });
    expect(out).toEqual([1, 4, 9]);
    expect(f.shown.at(-1)!.done).toBe(3);
  });

  it("escapes the label in HTML", () => {
    const f = fakes();
    startProgress({ label: "<img src=x onerror=alert(1)>", total: 2, sink: f.sink, now: f.now });
    const html = progressHtml(f.shown[0]);
    expect(html).not.toContain("<img");
    expect(html).toContain("&lt;img src=x onerror=alert(1)&gt;");
  });

  it("refuses bad input", () => {
    expect(() => startProgress({ total: -1, sink: "none" })).toThrow(InputError);
    expect(() => startProgress({ maxUpdatesPerSecond: 0, sink: "none" })).toThrow(
      /maxUpdatesPerSecond/,
    );
    expect(() => startProgress({ sink: "bell" as never })).toThrow(/sink/);
    const p = startProgress({ sink: "none" });
    expect(() => p.tick(NaN)).toThrow(InputError);
  });
});

describe("stream sink (outside a kernel)", () => {
  it("writes only the summary line when stderr is not a terminal", () => {
    const written: string[] = [];
    const f = fakes();
    const p = startProgress({
      label: "isotherms",
      total: 3,
      sink: streamSink({ write: (t) => written.push(t) }),
      now: f.now,
    });
    p.tick();
    f.advance(500);
    p.tick(2);
    p.finish();
    expect(written).toEqual(["isotherms: 3 items in 0.5 s (6.00/s)\n"]);
  });

  it("rewrites one line in place on a terminal", () => {
    const written: string[] = [];
    const f = fakes();
    const p = startProgress({
      total: 2,
      sink: streamSink({ write: (t) => written.push(t), isTTY: true }),
      now: f.now,
    });
    f.advance(1000);
    p.tick(2);
    p.finish();
    expect(written[0].startsWith("\r")).toBe(true);
    expect(written.at(-1)!.endsWith("\n")).toBe(true);
    expect(written.slice(0, -1).every((w) => !w.includes("\n"))).toBe(true);
  });
});

describe("formatDuration", () => {
  it("formats seconds, minutes and hours", () => {
    expect(formatDuration(0.42)).toBe("0.4 s");
    expect(formatDuration(12.4)).toBe("12 s");
    expect(formatDuration(185)).toBe("3 min 05 s");
    expect(formatDuration(3725)).toBe("1 h 02 min");
    expect(formatDuration(NaN)).toBe("?");
  });
});

describe("tslab sink", () => {
  it("updates one display in place: every snapshot replaces the HTML of the same display", async () => {
    const { tslabSink } = await import("../../../kernel-lib/src/progress/progressSinks.js");
    const html: string[] = [];
    const f = fakes();
    const p = startProgress({
      label: "surface",
      total: 4,
      sink: tslabSink({ html: (s) => html.push(s) }),
      now: f.now,
    });
    f.advance(200);
    p.tick(2);
    f.advance(200);
    p.tick(2);
    p.finish();
    expect(html.length).toBe(4); // first, two throttled updates (>= 100 ms apart), summary
    expect(html[1]).toContain("width:50.0%");
    expect(html.at(-1)).toContain("surface: 4 items in 0.4 s (10.0/s)");
  });
});
