/** Shared fixtures for the engine tests: components from the project's table. */
import { getComponent } from "../../../kernel-lib/src/components/getComponent.js";
import type { Component } from "../../../kernel-lib/src/components/types.js";

export function comps(...ids: string[]): Component[] {
  return ids.map((id) => getComponent(id));
}

/** |a - b| <= tol * max(|a|, |b|, floor) */
export function relClose(a: number, b: number, tol: number, floor = 0): boolean {
  return Math.abs(a - b) <= tol * Math.max(Math.abs(a), Math.abs(b), floor);
}
