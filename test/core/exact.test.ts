/**
 * The exact arithmetic of src/core/exact: decimal reading, rational helpers, conversion to double, fraction-free
 * elimination and the exact least-squares solve, against values worked by hand and against a second exact
 * implementation (Python's fractions module, run from the test; test/helpers/pythonExact.ts).
 */
import { describe, expect, it } from 'vitest';
import {
  add,
  compare,
  decimalParts,
  decimalRational,
  evaluateExact,
  exactLeastSquares,
  fromDouble,
  multiply,
  parseDecimal,
  rational,
  reduce,
  scaleToIntegers,
  solveExact,
  subtract,
  toNumber,
  type Rational,
} from '../../src/core/index.ts';
import { pythonExactLeastSquares, pythonFractions, pythonSolve } from '../helpers/pythonExact.ts';
import { rationalText } from '../helpers/rationalText.ts';

const text = rationalText;

/** The exact hexadecimal spelling of a double (what Python's float.fromhex reads back to the same double). */
function toHex(value: number): string {
  if (value === 0) return Object.is(value, -0) ? '-0x0p+0' : '0x0p+0';
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, value);
  const bits = view.getBigUint64(0);
  const sign = bits >> 63n ? '-' : '';
  const exponent = Number((bits >> 52n) & 0x7ffn);
  const mantissa = (bits & ((1n << 52n) - 1n)).toString(16).padStart(13, '0');
  return exponent === 0 ? `${sign}0x0.${mantissa}p-1022` : `${sign}0x1.${mantissa}p${exponent - 1023}`;
}

describe('decimal reading', () => {
  it('decimalParts reads the decimal a double prints as (computed by hand)', () => {
    expect(decimalParts(-12.5)).toEqual({ digits: -125n, exponent: -1 });
    expect(decimalParts(1e-7)).toEqual({ digits: 1n, exponent: -7 });
    expect(decimalParts(2.5e21)).toEqual({ digits: 25n, exponent: 20 });
    expect(decimalParts(0.1)).toEqual({ digits: 1n, exponent: -1 });
    expect(decimalParts(-0.0015)).toEqual({ digits: -15n, exponent: -4 });
    expect(decimalParts(300)).toEqual({ digits: 300n, exponent: 0 });
    expect(decimalParts(-0)).toEqual({ digits: 0n, exponent: 0 });
  });

  it('decimalParts gives the value of the shortest round-trip decimal, as Python reads repr(x)', () => {
    // Doubles of every size and sign, written with and without an exponent by String(); independent reading:
    // Python's Fraction(repr(x)) (repr is also the shortest decimal that reads back to x).
    const values = [0, -42, 9007199254740991, 9007199254740992, 5e-324, 1.7976931348623157e308, 123456789012345680000, 1e21, 1e-7, 0.000001, 273.15, -459.67, 1 / 3, -2 / 7];
    for (let i = 0; i < 60; i++) values.push((i % 2 ? -1 : 1) * Math.sin(i + 1) * 10 ** ((i % 41) - 20));
    const ours = values.map((value) => {
      const { digits, exponent } = decimalParts(value);
      return `${digits}e${exponent}`;
    });
    const python = pythonFractions(`all(F(repr(x)) == F(t) for x, t in zip([${values.map((value) => `float.fromhex('${toHex(value)}')`).join(',')}], [${ours.map((t) => `'${t}'`).join(',')}]))`);
    expect(python).toBe('True');
  });

  it('scaleToIntegers brings values to one exponent (computed by hand)', () => {
    expect(scaleToIntegers([1.5, 20, -0.25])).toEqual({ ints: [150n, 2000n, -25n], exponent: -2 });
  });

  it('decimalRational and parseDecimal give the written value exactly, not the binary one', () => {
    expect(text(decimalRational(0.1))).toBe('1/10');
    expect(text(parseDecimal('-2422.701'))).toBe('-2422701/1000');
    expect(text(parseDecimal('5e-4'))).toBe('1/2000');
    expect(text(parseDecimal('-1.4674896e+3'))).toBe('-917181/625'); // −14674896/10000 in lowest terms (by hand)
    expect(() => parseDecimal('Infinity')).toThrow(/cannot read/);
    // The binary value of 0.1 is not 1/10: fromDouble keeps it (IEEE 754: 0.1 = 3602879701896397 / 2^55).
    expect(text(fromDouble(0.1))).toBe('3602879701896397/36028797018963968');
  });
});

