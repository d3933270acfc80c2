// Where the project keeps its Jupyter state: everything under the repo, nothing global.
// The kernel spec lives in .jupyter-local/share/jupyter/kernels/tslab (written by install-kernel.mjs);
// JUPYTER_PATH points there so an installed Jupyter finds the TypeScript kernel.
import { existsSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), "..");
export const jupyterLocal = join(repoRoot, ".jupyter-local");
export const jupyterDataDir = join(jupyterLocal, "share", "jupyter");
export const kernelDir = join(jupyterDataDir, "kernels", "tslab");
export const tslabBinary = join(repoRoot, "node_modules", ".bin", "tslab");

/** Debian's python3 runs Debian's Jupyter; the first python3 on PATH may be another one. */
export const debianPython = "/usr/bin/python3";

/** The `jupyter` command from Debian's packages, or null when Jupyter is not installed. */
export function findJupyter() {
  for (const candidate of ["/usr/bin/jupyter", "/usr/local/bin/jupyter"]) {
    if (existsSync(candidate)) return candidate;
  }
  return null;
}

/** Environment for a Jupyter process that sees only the project-local kernel spec first. */
export function jupyterEnv(base = process.env) {
  return {
    ...base,
    JUPYTER_PATH: [jupyterDataDir, base.JUPYTER_PATH].filter(Boolean).join(":"),
    JUPYTER_CONFIG_DIR: join(jupyterLocal, "config"),
    JUPYTER_RUNTIME_DIR: join(jupyterLocal, "runtime"),
    JUPYTER_DATA_DIR: join(jupyterLocal, "data"),
  };
}

export const installHint =
  "Jupyter is not installed. On Debian: apt-get install jupyter-notebook jupyter-nbconvert " +
  "python3-nbclient python3-ipykernel (it runs on Debian's /usr/bin/python3), then run this again.";
