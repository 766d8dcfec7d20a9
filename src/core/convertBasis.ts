/**
 * Conversion of polynomial coefficients between the mapped variable t = (u − c)/h and the power basis of u.
 *
 * Σ_j b_j t^j = Σ_j b_j (u − c)^j / h^j = Σ_k a_k u^k with a_k = Σ_{j≥k} b_j · C(j,k) · (−c)^(j−k) / h^j.
 * The sum is formed in exact rational arithmetic from the binary values of b, c and h, so the only error in a_k
 * is the one already present in b (amplified by the conversion's own condition, which a far-from-zero c makes
 * large — that is why the mapped form is published too). The covariance is transformed as T·Σ·Tᵀ in floating point.
 *
 * Cost: O(m²) rational operations.
 */
import { fromDouble, rational, toNumber, type Rational } from './exact/rational.ts';
import type { DomainMap } from './types.ts';

function binomial(n: number, k: number): bigint {
  let result = 1n;
  for (let i = 1; i <= k; i++) result = (result * BigInt(n - k + i)) / BigInt(i);
  return result;
}

/** Matrix T (rows k, columns j) with a = T·b, as exact rationals. */
function conversionMatrix(map: DomainMap, size: number): Rational[][] {
  const c = fromDouble(map.center);
  const h = fromDouble(map.halfWidth);
  const rows: Rational[][] = [];
  for (let k = 0; k < size; k++) {
    const row: Rational[] = [];
    for (let j = 0; j < size; j++) {
      if (j < k) {
        row.push(rational(0n));
        continue;
      }
      // C(j,k)·(−c)^(j−k)/h^j
      const e = j - k;
      const num = binomial(j, k) * (-c.num) ** BigInt(e) * h.den ** BigInt(j);
      const den = c.den ** BigInt(e) * h.num ** BigInt(j);
      row.push(rational(num, den));
    }
    rows.push(row);
  }
  return rows;
}

/** Power-basis coefficients a (in u) from mapped coefficients b (in t). @example mappedToPower([1, 1], { center: 2, halfWidth: 1 }) // => [-1, 1] */
export function mappedToPower(mapped: readonly number[], map: DomainMap): number[] {
  const T = conversionMatrix(map, mapped.length);
  const b = mapped.map(fromDouble);
  return T.map((row) => {
    let num = 0n;
    let den = 1n;
    row.forEach((entry, j) => {
      const term = b[j]!;
      if (entry.num === 0n || term.num === 0n) return;
      const tn = entry.num * term.num;
      const td = entry.den * term.den;
      num = num * td + tn * den;
      den = den * td;
    });
    return toNumber(rational(num, den));
  });
}

/** Covariance of a = T·b given the covariance of b. */
export function mappedCovarianceToPower(
  covariance: readonly (readonly number[])[],
  map: DomainMap,
): number[][] {
  const size = covariance.length;
  const T = conversionMatrix(map, size).map((row) => row.map(toNumber));
  const temp = T.map((row) => covariance[0]!.map((_, l) => row.reduce((sum, value, j) => sum + value * covariance[j]![l]!, 0)));
  return temp.map((row) => T.map((other) => row.reduce((sum, value, l) => sum + value * other[l]!, 0)));
}
