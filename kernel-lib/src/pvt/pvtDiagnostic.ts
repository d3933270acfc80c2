/** One finding of the P-V-T route, for the user: what, where, how serious, and what to do. */
export interface PvtDiagnostic {
  /** Stable code, e.g. "fit-pattern", "two-phase", "maxwell-disagreement". */
  readonly code: string;
  readonly severity: "info" | "warning" | "refusal";
  readonly message: string;
}
