// `npm run notebook`: the classic Jupyter notebook on 127.0.0.1 with the project-local TypeScript
// kernel, serving notebooks/. Builds the library first so `import ... from "isochor"` resolves.
import { spawn, spawnSync } from "node:child_process";
import { join } from "node:path";
import { installKernel, installPageRuntime } from "./install-kernel.mjs";
import { findJupyter, installHint, jupyterEnv, repoRoot } from "./jupyter-env.mjs";

const jupyter = findJupyter();
if (!jupyter) {
  console.error(installHint);
  process.exit(1);
}
const build = spawnSync("npm", ["run", "build"], { cwd: repoRoot, stdio: "inherit" });
if (build.status !== 0) process.exit(build.status ?? 1);
installKernel();
await installPageRuntime();
const args = [
  "notebook",
  "--ip=127.0.0.1",
  "--no-browser",
  `--notebook-dir=${join(repoRoot, "notebooks")}`,
];
// Jupyter refuses to start as root without --allow-root (containers often run as root).
if (process.getuid?.() === 0 && !process.argv.includes("--allow-root")) {
  console.log("note: running as root, so Jupyter is started with --allow-root");
  args.push("--allow-root");
}
console.log(`starting: ${jupyter} ${args.join(" ")}`);
const child = spawn(jupyter, args.concat(process.argv.slice(2)), {
  stdio: "inherit",
  env: jupyterEnv(),
});
child.on("exit", (code) => process.exit(code ?? 0));
