// Writes the project-local tslab kernel spec under .jupyter-local/ (no global Jupyter state).
// With Debian's Jupyter present it uses tslab's own installer
// (`tslab install --python=/usr/bin/python3 --binary=<abs path> --prefix=.jupyter-local`);
// without it, it writes the same kernel.json directly, so the spec is always there.
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import {
  debianPython,
  jupyterDataDir,
  jupyterLocal,
  kernelDir,
  repoRoot,
  tslabBinary,
} from "./jupyter-env.mjs";

export function installKernel({ quiet = false } = {}) {
  if (!existsSync(tslabBinary)) {
    throw new Error(`tslab is not installed at ${tslabBinary}: run npm ci first`);
  }
  const hasJupyterClient =
    existsSync(debianPython) &&
    spawnSync(debianPython, ["-c", "import jupyter_client"], { stdio: "ignore" }).status === 0;
  if (hasJupyterClient) {
    const result = spawnSync(
      tslabBinary,
      [
        "install",
        `--python=${debianPython}`,
        `--binary=${tslabBinary}`,
        `--prefix=${jupyterLocal}`,
      ],
      { encoding: "utf8" },
    );
    if (result.status !== 0) {
      throw new Error(`tslab install failed:\n${result.stderr}${result.stdout}`);
    }
  } else {
    mkdirSync(kernelDir, { recursive: true });
    const spec = {
      argv: [tslabBinary, "kernel", "--config-path", "{connection_file}"],
      display_name: "TypeScript",
      language: "typescript",
    };
    writeFileSync(join(kernelDir, "kernel.json"), JSON.stringify(spec, null, 1) + "\n");
  }
  if (!quiet) console.log(`kernel spec: ${join(kernelDir, "kernel.json")}`);
  return kernelDir;
}

/**
 * Writes the chart runtime and the explorers' bundle under .jupyter-local/share/jupyter/
 * nbextensions/isochor/, where the classic notebook serves them: outputs of a page that was
 * refreshed or reopened on a running kernel load them from there (display/pageLoader.ts).
 * Needs the build (kernel-lib/dist, widgets/dist); without it, says so and writes nothing.
 */
export async function installPageRuntime({ quiet = false } = {}) {
  const writer = join(repoRoot, "kernel-lib", "dist", "display", "notebookRuntimeFiles.js");
  if (!existsSync(writer)) {
    console.warn(`page runtime not written: ${writer} is missing (run npm run build first)`);
    return null;
  }
  const { writeNotebookRuntimeFiles } = await import(pathToFileURL(writer).href);
  const { folder, bytes } = writeNotebookRuntimeFiles(jupyterDataDir);
  if (!quiet) {
    const sizes = Object.entries(bytes)
      .map(([name, n]) => `${name} ${(n / 1024).toFixed(0)} KB`)
      .join(", ");
    console.log(`page runtime for refreshed pages: ${folder} (${sizes})`);
  }
  return folder;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  installKernel();
  await installPageRuntime();
}
