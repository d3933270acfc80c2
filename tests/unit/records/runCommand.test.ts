import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";
import { runCommand } from "../../../kernel-lib/src/cli/run.js";

const fixtures = path.join(__dirname, "fixtures");

function captureIo(cwd: string): CliIo & { out: string[]; err: string[] } {
  const out: string[] = [];
  const err: string[] = [];
  return {
    out,
    err,
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    readStdin: () => Promise.resolve(""),
    cwd,
  };
}

describe("isochor run (runCommand)", () => {
  let work: string;
  beforeAll(() => {
    work = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-cli-"));
  });
  afterAll(() => fs.rmSync(work, { recursive: true, force: true }));

  it("a cell that throws: exit 1, names notebook, cell and error; removes an earlier record; no partial files", async () => {
    const outDir = path.join(work, "out", "records");
    fs.mkdirSync(outDir, { recursive: true });
    // A record left by an earlier, successful run of the same notebook must not survive.
    fs.writeFileSync(path.join(outDir, "throws.html"), "<!doctype html><p>old</p>");
    const io = captureIo(work);
    const code = await runCommand([path.join(fixtures, "throws.ipynb")], io);
    expect(code).toBe(1);
    const stderr = io.err.join("");
    expect(stderr).toContain(
      `${path.join(fixtures, "throws.ipynb")}: cell 3 of 4 failed: Error: boiler feed pressure missing`,
    );
    expect(stderr).toContain('cell begins: console.log("before the failure");');
    expect(stderr).toContain("No record written for");
    expect(io.out.join("")).toMatch(/cell 3 \(code 2\/3\) FAILED/);
    expect(fs.readdirSync(outDir)).toEqual([]);
  }, 60_000);

  it("a missing file and a non-notebook: exit 1 with a clear message, nothing written", async () => {
    const io = captureIo(work);
    expect(await runCommand(["--out", "recs", "absent.ipynb"], io)).toBe(1);
    expect(io.err.join("")).toBe("isochor run: absent.ipynb: no such file\nNo notebook was run.\n");
    const io2 = captureIo(fixtures);
    expect(await runCommand(["--out", path.join(work, "recs"), "not-json.ipynb"], io2)).toBe(1);
    expect(io2.err.join("")).toMatch(
      /^isochor run: not-json\.ipynb: not a notebook: the file is not valid JSON/,
    );
    expect(fs.existsSync(path.join(work, "recs"))).toBe(false);
  });

  it("usage errors exit 2; --help exits 0", async () => {
    const none = captureIo(work);
    expect(await runCommand([], none)).toBe(2);
    expect(none.err.join("")).toMatch(/no notebook given/);
    const unknown = captureIo(work);
    expect(await runCommand(["--fast", "a.ipynb"], unknown)).toBe(2);
    expect(unknown.err.join("")).toMatch(/unknown option "--fast"/);
    const noDir = captureIo(work);
    expect(await runCommand(["a.ipynb", "--out"], noDir)).toBe(2);
    expect(noDir.err.join("")).toMatch(/--out needs a folder/);
    const badTimeout = captureIo(work);
    expect(await runCommand(["--cell-timeout", "-3", "a.ipynb"], badTimeout)).toBe(2);
    expect(badTimeout.err.join("")).toMatch(
      /--cell-timeout needs a number of seconds > 0; received "-3"/,
    );
    const help = captureIo(work);
    expect(await runCommand(["--help"], help)).toBe(0);
    expect(help.out.join("")).toMatch(/^usage: isochor run \[--out <dir>\] <notebook.ipynb...>/);
  });
});
