import * as fs from "node:fs";
import * as path from "node:path";
import * as vm from "node:vm";
import { describe, expect, it } from "vitest";
import {
  RUNTIME_MARKER_ATTRIBUTE,
  vegaRuntimeScript,
  vegaRuntimeSource,
} from "../../../kernel-lib/src/display/vegaRuntime.js";

/** A sandbox that looks like a page with RequireJS loaded: `define.amd` is set. */
function pageWithRequireJs(): { context: vm.Context; defineCalls: unknown[][] } {
  const defineCalls: unknown[][] = [];
  const define = (...args: unknown[]): void => void defineCalls.push(args);
  define.amd = { jQuery: true };
  // The browser globals the bundles touch while loading (no DOM needed until a chart is embedded).
  const context = vm.createContext({
    define,
    console,
    setTimeout,
    clearTimeout,
    structuredClone,
    setInterval,
    clearInterval,
    queueMicrotask,
    URL,
    URLSearchParams,
    TextEncoder,
    TextDecoder,
  });
  return { context, defineCalls };
}

const root = path.resolve(__dirname, "../../../node_modules");

describe("vegaRuntimeScript", () => {
  const script = vegaRuntimeScript();

  it("is one marked script element, cached, with no inner </script", () => {
    expect(script.startsWith(`<script ${RUNTIME_MARKER_ATTRIBUTE}="chart-runtime vega@`)).toBe(
      true,
    );
    expect(script.endsWith("</script>")).toBe(true);
    expect(script.match(/<\/script/gi)).toHaveLength(1);
    expect(vegaRuntimeScript()).toBe(script);
    // About 830 KB: vega + vega-lite + vega-embed minified (sizes of the installed builds).
    expect(script.length).toBeGreaterThan(500_000);
  });

  it("defines vega, vegaLite and vegaEmbed as globals even when an AMD define is present", () => {
    const { context, defineCalls } = pageWithRequireJs();
    const { source, versions } = vegaRuntimeSource();
    vm.runInContext(source, context);
    expect(defineCalls).toHaveLength(0);
    expect(typeof context.vegaEmbed).toBe("function");
    expect(context.vega.version).toBe(versions.vega);
    expect(context.vegaLite.version).toBe(versions["vega-lite"]);
    // Running it a second time is a no-op (the guard sees vegaEmbed).
    const embed = context.vegaEmbed;
    vm.runInContext(source, context);
    expect(context.vegaEmbed).toBe(embed);
  });

  it("needs the wrapper: the bare vega bundle registers with AMD and sets no global", () => {
    const { context, defineCalls } = pageWithRequireJs();
    vm.runInContext(fs.readFileSync(path.join(root, "vega/build/vega.min.js"), "utf8"), context);
    expect(defineCalls).toHaveLength(1);
    expect(context.vega).toBeUndefined();
  });
});
