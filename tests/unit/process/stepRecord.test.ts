/**
 * A process step adds itself to a calculation record (records/recordStep.ts): inputs with their
 * source, the model, the "Method and assumptions" section, the caution, the heat-curve chart and
 * the stream table, in both the HTML and the Markdown forms.
 */
import { describe, expect, it } from "vitest";
import { startRecord } from "../../../kernel-lib/src/records/calculationRecord.js";
import { cooler } from "../../../kernel-lib/src/process/heater.js";
import { separator } from "../../../kernel-lib/src/process/separator.js";
import { PROCESS_CAUTION } from "../../../kernel-lib/src/process/types.js";
import { LIGHT_GAS_Z, lightGas, streamAt } from "./fixtures.js";

const gas = lightGas();

describe("a step in a calculation record", () => {
  it("adds inputs, model, method, caution, chart and tables", async () => {
    const feed = streamAt(
      gas,
      LIGHT_GAS_Z,
      350,
      20e5,
      { value: 36, unit: "kmol/h" },
      "recycle gas (invented)",
    );
    const r = cooler(feed, { outletTemperatureK: 250 });
    const rec = startRecord({
      question: "How much heat does E-101 remove?",
      register: false,
      live: false,
    });
    const added = await rec.step(r, {
      label: "E-101 cooler",
      source: "Corvid Point heat and material balance, case 1 (invented)",
    });
    expect(added.inputs.length).toBe(4);
    expect(added.method.id).toBe("A1");
    expect(added.chart).toBeDefined();
    const c = rec.content();
    expect(c.methods?.[0].text).toBe(r.method);
    expect(c.cautions).toContain(PROCESS_CAUTION);
    const md = await rec.markdown();
    expect(md).toContain("Method and assumptions");
    expect(md).toContain("E-101 cooler: streams");
    expect(md).toContain("Corvid Point heat and material balance, case 1 (invented)");
    const html = rec.html();
    expect(html).toContain("Method and assumptions");
    expect(html).toContain("Heat curve: E-101 cooler");
    // the section comes before the results
    expect(md.indexOf("Method and assumptions")).toBeLessThan(md.indexOf("Results"));
  });

  it("a record without methods has no such section; a separator draws its P-h path", async () => {
    const rec = startRecord({ question: "q", register: false, live: false });
    expect(await rec.markdown()).not.toContain("Method and assumptions");
    const feed = streamAt(gas, LIGHT_GAS_Z, 260, 20e5);
    await rec.step(separator(feed), { label: "V-101" });
    const md = await rec.markdown();
    expect(md).toContain("V-101: path on P-h axes");
    expect(md).toContain("V-101: power, duty and balances");
  });
});
