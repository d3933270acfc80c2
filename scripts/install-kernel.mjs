// Writes the project-local tslab kernel spec under .jupyter-local/ (no global Jupyter state).
// With Debian's Jupyter present it uses tslab's own installer
// (`tslab install --python=/usr/bin/python3 --binary=<abs path> --prefix=.jupyter-local`);
// without it, it writes the same kernel.json directly, so the spec is always there.
import { spawnSync } from "node:child_process";
import { existsSync, mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { debianPython, jupyterLocal, kernelDir, tslabBinary } from "./jupyter-env.mjs";

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

if (import.meta.url === `file://${process.argv[1]}`) {
  installKernel();
}
