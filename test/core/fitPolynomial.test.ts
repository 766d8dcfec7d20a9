/**
 * fitPolynomial against closed-form results and independent computations. Each check says where its expected
 * value comes from.
 */
import { describe, expect, it } from 'vitest';
import { bands, evaluateFit, FitError, fitOrders, fitPolynomial } from '../../src/core/index.ts';

const freeze = <T>(values: T[]): readonly T[] => Object.freeze(values);
const relative = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);

/** Plain least squares by explicit refits, for independent checks: solves the tiny normal equations of a line. */
function lineBySums(x: readonly number[], y: readonly number[]) {
  // Textbook simple linear regression (any statistics text, e.g. Montgomery & Runger, Applied Statistics and
  // Probability for Engineers, §11-2): b = Sxy/Sxx, a = ȳ − b·x̄, with centred sums.
  const n = x.length;
  const mx = x.reduce((s, v) => s + v, 0) / n;
  const my = y.reduce((s, v) => s + v, 0) / n;
  let sxx = 0;
  let sxy = 0;
  x.forEach((xi, i) => {
    sxx += (xi - mx) ** 2;
    sxy += (xi - mx) * (y[i]! - my);
  });
  const b = sxy / sxx;
  const a = my - b * mx;
  const sr = y.reduce((s, yi, i) => s + (yi - a - b * x[i]!) ** 2, 0);
  return { a, b, sxx, mx, sr, s: Math.sqrt(sr / (n - 2)) };
}

describe('fitPolynomial basics', () => {
  it('fitPolynomial recovers an exact cubic in kelvin (coefficients chosen by hand)', () => {
    const a = [12.5, -0.031, 4.2e-5, -1.7e-8];
    const x = freeze(Array.from({ length: 15 }, (_, i) => 250 + 46.4 * i));
    const y = freeze(x.map((t) => a[0]! + a[1]! * t + a[2]! * t * t + a[3]! * t ** 3));
    const fit = fitPolynomial({ x, y }, { order: 3 });
    fit.coefficients.forEach((value, k) => expect(relative(value, a[k]!)).toBeLessThan(1e-9));
    expect(fit.statistics.degreesOfFreedom).toBe(11);
  });

  it('fitPolynomial(line) matches the textbook slope, intercept, s and standard errors', () => {
    const x = freeze([301, 322, 348, 375, 401, 433, 455, 482, 510, 544]);
    const y = freeze([4.12, 4.3, 4.41, 4.66, 4.8, 5.07, 5.16, 5.44, 5.58, 5.9]);
    const ref = lineBySums(x, y);
    const fit = fitPolynomial({ x, y }, { order: 1 });
    expect(relative(fit.coefficients[1]!, ref.b)).toBeLessThan(1e-12);
    expect(relative(fit.coefficients[0]!, ref.a)).toBeLessThan(1e-12);
    expect(relative(fit.statistics.residualStdDev, ref.s)).toBeLessThan(1e-10);
    // se(b) = s/√Sxx; se(a) = s·√(1/n + x̄²/Sxx) (same textbook).
    expect(relative(fit.standardErrors[1]!, ref.s / Math.sqrt(ref.sxx))).toBeLessThan(1e-10);
    expect(relative(fit.standardErrors[0]!, ref.s * Math.sqrt(1 / x.length + ref.mx ** 2 / ref.sxx))).toBeLessThan(1e-10);
  });

  it('bands(line) match the textbook confidence and prediction half-widths', () => {
    const x = freeze([301, 322, 348, 375, 401, 433, 455, 482, 510, 544]);
    const y = freeze([4.12, 4.3, 4.41, 4.66, 4.8, 5.07, 5.16, 5.44, 5.58, 5.9]);
    const ref = lineBySums(x, y);
    const fit = fitPolynomial({ x, y }, { order: 1 });
    // t(0.975, 8) = 2.306 in printed t tables (quantile recalled from such a table; here from the stats package).
    const [band] = bands(fit, [450]);
    const leverage = 1 / x.length + (450 - ref.mx) ** 2 / ref.sxx;
    const tq = 2.306004135204166;
    expect(relative(band!.confidenceHigh - band!.y, tq * ref.s * Math.sqrt(leverage))).toBeLessThan(1e-8);
    expect(relative(band!.predictionHigh - band!.y, tq * ref.s * Math.sqrt(1 + leverage))).toBeLessThan(1e-8);
  });

  it('fitPolynomial leverages sum to the number of parameters and PRESS equals explicit leave-one-out refits', () => {
    const x = freeze([250, 280, 300, 340, 390, 420, 480, 530, 600, 650, 700, 760, 800, 850, 900]);
    const y = freeze(x.map((t, i) => 1 + 2e-3 * t - 1e-6 * t * t + 0.01 * Math.sin(i * 1.7)));
    const fit = fitPolynomial({ x, y }, { order: 2 });
    const sumLeverage = fit.points.leverage.reduce((s, h) => s + h, 0);
    expect(sumLeverage).toBeCloseTo(3, 10); // trace of the hat matrix = p (common practice)
    let press = 0;
    const studentized: number[] = [];
    for (let i = 0; i < x.length; i++) {
      const keep = (_: number, j: number) => j !== i;
      const loo = fitPolynomial({ x: x.filter(keep), y: y.filter(keep) }, { order: 2 });
      const predicted = evaluateFit(loo, x[i]!, { extrapolate: true }).y;
      press += (y[i]! - predicted) ** 2;
      // Externally studentized residual = deleted residual / its standard error (Belsley, Kuh & Welsch 1980).
      const hDeleted = fit.points.leverage[i]! / (1 - fit.points.leverage[i]!);
      studentized.push((y[i]! - predicted) / (loo.statistics.residualStdDev * Math.sqrt(1 + hDeleted)));
    }
    expect(relative(fit.statistics.press, press)).toBeLessThan(1e-8);
    fit.points.studentized.forEach((value, i) => expect(relative(value, studentized[i]!)).toBeLessThan(1e-7));
  });
});

