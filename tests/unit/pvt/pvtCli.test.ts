import { describe, expect, it } from "vitest";
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { main } from "../../../kernel-lib/src/cli/main.js";
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";

function capture(cwd: string) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIo = {
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    readStdin: async () => "",
    cwd,
  };
  return { io, out, err };
}

const tmp = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-pvt-"));
function write(name: string, text: string): string {
  fs.writeFileSync(path.join(tmp, name), text);
  return name;
}

// A small well-formed campaign from the Peng-Robinson closed form (see pengRobinsonTruth.ts).
import { pressurePR } from "./pengRobinsonTruth.js";
function smallCsv(): string {
  const rows = ["T [K],rho [mol/m3],P [MPa]"];
  for (const d of [200, 400, 800, 1600, 3200])
    for (const t of [310, 325, 340, 355, 370])
      rows.push(`${t},${d},${(pressurePR(t, d) / 1e6).toFixed(9)}`);
  return rows.join("\n") + "\n";
}

describe("isochor pvt", () => {
  it("writes exactly the JSON shape of issue 6 item 8 on stdout and a summary on stderr", async () => {
    const { io, out, err } = capture(tmp);
    const code = await main(["pvt", write("small.csv", smallCsv()), "--samples", "20"], io);
    expect(code).toBe(0);
    const json = JSON.parse(out.join(""));
    expect(Object.keys(json).sort()).toEqual(["diagnostics", "isotherms", "virial"]);
    expect(json.isotherms).toHaveLength(5);
    const iso = json.isotherms[0];
    expect(Object.keys(iso).sort()).toEqual(["T", "points"]);
    const p = iso.points[0];
    expect(Object.keys(p).sort()).toEqual(["P", "residual", "rho", "uncertainty"]);
    expect(Object.keys(p.residual).sort()).toEqual(["a", "g", "h", "s", "u"]);
    expect(Object.keys(p.uncertainty).sort()).toEqual(["a", "g", "h", "s", "u"]);
    expect(Object.keys(json.virial).sort()).toEqual(["B", "uB"]);
    expect(json.virial.B).toHaveLength(5);
    expect(json.diagnostics[0].code).toBe("conventions");
    expect(err.join("")).toMatch(/route "isochores", 5 isotherm/);
    // progress: one summary line per stage on a non-terminal stderr, before the summary
    const text = err.join("");
    for (const stage of ["surface fit", "isochore fits", "Monte Carlo", "linearised"])
      expect(text).toContain(`isochor pvt: ${stage}`);
    expect(text).toMatch(/Monte Carlo[^\n]*20/);
  });

  it("reads a semicolon-separated file like the comma-separated one", async () => {
    const a = capture(tmp);
    const b = capture(tmp);
    await main(["pvt", write("comma.csv", smallCsv()), "--samples", "0"], a.io);
    const semi = smallCsv().replace(/,/g, ";");
    expect(await main(["pvt", write("semi.csv", semi), "--samples", "0"], b.io)).toBe(0);
    expect(JSON.parse(b.out.join(""))).toEqual(JSON.parse(a.out.join("")));
  });

  it.each([
    [
      "a non-numeric cell",
      "T [K],rho [mol/m3],P [Pa]\n300,100,2e5\n310,1x0,2e5\n",
      /bad\.csv:3:2 \(column "rho \[mol\/m3\]"\): expected a number; found "1x0"/,
    ],
    ["a missing column", "T [K],P [Pa]\n300,2e5\n", /bad\.csv:1: expected a density/],
    [
      "a negative value",
      "T [K],rho [mol/m3],P [Pa]\n300,100,-2e5\n",
      /bad\.csv:2:3 .*expected a value > 0/,
    ],
    [
      "a unit that does not parse",
      "T [K],rho [mol/m3],P [bananas]\n300,100,2e5\n",
      /bad\.csv:1:3 .*expected a pressure unit/,
    ],
    [
      "conflicting repeats",
      "T [K],rho [mol/m3],P [Pa]\n300,100,2e5\n300,100,3e5\n",
      /bad\.csv:3:3 .*line 2/,
    ],
  ])(
    "refuses %s with file, line and column, and writes nothing on stdout",
    async (_n, text, message) => {
      const { io, out, err } = capture(tmp);
      const code = await main(["pvt", write("bad.csv", text)], io);
      expect(code).toBe(1);
      expect(out.join("")).toBe("");
      expect(err.join("")).toMatch(message);
    },
  );

  it("refuses usage errors with exit code 2", async () => {
    for (const argv of [
      ["pvt"],
      ["pvt", "a.csv", "--seed", "x"],
      ["pvt", "a.csv", "--M", "44"],
      ["pvt", "a.csv", "--bogus"],
    ]) {
      const { io, out } = capture(tmp);
      expect(await main(argv, io)).toBe(2);
      expect(out.join("")).toBe("");
    }
  });

  it("refuses a missing file with exit code 1", async () => {
    const { io, err } = capture(tmp);
    expect(await main(["pvt", "no-such.csv"], io)).toBe(1);
    expect(err.join("")).toMatch(/readable CSV file/);
  });
});

describe("isochor pvt on data measured along isotherms (surface route)", () => {
  it("answers with the same JSON shape and says which route it took", async () => {
    const rows = ["T [degC],v [L/mol],P [bar],u(P) [bar]"];
    [320, 340, 360, 380].forEach((t, k) => {
      for (const d of [150, 400, 900, 1600, 2600, 3800]) {
        const rho = d * (1 + 0.02 * k);
        rows.push(
          `${(t - 273.15).toFixed(2)},${(1000 / rho).toFixed(9)},${(pressurePR(t, rho) / 1e5).toFixed(7)},0.002`,
        );
      }
    });
    const { io, out, err } = capture(tmp);
    expect(
      await main(["pvt", write("isotherms.csv", rows.join("\n") + "\n"), "--samples", "0"], io),
    ).toBe(0);
    const json = JSON.parse(out.join(""));
    expect(Object.keys(json).sort()).toEqual(["diagnostics", "isotherms", "virial"]);
    expect(json.isotherms).toHaveLength(4);
    expect(json.isotherms[0].points).toHaveLength(6);
    expect(json.diagnostics.some((d: { code: string }) => d.code === "route")).toBe(true);
    expect(err.join("")).toMatch(/route "surface"/);
  });

  it("refuses too few points with exit code 1 and nothing on stdout", async () => {
    const { io, out, err } = capture(tmp);
    expect(
      await main(
        ["pvt", write("few.csv", "T [K],rho [mol/m3],P [Pa]\n300,100,2.4e5\n310,100,2.5e5\n")],
        io,
      ),
    ).toBe(1);
    expect(out.join("")).toBe("");
    expect(err.join("")).toMatch(/at least 6 accepted points/);
  });
});

describe("isochor pvt on a single isotherm", () => {
  it("refuses: entropy and enthalpy need the isochoric slope, which one temperature cannot give", async () => {
    const rows = ["T [K],rho [mol/m3],P [Pa]"];
    for (const d of [100, 200, 400, 800, 1600, 3200, 5000])
      rows.push(`330,${d},${pressurePR(330, d)}`);
    const { io, out, err } = capture(tmp);
    expect(await main(["pvt", write("one.csv", rows.join("\n") + "\n")], io)).toBe(1);
    expect(out.join("")).toBe("");
    expect(err.join("")).toMatch(/at least 2 distinct temperatures/);
  });
});
