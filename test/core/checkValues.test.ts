/**
 * Check values that catch a copy error (property-based, fast-check with a fixed seed): over many fits — plain,
 * weighted, transformed (1/x, ln x, ln y) and constrained — a copy of the PRINTED equation evaluated in double
 * precision (as a designer's spreadsheet or program would) agrees with every printed check value within its stated
 * tolerance, and changing the last printed digit of any single coefficient by ±1 moves at least one check value
 * beyond it. The property is the requirement itself (issue: check values that catch a copy error); the
 * implementation evaluates exactly in rationals, the test in plain floating point, so they are independent.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitPolynomial, lastPrintedPlace, type PolynomialFit, type TransformX, type TransformY } from '../../src/core/index.ts';

const settings = { seed: 20261202, numRuns: 120 };

/** The printed equation as a designer would code it: parse the printed decimals, Horner in double precision. */
function copyOf(printed: readonly string[], fit: PolynomialFit): (x: number) => number {
  const a = printed.map(Number);
  return (x: number) => {
    const u = fit.transformX === 'reciprocal' ? 1 / x : fit.transformX === 'log' ? Math.log(x) : x;
    let v = 0;
    for (let k = a.length - 1; k >= 0; k--) v = v * u + a[k]!;
    return fit.transformY === 'log' ? Math.exp(v) : v;
  };
}

/** The last printed digit of coefficient k changed by `sign` (as text arithmetic on the decimal, not in binary). */
function withDigitChanged(text: string, sign: 1 | -1): string {
  const place = lastPrintedPlace(text);
  const match = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text)!;
  const digits = BigInt(`${match[1] === '-' ? '-' : ''}${match[2] ?? ''}${match[3] ?? ''}` || '0') + BigInt(sign);
  return `${digits}e${place}`;
}

const fits = fc
  .record({
    n: fc.integer({ min: 8, max: 30 }),
    start: fc.double({ min: 150, max: 600, noNaN: true }),
    span: fc.double({ min: 20, max: 600, noNaN: true }),
    order: fc.integer({ min: 1, max: 5 }),
    transformX: fc.constantFrom<TransformX>('identity', 'reciprocal', 'log'),
    transformY: fc.constantFrom<TransformY>('identity', 'log'),
    weighted: fc.boolean(),
    constrained: fc.boolean(),
    noise: fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 30, maxLength: 30 }),
    level: fc.double({ min: 1e-4, max: 1e-1, noNaN: true }),
  })
  .map((p) => {
    // Values rounded to 6 significant digits, as measured data are written.
    const round = (value: number) => Number(value.toPrecision(6));
    const x = Array.from({ length: p.n }, (_, i) => round(p.start + (p.span * i) / (p.n - 1)));
    const truth = (t: number) => 5 + 40 * Math.exp(-900 / t) + t / 300;
    const y = x.map((t, i) => round(truth(t) * (1 + p.level * p.noise[i]!)));
    const uncertainty = p.weighted ? y.map((value, i) => round(Math.abs(value) * p.level * (0.5 + (i % 3)))) : undefined;
    const middle = x[Math.floor(p.n / 2)]!;
    const constraints = p.constrained ? [{ x: middle, y: round(truth(middle)) }] : [];
    return { data: { x, y, uncertainty }, options: { order: p.order, transformX: p.transformX, transformY: p.transformY, constraints } };
  });

describe('printed check values', () => {
  it('fitPolynomial printed check values: a correct copy passes, a ±1 last-digit error in any coefficient fails', () => {
    let checked = 0;
    fc.assert(
      fc.property(fits, ({ data, options }) => {
        const fit = fitPolynomial(data, options);
        if (fit.printedCheckValues.length === 0) return; // power form outside double range (warned); not the case here
        const copy = copyOf(fit.printedCoefficients, fit);
        for (const check of fit.printedCheckValues) {
          expect(Math.abs(copy(check.x) - Number(check.y)), `correct copy at x = ${check.x}`).toBeLessThanOrEqual(check.tolerance);
        }
        fit.printedCoefficients.forEach((text, k) => {
          if (k === 0 && !fit.intercept) return;
          for (const sign of [1, -1] as const) {
            const wrong = fit.printedCoefficients.map((entry, j) => (j === k ? withDigitChanged(entry, sign) : entry));
            const wrongCopy = copyOf(wrong, fit);
            const caught = fit.printedCheckValues.some((check) => Math.abs(wrongCopy(check.x) - Number(check.y)) > check.tolerance);
            expect(caught, `a${k} = ${text} changed by ${sign} in its last digit must be caught`).toBe(true);
          }
        });
        checked++;
      }),
      settings,
    );
    expect(checked).toBeGreaterThan(100);
  });

  it('fitPolynomial full-precision check values match a double-precision evaluation of the full coefficients within their tolerance', () => {
    fc.assert(
      fc.property(fits, ({ data, options }) => {
        const fit = fitPolynomial(data, options);
        const copy = copyOf(fit.coefficients.map(String), fit);
        for (const check of fit.checkValues) expect(Math.abs(copy(check.x) - check.y)).toBeLessThanOrEqual(check.tolerance!);
      }),
      { ...settings, numRuns: 60 },
    );
  });

  it('the vapour-pressure example of the issue: the printed equation reproduces its check values, a typo in −145306 does not', () => {
    // ln p = 13.88924 − 2422.701/T − 145306/T² (the demo's printed equation before this change, quoted in the issue).
    const printed = ['13.88924', '-2422.701', '-145306'];
    const fitLike = { transformX: 'reciprocal', transformY: 'log' } as PolynomialFit;
    const copy = copyOf(printed, fitLike);
    const typo = copyOf(['13.88924', '-2422.701', '-145307'], fitLike);
    // Computed by hand from the printed decimals: p(220) = exp(13.88924 − 2422.701/220 − 145306/220²) ≈ 0.882296.
    expect(copy(220)).toBeCloseTo(0.882296, 6);
    expect(Math.abs(typo(220) - copy(220)) / copy(220)).toBeGreaterThan(1e-6);
  });
});
