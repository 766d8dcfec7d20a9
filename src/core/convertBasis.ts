/**
 * Conversion of polynomial coefficients between the mapped variable t = (u − c)/h and the power basis of u, in
 * exact rational arithmetic.
 *
 * The centre c and half-width h are short decimals (domainMapFor) and are read as the decimals they print as, so
 * the conversion is exact both ways:
 *   power from mapped:  a_k = Σ_{j≥k} b_j · C(j,k) · (−c)^(j−k) / h^j
 *   mapped from power:  b_j = Σ_{k≥j} a_k · C(k,j) · c^(k−j) · h^j
 * (binomial expansion of (u − c)^j and of u^k = (c + h·t)^k). The published mapped form is the second one applied to
 * the exactly certified power coefficients, so both forms are the same certified polynomial, each rounded once to
 * double. The covariance is transformed as T·Σ·Tᵀ in floating point (it is a diagnostic, not a certified value).
 *
 * Cost: O(m²) rational operations.
 */
import { decimalRational } from './exact/decimal.ts';
import { add, fromDouble, multiply, rational, reduce, toNumber, type Rational } from './exact/rational.ts';
import type { DomainMap } from './types.ts';

function binomial(n: number, k: number): bigint {
  let result = 1n;
  for (let i = 1; i <= k; i++) result = (result * BigInt(n - k + i)) / BigInt(i);
  return result;
}

function power(value: Rational, exponent: number): Rational {
  return rational(value.num ** BigInt(exponent), value.den ** BigInt(exponent));
}

/** Matrix T (rows k, columns j) with a = T·b, as exact rationals: C(j,k)·(−c)^(j−k)/h^j for j ≥ k. */
function powerFromMappedMatrix(map: DomainMap, size: number): Rational[][] {
  const c = decimalRational(map.center);
  const h = decimalRational(map.halfWidth);
  return Array.from({ length: size }, (_, k) =>
    Array.from({ length: size }, (_, j) => {
      if (j < k) return rational(0n);
      const e = j - k;
      return rational(binomial(j, k) * (-c.num) ** BigInt(e) * h.den ** BigInt(j), c.den ** BigInt(e) * h.num ** BigInt(j));
    }),
  );
}

function apply(matrix: readonly (readonly Rational[])[], vector: readonly Rational[]): Rational[] {
  return matrix.map((row) => reduce(row.reduce((sum, entry, j) => (entry.num === 0n || vector[j]!.num === 0n ? sum : add(sum, multiply(entry, vector[j]!))), rational(0n))));
}

/**
 * Exact power-basis coefficients a (in u) from exact mapped coefficients b (in t).
 * @example powerFromMappedExact([rational(1n), rational(1n)], { center: 2, halfWidth: 1 }).map(toNumber) // => [-1, 1]
 */
export function powerFromMappedExact(mapped: readonly Rational[], map: DomainMap): Rational[] {
  return apply(powerFromMappedMatrix(map, mapped.length), mapped);
}

/**
 * Exact mapped coefficients b (in t = (u − c)/h) from exact power-basis coefficients a (in u).
 * @example mappedFromPowerExact([rational(-1n), rational(1n)], { center: 2, halfWidth: 1 }).map(toNumber) // => [1, 1]
 */
export function mappedFromPowerExact(coefficients: readonly Rational[], map: DomainMap): Rational[] {
  return substituteAffineExact(coefficients, decimalRational(map.center), decimalRational(map.halfWidth));
}

/**
 * Exact coefficients of q(s) = p(offset + factor·s) from the exact coefficients of p: the substitution of an affine
 * change of variable, c_j = Σ_{k≥j} a_k · C(k,j) · offset^(k−j) · factor^j (binomial expansion of (offset + factor·s)^k).
 * The mapped form is the case offset = centre, factor = half-width; a change of temperature scale is another
 * (x_K = x_°C + 273.15: offset 273.15, factor 1). Cost: O(m²) big-integer operations.
 * @example substituteAffineExact([rational(0n), rational(1n)], rational(27315n, 100n), rational(1n)).map(toNumber) // => [273.15, 1]
 */
