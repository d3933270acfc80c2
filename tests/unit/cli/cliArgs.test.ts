// The sub-commands read their arguments through node:util.parseArgs (cli/cliArgs.ts).
import { describe, expect, it } from "vitest";
import { parseCliArgs } from "../../../kernel-lib/src/cli/cliArgs.js";

const options = { out: { needs: "a folder" }, seed: { needs: "an integer" } };

describe("parseCliArgs", () => {
  it("takes --name value and --name=value, and positionals in any order", () => {
    expect(parseCliArgs(["a.ipynb", "--out", "recs", "--seed=7", "b.ipynb"], options)).toEqual({
      values: { out: "recs", seed: "7" },
      positionals: ["a.ipynb", "b.ipynb"],
    });
  });
  it("passes a value starting with a dash to the command's own range check", () => {
    expect(parseCliArgs(["--seed", "-3"], options)).toEqual({
      values: { seed: "-3" },
      positionals: [],
    });
  });
  it("ends the options at --", () => {
    expect(parseCliArgs(["--", "--out"], options)).toEqual({ values: {}, positionals: ["--out"] });
  });
  it("names an unknown option and an option without its value", () => {
    expect(parseCliArgs(["--fast", "a"], options)).toEqual({ error: 'unknown option "--fast"' });
    expect(parseCliArgs(["-x"], options)).toEqual({ error: 'unknown option "-x"' });
    expect(parseCliArgs(["a", "--out"], options)).toEqual({ error: "--out needs a folder" });
  });
  it("answers help for -h or --help anywhere", () => {
    expect(parseCliArgs(["a", "-h"], options)).toBe("help");
    expect(parseCliArgs(["--help", "--fast"], options)).toBe("help");
  });
});
