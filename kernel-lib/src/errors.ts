/**
 * Typed errors of the library. Every failure a user can cause or meet is one of these, so a
 * notebook, the batch CLI and the browser explorers can all report it the same way:
 * a stable `code`, a message written for an engineer, and structured fields for programs.
 */

/** Stable machine-readable error codes (used by `isochor eval` responses). */
export type ErrorCode =
  | "bad-input"
  | "out-of-range"
  | "unknown-name"
  | "ambiguous-unit"
  | "phase-unavailable"
  | "solver-failed"
  | "bad-request"
  | "runner-failed";

/** Base class: every error thrown on purpose by the library. */
export class IsochorError extends Error {
  readonly code: ErrorCode;
  constructor(code: ErrorCode, message: string) {
    super(message);
    this.code = code;
    this.name = new.target.name;
  }
}

/** Describes an input that was refused: its name, unit, valid range and the value received. */
export interface InputProblem {
  /** Name of the input as the caller wrote it, e.g. "temperatureK" or "states[3].P". */
  input: string;
  /** Unit of the value, e.g. "K"; "-" for dimensionless. */
  unit: string;
  /** The valid range in words, e.g. "> 0" or "200 K to 1500 K". */
  validRange: string;
  /** The value received (any type; NaN and undefined are shown as such). */
  received: unknown;
  /** Optional hint: what to do instead. */
  hint?: string;
}

/** Longest text of a received value echoed in a message; longer ones are cut and their length told. */
const ECHO_LIMIT = 200;

function clip(text: string): string {
  return text.length <= ECHO_LIMIT
    ? text
    : `${text.slice(0, ECHO_LIMIT)}... (${text.length} characters)`;
}

function show(value: unknown): string {
  if (typeof value === "number") return Number.isNaN(value) ? "NaN" : String(value);
  if (typeof value === "string") {
    return value.length <= ECHO_LIMIT
      ? JSON.stringify(value)
      : `${JSON.stringify(value.slice(0, ECHO_LIMIT))}... (${value.length} characters)`;
  }
  if (value === undefined) return "undefined";
  try {
    return clip(JSON.stringify(value) ?? String(value));
  } catch {
    return clip(String(value));
  }
}

/** An input outside its valid domain (NaN, non-positive, wrong type, ...). */
export class InputError extends IsochorError implements InputProblem {
  readonly input: string;
  readonly unit: string;
  readonly validRange: string;
  readonly received: unknown;
  readonly hint?: string;
  constructor(problem: InputProblem, code: ErrorCode = "bad-input") {
    super(
      code,
      `${problem.input} must be ${problem.validRange}${problem.unit && problem.unit !== "-" ? ` (unit: ${problem.unit})` : ""}; received ${show(problem.received)}` +
        (problem.hint ? `. ${problem.hint}` : ""),
    );
    this.input = problem.input;
    this.unit = problem.unit;
    this.validRange = problem.validRange;
    this.received = problem.received;
    this.hint = problem.hint;
  }
}

/** An input inside its mathematical domain but outside a correlation's or equation's validity range. */
export class OutOfRangeError extends InputError {
  constructor(problem: InputProblem) {
    super(problem, "out-of-range");
  }
}

/** A name (component, model, unit) that is not known; carries the closest known names. */
export class UnknownNameError extends IsochorError {
  readonly kind: string;
  readonly received: string;
  readonly suggestions: readonly string[];
  constructor(kind: string, received: string, suggestions: readonly string[]) {
    super(
      "unknown-name",
      `unknown ${kind} ${show(received)}` +
        (suggestions.length > 0 ? `; closest: ${suggestions.join(", ")}` : ""),
    );
    this.kind = kind;
    this.received = received;
    this.suggestions = suggestions;
  }
}

/** A unit string that could mean more than one thing, e.g. a bare "psi". */
export class AmbiguousUnitError extends IsochorError {
  readonly received: string;
  readonly choices: readonly string[];
  constructor(received: string, choices: readonly string[]) {
    super(
      "ambiguous-unit",
      `unit ${show(received)} is ambiguous; write one of: ${choices.join(", ")}`,
    );
    this.received = received;
    this.choices = choices;
  }
}

/** The requested phase does not exist at the requested conditions. */
export class PhaseUnavailableError extends IsochorError {
  constructor(message: string) {
    super("phase-unavailable", message);
  }
}

/** A numerical method did not converge; the message says what was tried. */
export class SolverError extends IsochorError {
  /** Name of the method, e.g. "Brent root finding". */
  readonly method: string;
  /** What was tried: bracket, start values, iterations used, last residual. */
  readonly tried: string;
  constructor(method: string, tried: string) {
    super("solver-failed", `${method} failed: ${tried}`);
    this.method = method;
    this.tried = tried;
  }
}

/** A malformed batch request; `path` is the JSON path of the problem, e.g. "$.states[2].T". */
export class RequestError extends IsochorError {
  readonly path: string;
  constructor(path: string, message: string) {
    super("bad-request", `${path}: ${message}`);
    this.path = path;
  }
}

/**
 * A warning attached to a result (never thrown): a state slightly outside a correlation's range,
 * a model used outside its intended domain. Results carry `warnings: Warning[]`.
 */
export interface ResultWarning {
  /**
   * "phase-split": a mixture is not stable as one phase at these conditions (tangent-plane test),
   * so the single-phase state is metastable or unstable.
   */
  /** "process-condition": a plant condition found by a process step (process/types.ts). */
  code:
    | "outside-validity"
    | "extrapolated"
    | "model-limitation"
    | "accuracy"
    | "phase-split"
    | "process-condition";
  message: string;
}