export function substituteAffineExact(coefficients: readonly Rational[], offset: Rational, factor: Rational): Rational[] {
  const c = offset;
  const h = factor;
  const size = coefficients.length;
  const m = size - 1;
  const denominator = coefficients[0]?.den ?? 1n;
  if (coefficients.every((a) => a.den === denominator)) {
    // Integers only: b_j = Σ_k N_k·C(k,j)·cn^(k−j)·cd^(m−k)·hn^j / (D·cd^(m−j)·hd^j), with a_k = N_k/D.
    const cdPowers = [1n];
    const cnPowers = [1n];
    for (let i = 1; i <= m; i++) {
      cdPowers.push(cdPowers[i - 1]! * c.den);
      cnPowers.push(cnPowers[i - 1]! * c.num);
    }
    return Array.from({ length: size }, (_, j) => {
      let sum = 0n;
      for (let k = j; k <= m; k++) {
        const numerator = coefficients[k]!.num;
        if (numerator !== 0n) sum += numerator * binomial(k, j) * cnPowers[k - j]! * cdPowers[m - k]!;
      }
      return rational(sum * h.num ** BigInt(j), denominator * cdPowers[m - j]! * h.den ** BigInt(j));
    });
  }
  return apply(substitutionMatrix(c, h, size), coefficients);
}

/** Matrix S (rows j, columns k) with c = S·a for q(s) = p(offset + factor·s): C(k,j)·offset^(k−j)·factor^j, k ≥ j. */
function substitutionMatrix(offset: Rational, factor: Rational, size: number): Rational[][] {
  // The powers of offset and factor, each formed once (the same rationals power() gives).
  const offsetPowers = Array.from({ length: size }, (_, e) => power(offset, e));
  const factorPowers = Array.from({ length: size }, (_, e) => power(factor, e));
  return Array.from({ length: size }, (_, j) =>
    Array.from({ length: size }, (_, k) => (k < j ? rational(0n) : multiply(rational(binomial(k, j)), multiply(offsetPowers[k - j]!, factorPowers[j]!)))),
  );
}

/**
 * Covariance of the coefficients of q(s) = p(offset + factor·s) given the covariance of p's: S·Σ·Sᵀ in floating
 * point (a diagnostic, not a certified value), with S exact and rounded once per entry.
 * @example substitutedCovariance([[1, 0], [0, 1]], rational(0n), rational(2n)) // => [[1, 0], [0, 4]]
 */
export function substitutedCovariance(covariance: readonly (readonly number[])[], offset: Rational, factor: Rational): number[][] {
  return congruence(substitutionMatrix(offset, factor, covariance.length).map((row) => row.map(toNumber)), covariance);
}

/** T·Σ·Tᵀ in floating point. */
function congruence(T: readonly (readonly number[])[], covariance: readonly (readonly number[])[]): number[][] {
  const temp = T.map((row) => covariance[0]!.map((_, l) => row.reduce((sum, value, j) => sum + value * covariance[j]![l]!, 0)));
  return temp.map((row) => T.map((other) => row.reduce((sum, value, l) => sum + value * other[l]!, 0)));
}

/**
 * Power-basis coefficients a (in u) from mapped coefficients b (in t), both as doubles; b is read exactly as the
 * binary values it holds, and each a_k is the nearest double to the exact sum.
 * @example mappedToPower([1, 1], { center: 2, halfWidth: 1 }) // => [-1, 1]
 */
export function mappedToPower(mapped: readonly number[], map: DomainMap): number[] {
  return powerFromMappedExact(mapped.map((value) => fromDouble(value)), map).map(toNumber);
}

/**
 * Covariance of a = T·b given the covariance of b (floating point).
 * @example mappedCovarianceToPower([[1, 0], [0, 1]], { center: 0, halfWidth: 2 }) // => [[1, 0], [0, 0.25]]
 */
export function mappedCovarianceToPower(covariance: readonly (readonly number[])[], map: DomainMap): number[][] {
  return congruence(powerFromMappedMatrix(map, covariance.length).map((row) => row.map(toNumber)), covariance);
}
