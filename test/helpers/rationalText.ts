/** A rational as reduced "num/den" text, the form Python's fractions prints, for comparing exact results. */
import { reduce, type Rational } from '../../src/core/index.ts';

export function rationalText(value: Rational): string {
  const r = reduce(value);
  return `${r.num}/${r.den}`;
}
