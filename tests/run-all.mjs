// `npm test`: every check the project runs, in order, with one plain closing line
// "N passed, N failed" (vitest cases count one each; every other step counts one).
//   1. type-check (kernel-lib, widgets, tests)   2. lint (typescript-eslint)   3. format (Prettier)
//   4. build (kernel-lib to CommonJS + .d.ts, widgets bundle for the browser)
//   5. the public .d.ts compiles under tslab's TypeScript 5.0
//   6. vitest (unit, property and bad-input tests; some use the build)
//   7. every notebook executed through `isochor run` (records into out/test-records/)
//   8. every record checked in headless Chromium (live charts, no page errors, no request off file://)
// Without Chromium the browser checks are skipped with a message; with CI=true that is a failure.
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const root = resolve(fileURLToPath(new URL("..", import.meta.url)));
const outDir = join(root, "out", "test-results");
const recordsDir = join(root, "out", "test-records");
const tsc = join(root, "node_modules", "typescript", "bin", "tsc");
const isCI = process.env.CI === "true";
const chromiumPath = process.env.ISOCHOR_CHROMIUM ?? "/usr/lib/chromium/chromium";

let passed = 0;
let failed = 0;
let skipped = 0;
const failures = [];

function record(name, ok, detail = "") {
  if (ok) passed++;
  else {
    failed++;
    failures.push(`${name}${detail ? `: ${detail}` : ""}`);
  }
  console.log(`${ok ? "ok  " : "FAIL"} ${name}${!ok && detail ? `\n${indent(detail)}` : ""}`);
}

function indent(text) {
  return text
    .trim()
    .split("\n")
    .slice(-40)
    .map((l) => `     ${l}`)
    .join("\n");
}

function run(cmd, args, options = {}) {
  const started = Date.now();
  const result = spawnSync(cmd, args, {
    cwd: root,
    encoding: "utf8",
    maxBuffer: 256 * 1024 * 1024,
    ...options,
  });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  return { ...result, seconds, output: `${result.stdout ?? ""}${result.stderr ?? ""}` };
}

function step(name, cmd, args, options) {
  console.log(`\n== ${name}`);
  const r = run(cmd, args, options);
  record(
    `${name} (${r.seconds} s)`,
    r.status === 0,
    r.status === 0 ? "" : r.output || r.error?.message,
  );
  return r.status === 0;
}

rmSync(outDir, { recursive: true, force: true });
mkdirSync(outDir, { recursive: true });

step("type-check kernel-lib", process.execPath, [
  tsc,
  "-p",
  "kernel-lib/tsconfig.json",
  "--noEmit",
]);
step("type-check widgets", process.execPath, [tsc, "-p", "widgets/tsconfig.json", "--noEmit"]);
step("type-check tests", process.execPath, [tsc, "-p", "tests/tsconfig.json", "--noEmit"]);
step("lint", process.execPath, [join(root, "node_modules", "eslint", "bin", "eslint.js"), "."]);
step("format check", process.execPath, [
  join(root, "node_modules", "prettier", "bin", "prettier.cjs"),
  "--check",
  ".",
]);

// 4. build (before vitest: the display and records tests use kernel-lib/dist).
const built = step("build", "npm", ["run", "build"]);

// 5. the .d.ts must suit tslab's TypeScript 5.0 (tslab compiles notebook cells with it).
if (built) {
  const consumerDir = join(outDir, "ts50-consumer");
  mkdirSync(consumerDir, { recursive: true });
  writeFileSync(
    join(consumerDir, "consumer.ts"),
    'import * as isochor from "isochor";\nexport const keys: string[] = Object.keys(isochor);\n',
  );
  writeFileSync(
    join(consumerDir, "tsconfig.json"),
    JSON.stringify({
      compilerOptions: {
        strict: true,
        noEmit: true,
        module: "commonjs",
        moduleResolution: "node",
        target: "ES2022",
        types: ["node"],
        typeRoots: [join(root, "node_modules", "@types")],
        baseUrl: ".",
        paths: { isochor: [join(root, "kernel-lib")] },
      },
      files: ["consumer.ts"],
    }),
  );
  const ts50 = join(root, "node_modules", "@tslab", "typescript-for-tslab", "bin", "tsc");
  step("public .d.ts under tslab's TypeScript 5.0", process.execPath, [ts50, "-p", consumerDir]);
}

// 6. vitest, counted case by case from its JSON report.
console.log("\n== vitest");
const vitestJson = join(outDir, "vitest.json");
const vitest = run(
  process.execPath,
  [
    join(root, "node_modules", "vitest", "vitest.mjs"),
    "run",
    "--reporter=default",
    "--reporter=json",
    `--outputFile.json=${vitestJson}`,
  ],
  { stdio: ["ignore", "inherit", "inherit"] },
);
if (existsSync(vitestJson)) {
  const report = JSON.parse(readFileSync(vitestJson, "utf8"));
  passed += report.numPassedTests ?? 0;
  failed += report.numFailedTests ?? 0;
  skipped += (report.numPendingTests ?? 0) + (report.numTodoTests ?? 0);
  for (const file of report.testResults ?? []) {
    for (const t of file.assertionResults ?? []) {
      if (t.status === "failed") failures.push(`vitest: ${t.fullName}`);
    }
    if (file.status === "failed" && (file.assertionResults ?? []).length === 0) {
      record(`vitest file ${file.name}`, false, file.message ?? "failed to load");
    }
  }
  console.log(
    `vitest: ${report.numPassedTests} passed, ${report.numFailedTests} failed (${vitest.seconds} s)`,
  );
} else {
  record("vitest", false, `no JSON report (exit ${vitest.status})`);
}

// 7. notebooks through the runner.
const notebooks = readdirSync(join(root, "notebooks"))
  .filter((f) => f.endsWith(".ipynb"))
  .sort();
const records = [];
if (built) {
  rmSync(recordsDir, { recursive: true, force: true });
  for (const nb of notebooks) {
    const ok = step(`notebook ${nb}`, process.execPath, [
      join(root, "kernel-lib", "dist", "cli", "main.js"),
      "run",
      join("notebooks", nb),
      "--out",
      recordsDir,
    ]);
    const html = join(recordsDir, nb.replace(/\.ipynb$/, ".html"));
    if (ok && existsSync(html)) records.push(html);
    else if (ok) record(`record written for ${nb}`, false, `missing ${html}`);
  }
} else {
  record("notebooks", false, "not run: the build failed");
}

// 8. records in headless Chromium.
console.log("\n== browser checks");
if (!existsSync(chromiumPath)) {
  if (isCI)
    record(
      "browser checks",
      false,
      `Chromium not found at ${chromiumPath} (required with CI=true)`,
    );
  else console.log(`browser checks skipped: Chromium not found at ${chromiumPath}`);
} else if (records.length > 0) {
  const checker = join(root, "tests", "browser", "checkRecords.mjs");
  if (!existsSync(checker)) {
    record("browser checks", false, "tests/browser/checkRecords.mjs is missing");
  } else {
    const { checkRecords } = await import(checker);
    const results = await checkRecords(records, { chromiumPath });
    for (const r of results) record(`browser: ${r.name}`, r.ok, r.message);
  }
}

writeFileSync(
  join(outDir, "summary.json"),
  JSON.stringify({ passed, failed, skipped, failures }, null, 2),
);
if (failures.length > 0) {
  console.log(`\nfailures:\n${failures.map((f) => `  - ${f.split("\n")[0]}`).join("\n")}`);
}
console.log(`\n${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ""}`);
process.exit(failed > 0 ? 1 : 0);
