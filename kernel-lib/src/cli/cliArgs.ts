/**
 * Command-line arguments of the sub-commands, read by `node:util.parseArgs` (long options with a
 * value as `--name value` or `--name=value`, `-h`/`--help`, `--` ends the options), with the
 * messages of this command line: an unknown option and an option without its value are named.
 * parseArgs runs non-strict so that a value starting with a dash (`--cell-timeout -3`) reaches the
 * command's own check, which says what range is allowed.
 */
import { parseArgs } from "node:util";

/** An option that takes a value; `needs` completes "--name needs ..." when the value is missing. */
export interface CliOption {
  readonly needs: string;
}

/** What was given: option values by name (undefined: not given) and the positional arguments. */
export interface CliArgs {
  readonly values: Readonly<Record<string, string | undefined>>;
  readonly positionals: readonly string[];
}

/**
 * Reads `argv` against the value options of a command.
 * @returns "help" when -h or --help is given, `{ error }` for a usage error, else the arguments.
 */
export function parseCliArgs(
  argv: readonly string[],
  options: Readonly<Record<string, CliOption>>,
): CliArgs | { error: string } | "help" {
  const { tokens } = parseArgs({
    args: [...argv],
    options: {
      ...Object.fromEntries(Object.keys(options).map((name) => [name, { type: "string" }])),
      help: { type: "boolean", short: "h" },
    },
    allowPositionals: true,
    strict: false,
    tokens: true,
  });
  if (tokens.some((t) => t.kind === "option" && t.name === "help")) return "help";
  const values: Record<string, string | undefined> = {};
  const positionals: string[] = [];
  for (const token of tokens) {
    if (token.kind === "positional") positionals.push(token.value);
    if (token.kind !== "option") continue;
    const option = options[token.name];
    if (option === undefined) return { error: `unknown option ${JSON.stringify(token.rawName)}` };
    if (token.value === undefined) return { error: `${token.rawName} needs ${option.needs}` };
    values[token.name] = token.value;
  }
  return { values, positionals };
}
