#!/usr/bin/env node
/**
 * The `isochor` command: one entry point, one sub-command per file.
 *   isochor run <notebook.ipynb...>   execute notebooks, write executed notebooks and HTML records
 *   isochor eval [request.json]       batch property evaluation, JSON in, JSON out
 *   isochor pvt <file.csv>            departure functions from measured P-V-T data
 *   isochor table <states.csv>        properties of many states, CSV in, CSV out
 *   isochor step [request.json]       one process step on a real fluid, JSON in, JSON out
 */
import type { CliIo } from "./io.js";
import { nodeIo } from "./io.js";

interface Command {
  summary: string;
  load: () => Promise<(argv: string[], io: CliIo) => Promise<number>>;
}

const commands: Record<string, Command> = {
  run: {
    summary: "run <notebook.ipynb...>  execute notebooks and write calculation records",
    load: async () => (await import("./run.js")).runCommand,
  },
  eval: {
    summary: "eval [request.json]     evaluate states from a JSON request (file or stdin)",
    load: async () => (await import("./eval.js")).evalCommand,
  },
  pvt: {
    summary: "pvt <file.csv>          departure functions from measured P-V-T data",
    load: async () => (await import("./pvt.js")).pvtCommand,
  },
  table: {
    summary: "table <states.csv>      properties of a CSV of states, as a CSV with units",
    load: async () => (await import("./table.js")).tableCommand,
  },
  step: {
    summary: "step [request.json]     one process step (valve ... separator) from a JSON request",
    load: async () => (await import("./step.js")).stepCommand,
  },
};

function usage(): string {
  return ["usage: isochor <command> [arguments]", "", "commands:"]
    .concat(Object.values(commands).map((c) => `  ${c.summary}`))
    .concat([
      "",
      "units: SI on a molar basis in and out (K, Pa, mol/m3, J/mol, J/(mol K)); pvt reads the",
      "units written in its CSV headers. `isochor <command> --help` gives each command's units.",
      "",
      "examples:",
      "  npx isochor eval request.json",
      "  npx isochor pvt lab-data.csv --component carbon-dioxide",
      "  npx isochor table states.csv --components methane --units T=degC,h=kJ/kg",
      "  npx isochor step cooler.json",
      "  npx isochor run notebooks/00-start-here.ipynb",
    ])
    .join("\n");
}

export async function main(argv: string[], io: CliIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === "--help" || name === "-h") {
    io.stdout(usage() + "\n");
    return name === undefined ? 2 : 0;
  }
  const command = commands[name];
  if (!command) {
    io.stderr(`isochor: unknown command ${JSON.stringify(name)}\n${usage()}\n`);
    return 2;
  }
  const run = await command.load();
  return run(rest, io);
}

/** Runs the command with this process's arguments and sets its exit code (bin/isochor.js). */
export function runMain(): void {
  main(process.argv.slice(2), nodeIo()).then(
    (code) => {
      process.exitCode = code;
    },
    (error: unknown) => {
      process.stderr.write(
        `isochor: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`,
      );
      process.exitCode = 1;
    },
  );
}

if (require.main === module) runMain();
