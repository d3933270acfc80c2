// The calculation record a notebook fills: inputs converted to SI and shown both ways, models with
// their provenance, results traced to model and inputs, warnings collected, cautions, escaping.
import { inspect } from "node:util";
import { describe, expect, it } from "vitest";
import {
  CalculationRecord,
  startRecord,
} from "../../../kernel-lib/src/records/calculationRecord.js";
import {
  escapeMarkdown,
  escapeMarkdownBlock,
} from "../../../kernel-lib/src/records/calculationMarkdown.js";
import {
  processSafetyCaution,
  SAFETY_TOPICS,
} from "../../../kernel-lib/src/records/processCaution.js";
import {
  registeredRecords,
  resetRecordRegistry,
} from "../../../kernel-lib/src/records/recordRegistry.js";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import { defineComponent } from "../../../kernel-lib/src/components/defineComponent.js";
import { parsePvtCsv } from "../../../kernel-lib/src/pvt/parsePvtCsv.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";
import type { TableColumn } from "../../../kernel-lib/src/tables/columns.js";

const question = "How far does the SGP-4 overhead gas cool across its letdown valve?";
const fresh = (topics?: ("pressure" | "low-metal-temperature")[]) =>
  startRecord({ question, site: "Corvid Point Refinery (invented)", topics, register: false });

describe("inputs", () => {
  it("converts to SI through units/ and keeps the value as given", () => {
    const rec = fresh();
    // 1 bar = 1e5 Pa exactly, standard atmosphere 101325 Pa exactly (NIST SP 811, 2008, App. B.8).
    const P = rec.input("inlet pressure", 32, "barg", { source: "DCS tag PT-2101, invented" });
    expect(P).toMatchObject({ id: "I1", value: 32, unit: "barg", unitSI: "Pa" });
    expect(P.valueSI).toBe(32e5 + 101325);
    expect(P.atmosphericPressurePa).toBe(101325);
    // 0 degC = 273.15 K exactly (ITS-90 / SI definition of the Celsius scale).
    const T = rec.input("inlet temperature", 45, "degC");
    expect(T.id).toBe("I2");
    expect(T.valueSI).toBeCloseTo(318.15, 12);
    const dT = rec.input("approach", 5, "degC", { difference: true });
    expect(dT.valueSI).toBe(5);
    const x = rec.input("composition", [0, 0.55, 0.35, 0.1], "-", {
      source: "lab sample, invented",
    });
    expect(x.valueSI).toEqual([0, 0.55, 0.35, 0.1]);
    const html = rec.html();
    expect(html).toContain("3301325 Pa"); // shown in SI
    expect(html).toMatch(/>32 barg</);
    expect(html).toContain("DCS tag PT-2101, invented");
    expect(html).toContain("gauge converted with atmospheric pressure 101325 Pa");
    expect(html).toContain("source not given"); // I2 has none: said, not hidden
  });

  it("refuses bad values and units with typed errors", () => {
    const rec = fresh();
    expect(() => rec.input("p", NaN, "bar")).toThrow(InputError);
    expect(() => rec.input("p", Infinity, "bar")).toThrow(InputError);
    expect(() => rec.input("t", -300, "degC")).toThrow(InputError); // below absolute zero
    expect(() => rec.input("x", [0.5, NaN], "-")).toThrow(/x\[1\]/);
    expect(() => rec.input("p", 1, "furlongs")).toThrow(UnknownNameError);
    expect(() => rec.input("", 1, "bar")).toThrow(InputError);
    expect(() => rec.input("h", 10, "kJ/kg")).toThrow(/molarMassKgPerMol/);
    expect(() => startRecord({ question: "  " })).toThrow(InputError);
    expect(() => startRecord({ question, topics: ["fire" as never] })).toThrow(/topics\[0\]/);
  });
});

