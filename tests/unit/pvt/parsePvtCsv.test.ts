import { describe, expect, it } from "vitest";
import { parsePvtCsv, PvtFormatError } from "../../../kernel-lib/src/pvt/index.js";

const GOOD = `# synthetic example
T [degC],rho [mol/L],P [bar],u(P) [kPa]
26.85,1,23.5,2
46.85,1,25.1,2

36.85,2,40.2,3
`;

function refusal(text: string, options = {}): PvtFormatError {
  try {
    parsePvtCsv(text, { source: "lab.csv", ...options });
  } catch (e) {
    if (e instanceof PvtFormatError) return e;
    throw e;
  }
  throw new Error("expected a refusal, got a data set");
}

describe("parsePvtCsv", () => {
  it("reads units in headers and converts to SI (degC offset 273.15 K and bar = 1e5 Pa, exact by SI definition)", () => {
    const d = parsePvtCsv(GOOD, { source: "lab.csv" });
    expect(d.points).toHaveLength(3);
    const p = d.points[0];
    expect(p?.temperatureK).toBeCloseTo(300, 12);
    expect(p?.densityMolPerM3).toBe(1000);
    expect(p?.pressurePa).toBeCloseTo(23.5e5, 6);
    expect(p?.uPressurePa).toBeCloseTo(2000, 9);
    expect(p?.line).toBe(3);
    expect(d.points[2]?.line).toBe(6);
    expect(d.comments).toEqual(["synthetic example"]);
    expect(d.setAside).toEqual([]);
  });

  it("reads molar volume columns and converts u(v) to u(rho) = u(v)/v^2 (first-order propagation)", () => {
    const d = parsePvtCsv("T [K],v [cm3/mol],P [MPa],u(v) [cm3/mol]\n300,1000,2.3,10\n");
    expect(d.points[0]?.densityMolPerM3).toBeCloseTo(1000, 9);
    expect(d.points[0]?.uDensityMolPerM3).toBeCloseTo(10, 9);
  });

  it("reads mass densities with a molar mass (kg/m3 / (kg/mol) = mol/m3)", () => {
    const d = parsePvtCsv("T [K],rho [kg/m3],P [Pa]\n300,44.0098,2.3e6\n", {
      molarMassKgPerMol: 0.0440098,
    });
    expect(d.points[0]?.densityMolPerM3).toBeCloseTo(1000, 9);
  });

  it("refuses a missing column naming the header line", () => {
    const e = refusal("T [K],P [Pa]\n300,1e5\n");
    expect(e.line).toBe(1);
    expect(e.message).toMatch(/lab\.csv:1: expected a density \(rho \[unit\]\) or volume/);
  });

  it("refuses a non-numeric cell with line, column and header", () => {
    const e = refusal("T [K],rho [mol/m3],P [Pa]\n300,100,2.4e5\n310,100,abc\n");
    expect([e.line, e.column, e.header]).toEqual([3, 3, "P [Pa]"]);
    expect(e.message).toBe('lab.csv:3:3 (column "P [Pa]"): expected a number; found "abc"');
  });

  it("refuses an empty cell", () => {
    const e = refusal("T [K],rho [mol/m3],P [Pa]\n300,,2.4e5\n");
    expect([e.line, e.column]).toEqual([2, 2]);
    expect(e.found).toBe("an empty cell");
  });

  it("refuses zero and negative values, including temperatures below 0 K after conversion", () => {
    expect(refusal("T [K],rho [mol/m3],P [Pa]\n300,0,2.4e5\n").column).toBe(2);
    expect(refusal("T [K],rho [mol/m3],P [Pa]\n300,10,-5\n").column).toBe(3);
    const e = refusal("T [degC],rho [mol/m3],P [Pa]\n-300,10,5\n");
    expect([e.line, e.column]).toEqual([2, 1]);
    expect(refusal("T [K],rho [mol/m3],P [Pa],u(P) [Pa]\n300,10,5,0\n").column).toBe(4);
  });

  it("refuses units that do not parse, or of the wrong dimension, at the header cell", () => {
    const e = refusal("T [K],rho [furlong],P [Pa]\n300,10,5\n");
    expect([e.line, e.column, e.header]).toEqual([1, 2, "rho [furlong]"]);
    expect(refusal("T [K],rho [mol/m3],P [kJ/mol]\n300,10,5\n").column).toBe(3);
    expect(refusal("T,rho [mol/m3],P [Pa]\n300,10,5\n").expected).toMatch(/name \[unit\]/);
    expect(refusal("T [],rho [mol/m3],P [Pa]\n300,10,5\n").column).toBe(1);
  });

  it("refuses mass densities without a molar mass", () => {
    const e = refusal("T [K],rho [kg/m3],P [Pa]\n300,10,5\n");
    expect(e.column).toBe(2);
    expect(e.message).toMatch(/molar mass/);
  });

  it("refuses unknown and duplicated columns, and both rho and v", () => {
    expect(refusal("T [K],rho [mol/m3],P [Pa],note [-]\n300,10,5,x\n").column).toBe(4);
    expect(refusal("T [K],rho [mol/m3],P [Pa],T [degC]\n300,10,5,3\n").column).toBe(4);
    expect(refusal("T [K],rho [mol/m3],v [m3/mol],P [Pa]\n300,10,0.1,5\n").column).toBe(3);
  });

  it("refuses a row with the wrong number of cells, and an unterminated quote", () => {
    const e = refusal("T [K],rho [mol/m3],P [Pa]\n300,10\n");
    expect([e.line, e.column]).toEqual([2, 3]);
    expect(refusal('T [K],rho [mol/m3],P [Pa]\n300,"10,5\n').line).toBe(2);
  });

  it("refuses conflicting repeats naming both lines; lists exact copies as set aside", () => {
    const e = refusal("T [K],rho [mol/m3],P [Pa]\n300,10,5\n300,10,6\n");
    expect(e.line).toBe(3);
    expect(e.message).toMatch(/line 2/);
    const withU = refusal("T [K],rho [mol/m3],P [Pa],u(P) [Pa]\n300,10,500,1\n300,10,510,1\n");
    expect(withU.message).toMatch(/3 combined standard uncertainties/);
    const ok = parsePvtCsv("T [K],rho [mol/m3],P [Pa],u(P) [Pa]\n300,10,500,2\n300,10,502,2\n");
    expect(ok.points).toHaveLength(2);
    const copy = parsePvtCsv("T [K],rho [mol/m3],P [Pa]\n300,10,5\n300,10,5\n");
    expect(copy.points).toHaveLength(1);
    expect(copy.setAside[0]?.line).toBe(3);
    expect(copy.setAside[0]?.reason).toMatch(/copy of line 2/);
  });

  it("refuses a file with a header only, or nothing", () => {
    expect(refusal("T [K],rho [mol/m3],P [Pa]\n").expected).toMatch(/at least one data line/);
    expect(refusal("# only a comment\n").expected).toMatch(/header/);
  });

  it("accepts quoted cells and CRLF line ends", () => {
    const d = parsePvtCsv('"T [K]","rho [mol/m3]","P [Pa]"\r\n300,"10",5\r\n');
    expect(d.points[0]?.pressurePa).toBe(5);
  });
});

describe("parsePvtCsv header spellings", () => {
  it("accepts a superscript-three in units and parentheses around the unit", () => {
    const d = parsePvtCsv("T (K),ρ [mol/m³],P [kPa]\n300,1000,2300\n");
    expect(d.points[0]?.densityMolPerM3).toBe(1000);
    expect(d.points[0]?.pressurePa).toBe(2.3e6);
  });

  it("reads gauge pressures with the notebook-wide atmosphere and says so in the column description", () => {
    const d = parsePvtCsv("T [K],rho [mol/m3],P [barg]\n300,1000,22\n");
    // 22 barg = 22e5 Pa + 101325 Pa (units module default atmosphere, standard atmosphere by definition)
    expect(d.points[0]?.pressurePa).toBeCloseTo(22e5 + 101325, 6);
    expect(d.columns[2]?.unit).toMatch(/atmospheric pressure added/);
  });
});