describe('fitPolynomial options', () => {
  it('fitPolynomial with a constraint at the origin equals the no-intercept slope Σxy/Σx²', () => {
    // Regression through the origin: b = Σxy/Σx² (closed form, any regression text).
    const x = freeze([0, 1, 2, 3, 4, 5]);
    const y = freeze([0.3, 2.1, 3.8, 6.3, 8.1, 9.7]);
    const slope = x.reduce((s, v, i) => s + v * y[i]!, 0) / x.reduce((s, v) => s + v * v, 0);
    for (const exact of ['auto', 'off'] as const) {
      const constrained = fitPolynomial({ x, y }, { order: 1, constraints: [{ x: 0, y: 0 }], exact });
      expect(Math.abs(constrained.coefficients[0]!)).toBeLessThan(1e-14);
      expect(relative(constrained.coefficients[1]!, slope)).toBeLessThan(1e-12);
      expect(constrained.statistics.degreesOfFreedom).toBe(5);
      const free = fitPolynomial({ x, y }, { order: 1, intercept: false, exact });
      expect(relative(free.coefficients[1]!, slope)).toBeLessThan(1e-12);
      expect(relative(constrained.standardErrors[1]!, free.standardErrors[1]!)).toBeLessThan(1e-9);
    }
  });

  it('fitPolynomial with a constraint passes through the point (zero strain at 293.15 K)', () => {
    const x = freeze(Array.from({ length: 20 }, (_, i) => 200 + 20 * i));
    const y = freeze(x.map((t, i) => 1.1e-5 * (t - 293.15) + 4e-9 * (t - 293.15) ** 2 + 2e-6 * Math.cos(3 * i)));
    for (const exact of ['auto', 'off'] as const) {
      const fit = fitPolynomial({ x, y }, { order: 2, constraints: [{ x: 293.15, y: 0 }], exact });
      expect(Math.abs(evaluateFit(fit, 293.15).y)).toBeLessThan(1e-15);
    }
  });

  it('fitPolynomial with reciprocal x and log y recovers an Arrhenius law exactly', () => {
    // ln μ = ln A + B/T for μ = A·exp(B/T), A = 2.4e-3, B = 1850 (values chosen by hand).
    const x = freeze([280, 300, 320, 340, 360, 380, 400]);
    const y = freeze(x.map((t) => 2.4e-3 * Math.exp(1850 / t)));
    const fit = fitPolynomial({ x, y }, { order: 1, transformX: 'reciprocal', transformY: 'log' });
    expect(relative(fit.coefficients[0]!, Math.log(2.4e-3))).toBeLessThan(1e-10);
    expect(relative(fit.coefficients[1]!, 1850)).toBeLessThan(1e-10);
    // Certified from the transformed values; the floating-point QR alone agrees to rounding.
    expect(fit.method.refinement).toBe('exact-rational');
    const floating = fitPolynomial({ x, y }, { order: 1, transformX: 'reciprocal', transformY: 'log', exact: 'off' });
    expect(floating.method.refinement).toBe('none');
    fit.coefficients.forEach((a, k) => expect(relative(floating.coefficients[k]!, a)).toBeLessThan(1e-11));
    expect(relative(evaluateFit(fit, 330).y, 2.4e-3 * Math.exp(1850 / 330))).toBeLessThan(1e-12);
  });

  it('fitPolynomial weights: a point with a large uncertainty barely moves the line', () => {
    const x = freeze([1, 2, 3, 4, 5, 6]);
    const y = freeze([2, 4, 6, 8, 30, 12]);
    const sigma = freeze([0.1, 0.1, 0.1, 0.1, 1e6, 0.1]);
    const fit = fitPolynomial({ x, y, uncertainty: sigma }, { order: 1 });
    expect(fit.coefficients[1]).toBeCloseTo(2, 8);
    expect(fit.statistics.reducedChiSquare).not.toBeNull();
  });
});

