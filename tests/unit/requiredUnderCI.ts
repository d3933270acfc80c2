/**
 * Environment skips that must not hide under CI: a test that needs a tool of the machine (Python's
 * nbformat, system fonts, Chromium, the build) is skipped without it on a developer's machine, but
 * with CI=true the missing tool is a failure, like the Chromium guard of tests/run-all.mjs (.ci/run
 * installs every one of them, so a skip there means the install step is broken).
 */
import { expect, it } from "vitest";

/** Adds a failing test when `available` is false under CI=true; call beside the skipIf it guards. */
export function requiredUnderCI(available: boolean, what: string): void {
  it.runIf(!available && process.env.CI === "true")(`needs ${what} (required with CI=true)`, () => {
    expect.fail(`${what} is missing; with CI=true that is a failure, not a skip`);
  });
}
