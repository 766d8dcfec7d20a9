/**
 * What a page carries for its temperature-scale switch, and the plain equation the switch writes: the forms are the
 * core's (a form that is not shown carries its reason and no coefficients), and the browser's plain text of a scale
 * is the same text as the core's equationPlain of that scale's coefficients (the export record's `equation`).
 * Data: an invented smooth property over 0…100 °C (order 6, where the kelvin power form is refused) and order 2.
 */
import { describe, expect, it } from 'vitest';
import { equationPlain, fitPolynomial, tQuantile } from '../../src/core/index.ts';
import { temperatureScaleData } from '../../src/components/lib/temperatureScaleData.ts';
import { plainEquation } from '../../src/client/temperatureScale.ts';

function celsiusFit(order: number, scatter: number) {
  const x = Array.from({ length: 41 }, (_, i) => 2.5 * i);
  const y = x.map((t, i) => {
    let value = 0;
    for (let k = 0; k <= order; k++) value += (k % 2 ? -1 : 1) * 1.7 ** k * (t / 100) ** k;
    return Number((1000 * value + scatter * Math.sin(7.3 * i)).toPrecision(9));
  });
  return fitPolynomial({ x, y }, { order, temperatureScale: '°C' });
}

describe('temperatureScaleData and the switch\'s plain equation', () => {
  it('a form that is not shown carries its reason and no coefficients; the others carry printed coefficients, digits and standard errors', () => {
    const fit = celsiusFit(6, 0.0005);
    const data = JSON.parse(temperatureScaleData(fit, 't', 'rho')!);
    expect(data.n).toBe('°C');
    expect(data.q).toBeCloseTo(tQuantile(0.975, fit.statistics.degreesOfFreedom), 5);
    const kelvin = data.o.find((entry: { s: string }) => entry.s === 'K');
    expect(kelvin.n).toMatch(/mapped form/);
    expect(kelvin.a).toBeUndefined();
    // Computed by hand: 0…100 °C is 273.15…373.15 K; the centre moves by 273.15, the half-width stays.
    expect(kelvin.r).toEqual([273.15, 373.15]);
    expect(kelvin.c).toBe(fit.mapped.map.center + 273.15);
    const fahrenheit = data.o.find((entry: { s: string }) => entry.s === '°F');
    expect(fahrenheit.a).toHaveLength(7);
    expect(fahrenheit.d).toHaveLength(7);
    expect(fahrenheit.e).toHaveLength(7);
    expect(temperatureScaleData({ ...fit, temperatureScales: null }, 't', 'rho')).toBeNull();
  });

  it('the plain equation the browser writes for a scale is the core\'s equationPlain of that scale', () => {
    const fit = celsiusFit(2, 0.05);
    for (const form of fit.temperatureScales!.scales) {
      const core = equationPlain({ ...fit, intercept: true, coefficients: form.coefficients, significantDigits: form.significantDigits }, { x: 't', y: 'rho' });
      expect(plainEquation('rho', 't', form.printedCoefficients), form.scale).toBe(core);
    }
  });
});
