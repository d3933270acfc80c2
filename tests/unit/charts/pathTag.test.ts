/* eslint-disable @typescript-eslint/no-explicit-any -- the tests read into plain JSON specs */
import { describe, expect, it } from "vitest";
import { pathTag } from "../../../kernel-lib/src/charts/pathTag.js";
import { processPathChart } from "../../../kernel-lib/src/charts/processPath.js";

/** The texts beside the states of a process-path chart (its text layer). */
function tags(spec: Record<string, unknown>): string[] {
  const layer = (spec.layer as any[]).find((l) => l.mark?.type === "text");
  return layer.data.values.map((r: any) => r.tag);
}

const state = (h: number, P: number, label?: string) => ({
  enthalpyJPerMol: h,
  pressurePa: P,
  ...(label === undefined ? {} : { label }),
});

describe("numbers beside the states of a path", () => {
  it("numbers labelled and unlabelled states of a path in order", () => {
    expect(pathTag("suction", 0, 3)).toBe("1 suction");
    expect(pathTag(undefined, 1, 3)).toBe("2");
  });

  it("does not number a label twice when it carries its own number", () => {
    expect(pathTag("1 suction", 0, 3)).toBe("1 suction");
    expect(pathTag("(2) valve outlet", 1, 3)).toBe("(2) valve outlet");
    expect(pathTag("3: after cooler", 2, 3)).toBe("3: after cooler");
    expect(pathTag("2a. interstage", 1, 3)).toBe("2a. interstage");
    // a label that only starts with a digit inside a word is not a number of its own
    expect(pathTag("1st stage suction", 0, 3)).toBe("1 1st stage suction");
  });

  it("gives a lone state no number", () => {
    expect(pathTag("state point", 0, 1)).toBe("state point");
    expect(pathTag(undefined, 0, 1)).toBe("");
  });

  it("reads '1 suction', not '1 1 suction', on the chart", () => {
    const spec = processPathChart(
      [state(10000, 1e5, "1 suction"), state(14000, 4e5, "2 discharge"), state(9000, 4e5)],
      { diagram: "pressure-enthalpy" },
    );
    expect(tags(spec)).toEqual(["1 suction", "2 discharge", "3"]);
    const one = processPathChart([state(10000, 1e5, "state point")], {
      diagram: "pressure-enthalpy",
    });
    expect(tags(one)).toEqual(["state point"]);
  });
});
