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

  it("a cell that throws: exit 1, names notebook, cell and error; writes the run up to it marked FAILED", async () => {
    const outDir = path.join(work, "out", "records");
    fs.mkdirSync(outDir, { recursive: true });
    // Records left by an earlier, successful run of the same notebook must not survive as such.
    fs.writeFileSync(path.join(outDir, "throws.html"), "<!doctype html><p>old</p>");
    fs.writeFileSync(path.join(outDir, "throws.record.html"), "<!doctype html><p>old</p>");
    fs.writeFileSync(path.join(outDir, "throws.record.md"), "# old");
    const io = captureIo(work);
    const code = await runCommand([path.join(fixtures, "throws.ipynb")], io);
    expect(code).toBe(1);
    const stderr = io.err.join("");
    expect(stderr).toContain(
      `${path.join(fixtures, "throws.ipynb")}: cell 3 of 4 failed: Error: boiler feed pressure missing`,
    );
    expect(stderr).toContain('cell begins: console.log("before the failure");');
    expect(stderr).toContain(
      "Written up to the failing cell and marked FAILED: out/records/throws.html, out/records/throws.ipynb",
    );
    expect(stderr).toContain("No calculation record written for");
    expect(io.out.join("")).toMatch(/cell 3 \(code 2\/3\) FAILED/);
    // the run record and the executed notebook, nothing else (no temp file, no calculation record)
    expect(fs.readdirSync(outDir).sort()).toEqual(["throws.html", "throws.ipynb"]);

    const html = fs.readFileSync(path.join(outDir, "throws.html"), "utf8");
    // title, heading, banner and footer all say it failed, and where
    expect(html).toContain(
      "<title>FAILED at cell 3: Fixture: a cell throws - calculation record</title>",
    );
    expect(html).toContain(
      '<h1 class="record-title">FAILED at cell 3: Fixture: a cell throws</h1>',
    );
    expect(html).toMatch(
      /<div class="failed-banner" role="alert"><b>Failed at cell 3 of 4<\/b>: Error: boiler feed pressure missing\./,
    );
    expect(html).toContain("cell 4 was not run");
    expect(html).toContain("This run FAILED at cell 3; the record is incomplete.");
    expect(html).not.toContain("ran to completion");
    // up to and including the failing cell, with its output and error; nothing after it
    expect(html).toContain('<section class="cell code-cell failed-cell" id="cell-3">');
    expect(html).toContain("before the failure");
    expect(html).not.toContain("never reached");
    expect(html).not.toContain('id="cell-4"');

    const executed = JSON.parse(fs.readFileSync(path.join(outDir, "throws.ipynb"), "utf8"));
    expect(executed.cells).toHaveLength(3);
    expect(
      executed.cells[2].outputs.some((o: { output_type: string }) => o.output_type === "error"),
    ).toBe(true);
    expect(executed.metadata.isochor.run.failed).toMatchObject({ cellNumber: 3, cellCount: 4 });
    expect(executed.metadata.isochor.run.failed.error).toMatch(
      /^Error: boiler feed pressure missing/,
    );
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
