/**
 * Formats a number for a chart label (internal to the chart builders): 4 significant figures, no
 * trailing zeros.
 */
export function shortNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  return String(Number(value.toPrecision(4)));
}