describe('fitPolynomial diagnostics', () => {
  it('lackOfFit matches a hand computation of the pure-error sum of squares', () => {
    // Replicates at x = 1, 2, 3: group means 2.0, 3.9, 6.1; SS_pe = 0.02 + 0.02 + 0.02 + ... computed below by hand.
    const x = freeze([1, 1, 2, 2, 3, 3, 4, 4]);
    const y = freeze([1.9, 2.1, 3.8, 4.0, 6.0, 6.2, 9.1, 8.9]);
    // Each pair differs by 0.2, so each contributes 2·0.1² = 0.02: SS_pe = 0.08 with 4 dof.
    const fit = fitPolynomial({ x, y }, { order: 1 });
    expect(fit.lackOfFit).not.toBeNull();
    expect(fit.lackOfFit!.pureErrorSumOfSquares).toBeCloseTo(0.08, 12);
    expect(fit.lackOfFit!.pureErrorDof).toBe(4);
    expect(fit.lackOfFit!.lackOfFitDof).toBe(2);
    expect(fit.lackOfFit!.lackOfFitSumOfSquares).toBeCloseTo(fit.statistics.residualSumOfSquares - 0.08, 12);
    // Curved data: a straight line shows lack of fit at the 5 % level.
    expect(fit.lackOfFit!.p).toBeLessThan(0.05);
  });

  it('runsTest counts sign runs as in the textbook formula', () => {
    // A symmetric parabola fitted by a line leaves residual signs + + − − − − + + (3 runs, n₊ = 4, n₋ = 4):
    // E[R] = 2·4·4/8 + 1 = 5; Var[R] = 32·(32 − 8)/(64·7) = 1.714…; z = (3 − 5)/√1.714 = −1.528 (by hand).
    const x = freeze([-7, -5, -3, -1, 1, 3, 5, 7]);
    const y = freeze(x.map((v) => v * v));
    const fit = fitPolynomial({ x, y }, { order: 1 });
    expect(fit.runsTest).not.toBeNull();
    expect(fit.runsTest!.runs).toBe(3);
    expect(fit.runsTest!.expectedRuns).toBeCloseTo(5, 12);
    expect(fit.runsTest!.z).toBeCloseTo(-2 / Math.sqrt((32 * 24) / (64 * 7)), 10);
  });

  it('fitPolynomial reports a far better conditioned mapped basis than the raw one', () => {
    const x = freeze(Array.from({ length: 30 }, (_, i) => 250 + 22 * i));
    const y = freeze(x.map((t) => Math.sqrt(t)));
    const fit = fitPolynomial({ x, y }, { order: 6 });
    expect(fit.statistics.conditionRaw).toBeGreaterThan(1e12);
    expect(fit.statistics.conditionMapped).toBeLessThan(1e3);
  });
});

describe('fitPolynomial refusals and the range guard', () => {
  it('fitPolynomial refuses an order the distinct x values cannot support', () => {
    const x = freeze([1, 1, 2, 2, 3, 3]);
    const y = freeze([1, 2, 3, 4, 5, 6]);
    expect(() => fitPolynomial({ x, y }, { order: 3 })).toThrowError(/order 3 needs at least 4 distinct x values, the data have 3/);
    expect(() => fitPolynomial({ x, y }, { order: 2 })).not.toThrow();
  });

  it('fitPolynomial refuses constant x and non-finite values', () => {
    expect(() => fitPolynomial({ x: [2, 2, 2], y: [1, 2, 3] }, { order: 1 })).toThrowError(FitError);
    expect(() => fitPolynomial({ x: [1, 2, NaN], y: [1, 2, 3] }, { order: 1 })).toThrowError(/x = NaN is not a finite number/);
  });

  it('evaluateFit refuses x outside the fitted range unless asked, and then says it extrapolates', () => {
    const fit = fitPolynomial({ x: [300, 400, 500, 600], y: [1, 2, 2.5, 2.7] }, { order: 1 });
    expect(() => evaluateFit(fit, 650)).toThrowError(/outside the fitted range \[300, 600\]/);
    expect(evaluateFit(fit, 650, { extrapolate: true }).extrapolated).toBe(true);
    expect(evaluateFit(fit, 450).extrapolated).toBe(false);
  });
});

