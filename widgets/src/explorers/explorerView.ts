/**
 * The explorer's view, shaped like a DOMWidgetView of @jupyter-widgets/base (`el`, `model`,
 * `render()`, `remove()`): it draws the controls, listens to the model's "change", recomputes the
 * chart (and table) with the bundled engine and redraws it through LiveChart. A comm-backed
 * version would subclass DOMWidgetView and call the same code from its render().
 *
 *   input event -> definition.update(state, key, value) -> model.set(...) + save_changes()
 *   model "change" -> redraw(): definition.chart(state) -> LiveChart.show(spec)
 *                    (one redraw at a time; moves made meanwhile collapse into one more redraw)
 *
 * After each redraw the root element gets the event "isochor-explorer-redraw" with
 * { path, computeMs, drawMs, totalMs }, used by the benchmark and the browser tests.
 */
import type { ChartSpec } from "../../../kernel-lib/src/charts/chartSpec.js";
import { chartMeta } from "../../../kernel-lib/src/charts/chartSpec.js";
import type { ControlValue } from "../../../kernel-lib/src/explorers/explorerControls.js";
import { explorerDefinition } from "../../../kernel-lib/src/explorers/explorerDefinitions.js";
import { ExplorerFluids } from "../../../kernel-lib/src/explorers/explorerFluids.js";
import type { ExplorerState } from "../../../kernel-lib/src/explorers/explorerState.js";
import { controlsShape, drawControl, type DrawnControl } from "./controls.js";
import { readState, type ExplorerModelLike } from "./explorerModel.js";
import { LiveChart } from "./liveChart.js";

/** Parts of the explorer's HTML (kernel-lib/src/explorers/explorerHtml.ts) the view fills. */
interface Parts {
  controls: HTMLElement;
  figure: HTMLElement;
  staticChart: HTMLElement;
  live: HTMLElement;
  status: HTMLElement;
  note: HTMLElement | null;
  table: HTMLElement;
  error: HTMLElement;
}

const CHART_ATTRIBUTE = "data-isochor-chart";
const EXPLORER_ATTRIBUTE = "data-isochor-explorer";

function part(root: HTMLElement, selector: string): HTMLElement {
  const found = root.querySelector<HTMLElement>(selector);
  if (!found) throw new Error(`isochor explorer: element ${selector} missing`);
  return found;
}

export class ExplorerView {
  private readonly parts: Parts;
  private readonly chart: LiveChart;
  private fluids: ExplorerFluids | undefined;
  private drawn: DrawnControl[] = [];
  private shape = "";
  private busy = false;
  private pending = false;
  private readonly keys: string[];
  private dragging = false;

  constructor(
    readonly el: HTMLElement,
    readonly model: ExplorerModelLike,
    initialKeys: readonly string[],
  ) {
    this.keys = [...initialKeys];
    const error = document.createElement("div");
    error.className = "isochor-explorer-error";
    error.setAttribute("style", "color:#9b2c1f;font-size:0.9em;min-height:1.2em");
    const controls = part(el, ".isochor-explorer-controls");
    controls.after(error);
    this.parts = {
      controls,
      figure: part(el, `[${CHART_ATTRIBUTE}]`),
      staticChart: part(el, ".isochor-chart-static"),
      live: part(el, ".isochor-chart-live"),
      status: part(el, ".isochor-explorer-status"),
      note: el.querySelector<HTMLElement>(".isochor-explorer-note"),
      table: part(el, ".isochor-explorer-table"),
      error,
    };
    this.chart = new LiveChart(this.parts.live);
  }

  /** The current state, read from the model. */
  state(): ExplorerState {
    return readState(this.model, this.keys);
  }

  /** Draws controls and the live chart (widget protocol). */
  render(): Promise<void> {
    const state = this.state();
    this.fluids = new ExplorerFluids(state.components);
    this.model.on("change", () => this.scheduleRedraw());
    this.drawControls(state);
    this.enablePicking(state);
    return this.redraw().then(
      () => {
        this.parts.staticChart.style.display = "none";
        if (this.parts.note) this.parts.note.style.display = "none";
        this.parts.live.style.display = "";
        this.parts.figure.setAttribute(CHART_ATTRIBUTE, "live");
        this.el.setAttribute(EXPLORER_ATTRIBUTE, "live");
      },
      (error: unknown) => {
        this.parts.figure.setAttribute(CHART_ATTRIBUTE, "failed");
        this.el.setAttribute(EXPLORER_ATTRIBUTE, "failed");
        this.showError(error);
        console.error("isochor explorer stayed static: " + messageOf(error));
      },
    );
  }