describe("models", () => {
  it("pulls citation, reference state, ideal-gas routes and k_ij provenance from a Fluid", () => {
    const rec = fresh();
    const gas = defineFluid({
      components: ["hydrogen", "methane", "ethane", "propane"],
      model: "peng-robinson",
    });
    const m = rec.model(gas, { label: "Fuel-gas streams" });
    expect(m.id).toBe("M1");
    expect(m.citation).toBe(gas.model.info.citation);
    expect(m.componentIds).toEqual(["hydrogen", "methane", "ethane", "propane"]);
    expect(m.referenceState).toMatch(/formation/);
    expect(m.idealGas).toHaveLength(4);
    expect(m.interaction).toHaveLength(6); // 4 components: 6 pairs
    expect(m.validity.join(" ")).toMatch(/No published range/);
    expect(m.defaultedPairs).toEqual([...gas.defaultedPairs]);
    const content = rec.content();
    if (gas.defaultedPairs.length > 0) {
      expect(content.warnings.map((w) => w.message).join("\n")).toContain("k_ij set to zero");
    }
    const html = rec.html();
    expect(html).toContain(`id="${rec.anchor}-M1"`);
    expect(html).toContain("Fuel-gas streams");
  });

  it("accepts a bare ModelInfo and refuses anything else", () => {
    const rec = fresh();
    const e = rec.model({
      id: "user",
      name: "My fit",
      citation: "lab report 7, invented",
      componentIds: [],
    });
    expect(e.validity).toEqual([]);
    expect(rec.html()).toContain("no range known to the library");
    expect(() => rec.model({} as never)).toThrow(InputError);
  });
});

describe("results are traced to their model and inputs", () => {
  const columns: TableColumn[] = [
    { key: "name", label: "Stream", text: true },
    { key: "temperatureK", label: "T", unit: "degC", digits: 4 },
  ];

  it("links each row to the model entry and inputs, per row when rows differ", () => {
    const rec = fresh();
    const a = rec.input("T a", 45, "degC");
    const b = rec.input("T b", 40, "degC");
    const m = rec.model({ id: "x", name: "X", citation: "c", componentIds: [] });
    const rows = [
      { name: "A", temperatureK: a.valueSI as number },
      { name: "B", temperatureK: b.valueSI as number },
    ];
    for (let i = 0; i < 9; i++) rows.push({ name: `extra ${i}`, temperatureK: 300 });
    const t = rec.results(rows, columns, {
      caption: "Inlets",
      model: m,
      rowBasis: (_row, i) => ({ inputs: [i === 1 ? b : a] }),
    });
    expect(t.id).toBe("T1");
    const links = [
      ...t.html.matchAll(
        /<td[^>]*><span class="calc-basis-cell">(<a href[^<]*<\/a>; <a href[^<]*<\/a>)<\/span><\/td>/g,
      ),
    ];
    expect(links).toHaveLength(11); // every row, including row 10 (token I..-1 vs -10 distinct)
    expect(links[0][1]).toBe(
      `<a href="#${rec.anchor}-M1">M1</a>; <a href="#${rec.anchor}-I1">I1</a>`,
    );
    expect(links[1][1]).toContain(`#${rec.anchor}-I2">I2</a>`);
    expect(t.html).not.toContain("isochor-basis-");
    expect(t.markdown).toContain("| M1; I2 |");
    expect(t.html).toContain("45"); // 318.15 K shown as degC
  });

  it("refuses a basis that is not in the record", () => {
    const rec = fresh();
    expect(() => rec.results([{ name: "A" }], columns, { model: "M7" })).toThrow(/model/);
    expect(() => rec.results([{ name: "A" }], columns, { inputs: ["I1"] })).toThrow(/inputs\[0\]/);
    const other = fresh().input("p", 1, "bar");
    expect(() => rec.results([], columns, { inputs: [other] })).toThrow(InputError);
  });
});

describe("warnings", () => {
  it("collects the engine's warnings from results, de-duplicated, with where they came from", () => {
    const rec = fresh();
    const w = { code: "outside-validity" as const, message: "T below the correlation's range" };
    const rows = [
      { name: "A", warnings: [w] },
      { name: "B", warnings: [w, { code: "accuracy" as const, message: "near critical" }] },
    ];
    rec.results(rows, [{ key: "name", label: "Stream", text: true }]);
    expect(rec.collectWarnings({ warnings: [w] }, { from: "saturation at 250 K" })).toBe(1);
    expect(rec.collectWarnings([{ value: 1 }])).toBe(0);
    const warnings = rec.content().warnings;
    expect(warnings).toHaveLength(2);
    expect(warnings[0]).toEqual({
      code: "outside-validity",
      message: "T below the correlation's range",
      from: ["T1", "saturation at 250 K"],
      count: 3,
    });
    expect(rec.html()).toContain("T1, saturation at 250 K; 3 times");
  });

  it("says so when there are none", () => {
    expect(fresh().html()).toContain("None: no result passed to this record carried a warning.");
  });
});

