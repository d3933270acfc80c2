/**
 * The state API's public declarations compile under tslab's TypeScript 5.0 (the compiler that
 * compiles notebook cells): a consumer written as a notebook would write it, type-checked
 * against the built kernel-lib/dist .d.ts files of fluid/ of fluid/ with @tslab/typescript-for-tslab. Needs
 * `npm run build` first (npm test builds before vitest).
 */
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { createRequire } from "node:module";
import { describe, expect, it } from "vitest";

const root = path.resolve(__dirname, "../../..");
const dist = path.join(root, "kernel-lib/dist/fluid/phaseState.d.ts");
const require = createRequire(__filename);

const consumer = `
import { defineFluid, referenceFluid, type PhaseState, type StatePhase, type StateRequest } from "isochor";
const gas = defineFluid({ components: ["methane", "propane"], model: "peng-robinson" });
const request: StateRequest = { P: 10e5, h: -80000, x: [0.9, 0.1] };
const st: PhaseState = gas.state(request);
const cp: number | undefined = st.molar.cp;
const first: StatePhase = st.phases[0];
const kind: "vapor" | "liquid" | "liquid-2" = first.kind;
const gap: number | undefined = st.check?.maxLnFugacityDifference;
const water = defineFluid({ components: ["water"], model: referenceFluid("water") });
const wet = water.state({ T: 450, vaporFraction: 0.3 });
export const out = [cp, kind, gap, wet.phases[1].h, st.specifiedBy[0]];
`;

describe("the state API's .d.ts under TypeScript 5.0", () => {
  it.runIf(fs.existsSync(dist))(
    "a notebook-style consumer type-checks with tslab's compiler",
    () => {
      const ts = require(
        path.join(root, "node_modules/@tslab/typescript-for-tslab"),
      ) as typeof import("typescript");
      expect(ts.version.startsWith("5.0")).toBe(true);
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-ts50-"));
      const file = path.join(dir, "consumer.ts");
      fs.writeFileSync(file, consumer);
      const program = ts.createProgram([file], {
        strict: true,
        noEmit: true,
        module: ts.ModuleKind.CommonJS,
        moduleResolution: ts.ModuleResolutionKind.NodeJs,
        target: ts.ScriptTarget.ES2022,
        // fluid/ (the state API and all it imports), without Node's types or the chart specs
        types: [],
        lib: ["lib.es2022.d.ts"],
        baseUrl: dir,
        paths: { isochor: [path.join(root, "kernel-lib/dist/fluid/index.d.ts")] },
      });
      const problems = ts
        .getPreEmitDiagnostics(program)
        .map((d) => ts.flattenDiagnosticMessageText(d.messageText, "\n"));
      fs.rmSync(dir, { recursive: true, force: true });
      expect(problems).toEqual([]);
    },
  );
});
