/**
 * A name that matches more than one component (a formula shared by isomers, e.g. C4H10 for
 * n-butane and isobutane). A subclass of UnknownNameError (code "unknown-name"), so callers that
 * catch unknown names catch this too; `choices` lists the ids that match.
 */
import { UnknownNameError } from "../errors.js";

export class AmbiguousNameError extends UnknownNameError {
  /** Ids of every component the name matches. */
  readonly choices: readonly string[];
  constructor(kind: string, received: string, choices: readonly string[]) {
    super(kind, received, choices);
    this.choices = choices;
    this.message = `${kind} name ${JSON.stringify(received)} is ambiguous; it matches ${choices.join(", ")}: use one of these ids`;
  }
}
