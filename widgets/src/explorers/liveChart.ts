/**
 * One live chart in the page, redrawn from successive Vega-Lite specs as fast as possible:
 *
 *   spec --splitData--> skeleton (spec with every inline data set replaced by a named one) + data
 *   same skeleton as the chart on screen -> replace the named data sets in the running vega view
 *                                          (view.change + runAsync: no re-parse, no new DOM)
 *   otherwise                            -> vegaEmbed a new view (titles, legends or scales changed)
 *
 * Uses the globals of the inline chart runtime (vega, vegaEmbed); nothing is fetched.
 */

/** The parts of vega's View used here. */
export interface VegaViewLike {
  change(name: string, changeset: unknown): VegaViewLike;
  runAsync(): Promise<VegaViewLike>;
  finalize(): void;
  scale(name: string): ((value: unknown) => number) & { invert?(px: number): unknown };
  origin(): [number, number];
}

interface VegaGlobals {
  vegaEmbed(
    el: HTMLElement,
    spec: unknown,
    options: Record<string, unknown>,
  ): Promise<{ view: VegaViewLike; finalize(): void }>;
  vega: {
    changeset(): {
      remove(predicate: () => boolean): { insert(values: unknown[]): unknown };
    };
  };
}

function globals(): VegaGlobals {
  const g = globalThis as unknown as Partial<VegaGlobals>;
  if (typeof g.vegaEmbed !== "function" || !g.vega) {
    throw new Error(
      "isochor explorers need the inline chart runtime (vega, vega-embed) on the page",
    );
  }
  return g as VegaGlobals;
}

/** A spec with its inline data sets moved to named `datasets`. */
export interface SplitSpec {
  /** The spec that is embedded: data by name, the values under top-level `datasets`. */
  spec: Record<string, unknown>;
  /** JSON of the spec without the values: equal skeletons differ only in data. */
  skeleton: string;
  datasets: Record<string, unknown[]>;
}

/** Moves every `data: { values }` of a spec (any depth) to a named data set d0, d1, ... */
export function splitData(spec: Record<string, unknown>): SplitSpec {
  const datasets: Record<string, unknown[]> = {};
  let n = 0;
  const walk = (node: unknown): unknown => {
    if (Array.isArray(node)) return node.map(walk);
    if (node === null || typeof node !== "object") return node;
    const out: Record<string, unknown> = {};
    for (const [key, value] of Object.entries(node)) {
      if (
        key === "data" &&
        value !== null &&
        typeof value === "object" &&
        Array.isArray((value as { values?: unknown }).values)
      ) {
        const name = `d${n++}`;
        datasets[name] = (value as { values: unknown[] }).values;
        const { values: _values, ...rest } = value as Record<string, unknown>;
        void _values;
        out[key] = { ...rest, name };
      } else {
        out[key] = walk(value);
      }
    }
    return out;
  };
  const skeletonSpec = walk(spec) as Record<string, unknown>;
  // usermeta (the builders' warnings) does not change the drawing
  const { usermeta: _usermeta, ...drawn } = skeletonSpec;
  void _usermeta;
  const skeleton = JSON.stringify(drawn);
  return { spec: { ...skeletonSpec, datasets }, skeleton, datasets };
}

/** How the last redraw went. */
export interface RedrawInfo {
  /** "data": named data sets replaced in the running view; "embed": a new view. */
  path: "data" | "embed";
  milliseconds: number;
}

/** A chart that redraws from specs; one per explorer. */
export class LiveChart {
  private view: VegaViewLike | undefined;
  private finalizeEmbed: (() => void) | undefined;
  private skeleton: string | undefined;
  /** JSON of each data set on screen, to send only those that changed. */
  private shownData = new Map<string, string>();

  constructor(private readonly container: HTMLElement) {}

  /** The running vega view (undefined before the first draw). */
  get vegaView(): VegaViewLike | undefined {
    return this.view;
  }

  /** Draws the spec: replaces data in place when only data changed, else embeds anew. */
  async show(spec: Record<string, unknown>): Promise<RedrawInfo> {
    const started = performance.now();
    const split = splitData(spec);
    const { vega, vegaEmbed } = globals();
    if (this.view && split.skeleton === this.skeleton) {
      for (const [name, values] of Object.entries(split.datasets)) {
        const json = JSON.stringify(values);
        if (this.shownData.get(name) === json) continue;
        this.shownData.set(name, json);
        this.view.change(
          name,
          vega
            .changeset()
            .remove(() => true)
            .insert(values),
        );
      }
      await this.view.runAsync();
      return { path: "data", milliseconds: performance.now() - started };
    }
    this.finalizeEmbed?.();
    this.view = undefined;
    const result = await vegaEmbed(this.container, split.spec, {
      actions: false,
      renderer: "svg",
    });
    this.view = result.view;
    this.finalizeEmbed = () => result.finalize();
    this.skeleton = split.skeleton;
    this.shownData = new Map(
      Object.entries(split.datasets).map(([name, values]) => [name, JSON.stringify(values)]),
    );
    return { path: "embed", milliseconds: performance.now() - started };
  }

  /** Frees the vega view. */
  dispose(): void {
    this.finalizeEmbed?.();
    this.view = undefined;
    this.finalizeEmbed = undefined;
    this.skeleton = undefined;
  }
}