  /** Frees the chart (widget protocol). */
  remove(): void {
    this.model.off("change");
    this.chart.dispose();
  }

  /** Applies a control change through the explorer's definition. */
  private apply(key: string, value: ControlValue): void {
    const definition = explorerDefinition(this.state());
    try {
      const next = definition.update(this.state(), key, value, this.fluids!);
      this.commit(next);
    } catch (error) {
      this.showError(error);
    }
  }

  private commit(next: ExplorerState): void {
    const entries = Object.entries(next) as [string, unknown][];
    for (const [k] of entries) if (!this.keys.includes(k)) this.keys.push(k);
    this.model.set(Object.fromEntries(entries));
    this.model.save_changes();
  }

  private showError(error: unknown): void {
    this.parts.error.textContent = error ? messageOf(error) : "";
  }

  private drawControls(state: ExplorerState): void {
    const definition = explorerDefinition(state);
    const controls = definition.controls(state, this.fluids!);
    const shape = controlsShape(controls);
    const molarMass =
      state.kind === "pressure-enthalpy" && state.massBasis
        ? state.components[0].molarMassKgPerMol
        : undefined;
    if (shape === this.shape && this.drawn.length === controls.length) {
      controls.forEach((c, i) => this.drawn[i].refresh(c));
      return;
    }
    this.shape = shape;
    this.drawn = controls.map((c) =>
      drawControl(c, state.units, (key, value) => this.apply(key, value), molarMass),
    );
    this.parts.controls.replaceChildren(...this.drawn.map((d) => d.element));
  }

  private scheduleRedraw(): void {
    if (this.busy) {
      this.pending = true;
      return;
    }
    void this.redraw().catch((error: unknown) => this.showError(error));
  }

  /** Recomputes and redraws; moves made while busy collapse into one more redraw. */
  private async redraw(): Promise<void> {
    this.busy = true;
    try {
      const started = performance.now();
      const state = this.state();
      const definition = explorerDefinition(state);
      const spec: ChartSpec = definition.chart(state, this.fluids!);
      const table = definition.table ? definition.table(state, this.fluids!) : undefined;
      const status = definition.status ? definition.status(state, this.fluids!) : "";
      const computed = performance.now();
      const info = await this.chart.show(spec);
      // tableHtml escapes every string it writes, so its output is safe as markup
      if (table !== undefined) this.parts.table.innerHTML = table;
      this.parts.status.textContent = status;
      this.drawControls(state);
      this.showError(undefined);
      const done = performance.now();
      this.el.dispatchEvent(
        new CustomEvent("isochor-explorer-redraw", {
          detail: {
            path: info.path,
            computeMs: computed - started,
            drawMs: done - computed,
            totalMs: done - started,
          },
        }),
      );
    } finally {
      this.busy = false;
    }
    if (this.pending) {
      this.pending = false;
      await this.redraw();
    }
  }

  /** Click or drag on the chart moves the point of explorers that have one. */
  private enablePicking(state: ExplorerState): void {
    const definition = explorerDefinition(state);
    if (!definition.pick) return;
    const live = this.parts.live;
    live.style.cursor = "crosshair";
    live.style.touchAction = "none";
    live.style.userSelect = "none"; // a drag must not select the chart's text
    const at = (event: PointerEvent): { x: number; y: number } | undefined => {
      const view = this.chart.vegaView;
      const svg = live.querySelector("svg");
      if (!view || !svg) return undefined;
      const box = svg.getBoundingClientRect();
      const [ox, oy] = view.origin();
      const x = view.scale("x").invert?.(event.clientX - box.left - ox);
      const y = view.scale("y").invert?.(event.clientY - box.top - oy);
      return typeof x === "number" && typeof y === "number" ? { x, y } : undefined;
    };
    const move = (event: PointerEvent) => {
      const point = at(event);
      if (!point) return;
      const current = this.state();
      try {
        this.commit(explorerDefinition(current).pick!(current, point, this.fluids!));
      } catch (error) {
        this.showError(error);
      }
    };
    live.addEventListener("pointerdown", (event) => {
      event.preventDefault();
      this.dragging = true;
      live.setPointerCapture(event.pointerId);
      move(event);
    });
    live.addEventListener("pointermove", (event) => {
      if (this.dragging) move(event);
    });
    const stop = () => (this.dragging = false);
    live.addEventListener("pointerup", stop);
    live.addEventListener("pointercancel", stop);
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

/** Reads the chart's display metadata (for callers that need the axes' units). */
export function specUnits(spec: ChartSpec): Readonly<Record<string, string>> {
  return chartMeta(spec)?.units ?? {};
}