describe("cautions", () => {
  it("adds the standard caution when tagged with a safety topic, naming the topic", () => {
    const rec = fresh(["low-metal-temperature"]);
    const cautions = rec.content().cautions;
    expect(cautions).toHaveLength(1);
    expect(cautions[0]).toContain("minimum design metal temperature");
    expect(cautions[0]).toMatch(/licensed or otherwise competent engineer/);
    expect(cautions[0]).toMatch(/codes govern/);
    rec.caution(); // the same standard caution is not repeated
    expect(rec.content().cautions).toHaveLength(1);
    expect(rec.html()).toContain('class="calc-caution"');
  });

  it("has no caution untagged, and the standard one on request", () => {
    const rec = fresh();
    expect(rec.content().cautions).toEqual([]);
    rec.caution();
    expect(rec.content().cautions).toEqual([processSafetyCaution()]);
    rec.tag("relief");
    expect(rec.content().cautions[0]).toContain("relief sizing");
    expect(SAFETY_TOPICS).toContain("blowdown");
  });
});

describe("escaping of every caller string", () => {
  const evil = `<script>window.__isochorInjected=1</script><img src=x onerror=alert(1)>`;

  it("escapes labels, sources, notes, captions, answers and the question in HTML", () => {
    const rec = startRecord({ question: evil, author: evil, site: evil, register: false });
    rec.input(evil, 1, "bar", { source: evil, note: evil });
    rec.model(
      { id: evil, name: evil, citation: evil, componentIds: [evil] },
      { label: evil, note: evil },
    );
    rec.results([{ [evil]: evil }], [{ key: evil, label: evil, text: true }], {
      caption: evil,
      note: evil,
    });
    rec.collectWarnings({ warnings: [{ code: "accuracy", message: evil }] }, { from: evil });
    rec.caution(evil).answer(evil);
    const html = rec.html();
    expect(html).not.toContain("<script>");
    expect(html).not.toContain("<img src=x");
    expect(html).toContain("&lt;script&gt;window.__isochorInjected=1&lt;/script&gt;");
  });

  it("escapes a user component's name and a CSV file's provenance comments", async () => {
    const rec = startRecord({ question, register: false });
    // Constants are drawing values for a made-up gas (no physics asserted here).
    const component = defineComponent({
      id: evil,
      molarMassKgPerMol: 0.03,
      criticalTemperatureK: 300,
      criticalPressurePa: 4e6,
      acentricFactor: 0.1,
      idealGasCp: {
        form: "polynomial",
        minTemperatureK: 200,
        maxTemperatureK: 1000,
        segments: [{ minTemperatureK: 200, maxTemperatureK: 1000, coefficients: [4] }],
      },
    });
    const gas = defineFluid({ components: [component], model: "peng-robinson" });
    rec.model(gas);
    const data = parsePvtCsv(`# measured by ${evil}\nT [K],rho [mol/L],P [MPa]\n300,1,2.4\n`);
    expect(data.comments.join(" ")).toContain(evil);
    rec.input("a pressure from the file", 2.4, "MPa", { source: data.comments.join(" ") });
    const html = rec.html();
    expect(html).not.toContain("<script>");
    expect(html).toContain("&lt;script&gt;window.__isochorInjected=1&lt;/script&gt;");
    expect(await rec.markdown()).not.toMatch(/(^|[^\\])<script>/m);
  });

  it("escapes Markdown so no HTML or link can pass through a Markdown renderer", async () => {
    expect(escapeMarkdown("<b>x</b> & [y](z) | a_b")).toBe(
      "\\<b\\>x\\</b\\> \\& \\[y\\](z) \\| a\\_b",
    );
    expect(escapeMarkdownBlock("# heading\nline")).toBe("\\# heading line");
    expect(escapeMarkdownBlock("1. item")).toBe("1\\. item");
    expect(escapeMarkdown("1. item")).toBe("1. item"); // inside a line it is not a list
    const rec = startRecord({ question: evil, register: false });
    rec.input(evil, 1, "bar", { source: evil });
    const md = await rec.markdown();
    expect(md).not.toMatch(/(^|[^\\])<script>/);
    expect(md).toContain("\\<script\\>");
  });
});

