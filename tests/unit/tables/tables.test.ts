/* eslint-disable @typescript-eslint/no-explicit-any -- bad-input tests pass wrong types */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { formatSignificant } from "../../../kernel-lib/src/tables/formatNumber.js";
import { tableHtml } from "../../../kernel-lib/src/tables/tableHtml.js";
import { tableMarkdown, tableText } from "../../../kernel-lib/src/tables/tableText.js";
import type { TableColumn } from "../../../kernel-lib/src/tables/columns.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";

describe("formatSignificant", () => {
  it("rounds to significant figures (closed-form cases)", () => {
    expect(formatSignificant(101325, { digits: 4 })).toBe("101300");
    expect(formatSignificant(298.15)).toBe("298.15");
    expect(formatSignificant(298.15, { digits: 3 })).toBe("298");
    expect(formatSignificant(9.99951, { digits: 4 })).toBe("10.00"); // carry into a new digit
    expect(formatSignificant(0.0012345, { digits: 3 })).toBe("0.00123");
    expect(formatSignificant(-0.5, { digits: 2 })).toBe("-0.50");
    expect(formatSignificant(1, { digits: 3 })).toBe("1.00");
  });

  it("uses scientific notation outside 1e-4 .. 1e6", () => {
    expect(formatSignificant(1.2345e-5)).toBe("1.2345e-5");
    expect(formatSignificant(6.02214076e23, { digits: 4 })).toBe("6.022e23");
    expect(formatSignificant(999999.4, { digits: 6 })).toBe("999999");
    expect(formatSignificant(999999.6, { digits: 6 })).toBe("1.00000e6");
  });

  it("shows zero, negative zero, NaN and infinities honestly", () => {
    expect(formatSignificant(0)).toBe("0");
    expect(formatSignificant(-0)).toBe("0");
    expect(formatSignificant(-0.0001, { decimals: 2 })).toBe("0.00");
    expect(formatSignificant(NaN)).toBe("NaN");
    expect(formatSignificant(Infinity)).toBe("inf");
    expect(formatSignificant(-Infinity)).toBe("-inf");
  });

  it("keeps the value: parsing the text gives the value rounded to the digits", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e300, max: 1e300, noNaN: true }),
        fc.integer({ min: 1, max: 15 }),
        (v, d) => {
          const text = formatSignificant(v, { digits: d });
          expect(Number(text)).toBe(v === 0 ? 0 : Number(v.toPrecision(d)));
        },
      ),
      { numRuns: 500 },
    );
  });

  it("refuses bad digit counts", () => {
    expect(() => formatSignificant(1, { digits: 0 })).toThrow(InputError);
    expect(() => formatSignificant(1, { digits: 2.5 })).toThrow(/digits/);
    expect(() => formatSignificant(1, { decimals: -1 })).toThrow(/decimals/);
  });
});

const columns: TableColumn[] = [
  { key: "name", label: "Stream", text: true },
  { key: "temperatureK", label: "Temperature", unit: "degC", digits: 4 },
  { key: "pressurePa", label: "Pressure", quantity: "pressure" },
  { key: "z", label: "Z", quantity: "dimensionless", digits: 4 },
  { key: "hJPerMol", label: "Enthalpy", unit: "kJ/kg", digits: 4 },
];
const rows = [
  {
    name: "Corvid Point fuel gas",
    temperatureK: 313.15,
    pressurePa: 2.5e6,
    z: 0.95123,
    hJPerMol: -1234.5,
  },
  {
    name: "<script>alert('x')</script> & co",
    temperatureK: 273.15,
    pressurePa: 101325,
    z: 0.99,
    hJPerMol: NaN,
  },
  { name: null, temperatureK: undefined, pressurePa: 1e5, z: 1, hJPerMol: 0 },
];
// Methane molar mass 16.0425 g/mol (from memory of IUPAC standard atomic weights); a scale only.
const opts = {
  molarMassKgPerMol: 0.0160425,
  caption: "Fuel gas | header <b>",
  note: "Model: Peng-Robinson (1976)",
};

