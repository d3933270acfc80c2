// Every chart builder of kernel-lib/src/charts, fed with data sampled from a Peng-Robinson ethane
// fluid and with a title, subtitle and series labels that carry script and expression payloads,
// is put in one calculation record (the record writer), which is opened in headless Chromium:
// each chart must go live (vega-embed draws it from the inline runtime), the payload must be drawn
// as literal text, no injected script may run, and no request may leave file://.
//
// Schema validity of each builder's output is tested in tests/unit/charts; here the same helper
// checks that the payload labels did not break the specs. One Chromium launch for the file.
// Skipped without /usr/lib/chromium/chromium, except with CI=true, where that is a failure.
import * as fs from "node:fs";
import * as os from "node:os";
import * as path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { defineFluid } from "../../../kernel-lib/src/fluid/defineFluid.js";
import {
  compressibilityFromFluid,
  departuresFromFluid,
  isobarOnTemperatureEntropy,
  isothermOnPressureEnthalpy,
  isothermsFromModel,
  saturationFromModel,
  surfaceFromFluid,
} from "../../../kernel-lib/src/charts/sample/index.js";
import { isothermChart } from "../../../kernel-lib/src/charts/isotherms.js";
import { departureChart } from "../../../kernel-lib/src/charts/departures.js";
import { compressibilityChart } from "../../../kernel-lib/src/charts/compressibility.js";
import { pressureEnthalpyChart } from "../../../kernel-lib/src/charts/pressureEnthalpy.js";
import { temperatureEntropyChart } from "../../../kernel-lib/src/charts/temperatureEntropy.js";
import { propertySurfaceChart } from "../../../kernel-lib/src/charts/propertySurface.js";
import { modelVsDataChart } from "../../../kernel-lib/src/charts/modelVsData.js";
import { processPathChart, withProcessPath } from "../../../kernel-lib/src/charts/processPath.js";
import { linearGrid, logGrid } from "../../../kernel-lib/src/charts/sampling.js";
import type { ChartSpec } from "../../../kernel-lib/src/charts/chartSpec.js";
import { startRecord } from "../../../kernel-lib/src/records/calculationRecord.js";
import {
  checkRecords,
  DEFAULT_CHROMIUM_PATH,
  INJECTION_FLAG,
} from "../../browser/checkRecords.mjs";
import type { RecordCheck } from "../../browser/checkRecords.mjs";
import { schemaErrors } from "../charts/specCheck.js";

const chromium = process.env.ISOCHOR_CHROMIUM ?? DEFAULT_CHROMIUM_PATH;
const hasChromium = fs.existsSync(chromium);
const isCI = process.env.CI === "true";

/** Drawn as a chart title: must show as these exact characters, and never run. */
const TITLE = `Corvid <script>window.${INJECTION_FLAG}=1</script> & "quoted" <img src=x onerror="window.${INJECTION_FLAG}=2">`;
/** Would break out of a Vega expression string if a builder pasted labels into one. */
const SUBTITLE = `'); window.${INJECTION_FLAG}=3; (' {{window.${INJECTION_FLAG}=4}}`;
/** A short series label (legends truncate long labels). */
const LABEL = "<script>x</script>";

it.runIf(!hasChromium && isCI)("has Chromium (required with CI=true)", () => {
  expect.fail(`no Chromium at ${chromium}; the browser tests of chart records cannot run`);
});

