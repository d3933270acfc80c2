// `npx isochor ...` right after `npm ci`: the bin is a committed launcher, and every command's
// --help states its units and shows an example.
import { spawnSync } from "node:child_process";
import * as fs from "node:fs";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { main } from "../../../kernel-lib/src/cli/main.js";
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";

const root = path.resolve(__dirname, "../../..");

async function help(argv: string[]): Promise<{ code: number; out: string }> {
  let out = "";
  const io: CliIo = {
    stdout: (t) => void (out += t),
    stderr: (t) => void (out += t),
    readStdin: () => Promise.resolve(""),
    cwd: root,
  };
  const code = await main(argv, io);
  return { code, out };
}

describe("isochor --help", () => {
  for (const command of [[], ["eval"], ["pvt"], ["run"], ["table"], ["step"]]) {
    it(`${["isochor", ...command].join(" ")} --help states the units and shows an example`, async () => {
      const { code, out } = await help([...command, "--help"]);
      expect(code).toBe(0);
      expect(out).toMatch(/^units/im);
      expect(out).toMatch(/^examples?/im);
      expect(out).toMatch(/npx isochor/);
    });
  }
});

describe("the isochor bin", () => {
  const pkg = JSON.parse(fs.readFileSync(path.join(root, "kernel-lib/package.json"), "utf8"));
  const bin = path.join(root, "kernel-lib", pkg.bin.isochor);

  it("is a committed launcher (npm links it before anything is built), shipped with the package", () => {
    expect(pkg.bin.isochor).toBe("bin/isochor.js");
    expect(pkg.files).toContain("bin");
    expect(fs.readFileSync(bin, "utf8").startsWith("#!/usr/bin/env node\n")).toBe(true);
    expect(fs.statSync(bin).mode & 0o111).not.toBe(0);
  });

  it.runIf(fs.existsSync(path.join(root, "kernel-lib/dist/cli/main.js")))(
    "runs the compiled command line with the process's arguments and exit code",
    () => {
      const ok = spawnSync(process.execPath, [bin, "--help"], { encoding: "utf8" });
      expect(ok.status).toBe(0);
      expect(ok.stdout).toMatch(/^usage: isochor <command>/);
      const bad = spawnSync(process.execPath, [bin, "no-such-command"], { encoding: "utf8" });
      expect(bad.status).toBe(2);
      expect(bad.stderr).toMatch(/unknown command "no-such-command"/);
    },
  );
});
