/** Numbers of a calculation record written in full (inputs, ranges, k_ij), for HTML and Markdown. */

/** A number in full, to 10 significant figures without trailing zeros. */
export function fullNumber(value: number): string {
  return String(Number(value.toPrecision(10)));
}

/** A recorded value in full: one number, or a list joined by ", ". */
export function fullValues(v: number | readonly number[]): string {
  return typeof v === "number" ? fullNumber(v) : v.map(fullNumber).join(", ");
}
