/**
 * Exact rational arithmetic for balancing reactions, from mathjs's fraction type only (importing just its
 * dependencies keeps the functions bundle small).
 */
import { create, fractionDependencies } from "mathjs";
import type { Fraction } from "mathjs";

const math = create({ fractionDependencies });
/** The fraction type's class, which the instance carries (fractionDependencies creates it; mathjs's types omit it). */
const FractionType = (math as unknown as { Fraction: new (n: number, d: number) => Fraction }).Fraction;

export type Rational = Fraction;

/** numerator/denominator exactly: what math.fraction(number, number) returns, without its run-time type dispatch. */
export function rational(numerator: number, denominator = 1): Rational {
  return new FractionType(numerator, denominator);
}

/**
 * Solves A·x = b exactly by Gauss–Jordan elimination. A is rows × cols; returns x, or null when the system has no
 * solution or more than one.
 */
export function solveExact(a: Rational[][], b: Rational[]): Rational[] | null {
  const rows = a.length;
  const cols = rows > 0 ? a[0].length : 0;
  const m = a.map((row, i) => [...row, b[i]]);
  const pivotCols: number[] = [];
  let r = 0;
  for (let c = 0; c < cols && r < rows; c++) {
    let p = r;
    while (p < rows && m[p][c].equals(0)) p++;
    if (p === rows) continue;
    [m[r], m[p]] = [m[p], m[r]];
    const pivot = m[r][c];
    for (let k = c; k <= cols; k++) m[r][k] = m[r][k].div(pivot);
    for (let i = 0; i < rows; i++) {
      if (i === r || m[i][c].equals(0)) continue;
      const factor = m[i][c];
      for (let k = c; k <= cols; k++) m[i][k] = m[i][k].sub(factor.mul(m[r][k]));
    }
    pivotCols.push(c);
    r++;
  }
  if (pivotCols.length < cols) return null; // underdetermined
  for (let i = r; i < rows; i++) if (!m[i][cols].equals(0)) return null; // inconsistent
  const x: Rational[] = new Array(cols);
  pivotCols.forEach((c, i) => (x[c] = m[i][cols]));
  return x;
}
