/**
 * One certified result, weighted fits done with the local uncertainty, the transform guard and the runs test.
 * Sources: exact rational identities (a change of basis and its inverse give back the input exactly, common
 * practice); values computed by hand where stated; Python fractions for the exact conversion.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  bands,
  decimalRational,
  domainMapFor,
  evaluateExact,
  evaluateFit,
  FitError,
  fitPolynomial,
  localUncertainty,
  mappedFromPowerExact,
  powerFromMappedExact,
  rational,
  runsTest,
  toNumber,
  type Rational,
} from '../../src/core/index.ts';
import { pythonFractions } from '../helpers/pythonExact.ts';
import { rationalText } from '../helpers/rationalText.ts';

const text = rationalText;

describe('exact change of basis', () => {
  it('mappedFromPowerExact then powerFromMappedExact gives back the coefficients exactly (random rationals)', () => {
    const coefficient = fc.tuple(fc.bigInt({ min: -(10n ** 20n), max: 10n ** 20n }), fc.bigInt({ min: 1n, max: 10n ** 12n })).map(([n, d]) => rational(n, d));
    const maps = fc.constantFrom({ center: 575, halfWidth: 325 }, { center: 0.003315, halfWidth: 0.00064 }, { center: 240, halfWidth: 60 }, { center: -1.25, halfWidth: 0.5 });
    fc.assert(
      fc.property(fc.array(coefficient, { minLength: 1, maxLength: 13 }), maps, (a, map) => {
        const back = powerFromMappedExact(mappedFromPowerExact(a, map), map);
        expect(back.map(text)).toEqual(a.map(text));
      }),
      { seed: 7, numRuns: 100 },
    );
  });

  it('mappedFromPowerExact agrees with Python fractions on a worked case', () => {
    // v = 1 + 2u + 3u², u = 240 + 60t: b = [1 + 2·240 + 3·240², (2 + 6·240)·60, 3·60²].
    const b = mappedFromPowerExact([rational(1n), rational(2n), rational(3n)], { center: 240, halfWidth: 60 }).map(text);
    const python = pythonFractions('" ".join(str(x) for x in [F(1)+2*F(240)+3*F(240)**2, (2+6*F(240))*60, 3*F(60)**2])').split(' ');
    expect(b).toEqual(python.map((value) => `${value}/1`));
  });

  it('the mapped form of a fit is the certified polynomial: evaluating it reproduces the exact check values', () => {
    const x = [220, 230, 240, 250, 260, 270, 280, 290, 300, 310, 320, 330, 340];
    const y = x.map((t) => Number(Math.exp(13.9 - 2420 / t - 145000 / (t * t)).toPrecision(5)));
    const fit = fitPolynomial({ x, y }, { order: 2, transformX: 'reciprocal', transformY: 'log' });
    expect(fit.method.refinement).toBe('exact-rational');
    for (const check of fit.checkValues) {
      expect(Math.abs(evaluateFit(fit, check.x).y - check.y) / check.y).toBeLessThan(1e-13);
    }
  });
});

describe('short-decimal centre and half-width', () => {
  it('domainMapFor gives typable numbers: 180…300 → 240 ± 60, not 59.999999999999986 (issue 9 item 7)', () => {
    expect(domainMapFor([180, 300], true)).toEqual({ center: 240, halfWidth: 60 });
    const u = [1 / 340, 1 / 300, 1 / 220];
    const map = domainMapFor(u, true);
    expect(String(map.center).replace(/^0\.0*|-/g, '').length).toBeLessThanOrEqual(5);
    expect(String(map.halfWidth).replace(/^0\.0*/, '').length).toBeLessThanOrEqual(2);
    // Every data point maps into [−1, 1] (up to rounding).
    for (const value of u) expect(Math.abs((value - map.center) / map.halfWidth)).toBeLessThanOrEqual(1 + 1e-12);
    // The decimals are read exactly: 0.00064 is 64/100000, not its binary neighbour.
    expect(text(decimalRational(map.halfWidth))).toBe(pythonFractions(`F("${map.halfWidth}")`));
  });
});

