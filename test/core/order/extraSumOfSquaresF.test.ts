import { describe, expect, it } from 'vitest';
import { extraSumOfSquaresF, extraSumOfSquaresP, fCriticalValue, isSignificant } from '../../../src/core/order/index.ts';

// Upper 5 % and 1 % points of F, as printed in standard F tables (NIST/SEMATECH e-Handbook §1.3.6.7.3,
// "Upper critical values of the F distribution"); values from memory, to the digits printed there.
const fTable: [alpha: number, d1: number, d2: number, value: number][] = [
  [0.05, 1, 10, 4.965],
  [0.05, 2, 10, 4.103],
  [0.05, 1, 7, 5.591],
  [0.05, 2, 5, 5.786],
  [0.05, 1, 5, 6.608],
  [0.05, 3, 20, 3.098],
  [0.01, 1, 10, 10.044],
];

describe('fCriticalValue', () => {
  it.each(fTable)('fCriticalValue(%f, %i, %i) matches the printed table value %f', (alpha, d1, d2, value) => {
    expect(fCriticalValue(alpha, d1, d2)).toBeCloseTo(value, 2);
  });
});

describe('extraSumOfSquaresP', () => {
  it.each(fTable)('extraSumOfSquaresP at the printed F(%f; %i, %i) = %f gives p ≈ α', (alpha, d1, d2, value) => {
    expect(extraSumOfSquaresP({ statistic: value, numeratorDof: d1, denominatorDof: d2 })).toBeCloseTo(alpha, 3);
  });
});

describe('extraSumOfSquaresF', () => {
  it('extraSumOfSquaresF((10, p 2), (7, p 3), n 10) = (3/1)/(7/7) = 3 with (1, 7) dof (hand computed)', () => {
    const test = extraSumOfSquaresF(
      { order: 1, parameters: 2, degreesOfFreedom: 8, residualSumOfSquares: 10, press: 0 },
      { order: 2, parameters: 3, degreesOfFreedom: 7, residualSumOfSquares: 7, press: 0 },
    );
    expect(test).toEqual({ statistic: 3, numeratorDof: 1, denominatorDof: 7 });
    expect(isSignificant(test, 0.05)).toBe(false); // 3 < 5.591
  });
  it('extraSumOfSquaresF gives F = 0 when the higher order does not lower S_r (floored ties)', () => {
    const fit = { order: 1, parameters: 2, degreesOfFreedom: 8, residualSumOfSquares: 1e-20, press: 0 };
    expect(extraSumOfSquaresF(fit, { ...fit, order: 2, parameters: 3, degreesOfFreedom: 7 }).statistic).toBe(0);
  });
});
