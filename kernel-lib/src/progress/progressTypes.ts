/** What a progress display shows at one moment. */
export interface ProgressSnapshot {
  /** What is being computed (plain text), e.g. "h and s on a 200 x 200 grid". */
  readonly label: string;
  /** Items done so far. */
  readonly done: number;
  /** Items in all, when known. */
  readonly total?: number;
  /** Name of the items, e.g. "states". */
  readonly unit: string;
  /** Seconds since the work started. */
  readonly elapsedSeconds: number;
  /** Items per second so far (0 before the first item). */
  readonly ratePerSecond: number;
  /** Estimated seconds left, when the total is known and the rate is positive. */
  readonly remainingSeconds?: number;
  /** "running", "done" or "failed". */
  readonly status: "running" | "done" | "failed";
  /** The failure message, when failed. */
  readonly failure?: string;
}

/** Where progress goes: a notebook output updated in place, a terminal line, or nowhere. */
export interface ProgressSink {
  /** Shows a snapshot (replaces what the sink showed before). */
  show(snapshot: ProgressSnapshot): void;
}
