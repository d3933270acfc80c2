// The eval request's JSON Schema is the published format and the checker: it must agree with the
// engine's names, be a valid JSON Schema 2020-12 shipped with the package, and report one problem
// with the JSON path a person would look at.
import * as fs from "node:fs";
import * as path from "node:path";
import Ajv2020 from "ajv/dist/2020.js";
import { describe, expect, it } from "vitest";
import { MODEL_IDS } from "../../../kernel-lib/src/eos/createModel.js";
import { referenceFluidIds } from "../../../kernel-lib/src/eos/multiparameter/referenceFluids.js";
import { EVAL_REQUEST_SCHEMA, parseEvalRequest } from "../../../kernel-lib/src/cli/evalRequest.js";
import { RequestError } from "../../../kernel-lib/src/errors.js";

const root = path.resolve(__dirname, "../../..");
const schemaFile = path.join(root, "kernel-lib/src/cli/schema/eval-request.schema.json");
const schema = JSON.parse(fs.readFileSync(schemaFile, "utf8"));

function pathOf(request: unknown): string {
  try {
    parseEvalRequest(request);
  } catch (e) {
    if (e instanceof RequestError) return e.path;
    throw e;
  }
  return "accepted";
}

describe("the eval request schema", () => {
  it("is a valid JSON Schema 2020-12 (ajv checks it against the meta-schema)", () => {
    const ajv = new Ajv2020({ strict: false });
    expect(ajv.validateSchema(schema)).toBe(true);
  });

  it("is the schema the checker uses, and the build ships it in dist/cli/schema", () => {
    expect(EVAL_REQUEST_SCHEMA).toEqual(schema);
    const shipped = path.join(root, "kernel-lib/dist/cli/schema/eval-request.schema.json");
    if (fs.existsSync(path.join(root, "kernel-lib/dist/cli/evalRequest.js"))) {
      expect(JSON.parse(fs.readFileSync(shipped, "utf8"))).toEqual(schema);
    }
    const pkg = JSON.parse(fs.readFileSync(path.join(root, "kernel-lib/package.json"), "utf8"));
    expect(pkg.files).toContain("dist");
    // ajv runs when a request is checked, so it is a dependency of the package, not of the tests
    expect(pkg.dependencies.ajv).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it("lists exactly the engine's model ids plus reference", () => {
    expect([...schema.properties.model.enum].sort()).toEqual([...MODEL_IDS, "reference"].sort());
  });

  it("names every fluid with a reference equation where it refuses others", () => {
    const message: string = schema.then.properties.components["x-message"];
    const check: string = schema["x-checks"].find((c: string) => c.includes("reference"));
    for (const id of referenceFluidIds()) {
      expect(message).toContain(id);
      expect(check).toContain(id);
    }
  });

  it("reports an unknown field before the problems it explains", () => {
    // "Temp" instead of "T": the state also lacks T, but the misspelling is what to fix
    const request = { model: "peng-robinson", components: ["methane"], states: [{ Temp: 300 }] };
    expect(pathOf(request)).toBe("$.states[0].Temp");
  });

  it("refuses what the schema cannot state with the path of the field", () => {
    const base = {
      model: "peng-robinson",
      components: ["methane", "ethane"],
      states: [{ T: 300, P: 1e5 }],
    };
    expect(pathOf(base)).toBe("$.x"); // x required for a mixture
    expect(
      pathOf({
        ...base,
        x: [0.5, 0.5],
        kij: [
          [0, 0],
          [0, 0],
          [0, 0],
        ],
      }),
    ).toBe("$.kij");
    expect(pathOf({ ...base, x: [0.5, 0.5], constants: [null] })).toBe("$.constants");
    expect(pathOf({ ...base, x: [0.5, 0.5] })).toBe("accepted");
  });

  it("refuses non-finite numbers handed in from code (JSON cannot carry them)", () => {
    const request = {
      model: "peng-robinson",
      components: ["methane"],
      states: [{ T: NaN, P: 1e5 }],
    };
    expect(pathOf(request)).toBe("$.states[0].T");
  });
});
