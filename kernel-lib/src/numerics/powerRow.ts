/**
 * The row (1, x, x^2, ..., x^(terms-1)) of a polynomial design matrix (Vandermonde row), each
 * power as x ** j. A plain loop: `Array.from({ length }, fn)` goes through the iterator protocol
 * and was a large part of the cost of fitting long isochores.
 */
export function powerRow(x: number, terms: number): number[] {
  const row = new Array<number>(terms);
  for (let j = 0; j < terms; j++) row[j] = x ** j;
  return row;
}
