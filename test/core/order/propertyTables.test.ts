import { describe, expect, it } from 'vitest';
import { forwardX, inverseY } from '../../../src/core/transforms.ts';
import { selectOrder, type OrderSelection } from '../../../src/core/order/index.ts';

/** Evaluate the chosen order's fit at the data points, in the user's y units. */
function fittedValues(selection: OrderSelection, x: readonly number[]): number[] {
  const row = selection.orders.find((r) => r.order === selection.order)!;
  return x.map((xi) => {
    const t = (forwardX(selection.transformX, xi) - selection.map.center) / selection.map.halfWidth;
    let v = 0;
    for (let k = row.mappedCoefficients.length - 1; k >= 0; k--) v = v * t + row.mappedCoefficients[k]!;
    return inverseY(selection.transformY, v);
  });
}

function maxRelativeResidual(selection: OrderSelection, x: readonly number[], y: readonly number[]): number {
  const fitted = fittedValues(selection, x);
  return Math.max(...y.map((yi, i) => Math.abs(yi - fitted[i]!) / Math.abs(yi)));
}

describe('selectOrder on published property tables', () => {
  it('selectOrder(density of liquid water, 0–100 °C at 101.325 kPa) picks order 5 with residuals at the table’s rounding', () => {
    // Density in kg/m³ as tabulated in common steam tables computed from the IAPWS-95 formulation
    // (IAPWS R6-95, http://www.iapws.org/release.html); 100 °C is the saturated liquid. Recalled from memory to
    // the digits shown (0.01 kg/m³, i.e. about 5e-6 relative rounding).
    const temperature = [0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100];
    const density = [999.84, 999.7, 998.21, 995.65, 992.22, 988.03, 983.2, 977.76, 971.79, 965.31, 958.35];
    const selection = selectOrder({ x: temperature, y: density });
    // Sensible: a quintic is the usual order for 5-digit water density over 0–100 °C; the residual RMS of the
    // chosen fit must be at the level of the table's rounding (0.01/√12 ≈ 0.003 kg/m³), not above it.
    expect(selection.order).toBe(5);
    const row = selection.orders[5]!;
    expect(Math.sqrt(row.residualSumOfSquares / 11)).toBeLessThan(0.006);
    expect(maxRelativeResidual(selection, temperature, density)).toBeLessThan(1e-5);
    // Order 4 is clearly not enough: its residual variance is more than 10× the quintic's.
    expect(selection.orders[4]!.residualVariance! / row.residualVariance!).toBeGreaterThan(10);
  });

  it('selectOrder(saturation pressure of water, 0.01–100 °C) in (1/T, ln p) picks a low order fitting to 1e-4', () => {
    // Saturation pressure in kPa from common steam tables based on IAPWS-95 (IAPWS R6-95); recalled from memory
    // to the digits shown. T in kelvin (T = t + 273.15). The Clausius–Clapeyron form ln p ≈ A − B/T is order 1
    // in 1/T; real data need a few more terms (Antoine- and Wagner-type equations use 3–4 constants).
    const celsius = [0.01, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100];
    const pressure = [0.6117, 1.2282, 2.3393, 4.247, 7.3849, 12.352, 19.946, 31.201, 47.414, 70.182, 101.42];
    const kelvin = celsius.map((t) => t + 273.15);
    const selection = selectOrder({ x: kelvin, y: pressure }, { transformX: 'reciprocal', transformY: 'log' });
    expect(selection.order).toBeGreaterThanOrEqual(3);
    expect(selection.order).toBeLessThanOrEqual(5);
    expect(maxRelativeResidual(selection, kelvin, pressure)).toBeLessThan(1e-4);
    // The straight Clausius–Clapeyron line misses by percent-level errors, so order 1 must not be chosen.
    const line = { ...selection, order: 1 };
    expect(maxRelativeResidual(line, kelvin, pressure)).toBeGreaterThan(1e-2);
  });
});
