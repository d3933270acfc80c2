import { defineConfig } from "vitest/config";

// Unit and property tests run against the TypeScript sources (no build needed).
// Notebook execution and browser checks are driven by tests/run-all.mjs after a build.
export default defineConfig({
  test: {
    include: ["tests/unit/**/*.test.ts"],
    environment: "node",
    testTimeout: 60_000,
    pool: "forks",
    maxWorkers: 2,
  },
});
