/**
 * Bad-input catalogue, part 2: the P-V-T import (parsePvtCsv for CSV text, pvtFromArrays for
 * arrays typed in a cell). Every refusal is a PvtFormatError (code "bad-input") whose message
 * names the source, the line and the column or array, and what was found.
 */
import { describe, expect, it } from "vitest";
import { parsePvtCsv, pvtFromArrays, PvtFormatError } from "../../../kernel-lib/src/pvt/index.js";
import type { PvtArrays } from "../../../kernel-lib/src/pvt/pvtFromArrays.js";

interface CsvCase {
  name: string;
  text: string;
  /** What the message must name (source:line[:column] is checked separately). */
  names: RegExp;
  line: number;
}

const H = "T [K],rho [mol/L],P [MPa]";
const csvCases: CsvCase[] = [
  { name: "empty file", text: "", names: /header/, line: 1 },
  { name: "only comments", text: "# nothing\n", names: /header/, line: 1 },
  { name: "header without units", text: "T,rho,P\n300,1,2\n", names: /"T"/, line: 1 },
  {
    name: "unknown column",
    text: "T [K],rho [mol/L],P [MPa],Z [-]\n",
    names: /"Z \[-\]"/,
    line: 1,
  },
  { name: "empty unit", text: "T [],rho [mol/L],P [MPa]\n", names: /empty unit/, line: 1 },
  { name: "unknown unit", text: "T [K],rho [mol/L],P [furlong]\n", names: /"furlong"/, line: 1 },
  { name: "ambiguous psi", text: "T [K],rho [mol/L],P [psi]\n", names: /"psi"/, line: 1 },
  { name: "missing pressure", text: "T [K],rho [mol/L]\n300,1\n", names: /pressure/, line: 1 },
  { name: "missing density", text: "T [K],P [MPa]\n300,1\n", names: /density/, line: 1 },
  {
    name: "density and volume",
    text: "T [K],rho [mol/L],v [L/mol],P [MPa]\n",
    names: /both/,
    line: 1,
  },
  {
    name: "two temperature columns",
    text: "T [K],T [degC],rho [mol/L],P [MPa]\n",
    names: /second column/,
    line: 1,
  },
  { name: "no data lines", text: `${H}\n`, names: /at least one data line/, line: 2 },
  { name: "a short row", text: `${H}\n300,1\n`, names: /3 cells/, line: 2 },
  { name: "a long row", text: `${H}\n300,1,2,4\n`, names: /3 cells/, line: 2 },
  { name: "a word in a cell", text: `${H}\n300,one,2\n`, names: /"one"/, line: 2 },
  { name: "an empty cell", text: `${H}\n300,,2\n`, names: /empty cell/, line: 2 },
  { name: "NaN in a cell", text: `${H}\n300,1,NaN\n`, names: /"NaN"/, line: 2 },
  { name: "Infinity in a cell", text: `${H}\n300,1,Infinity\n`, names: /"Infinity"/, line: 2 },
  { name: "a negative pressure", text: `${H}\n300,1,-2\n`, names: /-2/, line: 2 },
  { name: "zero density", text: `${H}\n300,0,2\n`, names: /> 0/, line: 2 },
  {
    name: "below absolute zero in degC",
    text: "T [degC],rho [mol/L],P [MPa]\n-300,1,2\n",
    names: /-300/,
    line: 2,
  },
  { name: "a number too large for a double", text: `${H}\n300,1,1e400\n`, names: /1e400/, line: 2 },
  {
    name: "mass density without molar mass",
    text: "T [K],rho [kg/m3],P [MPa]\n300,1,2\n",
    names: /molar mass/i,
    line: 1,
  },
  {
    name: "a bad value on the third data line",
    text: `${H}\n300,1,2\n310,1,2.1\n320,1,x\n`,
    names: /"x"/,
    line: 4,
  },
];

describe("parsePvtCsv refuses bad files naming file, line and column", () => {
  for (const c of csvCases) {
    it(c.name, () => {
      let err: unknown;
      try {
        parsePvtCsv(c.text, { source: "lab.csv" });
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(PvtFormatError);
      const e = err as PvtFormatError;
      expect(e.code).toBe("bad-input");
      expect(e.line).toBe(c.line);
      expect(e.message).toMatch(new RegExp(`^lab\\.csv:${c.line}`));
      expect(e.message).toMatch(c.names);
    });
  }
});

interface ArrayCase {
  name: string;
  arrays: Partial<Record<keyof PvtArrays, unknown>>;
  /** The array the message must name. */
  names: RegExp;
}

const good = {
  temperatureK: [300, 310],
  densityMolPerM3: [1000, 1000],
  pressurePa: [2.3e6, 2.4e6],
};
const arrayCases: ArrayCase[] = [
  {
    name: "no density or volume",
    arrays: { ...good, densityMolPerM3: undefined },
    names: /densityMolPerM3 or molarVolumeM3PerMol/,
  },
  {
    name: "density and volume",
    arrays: { ...good, molarVolumeM3PerMol: [1e-3, 1e-3] },
    names: /not both/,
  },
  { name: "empty temperatures", arrays: { ...good, temperatureK: [] }, names: /temperatureK/ },
  {
    name: "pressures too short",
    arrays: { ...good, pressurePa: [2.3e6] },
    names: /pressurePa.*2 numbers/,
  },
  { name: "pressures a number", arrays: { ...good, pressurePa: 2.3e6 }, names: /pressurePa/ },
  {
    name: "a NaN temperature",
    arrays: { ...good, temperatureK: [300, NaN] },
    names: /temperatureK.*NaN/,
  },
  {
    name: "a negative density",
    arrays: { ...good, densityMolPerM3: [1000, -1] },
    names: /densityMolPerM3.*-1/,
  },
  {
    name: "an infinite pressure",
    arrays: { ...good, pressurePa: [2.3e6, Infinity] },
    names: /pressurePa.*Infinity/,
  },
  {
    name: "a string pressure",
    arrays: { ...good, pressurePa: [2.3e6, "2.4e6"] },
    names: /pressurePa.*2\.4e6/,
  },
  {
    name: "a null temperature",
    arrays: { ...good, temperatureK: [300, null] },
    names: /temperatureK.*null/,
  },
  {
    name: "uncertainties of the wrong length",
    arrays: { ...good, uPressurePa: [1, 2, 3] },
    names: /uPressurePa/,
  },
  { name: "a zero uncertainty", arrays: { ...good, uPressurePa: 0 }, names: /uPressurePa/ },
];

describe("pvtFromArrays refuses bad arrays naming the array", () => {
  for (const c of arrayCases) {
    it(c.name, () => {
      let err: unknown;
      try {
        pvtFromArrays(c.arrays as unknown as PvtArrays, { source: "cell 4" });
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(PvtFormatError);
      const e = err as PvtFormatError;
      expect(e.code).toBe("bad-input");
      expect(e.message).toMatch(/^cell 4:/);
      expect(e.message).toMatch(c.names);
    });
  }
});

export const PVT_CASES = csvCases.length + arrayCases.length;
