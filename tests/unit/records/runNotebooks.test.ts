import { execFileSync } from "node:child_process";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runNotebooks } from "../../../kernel-lib/src/records/runNotebooks.js";
import type { NotebookRecord } from "../../../kernel-lib/src/records/runNotebooks.js";
import { RunnerError } from "../../../kernel-lib/src/records/runnerError.js";
import { nbformat4Problems } from "./nbformat4.js";
import { requiredUnderCI } from "../requiredUnderCI.js";

const fixtures = path.join(__dirname, "fixtures");
const fixture = (name: string): string => path.join(fixtures, name);

/** True when Debian's Python nbformat (the reference validator) is installed. */
function pythonNbformat(): boolean {
  try {
    execFileSync("/usr/bin/python3", ["-c", "import nbformat"], { stdio: "ignore" });
    return true;
  } catch {
    return false;
  }
}

describe("runNotebooks on a good notebook (one run shared by the tests below)", () => {
  let outDir: string;
  let records: NotebookRecord[];
  let executed: Record<string, unknown> & { cells: Array<Record<string, unknown>> };
  let html: string;
  const progress: string[] = [];

  beforeAll(async () => {
    outDir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-records-"));
    records = await runNotebooks([fixture("good.ipynb")], {
      outDir,
      onProgress: (e) =>
        progress.push(e.kind === "cell-done" ? `cell-done ${e.cellNumber}` : e.kind),
    });
    executed = JSON.parse(fs.readFileSync(path.join(outDir, "good.ipynb"), "utf8"));
    html = fs.readFileSync(path.join(outDir, "good.html"), "utf8");
  }, 60_000);

  afterAll(() => fs.rmSync(outDir, { recursive: true, force: true }));

  it("writes exactly the executed notebook and the record, no temporary files", () => {
    expect(fs.readdirSync(outDir).sort()).toEqual(["good.html", "good.ipynb"]);
    expect(records).toHaveLength(1);
    expect(records[0]).toMatchObject({ title: "Fixture: good notebook", codeCells: 6 });
    expect(records[0].recordPath).toBe(path.join(outDir, "good.html"));
  });

  it("reports progress per cell, in order", () => {
    expect(progress).toEqual([
      "notebook-start",
      "session-ready",
      "cell-start",
      "cell-done 2",
      "cell-start",
      "cell-done 3",
      "cell-start",
      "cell-done 4",
      "cell-start",
      "cell-done 6",
      "cell-start",
      "cell-done 8",
      "notebook-done",
    ]);
  });

  it("produces a structurally valid nbformat 4.5 notebook", () => {
    expect(nbformat4Problems(executed)).toEqual([]);
    expect(executed.nbformat_minor).toBe(5);
  });

  requiredUnderCI(pythonNbformat(), "Python nbformat (/usr/bin/python3 -c 'import nbformat')");
  it.skipIf(!pythonNbformat())("passes the reference validator (Python nbformat.validate)", () => {
    const script =
      "import sys, nbformat; nbformat.validate(nbformat.read(sys.argv[1], as_version=4)); print('valid')";
    const out = execFileSync("/usr/bin/python3", ["-c", script, path.join(outDir, "good.ipynb")], {
      encoding: "utf8",
    });
    expect(out.trim()).toBe("valid");
  });

  it("captures stdout, display_data, stderr, updated displays and last values with execution counts", () => {
    const cells = executed.cells;
    expect(cells.map((c) => c.execution_count ?? null)).toEqual([null, 1, 2, 3, null, 4, null, 5]);
    expect(cells[1].outputs).toEqual([
      { output_type: "stream", name: "stdout", text: "sum of pressures/Pa 300000\n" },
    ]);
    expect(cells[2].outputs).toEqual([
      {
        output_type: "display_data",
        data: { "text/html": '<p class="fixture-html">shown as html</p>' },
        metadata: {},
      },
      { output_type: "stream", name: "stderr", text: "a warning on stderr\n" },
      // process.stderr.write(...) returns true: the cell's last value, as in the tslab kernel.
      {
        output_type: "execute_result",
        execution_count: 2,
        data: { "text/plain": "true" },
        metadata: {},
      },
    ]);
    // newDisplay(): the second call updates the first output in place.
    expect(cells[3].outputs).toEqual([
      { output_type: "display_data", data: { "text/plain": "step 2 of 2" }, metadata: {} },
    ]);
    expect(cells[5].outputs).toEqual([
      {
        output_type: "execute_result",
        execution_count: 4,
        data: { "text/plain": "42" },
        metadata: {},
      },
    ]);
    expect(cells[6].outputs).toEqual([]);
    expect(cells[7].outputs).toEqual([
      {
        output_type: "execute_result",
        execution_count: 5,
        data: { "text/plain": "async done" },
        metadata: {},
      },
    ]);
  });

  it("keeps the notebook's metadata and adds the run's provenance", () => {
    const metadata = executed.metadata as Record<string, Record<string, Record<string, unknown>>>;
    expect(metadata.kernelspec.name).toBe("tslab");
    expect(metadata.isochor.run.tslab).toBe("1.0.22");
    expect(metadata.isochor.run.node).toBe(process.version);
  });

  it("writes a record with title, versions, commit, every source and output, markdown rendered safely", () => {
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).toContain('<h1 class="record-title">Fixture: good notebook</h1>');
    expect(html).toContain("<h1>Fixture: <em>good</em> notebook</h1>");
    expect(html).toContain("Raw &lt;b&gt;HTML&lt;/b&gt; stays text.");
    expect(html).toContain(`Node ${process.version}`);
    expect(html).toContain("tslab 1.0.22");
    // Other commits may land while the suite runs: check the recorded commit exists in this
    // checkout's history (git cat-file), rather than comparing with HEAD now.
    const metadata = executed.metadata as { isochor: { run: { gitCommit: string } } };
    const commit = metadata.isochor.run.gitCommit;
    let insideGit = true;
    try {
      execFileSync("git", ["rev-parse", "--git-dir"], { cwd: fixtures, stdio: "ignore" });
    } catch {
      insideGit = false;
    }
    if (insideGit) {
      expect(commit).toMatch(/^[0-9a-f]{40}$/);
      expect(() =>
        execFileSync("git", ["cat-file", "-e", `${commit}^{commit}`], { cwd: fixtures }),
      ).not.toThrow();
      expect(html).toContain(`commit <code>${commit.slice(0, 12)}</code>`);
    } else {
      expect(commit).toBe("unknown");
      expect(html).toContain("unknown (not a git checkout)");
    }
    expect(html).toContain(
      "console.log(&quot;sum of pressures/Pa&quot;, pressuresPa.reduce((a, b) =&gt; a + b, 0));",
    );
    expect(html).toContain("sum of pressures/Pa 300000");
    expect(html).toContain('<p class="fixture-html">shown as html</p>');
    expect(html).toContain('<pre class="stream stderr">a warning on stderr\n</pre>');
    expect(html).toContain("step 2 of 2");
    expect(html).not.toContain("step 1 of 2</pre>");
    expect(html).toContain("All 6 code cells ran to completion");
    // The page forbids itself any load from outside (Content Security Policy).
    expect(html).toContain(
      `<meta http-equiv="Content-Security-Policy" content="default-src 'none';`,
    );
    // No chart in this notebook: no runtime, and nothing that could load from the network.
    expect(html).not.toContain("data-isochor-once");
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//);
  });
});

