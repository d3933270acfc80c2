// Failures that happen while a cell runs rather than as a thrown error: a cell that never finishes
// (interrupted after cellTimeoutMs) and an exception thrown later from a timer the cell started.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runNotebooks } from "../../../kernel-lib/src/records/runNotebooks.js";
import { RunnerError } from "../../../kernel-lib/src/records/runnerError.js";

const fixture = (name: string): string => path.join(__dirname, "fixtures", name);

describe("cells that fail while running", () => {
  let outDir: string;
  beforeAll(() => {
    outDir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-cellfail-"));
  });
  afterAll(() => fs.rmSync(outDir, { recursive: true, force: true }));

  async function failure(name: string, cellTimeoutMs?: number): Promise<RunnerError> {
    try {
      await runNotebooks([fixture(name)], { outDir, cellTimeoutMs });
    } catch (error) {
      expect(error).toBeInstanceOf(RunnerError);
      return error as RunnerError;
    }
    throw new Error(`${name} did not fail`);
  }

  it("a cell that never settles is interrupted after cellTimeoutMs", async () => {
    const error = await failure("hangs.ipynb", 1500);
    expect(error.cellNumber).toBe(1);
    expect(error.detail).toMatch(/^Error: the cell ran longer than 1500 ms and was interrupted/);
    expect(error.failedRecordPath).toBe(path.join(outDir, "hangs.html"));
    expect(fs.readFileSync(error.failedRecordPath!, "utf8")).toContain("FAILED at cell 1");
    expect(fs.readdirSync(outDir).sort()).toEqual(["hangs.html", "hangs.ipynb"]);
  }, 60_000);

  it("an exception thrown later by a timer fails the cell that started it", async () => {
    const error = await failure("uncaught.ipynb");
    expect(error.cellNumber).toBe(1);
    expect(error.detail).toMatch(/^Error: late failure in a timer/);
    expect(error.failedNotebookPath).toBe(path.join(outDir, "uncaught.ipynb"));
    expect(
      fs
        .readdirSync(outDir)
        .filter((f) => f.startsWith("uncaught"))
        .sort(),
    ).toEqual(["uncaught.html", "uncaught.ipynb"]);
  }, 60_000);

  it("refuses a cellTimeoutMs that is not positive", async () => {
    await expect(
      runNotebooks([fixture("hangs.ipynb")], { outDir, cellTimeoutMs: Number.NaN }),
    ).rejects.toThrow(/options\.cellTimeoutMs must be > 0 \(unit: ms\); received NaN/);
  });
});