describe('rational helpers', () => {
  it('add, subtract, multiply, reduce and compare agree with Python fractions', () => {
    const a = rational(7n, 12n);
    const b = rational(-5n, 18n);
    const ours = [text(add(a, b)), text(subtract(a, b)), text(multiply(a, b))];
    const python = pythonFractions('" ".join(str(x) for x in [F(7,12)+F(-5,18), F(7,12)-F(-5,18), F(7,12)*F(-5,18)])').split(' ');
    expect(ours.map((t) => t.replace(/\/1$/, ''))).toEqual(python);
    expect(compare(a, b)).toBe(1);
    expect(compare(b, a)).toBe(-1);
    expect(compare(rational(2n, 4n), rational(1n, 2n))).toBe(0);
  });

  it('toNumber rounds to the nearest double, like Python float(Fraction)', () => {
    const cases: [bigint, bigint][] = [[1n, 3n], [-2n, 7n], [10n ** 30n + 1n, 3n], [1n, 10n ** 320n], [123456789012345678901234567890n, 987654321n]];
    // Numerators and denominators just below, at and above powers of two (where Number(bigint) rounds up to the power),
    // and beyond 2^1000 (where the bit length is found in steps).
    for (const bits of [53n, 54n, 64n, 999n, 1000n, 1001n, 1023n, 1024n, 2100n]) {
      for (const delta of [-1n, 0n, 1n]) cases.push([(1n << bits) + delta, (1n << (bits - 40n)) + 3n], [7n ** 40n, (1n << bits) + delta]);
    }
    const python = JSON.parse(pythonFractions(`__import__("json").dumps([float(F(${cases.map(([n, d]) => `${n},${d}`).join(')), float(F(')}))])`)) as number[];
    cases.forEach(([n, d], i) => expect(toNumber(rational(n, d))).toBe(python[i]));
  });

  it('evaluateExact applies Horner in rationals: 1 + 2u + 3u² at u = 1/2 is 11/4 (computed by hand)', () => {
    expect(text(evaluateExact([rational(1n), rational(2n), rational(3n)], rational(1n, 2n)))).toBe('11/4');
  });

  it('evaluateExact gives the value Python fractions give, over one, dividing and unrelated denominators', () => {
    // Printed decimals (10^e denominators), a change of scale's denominators (D·900^(m−j)·9^j), and denominators
    // none of which divides the largest (3, 7, 10): the three ways in. Independent value: Python's Fraction Horner.
    const cases: [bigint, bigint][][] = [
      [[12n, 10n], [-345n, 100n], [7n, 1000n], [1n, 1n]],
      [[5n, 7n * 900n ** 3n], [-11n, 7n * 900n ** 2n * 9n], [13n, 7n * 900n * 81n], [-2n, 7n * 729n]],
      [[1n, 3n], [2n, 7n], [-3n, 10n]],
    ];
    const at: [bigint, bigint] = [-27315n, 100n];
    const ours = cases.map((coefficients) => text(reduce(evaluateExact(coefficients.map(([n, d]) => rational(n, d)), rational(...at)))));
    const python = cases.map((coefficients) =>
      pythonFractions(`(lambda c, u: (lambda v: f"{v.numerator}/{v.denominator}")(sum(a * u ** k for k, a in enumerate(c))))([${coefficients.map(([n, d]) => `F(${n},${d})`).join(',')}], F(${at[0]},${at[1]}))`),
    );
    expect(ours).toEqual(python);
  });
});