describe('weighted fits use the local uncertainty', () => {
  // y from about 54 to 4.4e6 with σ = 1 % of y (the case in the issue), invented smooth data.
  const x = Array.from({ length: 16 }, (_, i) => 1 + i);
  const y = x.map((t) => Number((54 * t ** 4.2).toPrecision(6)));
  const sigma = y.map((value) => Number((0.01 * value).toPrecision(3)));

  it('fitPolynomial(weighted): the printed equation stays within 1 % of the local σ at every point (digits rule)', () => {
    const fit = fitPolynomial({ x, y, uncertainty: sigma }, { order: 4 });
    const printed = fit.printedCoefficients.map(Number);
    x.forEach((t, i) => {
      let value = 0;
      for (let k = printed.length - 1; k >= 0; k--) value = value * t + printed[k]!;
      const full = evaluateExact(fit.coefficients.map((a) => decimalRational(a)), decimalRational(t));
      expect(Math.abs(value - toNumber(full)), `x = ${t}`).toBeLessThanOrEqual(0.01 * localUncertainty(fit, t) * 1.0000001);
    });
  });

  it('bands(weighted fit): the prediction band follows the stated σ, narrow where σ is small', () => {
    const fit = fitPolynomial({ x, y, uncertainty: sigma }, { order: 4 });
    const [low, high] = bands(fit, [1, 16]);
    const halfLow = (low!.predictionHigh - low!.predictionLow) / 2;
    const halfHigh = (high!.predictionHigh - high!.predictionLow) / 2;
    expect(halfLow).toBeLessThan(halfHigh / 1000); // σ differs by a factor ≈ 16^4.2 ≈ 1.1e5 between the ends
    // At the low end the band is of the order of the stated σ there (0.54), not the RMS of all σ (≈ 9300).
    expect(halfLow).toBeLessThan(10 * sigma[0]!);
  });

  it('localUncertainty follows a stated relative model: relative·|ŷ(x)| (scaled by s outside χ² mode)', () => {
    const fit = fitPolynomial({ x, y, uncertainty: sigma }, { order: 4, uncertaintyModel: { relative: 0.01 }, uncertaintyScale: 'stated' });
    for (const t of [1, 5.5, 16]) {
      // σ(x) = 1 % of the fitted value (the model stated), by definition.
      expect(Math.abs(localUncertainty(fit, t) / (0.01 * evaluateFit(fit, t).y) - 1)).toBeLessThan(1e-12);
    }
  });

  it('fitPolynomial χ² mode: standard errors from the stated σ, unscaled; otherwise scaled by s', () => {
    const noisy = y.map((value, i) => value + (i % 2 ? 1.5 : -1.5) * sigma[i]!);
    const scaled = fitPolynomial({ x, y: noisy, uncertainty: sigma }, { order: 4 });
    const stated = fitPolynomial({ x, y: noisy, uncertainty: sigma }, { order: 4, uncertaintyScale: 'stated' });
    expect(stated.uncertaintyScale).toBe('stated');
    expect(scaled.uncertaintyScale).toBe('scatter');
    const s = scaled.statistics.residualStdDev;
    // SE_scaled = s · SE_stated (s² = reduced χ² multiplies (XᵀWX)⁻¹; common practice, NIST/SEMATECH §4.4.5.2).
    scaled.standardErrors.forEach((se, k) => expect(Math.abs(se / (s * stated.standardErrors[k]!) - 1)).toBeLessThan(1e-9));
  });
});

describe('transform guard', () => {
  it('fitPolynomial refuses 1/x over data from −40 to 100 (no point at 0, but a pole inside the range)', () => {
    const x = [-40, -20, -5, 10, 30, 50, 75, 100];
    const y = [0.981, 0.99, 0.997, 1.001, 1.004, 1.006, 1.009, 1.013];
    expect(() => fitPolynomial({ x, y }, { order: 2, transformX: 'reciprocal' })).toThrow(FitError);
    expect(() => fitPolynomial({ x, y }, { order: 2, transformX: 'reciprocal' })).toThrow('the x range -40 to 100 contains x = 0, where 1/x is infinite');
  });
});

describe('runsTest', () => {
  it('runsTest is independent of the row order of replicates (one mean residual per distinct x)', () => {
    // Worked by hand: means per x are +, −, +, −, +, − → 6 runs whatever the order of the replicate rows.
    const x = [1, 1, 2, 2, 3, 3, 4, 4, 5, 5, 6, 6];
    const r = [0.3, -0.1, -0.2, 0.1, 0.4, -0.3, -0.5, 0.2, 0.1, 0.05, -0.2, 0.1];
    const swapped = { x: [...x], r: [...r] };
    [swapped.r[0], swapped.r[1]] = [r[1]!, r[0]!];
    [swapped.r[6], swapped.r[7]] = [r[7]!, r[6]!];
    const a = runsTest(x, r, 0)!;
    const b = runsTest(swapped.x, swapped.r, 0)!;
    expect(a.runs).toBe(6);
    expect(b).toEqual(a);
  });

  it('fitPolynomial(runsTest) gives the same p when two replicate rows are swapped', () => {
    const x = [250, 250, 275, 275, 300, 300, 325, 325, 350, 350, 375, 375, 400, 400];
    const y = [1.02, 0.97, 1.31, 1.36, 1.58, 1.52, 1.86, 1.83, 2.11, 2.17, 2.45, 2.41, 2.73, 2.79];
    const fit = fitPolynomial({ x, y }, { order: 1 });
    const sx = [...x];
    const sy = [...y];
    [sy[2], sy[3]] = [y[3]!, y[2]!];
    const refit = fitPolynomial({ x: sx, y: sy }, { order: 1 });
    expect(refit.runsTest).toEqual(fit.runsTest);
  });
});
