import { describe, expect, it } from 'vitest';
import { FitError } from '../../../src/core/fitError.ts';
import { extraSumOfSquaresP, selectOrder } from '../../../src/core/order/index.ts';

// Invented test data: a smooth curve on a temperature-like range with a fixed small wobble.
const x = Object.freeze([250, 300, 350, 400, 450, 500, 550, 600, 650, 700, 750, 800, 850, 900]);
const y = Object.freeze(x.map((v, i) => 1 + 2e-3 * v + 3e-6 * v ** 2 + 1e-9 * v ** 3 + (i % 2 === 0 ? 1e-3 : -1e-3)));

describe('selectOrder', () => {
  it('selectOrder(data) returns the order, a reason, the rule and a full JSON-serialisable table', () => {
    const selection = selectOrder({ x, y });
    expect(selection.criterion).toBe('lowestJustified');
    expect(selection.order).toBe(3);
    expect(selection.reason).toMatch(/^Order 3: /);
    expect(selection.orders.map((row) => row.order)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(JSON.parse(JSON.stringify(selection))).toEqual(selection);
    expect(x).toHaveLength(14); // frozen input untouched (a write would have thrown)
  });

  it('selectOrder rows: fToNext and pToNext follow from the rows’ own S_r (independent re-computation)', () => {
    const { orders } = selectOrder({ x, y });
    for (let i = 0; i + 1 < orders.length; i++) {
      const lower = orders[i]!;
      const higher = orders[i + 1]!;
      const f = (lower.residualSumOfSquares - higher.residualSumOfSquares) / (higher.residualSumOfSquares / higher.degreesOfFreedom);
      expect(lower.fToNext!).toBeCloseTo(Math.max(f, 0), 6);
      expect(lower.pToNext!).toBeCloseTo(extraSumOfSquaresP({ statistic: Math.max(f, 0), numeratorDof: 1, denominatorDof: higher.degreesOfFreedom }), 12);
      expect(lower.residualVariance!).toBeCloseTo(lower.residualSumOfSquares / (14 - lower.order - 1), 15);
      expect(lower.looRmse).toBeCloseTo(Math.sqrt(lower.press / 14), 15);
    }
    expect(orders.at(-1)!.pToNext).toBeNull();
    expect(orders[0]!.chiSquare).toBeNull();
  });

  it('selectOrder with criterion sequentialF gives a reason a reviewer can check', () => {
    const selection = selectOrder({ x, y }, { criterion: 'sequentialF' });
    expect(selection.order).toBe(3);
    expect(selection.reason).toMatch(/^Order 3: going to order 4 (lowers|raises) the residual variance by [\d.]+ %, not significant \(F = [\d.e+-]+, p = [\d.]+ ≥ 0\.05\)\.$/);
    const row = selection.orders[3]!;
    expect(row.pToNext!).toBeGreaterThanOrEqual(0.05);
  });

  it('selectOrder with a fixed order but no reason throws', () => {
    expect(() => selectOrder({ x, y }, { fixedOrder: 2 })).toThrow(FitError);
    expect(() => selectOrder({ x, y }, { fixedOrder: 2, reason: '   ' })).toThrow('selectOrder requires a reason for a fixed order');
  });

  it('selectOrder with a fixed order and a reason reports it, the table, and what the criterion would choose', () => {
    const selection = selectOrder({ x, y }, { fixedOrder: 2, reason: 'the handbook form is quadratic' });
    expect(selection.criterion).toBe('fixed');
    expect(selection.order).toBe(2);
    expect(selection.reason).toBe('Order 2 fixed by the author: the handbook form is quadratic');
    expect(selection.warnings).toContain('The lowestJustified criterion would choose order 3.');
    expect(selection.orders).toHaveLength(11);
  });

  it('selectOrder with criterion chiSquare requires uncertainties', () => {
    expect(() => selectOrder({ x, y }, { criterion: 'chiSquare' })).toThrow('selectOrder requires per-point uncertainties for the chiSquare criterion');
  });

  it('selectOrder with uncertainties reports χ² = S_r/σ² and its p-value, and the χ² rule picks order 3', () => {
    const sigma = 1e-3;
    const weighted = selectOrder({ x, y, uncertainty: x.map(() => sigma) }, { criterion: 'chiSquare' });
    const plain = selectOrder({ x, y });
    expect(weighted.weighted).toBe(true);
    weighted.orders.forEach((row, i) => {
      expect(row.chiSquare!).toBeCloseTo(plain.orders[i]!.residualSumOfSquares / sigma ** 2, 6);
      expect(row.chiSquareP).not.toBeNull();
    });
    expect(weighted.order).toBe(3);
    expect(weighted.reason).toMatch(/^Order 3 is the lowest consistent with the stated uncertainties/);
  });

  it('selectOrder on flat data chooses order 0', () => {
    const flat = selectOrder({ x, y: x.map((_, i) => 5 + (i % 3 === 0 ? 0.01 : -0.005)) });
    expect(flat.order).toBe(0);
    expect(flat.reason).toMatch(/^Order 0: the data are flat/);
    expect(selectOrder({ x, y: x.map(() => 5) }).order).toBe(0);
  });

  it('selectOrder(..., { intercept: false }) fits through the origin: y = 2x + 3x² exactly gives order 2', () => {
    const xs = [0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4];
    const selection = selectOrder({ x: xs, y: xs.map((v) => 2 * v + 3 * v * v) }, { intercept: false });
    expect(selection.order).toBe(2);
    expect(selection.orders[0]!.order).toBe(1);
    const row = selection.orders.find((r) => r.order === 2)!;
    expect(row.mappedCoefficients[0]).toBe(0);
    // t = x/4: y = 2·4 t + 3·16 t² → mapped coefficients [0, 8, 48]
    expect(row.mappedCoefficients[1]).toBeCloseTo(8, 10);
    expect(row.mappedCoefficients[2]).toBeCloseTo(48, 10);
  });

  it('selectOrder applies transforms first: y = exp(2 − 300/x) is order 1 in (1/x, ln y)', () => {
    const selection = selectOrder({ x, y: x.map((v) => Math.exp(2 - 300 / v)) }, { transformX: 'reciprocal', transformY: 'log' });
    expect(selection.order).toBe(1);
    expect(selection.transformX).toBe('reciprocal');
  });

  it('selectOrder rejects too few points and non-finite values', () => {
    expect(() => selectOrder({ x: [1, 2], y: [1, 2] })).toThrow(/choosing an order needs at least 3 points with 2 different x values; the data have 2 points and 2 different x values/);
    expect(() => selectOrder({ x: [1, 2, 3, 4], y: [1, Number.NaN, 3, 4] })).toThrow(FitError);
  });
});
