// `isochor table`: a CSV of states with units in its headers in, a CSV of properties out, the
// same numbers as the library's states (units converted as the units module does).
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { describe, expect, it } from "vitest";
import { csvParse } from "d3-dsv";
import { tableCommand } from "../../../kernel-lib/src/cli/table.js";
import type { CliIo } from "../../../kernel-lib/src/cli/io.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";

function run(argv: string[], files: Record<string, string>) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-table-cli-"));
  for (const [name, text] of Object.entries(files)) fs.writeFileSync(path.join(dir, name), text);
  let out = "";
  let err = "";
  const io: CliIo = {
    stdout: (t) => void (out += t),
    stderr: (t) => void (err += t),
    readStdin: () => Promise.resolve(""),
    cwd: dir,
  };
  return tableCommand(argv, io).then((code) => ({ code, out, err, dir }));
}

const body = (out: string) =>
  csvParse(
    out
      .split("\n")
      .filter((l) => !l.startsWith("#"))
      .join("\n"),
  );

describe("isochor table", () => {
  it("T in degC and P in barg in, h in kJ/kg and T in degC out, equal to stateAtTP", async () => {
    const { code, out } = await run(
      [
        "states.csv",
        "--components",
        "methane",
        "--properties",
        "T,P,h,rho",
        "--units",
        "T=degC,h=kJ/kg",
      ],
      { "states.csv": "# test states\nT [degC],P [barg]\n30,60\n-20,10\n" },
    );
    expect(code).toBe(0);
    const rows = body(out);
    expect(rows.columns).toEqual([
      "T [degC]",
      "P [Pa]",
      "h [kJ/kg]",
      "rho [mol/m3]",
      "phases [-]",
      "phase [-]",
      "error [-]",
    ]);
    const methane = defineFluid({ components: ["methane"], model: "peng-robinson" });
    // 30 degC = 303.15 K; 60 barg = 61.01325 bar with the standard atmosphere 101325 Pa (NIST SP 811)
    const st = methane.stateAtTP(303.15, 6101325);
    expect(Number(rows[0]["T [degC]"])).toBeCloseTo(30, 10);
    expect(Number(rows[0]["P [Pa]"])).toBeCloseTo(6101325, 6);
    expect(Number(rows[0]["h [kJ/kg]"])).toBeCloseTo(st.mass.h / 1000, 9);
    expect(Number(rows[0]["rho [mol/m3]"])).toBeCloseTo(st.densityMolPerM3, 9);
  });

  it("a (P, h) file of a mixture; a bad row is coded, the rest computed", async () => {
    const gas = defineFluid({ components: ["methane", "ethane"], model: "peng-robinson" });
    const h = gas.stateAtTP(300.5, 30e5, [0.9, 0.1]).molar.h;
    const { code, out, err } = await run(
      ["pts.csv", "--components", "methane,ethane", "--x", "0.9,0.1", "--properties", "T"],
      // 1e7 bar converts, but is beyond the model's physical limit (state/physicalLimits.ts)
      { "pts.csv": `P [bar],h [J/mol]\n30,${h}\n1e7,${h}\n` },
    );
    expect(code).toBe(0);
    const rows = body(out);
    expect(Number(rows[0]["T [K]"])).toBeCloseTo(300.5, 6);
    expect(rows[1]["T [K]"]).toBe("");
    expect(rows[1]["error [-]"]).toBe("bad-input");
    expect(err).toMatch(/1 of 2 rows failed/);
  });

  it("refuses an ambiguous unit, a header without units and a negative absolute pressure", async () => {
    const negative = await run(["s.csv", "--components", "methane"], {
      "s.csv": "T [K],P [bar]\n300,-5\n",
    });
    expect(negative.code).toBe(1);
    expect(negative.err).toMatch(/line 2/);
    const psi = await run(["s.csv", "--components", "methane"], {
      "s.csv": "T [K],P [psi]\n300,100\n",
    });
    expect(psi.code).toBe(1);
    expect(psi.err).toMatch(/psi/);
    const bare = await run(["s.csv", "--components", "methane"], { "s.csv": "T,P\n300,1e5\n" });
    expect(bare.code).toBe(1);
    expect(bare.err).toMatch(/name \[unit\]/);
    const usage = await run(["s.csv"], { "s.csv": "" });
    expect(usage.code).toBe(2);
  });
});