describe('solveExact (fraction-free elimination)', () => {
  it('solveExact solves a 3×3 system exactly (worked by hand: x = 1, y = −2, z = 3; det K = −5)', () => {
    // 2x + y − z = −3, x + 3y + 2z = 1, −x + y + z = 0 → x = 1, y = −2, z = 3 (substitution by hand).
    const K = [[2n, 1n, -1n], [1n, 3n, 2n], [-1n, 1n, 1n]];
    const { denominator, numerators } = solveExact(K, [[-3n], [1n], [0n]]);
    const solution = numerators.map((row) => text(rational(row[0]!, denominator)));
    expect(solution).toEqual(['1/1', '-2/1', '3/1']);
    // det K by cofactor expansion (by hand): 2(3·1 − 2·1) − 1(1·1 − 2·(−1)) + (−1)(1·1 − 3·(−1)) = 2 − 3 − 4 = −5;
    // the determinant is returned up to sign.
    expect(denominator === 5n || denominator === -5n).toBe(true);
    const det = Number(pythonFractions('2*(3*1-2*1) - 1*(1*1-2*(-1)) + (-1)*(1*1-3*(-1))'));
    expect(Math.abs(Number(denominator))).toBe(Math.abs(det));
  });

  it('solveExact solves [K | g | I] (solution and inverse) as Python fractions do, with zero and large entries', () => {
    // A symmetric Hankel matrix of power sums, as exactLeastSquares builds (Σ u^(j+k) over u = 3, 17, 250, 4001, 65537,
    // 1000003), bordered by one constraint row and column with zeros in its corner; right-hand sides: a vector of
    // mixed signs and the identity (whose zero entries the elimination skips). Independent computation: Python's
    // Fraction Gauss–Jordan of the same system (test/helpers/pythonExact.ts).
    const us = [3n, 17n, 250n, 4001n, 65537n, 1000003n];
    const p = 4;
    const K: bigint[][] = [];
    for (let j = 0; j < p + 1; j++) {
      K.push(Array.from({ length: p + 1 }, (_, k) => (j < p && k < p ? us.reduce((sum, u) => sum + u ** BigInt(j + k), 0n) : j === p && k === p ? 0n : 7n ** BigInt(j < p ? j : k))));
    }
    const g = [5n, -3n, 0n, 11n, 2n];
    const B = K.map((_, i) => [g[i]!, ...K.map((__, j) => (i === j ? 1n : 0n))]);
    const { denominator, numerators } = solveExact(K, B);
    const ours = numerators.map((row) => row.map((value) => text(rational(value, denominator))));
    const python = pythonSolve(K.map((row) => row.map(String)), B.map((row) => row.map(String)));
    expect(ours).toEqual(python);
  });

  it('solveExact reports a singular matrix with denominator 0', () => {
    expect(solveExact([[1n, 2n], [2n, 4n]], [[1n], [2n]]).denominator).toBe(0n);
  });

  it('solveExact does not modify its inputs', () => {
    const K = Object.freeze([Object.freeze([4n, 1n]), Object.freeze([1n, 3n])]);
    const B = Object.freeze([Object.freeze([1n]), Object.freeze([2n])]);
    expect(() => solveExact(K, B)).not.toThrow();
  });
});

describe('exactLeastSquares against Python fractions', () => {
  it('exactLeastSquares gives the same exact coefficients as an independent Gauss–Jordan on Fractions', () => {
    const u = [250, 275.5, 301.25, 330, 362.75, 400.5, 441, 480.125, 520];
    const v = [1.2345, 1.3012, 1.4103, 1.5222, 1.6501, 1.8017, 1.9632, 2.1304, 2.3111];
    const w = [1, 4, 2.25, 1, 0.64, 1, 4, 1, 0.25];
    const problems = [
      { order: 3, intercept: true, weights: undefined, constraints: [] },
      { order: 2, intercept: true, weights: w, constraints: [] },
      { order: 3, intercept: false, weights: undefined, constraints: [] },
      { order: 3, intercept: true, weights: w, constraints: [{ u: 300, v: 1.4 }] },
      { order: 4, intercept: true, weights: w, constraints: [], covarianceScale: 'stated' as const },
      { order: 2, intercept: false, weights: undefined, constraints: [{ u: 400.5, v: 1.8 }] },
    ];
    const python = pythonExactLeastSquares(
      problems.map((p) => ({
        u: u.map(String),
        v: v.map(String),
        ...(p.weights ? { w: p.weights.map(String) } : {}),
        order: p.order,
        intercept: p.intercept,
        constraints: p.constraints.map((c) => [String(c.u), String(c.v)] as const),
        stated: 'covarianceScale' in p,
      })),
    );
    problems.forEach((p, i) => {
      const ours = exactLeastSquares({ u, v, weights: p.weights, order: p.order, intercept: p.intercept, constraints: p.constraints, ...('covarianceScale' in p ? { covarianceScale: p.covarianceScale } : {}) })!;
      expect(ours.exactCoefficients.map(text).map((t) => t.replace(/^0\/1$/, '0/1'))).toEqual(python[i]!.exact);
      ours.coefficients.forEach((value, k) => expect(value).toBe(python[i]!.nearest[k]));
      // Every entry of the covariance, both triangles: the nearest double to the exact value.
      expect(ours.covariance).toEqual(python[i]!.covariance);
    });
  });
});
