// A notebook saved with tslab's JavaScript kernel ("jslab") runs as JavaScript: plain JavaScript
// runs, and a TypeScript type annotation is refused the way the jslab kernel refuses it.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { expect, it } from "vitest";
import { runNotebooks } from "../../../kernel-lib/src/records/runNotebooks.js";
import { RunnerError } from "../../../kernel-lib/src/records/runnerError.js";

it("runs a jslab notebook as JavaScript", async () => {
  const outDir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-js-"));
  try {
    const failure = await runNotebooks([path.join(__dirname, "fixtures", "javascript.ipynb")], {
      outDir,
    }).then(
      () => undefined,
      (error: unknown) => error,
    );
    expect(failure).toBeInstanceOf(RunnerError);
    const error = failure as RunnerError;
    // Cell 1 (plain JavaScript) ran; cell 2 failed on the annotation, which only a JS session refuses.
    expect(error.cellNumber).toBe(2);
    expect(error.detail).toMatch(/can only be used in TypeScript files/);
  } finally {
    fs.rmSync(outDir, { recursive: true, force: true });
  }
}, 60_000);
