/**
 * The explorer's model: the serialisable state (kernel-lib/src/explorers/explorerState.ts) behind
 * the methods a Jupyter widget model has (`get`, `set`, `save_changes`, `on`, `off`), so the views
 * below work unchanged on a comm-backed DOMWidgetModel of @jupyter-widgets/base once the kernel
 * has a comm channel. Here there is no kernel side: `save_changes` only tells the listeners.
 */
import type { WidgetModel } from "@jupyter-widgets/base";
import type { ExplorerState } from "../../../kernel-lib/src/explorers/explorerState.js";

/**
 * What the views use of a widget model. ExplorerModel implements it, and @jupyter-widgets/base's
 * WidgetModel (hence DOMWidgetModel) is checked below to satisfy it, so a comm-backed model can
 * be handed to the same views.
 */
export interface ExplorerModelLike {
  get(key: string): unknown;
  set(key: string | Record<string, unknown>, value?: unknown): unknown;
  save_changes(): void;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  on(events: string, callback: (...args: any[]) => void): unknown;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  off(events?: string, callback?: (...args: any[]) => void): unknown;
}

/** Compile-time check: a Jupyter WidgetModel can stand in for ExplorerModelLike. */
export type WidgetModelFits = WidgetModel extends ExplorerModelLike ? true : never;
const widgetModelFits: WidgetModelFits = true;
void widgetModelFits;

type Listener = (model: ExplorerModel) => void;

/** An in-page widget model holding an explorer's state. */
export class ExplorerModel implements ExplorerModelLike {
  private attributes: Record<string, unknown>;
  private readonly listeners = new Map<string, Set<Listener>>();
  private changed = new Set<string>();

  constructor(state: ExplorerState) {
    this.attributes = { ...state };
  }

  /** Value of one state field (widget protocol). */
  get(key: string): unknown {
    return this.attributes[key];
  }

  /** Sets one field, or several from an object (widget protocol); listeners hear on save_changes. */
  set(key: string | Record<string, unknown>, value?: unknown): this {
    const entries = typeof key === "string" ? [[key, value] as const] : Object.entries(key);
    for (const [k, v] of entries) {
      if (this.attributes[k] !== v) {
        this.attributes = { ...this.attributes, [k]: v };
        this.changed.add(k);
      }
    }
    return this;
  }

  /** Announces the changes made by set: "change:<key>" per field, then "change" (widget protocol). */
  save_changes(): void {
    const keys = [...this.changed];
    this.changed = new Set();
    if (keys.length === 0) return;
    for (const k of keys) this.emit(`change:${k}`);
    this.emit("change");
  }

  /** Listens to "change" or "change:<key>" (space-separated names allowed). */
  on(events: string, callback: Listener): this {
    for (const name of events.split(/\s+/).filter(Boolean)) {
      let set = this.listeners.get(name);
      if (!set) this.listeners.set(name, (set = new Set()));
      set.add(callback);
    }
    return this;
  }

  /** Stops listening (all listeners of the events when no callback is given). */
  off(events?: string, callback?: Listener): this {
    if (events === undefined) {
      this.listeners.clear();
      return this;
    }
    for (const name of events.split(/\s+/).filter(Boolean)) {
      if (callback) this.listeners.get(name)?.delete(callback);
      else this.listeners.delete(name);
    }
    return this;
  }

  /** The state as plain JSON (what a comm would sync). */
  toJSON(): ExplorerState {
    return { ...this.attributes } as unknown as ExplorerState;
  }

  private emit(name: string): void {
    for (const f of this.listeners.get(name) ?? []) f(this);
  }
}

/** Reads the whole state from any widget-like model, field by field. */
export function readState(model: ExplorerModelLike, keys: readonly string[]): ExplorerState {
  const state: Record<string, unknown> = {};
  for (const k of keys) {
    const v: unknown = model.get(k);
    if (v !== undefined) state[k] = v;
  }
  return state as unknown as ExplorerState;
}
