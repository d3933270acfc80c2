import { describe, expect, it } from "vitest";
import { createExplorerState } from "../../../kernel-lib/src/explorers/createExplorerState.js";
import { InputError, UnknownNameError } from "../../../kernel-lib/src/errors.js";

describe("createExplorerState", () => {
  it("fills the widget-protocol fields and offers the reference equation where one exists", () => {
    const s = createExplorerState("isotherms", { components: "carbon dioxide" });
    expect(s._model_name).toBe("IsothermExplorerModel");
    expect(s._view_name).toBe("IsothermExplorerView");
    expect(s._model_module).toBe("isochor-widgets");
    expect(s.model).toBe("reference");
    expect(s.models).toContain("peng-robinson");
    // JSON round trip: the state is plain data
    expect(JSON.parse(JSON.stringify(s))).toEqual(s);
    const mix = createExplorerState("departures", { components: ["methane", "propane"] });
    expect(mix.models).not.toContain("reference");
    expect(mix.model).toBe("peng-robinson");
    if (mix.kind === "departures") expect(mix.x).toEqual([0.5, 0.5]);
  });

  it("refuses bad options with typed errors naming the input", () => {
    const bad: Array<[() => unknown, string]> = [
      [
        () => createExplorerState("isotherms", { components: "carbon dioxide", temperatureK: NaN }),
        "temperatureK",
      ],
      [
        () => createExplorerState("isotherms", { components: "carbon dioxide", temperatureK: -5 }),
        "temperatureK",
      ],
      [
        () =>
          createExplorerState("isotherms", {
            components: "carbon dioxide",
            temperatureK: Infinity,
          }),
        "temperatureK",
      ],
      [
        () =>
          createExplorerState("isotherms", {
            components: "carbon dioxide",
            temperatureRangeK: [400, 300],
          }),
        "temperatureRangeK",
      ],
      [
        () => createExplorerState("isotherms", { components: "carbon dioxide", points: 5 }),
        "points",
      ],
      [() => createExplorerState("isotherms", { components: [] }), "components"],
      [
        () =>
          createExplorerState("departures", { components: ["methane", "propane"], x: [0.5, 0.6] }),
        "x",
      ],
      [
        () =>
          createExplorerState("departures", { components: ["methane", "propane"], x: [NaN, 1] }),
        "x",
      ],
      [
        () =>
          createExplorerState("departures", {
            components: ["methane", "propane"],
            model: "reference",
          }),
        "model",
      ],
      [
        () => createExplorerState("pressure-enthalpy", { components: ["methane", "propane"] }),
        "components",
      ],
      [
        () => createExplorerState("pressure-enthalpy", { components: "propane", pressurePa: 0 }),
        "pressurePa",
      ],
      [() => createExplorerState("isotherms", { components: "methane", width: 5 }), "width"],
      [
        () =>
          createExplorerState("isotherms", {
            components: "methane",
            models: ["peng-robinson"],
            model: "van-der-waals",
          }),
        "model",
      ],
      [() => createExplorerState("bogus" as "isotherms", { components: "methane" }), "kind"],
    ];
    for (const [call, input] of bad) {
      let caught: unknown;
      try {
        call();
      } catch (error) {
        caught = error;
      }
      expect(caught, input).toBeInstanceOf(InputError);
      expect((caught as InputError).input).toBe(input);
    }
    expect(() => createExplorerState("isotherms", { components: "unobtainium" })).toThrow(
      UnknownNameError,
    );
    expect(() =>
      createExplorerState("isotherms", { components: "methane", units: { pressure: "furlong" } }),
    ).toThrow(UnknownNameError);
  });
});
