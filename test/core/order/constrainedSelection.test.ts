/**
 * selectOrder with pass-through points: candidate orders are fitted under the constraints, and the order table's
 * S_r agrees with fitPolynomial's exact rational certification of each constrained fit (an independent path:
 * null-space QR in floating point against exact elimination of the bordered normal equations).
 */
import { describe, expect, it } from 'vitest';
import { fitPolynomial, selectOrder } from '../../../src/core/index.ts';

// Invented thermal strain: ε = 1.2e-5·(T − 293.15) + 6e-9·(T − 293.15)² (µm/m scale), zero at 293.15 K,
// plus a fixed deterministic wiggle standing in for noise.
const x = Object.freeze(Array.from({ length: 25 }, (_, i) => 200 + 25 * i));
const y = Object.freeze(x.map((t, i) => 1.2e-5 * (t - 293.15) + 6e-9 * (t - 293.15) ** 2 + 4e-7 * Math.sin(2.3 * i)));
const constraints = [{ x: 293.15, y: 0 }];

describe('selectOrder with constraints', () => {
  it('selectOrder fits candidate orders under the constraints and matches exact constrained S_r', () => {
    const selection = selectOrder({ x, y }, { constraints });
    expect(selection.order).toBe(2);
    for (const row of selection.orders.filter((r) => r.order >= 1 && r.order <= 6)) {
      const exact = fitPolynomial({ x, y }, { order: row.order, constraints });
      expect(exact.method.refinement).toBe('exact-rational');
      expect(row.degreesOfFreedom).toBe(exact.statistics.degreesOfFreedom);
      expect(Math.abs(row.residualSumOfSquares - exact.statistics.residualSumOfSquares) / exact.statistics.residualSumOfSquares).toBeLessThan(1e-8);
    }
  });

  it('selectOrder counts the constraint: order m has m free coefficients and n − m residual dof', () => {
    const selection = selectOrder({ x, y }, { constraints });
    const row = selection.orders.find((r) => r.order === 3)!;
    expect(row.parameters).toBe(3);
    expect(row.degreesOfFreedom).toBe(22);
    // Order 0 is fixed completely by the constraint (y ≡ 0) and is not a candidate.
    expect(selection.orders[0]!.order).toBe(1);
  });

  it('selectOrder refuses a fixed order the constraints determine completely', () => {
    expect(() => selectOrder({ x, y }, { constraints, fixedOrder: 0, reason: 'test' })).toThrowError(/order 0 leaves no free coefficient after 1 pass-through point/);
  });
});