describe("runNotebooks refuses bad input before running anything", () => {
  let outDir: string;
  beforeAll(() => {
    outDir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), "isochor-bad-")), "records");
  });
  afterAll(() => fs.rmSync(path.dirname(outDir), { recursive: true, force: true }));

  async function failure(paths: string[]): Promise<RunnerError> {
    try {
      await runNotebooks(paths, { outDir });
    } catch (error) {
      expect(error).toBeInstanceOf(RunnerError);
      return error as RunnerError;
    }
    throw new Error("runNotebooks did not fail");
  }

  it("a missing file: names it, and writes nothing (not even the folder)", async () => {
    const error = await failure([fixture("good.ipynb"), fixture("no-such.ipynb")]);
    expect(error.notebook).toBe(fixture("no-such.ipynb"));
    expect(error.cellNumber).toBeUndefined();
    expect(error.message).toBe(`${fixture("no-such.ipynb")}: no such file`);
    expect(fs.existsSync(outDir)).toBe(false);
  });

  it("a file that is not JSON, an old nbformat, a folder", async () => {
    expect((await failure([fixture("not-json.ipynb")])).message).toMatch(
      /not-json\.ipynb: not a notebook: the file is not valid JSON/,
    );
    expect((await failure([fixture("old-format.ipynb")])).message).toMatch(
      /not an nbformat 4 notebook \(nbformat is 3\)/,
    );
    expect((await failure([fixtures])).message).toMatch(/is a directory, not a notebook file/);
    expect(fs.existsSync(outDir)).toBe(false);
  });

  it("two notebooks whose records would share a name", async () => {
    const other = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-dup-"));
    fs.copyFileSync(fixture("good.ipynb"), path.join(other, "good.ipynb"));
    try {
      const error = await failure([fixture("good.ipynb"), path.join(other, "good.ipynb")]);
      expect(error.message).toMatch(/same file name as .*good\.ipynb/);
    } finally {
      fs.rmSync(other, { recursive: true, force: true });
    }
  });

  it("no paths at all", async () => {
    await expect(runNotebooks([], { outDir })).rejects.toThrow(
      /paths must be one or more notebook paths/,
    );
  });
});