describe("the Markdown record", () => {
  it("has every section, with ids matching the HTML", async () => {
    const rec = fresh(["pressure"]);
    const P = rec.input("inlet pressure", 32, "barg", { source: "DCS tag PT-2101, invented" });
    const m = rec.model({ id: "x", name: "X model", citation: "cite", componentIds: ["methane"] });
    rec.results([{ name: "A" }], [{ key: "name", label: "Stream", text: true }], {
      model: m,
      inputs: [P],
    });
    rec.answer("About 20 K of cooling.");
    const md = await rec.markdown();
    for (const heading of [
      "Question",
      "Answer",
      "Cautions",
      "Inputs",
      "Models",
      "Results",
      "Warnings raised",
      "Environment",
    ]) {
      expect(md).toMatch(new RegExp(`^## \\d+\\. ${heading}$`, "m"));
    }
    expect(md).toContain(
      "| I1 | inlet pressure | 32 barg | 3301325 Pa | DCS tag PT-2101, invented; gauge converted with atmospheric pressure 101325 Pa |",
    );
    expect(md).toContain("### M1: X model");
    expect(md).toContain("| A | M1; I1 |");
    expect(md).toContain("**CAUTION.**");
    expect(md).toMatch(/git commit [0-9a-f]{7,}|git commit unknown/);
  });
});

describe("printed as a cell's last value", () => {
  it("prints one line per part, not the HTML it carries; JSON is unchanged", () => {
    const rec = fresh();
    const P = rec.input("inlet pressure", 32, "barg");
    const m = rec.model(
      { id: "x", name: "X model", citation: "c", componentIds: [] },
      { label: "Feed" },
    );
    const t = rec.results([{ name: "A" }], [{ key: "name", label: "Stream", text: true }], {
      caption: "Inlets",
    });
    expect(inspect(P)).toBe("I1 inlet pressure = 32 barg (recorded)");
    expect(inspect(m)).toBe("M1 Feed: X model (recorded)");
    expect(inspect(t)).toBe("T1 recorded (Inlets, 1 rows)");
    expect(inspect(rec)).toBe(
      'calculation record "' +
        question +
        '": 1 input, 1 model, 1 table, 0 charts, 0 warnings (rec.show() displays it)',
    );
    expect(Object.keys(JSON.parse(JSON.stringify(P)))).toContain("valueSI");
  });
});

describe("chart images of the Markdown form", () => {
  it("with an image base, each chart is an SVG file the Markdown shows; without, it is listed", async () => {
    const rec = startRecord({ question, register: false });
    await rec.chart(
      {
        title: "Z against pressure",
        data: {
          values: [
            { p: 1, z: 0.99 },
            { p: 2, z: 0.98 },
          ],
        },
        mark: "line",
        encoding: {
          x: { field: "p", type: "quantitative" },
          y: { field: "z", type: "quantitative" },
        },
      },
      { caption: "Letdown [inlet]" },
    );
    const withImages = await rec.renderFiles({ imageBase: "00-start-here.record" });
    expect(withImages.images).toHaveLength(1);
    expect(withImages.images?.[0].file).toBe("00-start-here.record-C1.svg");
    expect(withImages.images?.[0].content).toMatch(/^<svg /);
    expect(withImages.markdown).toContain(
      "![C1: Letdown \\[inlet\\]](00-start-here.record-C1.svg)",
    );
    const listed = await rec.renderFiles();
    expect(listed.images).toEqual([]);
    expect(listed.markdown).toContain("**C1** (chart, drawn in the HTML record)");
    expect(listed.markdown).not.toContain("![");
  });
});

describe("registration for isochor run", () => {
  it("registers by default, not with register: false", async () => {
    resetRecordRegistry();
    startRecord({ question, register: false });
    expect(registeredRecords()).toHaveLength(0);
    const rec = startRecord({ question, title: "Letdown cooling" });
    expect(rec).toBeInstanceOf(CalculationRecord);
    const [registered] = registeredRecords();
    expect(registered.title).toBe("Letdown cooling");
    const files = await registered.renderFiles();
    expect(files.html).toMatch(/^<!doctype html>/);
    expect(files.html).toContain("Content-Security-Policy");
    expect(files.html).not.toContain("data-isochor-once"); // no chart: no runtime
    expect(files.markdown).toMatch(/^# Calculation record: Letdown cooling/);
    resetRecordRegistry();
  });
});
