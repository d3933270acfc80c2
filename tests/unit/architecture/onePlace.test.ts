/**
 * The "one place" rule (DEVELOPERS.md): each building block of the engine is written once, in the
 * module that owns it, and every caller uses it. A cheap textual check over kernel-lib/src: the
 * formulas below may appear only in their owner (and in the listed exceptions, each with its
 * reason). Comments are stripped first, so a header may still state a formula.
 */
import * as fs from "node:fs";
import * as path from "node:path";
import { describe, expect, it } from "vitest";

const SRC = path.resolve(__dirname, "../../../kernel-lib/src");

interface Block {
  readonly name: string;
  /** Where it lives (relative to src). */
  readonly owner: string;
  readonly pattern: RegExp;
  /** Other files allowed to match, with the reason. */
  readonly exceptions?: readonly { file: string; reason: string }[];
}

// pvt/ is split and its formulas fixed on another branch; until that lands its copies are listed
const PVT_SPLIT = "pvt/ is being split on its own branch, which moves these lines onto the helpers";

const BLOCKS: readonly Block[] = [
  {
    name: "pressure P = rho R T (1 + aD)",
    owner: "eos/residualRelations.ts",
    pattern: /\*\s*\(1 \+ [\w.]*\baD\)/,
    exceptions: [
      { file: "pvt/departuresFromPvt.ts", reason: PVT_SPLIT },
      { file: "pvt/compareWithModel.ts", reason: PVT_SPLIT },
    ],
  },
  {
    name: "(dP/drho)_T: 1 + 2 aD + aDD",
    owner: "eos/residualRelations.ts",
    pattern: /1 \+ 2 \* [\w.]*\baD \+ [\w.]*\baDD\b/,
    exceptions: [{ file: "pvt/departuresFromPvt.ts", reason: PVT_SPLIT }],
  },
  {
    name: "g/RT at given density: ln(rho) + a + aD",
    owner: "eos/residualRelations.ts",
    pattern: /Math\.log\([\w.]+\) \+ [\w.]*\.a \+ [\w.]*\.aD\b/,
  },
  {
    name: "(dP/dT) at constant density: rho R (1 + aD + aDT)",
    owner: "eos/residualRelations.ts",
    pattern: /1 \+ [\w.]*\baD \+ [\w.]*\baDT\b/,
    exceptions: [{ file: "pvt/departuresFromPvt.ts", reason: PVT_SPLIT }],
  },
  {
    name: "ln phi_i = dnA_i - ln Z",
    owner: "state/properties.ts",
    pattern: /dnA\[\w+\] - lnZ\b/,
  },
  {
    name: "Wilson's 5.373 (1 + omega)(1 - Tc/T)",
    owner: "phase/wilson.ts",
    pattern: /5\.373/,
  },
  {
    name: "Tsonopoulos coefficients",
    owner: "eos/virial/tsonopoulos.ts",
    pattern: /0\.1445|0\.0637|0\.000607|0\.1385/,
  },
  {
    name: "choice between density roots by g_r/RT",
    owner: "state/rootChoice.ts",
    // calls, not the definition (eos/residualRelations.ts)
    pattern: /(?<!function )residualGibbsTP\(/,
    exceptions: [
      {
        file: "state/stateAt.ts",
        reason: "densityRootsAtTP reports g_r/RT of every root (a listing, not a choice)",
      },
      {
        file: "state/fugacity.ts",
        reason: "phaseFugacityAtTP reports g_r/RT of the root rootChoice.ts chose",
      },
      {
        file: "sweep/leanRows.ts",
        reason:
          "the cubic row kernel runs chooseDensityRootInto's steps inline (no boxed numbers per point); tests/unit/sweep/sweepKernel.test.ts holds its choice equal to stateAtTP's",
      },
    ],
  },
  {
    name: "a zero-filled residual derivatives record (one shape for every draft)",
    owner: "eos/residualDraft.ts",
    pattern: /aDDD: 0,\s*aDDT: 0\b/,
  },
  {
    name: "closed-form roots or the scan",
    owner: "state/findDensityRoots.ts",
    pattern: /model\.densityRoots\s*\?/,
  },
  {
    name: "Neufeld et al. (1972) collision integral 1.16145 T*^-0.14874 (Chung's viscosity)",
    owner: "transport/chung.ts",
    pattern: /1\.16145/,
  },
  {
    name: "IAPWS 2011 critical enhancement of conductivity, Lambda = 177.8514",
    owner: "transport/iapwsWater.ts",
    pattern: /177\.8514/,
  },
];

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(full);
    return e.name.endsWith(".ts") ? [full] : [];
  });
}

/** The code of a file without its comments (block and line comments; strings are kept). */
function code(text: string): string {
  return text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/^\s*\/\/.*$/gm, "");
}

const files = sourceFiles(SRC).map((f) => ({
  relative: path.relative(SRC, f).split(path.sep).join("/"),
  code: code(fs.readFileSync(f, "utf8")),
}));

/** Files other than the owner and the exceptions where the block's pattern appears. */
function copiesOf(block: Block, sources = files): string[] {
  const allowed = new Set([block.owner, ...(block.exceptions ?? []).map((e) => e.file)]);
  return sources
    .filter((f) => !allowed.has(f.relative) && block.pattern.test(f.code))
    .map((f) => f.relative);
}

describe("one place for each building block of kernel-lib/src", () => {
  for (const block of BLOCKS) {
    it(`${block.name}: only in ${block.owner}`, () => {
      const owner = files.find((f) => f.relative === block.owner);
      expect(owner, `${block.owner} exists`).toBeDefined();
      expect(block.pattern.test(owner!.code), `the owner holds the formula`).toBe(true);
      expect(copiesOf(block)).toEqual([]);
    });
  }

  it("a second copy would be caught", () => {
    const pressure = BLOCKS[0];
    const copy = { relative: "phase/newStep.ts", code: "const p = rho * R * T * (1 + d.aD);" };
    expect(copiesOf(pressure, [...files, copy])).toEqual(["phase/newStep.ts"]);
    const wilson = BLOCKS.find((b) => b.owner === "phase/wilson.ts")!;
    const flash = { relative: "phase/flash.ts", code: "K = Math.exp(5.373 * (1 + w));" };
    expect(copiesOf(wilson, [...files, flash])).toEqual(["phase/flash.ts"]);
  });

  it("comments may state a formula", () => {
    expect(code("/** P = rho R T * (1 + aD) */\n// 5.373\nconst a = 1;")).not.toMatch(/5\.373|aD/);
  });
});