describe.skipIf(!hasChromium)("every chart builder renders live in a calculation record", () => {
  let dir: string;
  let file: string;
  const specs: Record<string, ChartSpec> = {};
  let result: RecordCheck;

  beforeAll(async () => {
    // The molecular ideal gas covers the low end of the dome (the cp correlation starts at 270 K).
    const fluid = defineFluid({
      components: ["ethane"],
      model: "peng-robinson",
      idealGas: "molecular",
    });
    const dome = saturationFromModel(fluid, { points: 14 });
    const common = { title: TITLE, subtitle: SUBTITLE };
    const isotherms = isothermsFromModel(fluid.model, [250, 320], { points: 60 });
    specs.isotherms = isothermChart(
      { isotherms: [{ ...isotherms[0], label: LABEL }, isotherms[1]], ...dome },
      common,
    );
    const dep = departuresFromFluid(fluid, [250, 350], logGrid(1e5, 5e6, 10));
    specs.departures = departureChart([{ ...dep[0], label: LABEL }, dep[1]], {
      ...common,
      property: ["h", "s"],
    });
    const z = compressibilityFromFluid(fluid, [1.1, 1.5], linearGrid(0.1, 5, 10));
    specs.compressibility = compressibilityChart([{ ...z[0], label: LABEL }, z[1]], common);
    const ph = {
      ...dome,
      isotherms: [
        { ...isothermOnPressureEnthalpy(fluid, 250, logGrid(1e5, 1e7, 16)), label: LABEL },
      ],
    };
    specs.pressureEnthalpy = pressureEnthalpyChart(ph, common);
    specs.temperatureEntropy = temperatureEntropyChart(
      {
        ...dome,
        isobars: [
          { ...isobarOnTemperatureEntropy(fluid, 1e6, linearGrid(160, 350, 16)), label: LABEL },
        ],
      },
      common,
    );
    const surface = surfaceFromFluid(fluid, linearGrid(200, 400, 6), logGrid(1e5, 1e7, 6), {
      name: `Z ${LABEL}`,
      kind: "dimensionless",
      pick: (s) => s.Z,
    });
    specs.propertySurface = propertySurfaceChart(surface, { ...common, levels: 4 });
    // Model against "data": the data points are the model's own densities scaled by 1 % (drawing
    // data only; nothing thermodynamic is asserted here).
    const pressures = linearGrid(1e5, 4e6, 8);
    const rho = pressures.map((p) => fluid.stateAtTP(320, p).densityMolPerM3);
    specs.modelVsData = modelVsDataChart(
      {
        x: { name: `Pressure ${LABEL}`, kind: "pressure" },
        y: { name: "Molar density", kind: "molarDensity" },
        model: [{ label: LABEL, points: pressures.map((p, i) => ({ x: p, y: rho[i] })) }],
        data: [
          { label: "lab, invented", points: pressures.map((p, i) => ({ x: p, y: rho[i] * 1.01 })) },
        ],
      },
      common,
    );
    const inlet = fluid.stateAtTP(300, 4e6);
    const outlet = fluid.temperatureAtPH(1e6, inlet.molar.h);
    const states = [
      {
        label: LABEL,
        pressurePa: inlet.pressurePa,
        enthalpyJPerMol: inlet.molar.h,
        temperatureK: 300,
        entropyJPerMolK: inlet.molar.s,
      },
      {
        label: "outlet",
        pressurePa: 1e6,
        enthalpyJPerMol: inlet.molar.h,
        temperatureK: outlet.temperatureK,
        entropyJPerMolK: outlet.state.molar.s,
      },
    ];
    specs.processPath = processPathChart(states, { ...common, diagram: "temperature-entropy" });
    specs.pathOnDiagram = withProcessPath(pressureEnthalpyChart(ph, common), states);

    const rec = startRecord({
      question: `Do all chart builders render in a record? ${TITLE}`,
      site: "Corvid Point Refinery (invented)",
      register: false,
    });
    const model = rec.model(fluid, { label: `Ethane ${LABEL}` });
    for (const [name, spec] of Object.entries(specs)) {
      await rec.chart(spec, { caption: `${name}: ${TITLE}`, model });
    }
    dir = fs.mkdtempSync(path.join(os.tmpdir(), "isochor-charts-in-records-"));
    file = path.join(dir, "all-builders.record.html");
    fs.writeFileSync(file, await rec.document());
    [result] = await checkRecords([file], {
      chromiumPath: chromium,
      timeoutMs: 60_000,
      expectText: [TITLE, SUBTITLE, LABEL],
      expectChartText: [TITLE, SUBTITLE],
    });
  }, 180_000);
  afterAll(() => {
    if (dir) fs.rmSync(dir, { recursive: true, force: true });
  });

  it("covers the nine builders, each spec valid against the Vega-Lite schema with the payloads", () => {
    expect(Object.keys(specs)).toHaveLength(9);
    for (const [name, spec] of Object.entries(specs)) {
      expect({ name, errors: schemaErrors(spec) }).toEqual({ name, errors: [] });
    }
  });

  it("every chart goes live, the payloads show as text, none runs, nothing leaves file://", () => {
    expect(result).toEqual({
      name: "all-builders.record.html",
      ok: true,
      message: "9 charts live, no request outside file://, no page errors",
    });
  });

  it("keeps payloads out of the HTML as markup: escaped in text, \\u003c-escaped in spec JSON", () => {
    const html = fs.readFileSync(file, "utf8");
    const withoutRuntime = html.replace(/<script data-isochor-once[\s\S]*?<\/script>/, "");
    expect(withoutRuntime).not.toContain("<script>window.");
    expect(withoutRuntime).not.toContain("<img src=x");
    expect(withoutRuntime).toContain("&lt;script&gt;window.");
    expect(withoutRuntime).toContain("\\u003cscript\\u003ewindow.");
  });
});