describe('fitOrders', () => {
  it('fitOrders returns one full fit per order and keeps refusals with their reason', () => {
    const x = freeze([300, 350, 400, 450, 500]);
    const y = freeze([1.2, 1.9, 2.3, 2.6, 2.7]);
    const fits = fitOrders({ x, y }, [1, 2, 5], { exactFor: [2] });
    expect(fits.map((entry) => entry.order)).toEqual([1, 2, 5]);
    expect(fits[0]!.fit?.method.refinement).toBe('none');
    expect(fits[1]!.fit?.method.refinement).toBe('exact-rational');
    expect(fits[2]!.fit).toBeNull();
    expect(fits[2]!.refused?.message).toMatch(/order 5 needs at least 6 points, the data have 5/);
    // JSON round trip keeps everything a page needs (NaN becomes null, which pages treat as "not defined").
    expect(JSON.parse(JSON.stringify(fits[1]!.fit)).coefficients).toEqual(fits[1]!.fit!.coefficients);
  });
});

describe('fitPolynomial constraint count', () => {
  it('fitPolynomial refuses pass-through points that fix every coefficient', () => {
    const data = { x: [300, 350, 400], y: [1, 2, 2.5] };
    expect(() => fitPolynomial(data, { order: 1, constraints: [{ x: 300, y: 1 }, { x: 400, y: 2.5 }] })).toThrowError(
      /2 pass-through points fix every coefficient of an order-1 curve/,
    );
  });
});

describe('fitPolynomial validity range', () => {
  const x = freeze([300, 320, 340, 360, 380, 400, 420, 440]);
  const y = freeze(x.map((t) => 1000 - 0.8 * t - 1e-3 * t * t));

  it('fitPolynomial narrows the validity range on request: guard, check values and ends follow it', () => {
    const fit = fitPolynomial({ x, y }, { order: 2, range: { min: 300, max: 410 } });
    expect(fit.range).toEqual({ min: 300, max: 410 });
    expect(fit.checkValues[0]!.x).toBe(300);
    expect(fit.checkValues.at(-1)!.x).toBe(410);
    expect(fit.checkValues.every((check) => check.x >= 300 && check.x <= 410)).toBe(true);
    expect(() => evaluateFit(fit, 430)).toThrowError(/outside the fitted range \[300, 410\]/);
  });

  it('fitPolynomial refuses a validity range wider than the data, and a constraint outside it', () => {
    expect(() => fitPolynomial({ x, y }, { order: 2, range: { min: 290, max: 440 } })).toThrowError(/can be narrowed, never widened/);
    expect(() => fitPolynomial({ x, y }, { order: 2, range: { min: 300, max: 400 }, constraints: [{ x: 420, y: 487.6 }] })).toThrowError(
      /constraint at x = 420 is outside the validity range \[300, 400\]/,
    );
  });
});

describe('fitPolynomial magnitude limits', () => {
  it('fitPolynomial refuses values whose squares would overflow, naming the point', () => {
    expect(() => fitPolynomial({ x: [1, 2, 3, 4], y: [1, 2e200, 3, 4] }, { order: 1 })).toThrowError(/y = 2e\+200 is too large to fit in double precision/);
  });

  it('fitPolynomial warns when the power form cannot reproduce the fit (x ≈ 1e-200, order 2)', () => {
    const x = [1e-200, 2e-200, 3e-200, 4e-200, 5e-200];
    const fit = fitPolynomial({ x, y: [1, 2, 3.5, 4, 6] }, { order: 2 });
    expect(fit.warnings.join(' ')).toMatch(/power-basis coefficients do not reproduce the fit/);
    // The mapped form still evaluates correctly: the check value at the low end is the fitted value there.
    expect(Number.isFinite(fit.checkValues[0]!.y)).toBe(true);
  });
});
