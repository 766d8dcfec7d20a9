import { describe, expect, it } from 'vitest';
import {
  allHigherFCriterion,
  createLowestJustifiedCriterion,
  LOWEST_JUSTIFIED_DEFAULTS,
  lowestJustifiedCriterion,
  selectOrder,
} from '../../../src/core/order/index.ts';
import { handTable } from './tableHelpers.ts';

/** Deterministic small "noise" in [−1, 1]: a fixed scrambled sequence, not random. */
function wobble(i: number): number {
  return (((i * 7919) % 23) - 11) / 11;
}

/** Chebyshev-like truth on 250..900 in τ = (x − 575)/325 with decaying coefficients (invented test data). */
function polynomialData(degree: number, n: number, noise: number) {
  const coefficients = [1, 0.3, -0.09, 0.027, -0.0081, 0.00243].slice(0, degree + 1);
  const x = Array.from({ length: n }, (_, i) => 250 + (650 * i) / (n - 1));
  const y = x.map((xi, i) => {
    const tau = (xi - 575) / 325;
    return coefficients.reduce((sum, c, k) => sum + c * tau ** k, 0) + noise * wobble(i);
  });
  return { x, y };
}

describe('lowestJustifiedCriterion', () => {
  it.each([1, 2, 3, 4, 5])('selectOrder(degree-%i polynomial + small deterministic noise) recovers the true order', (degree) => {
    // noise amplitude 1/20 of the top coefficient 0.3^d, 15 points
    const data = polynomialData(degree, 15, 0.3 ** degree / 20);
    expect(selectOrder(data).order).toBe(degree);
  });

  it('lowestJustifiedCriterion looks past one small intermediate coefficient (hand-made table)', () => {
    // n = 10, S_r = 100, 30, 6.3, 6.2, 1.0, 0.95, 0.9. Order 2 vs 4: F = (5.3/2)/(1.0/5) = 13.25; the fit of
    // order 4 has 5 residual dof (< 10), so the level is 10 %/2 = 5 %: F₀.₉₅(2,5) = 5.79 → significant.
    // Order 3 vs 4: F = 5.2/0.2 = 26 > 5.79-ish. Order 4 vs 5: F = 0.05/(0.95/4) = 0.21; vs 6: (0.1/2)/(0.9/3) = 0.17.
    const table = handTable(10, [100, 30, 6.3, 6.2, 1.0, 0.95, 0.9]);
    expect(lowestJustifiedCriterion.choose(table)).toBe(4);
    // Looking at the next order only stops at 2, as the sequential F test does.
    expect(createLowestJustifiedCriterion({ ...LOWEST_JUSTIFIED_DEFAULTS, lookAhead: 1 }).choose(table)).toBe(2);
  });

  it('lowestJustifiedCriterion ignores an improvement three orders up, unlike the all-higher-orders rule', () => {
    // n = 12, S_r = 100, 30, 6.3, 6.2, 6.1, 1.0: orders 3 and 4 do not improve on 2; order 5 does
    // (F = (5.3/3)/(1.0/6) = 10.6 > F₀.₉₅(3,6) = 4.76), which the all-higher rule counts and the window does not.
    const table = handTable(12, [100, 30, 6.3, 6.2, 6.1, 1.0]);
    expect(lowestJustifiedCriterion.choose(table)).toBe(2);
    expect(allHigherFCriterion.choose(table)).toBe(5);
  });

  it('lowestJustifiedCriterion never leaves fewer than 2 residual dof (n = 6, every step significant)', () => {
    // S_r falls by 10× per order; maxCandidate = n − 2 = 4 would leave 1 dof, so the answer is 3 (dof 2).
    const table = handTable(6, [1000, 100, 10, 1, 0.001]);
    expect(lowestJustifiedCriterion.choose(table)).toBe(3);
    expect(lowestJustifiedCriterion.explain(table, 3)).toContain('highest order that keeps 2 residual degrees of freedom');
  });

  it('lowestJustifiedCriterion.explain gives the F statistics and p-values behind the choice', () => {
    const table = handTable(10, [100, 30, 6.3, 6.2, 1.0, 0.95, 0.9]);
    const reason = lowestJustifiedCriterion.explain(table, 4);
    expect(reason).toMatch(/^Order 4: going higher is not significant: order 5 lowers S_r by 5 % \(F = 0\.21/);
    expect(reason).toContain('order 3 is improved on by order 4 (F = 26');
  });

  it('selectOrder never picks an order with < 2 residual dof on exact quartic data with 6 points', () => {
    const x = [1, 2, 3, 4, 5, 6];
    const y = x.map((v) => 1 + v - 0.5 * v ** 2 + 0.1 * v ** 3 - 0.01 * v ** 4);
    const selection = selectOrder({ x, y });
    expect(selection.maxCandidate).toBe(4);
    expect(selection.order).toBe(3);
    expect(selection.warnings).toEqual([]);
  });

  it('selectOrder forces order 1 with a warning when 3 points leave 1 residual dof', () => {
    const selection = selectOrder({ x: [1, 2, 3], y: [1, 2.1, 2.9] });
    expect(selection.order).toBe(1);
    expect(selection.reason).toMatch(/^Order 1: forced/);
    expect(selection.warnings[0]).toMatch(/leaves 1 residual degree of freedom/);
  });
});