describe("tableHtml", () => {
  it("converts units and shows them under the heads", () => {
    const html = tableHtml(rows, columns, opts);
    expect(html).toContain(">Temperature<br><span");
    expect(html).toContain(">°C</span>");
    expect(html).toContain(">MPa</span>");
    expect(html).toContain(">40.00</td>"); // 313.15 K = 40 degC (Celsius offset 273.15 K)
    expect(html).toContain(">2.5000</td>"); // 2.5e6 Pa = 2.5 MPa
    // -1234.5 J/mol / 0.0160425 kg/mol = -76952 J/kg = -76.95 kJ/kg
    expect(html).toContain(">-76.95</td>");
    expect(html).toContain(">NaN</td>");
    expect(html).toContain(">–</td>");
    expect((html.match(/<tr>/g) ?? []).length).toBe(5); // head, 3 rows, note
  });

  it("escapes every user string", () => {
    const html = tableHtml(rows, [{ key: "name", label: "<i>Stream</i>", text: true }], opts);
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; co");
    expect(html).toContain("&lt;i&gt;Stream&lt;/i&gt;");
    expect(html).toContain("Fuel gas | header &lt;b&gt;");
  });

  it("field units", () => {
    const html = tableHtml(rows, [{ key: "pressurePa", label: "P", quantity: "pressure" }], {
      units: "field",
    });
    // 101325 Pa = 14.696 psia (NIST SP 811: 1 psi = 6894.757 Pa)
    expect(html).toContain(">14.696</td>");
    expect(html).toContain(">psia</span>");
  });

  it("molar and mass flow units: rows in mol/s or kg/s, the column converts", () => {
    const flows = [{ n: 1, m: 1 }];
    const html = tableHtml(flows, [
      { key: "n", label: "Molar flow", unit: "kmol/h" },
      { key: "m", label: "Mass flow", unit: "t/h" },
      { key: "m", label: "Mass flow", unit: "lb/h", digits: 6 },
    ]);
    expect(html).toContain(">3.6000</td>"); // 1 mol/s = 3600 mol/h = 3.6 kmol/h
    expect(html).toContain(">t/h</span>"); // and 1 kg/s = 3.6 t/h
    // NIST SP 811 (2008) App. B.8: 1 lb = 0.45359237 kg; 3600 / 0.45359237 = 7936.64 lb/h
    expect(html).toContain(">7936.64</td>");
    // a volume flow needs a molar volume the column does not have: refused as an unknown unit
    expect(() => tableHtml(flows, [{ key: "m", label: "V", unit: "m3/h" }])).toThrow(
      UnknownNameError,
    );
  });

  it("refuses bad columns, mass units without molar mass, non-numbers", () => {
    expect(() => tableHtml(rows, [])).toThrow(InputError);
    expect(() => tableHtml(rows, [{ key: "hJPerMol", label: "h", unit: "kJ/kg" }])).toThrow(
      /molarMassKgPerMol/,
    );
    expect(() => tableHtml(rows, [{ key: "pressurePa", label: "P", unit: "furlongs" }])).toThrow(
      UnknownNameError,
    );
    expect(() => tableHtml([{ p: "high" }], [{ key: "p", label: "P", unit: "bar" }])).toThrow(
      /row\.p/,
    );
    expect(() => tableHtml("rows" as any, columns)).toThrow(/rows/);
  });
});

describe("tableText and tableMarkdown", () => {
  it("aligns decimal points and keeps units on their own line", () => {
    const text = tableText(
      [{ p: 1.5e5 }, { p: 12.25e6 }, { p: 1e5 }],
      [{ key: "p", label: "Pressure", unit: "bar", digits: 4 }],
    );
    const lines = text.split("\n");
    expect(lines[0]).toBe("Pressure");
    expect(lines[1].trim()).toBe("bar");
    const cells = lines.slice(3);
    // Right-aligned to the head's width, decimal points in one column (trailing blanks trimmed).
    expect(cells).toEqual(["   1.500", " 122.5", "   1.000"]);
    expect(new Set(cells.map((c) => c.indexOf("."))).size).toBe(1);
  });

  it("keeps every cell on one line", () => {
    const text = tableText([{ s: "two\nlines" }], [{ key: "s", label: "Note", text: true }]);
    expect(text.split("\n").length).toBe(3);
  });

  it("escapes Markdown specials", () => {
    const md = tableMarkdown(rows, columns.slice(0, 2), opts);
    expect(md).toContain("| Stream | Temperature (°C) |");
    expect(md).toContain("\\<script\\>");
    expect(md).toContain("Fuel gas \\| header \\<b\\>");
  });
});
