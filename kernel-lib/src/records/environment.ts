/**
 * The environment a record was produced in: library version, git commit of the notebook's
 * checkout, Node, tslab and tslab's TypeScript. Every field falls back to "unknown" rather than
 * failing the run.
 */
import { execFileSync } from "node:child_process";
import * as fs from "node:fs";
import * as path from "node:path";
import { tslabPackageDir } from "./tslabSession.js";

export interface RunEnvironment {
  /** isochor's version (kernel-lib/package.json). */
  isochorVersion: string;
  /** `git rev-parse HEAD` in the notebook's folder, or "unknown" outside a git checkout. */
  gitCommit: string;
  /** True when tracked files differ from that commit; undefined when unknown. */
  gitDirty?: boolean;
  nodeVersion: string;
  tslabVersion: string;
  /** The TypeScript version tslab compiles cells with. */
  typescriptVersion: string;
}

function readVersion(manifest: string): string {
  try {
    const { version } = JSON.parse(fs.readFileSync(manifest, "utf8")) as { version?: unknown };
    return typeof version === "string" ? version : "unknown";
  } catch {
    return "unknown";
  }
}

function git(args: string[], cwd: string): string | undefined {
  try {
    return execFileSync("git", args, {
      cwd,
      encoding: "utf8",
      stdio: ["ignore", "pipe", "ignore"],
      timeout: 10_000,
    }).trim();
  } catch {
    return undefined;
  }
}

/** Reads the environment; `notebookDir` decides which git checkout is reported. */
export function runEnvironment(notebookDir: string): RunEnvironment {
  // src/records and dist/records both sit two levels below kernel-lib/.
  const isochorVersion = readVersion(path.join(__dirname, "..", "..", "package.json"));
  const commit = git(["rev-parse", "HEAD"], notebookDir);
  const status = commit
    ? git(["status", "--porcelain", "--untracked-files=no"], notebookDir)
    : undefined;
  const tslabDir = tslabPackageDir();
  let typescriptVersion = "unknown";
  try {
    typescriptVersion = readVersion(
      require.resolve("@tslab/typescript-for-tslab/package.json", { paths: [tslabDir] }),
    );
  } catch {
    // keep "unknown"
  }
  return {
    isochorVersion,
    gitCommit: commit && /^[0-9a-f]{7,64}$/.test(commit) ? commit : "unknown",
    gitDirty: status === undefined ? undefined : status.length > 0,
    nodeVersion: process.version,
    tslabVersion: readVersion(path.join(tslabDir, "package.json")),
    typescriptVersion,
  };
}
