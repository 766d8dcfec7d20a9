/**
 * Temperature scales: the exact re-expression of a fit in K, °C and °F.
 * Sources, named beside each check: the conversion constants as the SI defines them (SI Brochure, 9th ed., §2.3.1:
 * t/°C = T/K − 273.15) and as common practice defines the Fahrenheit scale (t/°F = 9/5·t/°C + 32); conversions
 * computed by hand; and an independent exact computation in Python's fractions (standard library) run from the test.
 */
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import {
  applyMap,
  fitPolynomial,
  parseDecimal,
  rational,
  scaleConversion,
  substituteAffineExact,
  temperatureScaleOf,
  toNumber,
  type PolynomialFit,
  type TemperatureScaleForm,
} from '../../src/core/index.ts';
import { pythonExactLeastSquares } from '../helpers/pythonExact.ts';
import { rationalText } from '../helpers/rationalText.ts';

const text = rationalText;

function scale(fit: PolynomialFit, name: string): TemperatureScaleForm {
  const form = fit.temperatureScales?.scales.find((entry) => entry.scale === name);
  if (form === undefined) throw new Error(`no ${name} form`);
  return form;
}

/** A smooth invented property over 0…100 °C with a small deterministic scatter. */
function celsiusData(order: number, scatter: number) {
  const x = Array.from({ length: 41 }, (_, i) => 2.5 * i);
  const y = x.map((t, i) => {
    let value = 0;
    for (let k = 0; k <= order; k++) value += ((k % 2 ? -1 : 1) * 1.7 ** k * (t / 100) ** k);
    return Number((1000 * value + scatter * Math.sin(7.3 * i)).toPrecision(9));
  });
  return { x, y };
}

/** Run a Python program over Fractions with JSON in and out. */
function python(program: string, input: unknown): unknown {
  return JSON.parse(execFileSync('python3', ['-c', `import json, sys\nfrom fractions import Fraction as F\njob = json.load(sys.stdin)\n${program}`], { input: JSON.stringify(input), encoding: 'utf8' }));
}

describe('temperature scales and their conversions', () => {
  it('recognises the units the content format writes, and nothing else', () => {
    expect(['K', '°C', '℃', 'degC', '°F', '℉', 'degF', ' K '].map(temperatureScaleOf)).toEqual(['K', '°C', '°C', '°C', '°F', '°F', '°F', 'K']);
    expect(['kelvin', 'C', 'F', '1', 'Pa', 'mK'].map(temperatureScaleOf)).toEqual([null, null, null, null, null, null]);
  });

  it('uses the constants as defined: 273.15 (SI) and 9/5, 32 (common practice), exactly', () => {
    // SI Brochure, 9th ed., §2.3.1: t/°C = T/K − 273.15, exactly.
    const toKelvin = scaleConversion('°C', 'K');
    expect([text(toKelvin.factor), text(toKelvin.offset)]).toEqual(['1/1', '5463/20']);
    // Common practice: t/°F = 9/5·t/°C + 32.
    const toFahrenheit = scaleConversion('°C', '°F');
    expect([text(toFahrenheit.factor), text(toFahrenheit.offset)]).toEqual(['9/5', '32/1']);
    // Computed by hand: T/K = 5/9·(t/°F − 32) + 273.15 = 5/9·t/°F + 45967/180.
    const fromFahrenheit = scaleConversion('°F', 'K');
    expect([text(fromFahrenheit.factor), text(fromFahrenheit.offset)]).toEqual(['5/9', '45967/180']);
    // Computed by hand: water's ice and steam points of common practice, and the crossing at −40.
    expect(text(applyMap(scaleConversion('°C', '°F'), rational(100n)))).toBe('212/1');
    expect(text(applyMap(scaleConversion('K', '°F'), parseDecimal('273.15')))).toBe('32/1');
    expect(text(applyMap(scaleConversion('°F', '°C'), rational(-40n)))).toBe('-40/1');
    expect(text(applyMap(scaleConversion('°F', 'K'), rational(212n)))).toBe('7463/20');
  });

  it('substitutes exactly: a quadratic in °C re-expressed in K and °F, computed by hand', () => {
    // p = 1 + 2·t + 3·t², t in °C. Computed by hand: with t = T − 273.15,
    // p = 3T² + (2 − 6·273.15)T + (1 − 2·273.15 + 3·273.15²) = 3T² − 1636.9T + 223287.4675;
    // with t = 5/9·(F − 32), p = 25/27·F² − 1570/27·F + 24667/27.
    const p = [rational(1n), rational(2n), rational(3n)];
    const kelvin = scaleConversion('K', '°C');
    expect(substituteAffineExact(p, kelvin.offset, kelvin.factor).map(text)).toEqual(['89314987/400', '-16369/10', '3/1']);
    expect(89314987 / 400).toBe(223287.4675);
    const fahrenheit = scaleConversion('°F', '°C');
    expect(substituteAffineExact(p, fahrenheit.offset, fahrenheit.factor).map(text)).toEqual(['24667/27', '-1570/27', '25/27']);
  });

  it('re-expresses certified coefficients exactly as Python fractions does (an order-4 fit in °C)', () => {
    const data = celsiusData(4, 0.02);
    const fit = fitPolynomial(data, { order: 4, temperatureScale: '°C' });
    expect(fit.method.refinement).toBe('exact-rational');
    // Independent: Python solves the normal equations exactly, then substitutes with Fraction('273.15'), 9/5, 32.
    const [solution] = pythonExactLeastSquares([{ u: data.x.map(String), v: data.y.map(String), order: 4, intercept: true }]);
    const result = python(
      `a = [F(t) for t in job["exact"]]
from math import comb
def sub(a, off, fac):
    return [sum(a[k] * comb(k, j) * off ** (k - j) * fac ** j for k in range(j, len(a))) for j in range(len(a))]
K = sub(a, -F("273.15"), F(1))
Fh = sub(a, -F(32) * F(5, 9), F(5, 9))
x = [F(s) for s in job["xK"]]
yK = [float(sum(c * xx ** k for k, c in enumerate(K))) for xx in x]
json.dump({"K": [float(c) for c in K], "F": [float(c) for c in Fh], "yK": yK}, sys.stdout)`,
      { exact: solution!.exact, xK: scale(fit, 'K').checkValues.map((check) => String(check.x)) },
    ) as { K: number[]; F: number[]; yK: number[] };
    expect(scale(fit, 'K').coefficients).toEqual(result.K);
    expect(scale(fit, '°F').coefficients).toEqual(result.F);
    // The K check values are the exact polynomial in K at the K check points, rounded once.
    expect(scale(fit, 'K').checkValues.map((check) => check.y)).toEqual(result.yK);
  });

  it('gives each scale its own range, check points and digits, and lists the native scale first', () => {
    const fit = fitPolynomial(celsiusData(2, 0.05), { order: 2, temperatureScale: '°C' });
    const scales = fit.temperatureScales!;
    expect(scales.native).toBe('°C');
    expect(scales.scales.map((form) => [form.scale, form.native])).toEqual([['°C', true], ['K', false], ['°F', false]]);
    // Computed by hand: 0…100 °C is 273.15…373.15 K and 32…212 °F.
    expect(scale(fit, 'K').range).toEqual({ min: 273.15, max: 373.15 });
    expect(scale(fit, '°F').range).toEqual({ min: 32, max: 212 });
    expect(scale(fit, '°F').checkValues.map((check) => check.x)).toEqual([32, 62, 92, 122, 152, 182, 212]);
    expect(scale(fit, '°C').coefficients).toEqual(fit.coefficients);
    expect(scale(fit, '°C').printedCheckValues).toEqual(fit.printedCheckValues);
    for (const form of scales.scales) {
      expect(form.shown).toBe(true);
      expect(form.printedDeviation).toBeLessThanOrEqual(1);
      expect(form.significantDigits.length).toBe(3);
    }
  });

  it('shows a re-expressed form only when its printed digits reproduce the fit within 1 % of s (order 6: K is refused)', () => {
    const data = celsiusData(6, 0.0005);
    const fit = fitPolynomial(data, { order: 6, temperatureScale: '°C' });
    const s = fit.statistics.residualStdDev;
    const kelvin = scale(fit, 'K');
    expect(kelvin.shown).toBe(false);
    expect(kelvin.reason).toMatch(/mapped form/);
    // Independent check in Python: the printed K coefficients, evaluated in double precision by Horner's rule,
    // against the exact native polynomial (Python's own exact fit) at the same temperature.
    const [solution] = pythonExactLeastSquares([{ u: data.x.map(String), v: data.y.map(String), order: 6, intercept: true }]);
    const worst = python(
      `a = [F(t) for t in job["exact"]]
worst = 0.0
for i in range(201):
    xK = 273.15 + 100 * i / 200
    h = 0.0
    for c in reversed([float(t) for t in job["printed"]]):
        h = h * xK + c
    exact = sum(c * (F(xK) - F("273.15")) ** k for k, c in enumerate(a))
    worst = max(worst, abs(h - float(exact)))
json.dump(worst, sys.stdout)`,
      { exact: solution!.exact, printed: kelvin.printedCoefficients },
    ) as number;
    expect(worst).toBeGreaterThan(0.01 * s);
    // The °C form (native) is always shown; °F keeps the digits rule here.
    expect(scale(fit, '°C').shown).toBe(true);
  });

  it('a shown form reproduces the fit within 1 % of s when its printed coefficients are evaluated in Python', () => {
    const data = celsiusData(3, 0.05);
    const fit = fitPolynomial(data, { order: 3, temperatureScale: '°C' });
    const s = fit.statistics.residualStdDev;
    const [solution] = pythonExactLeastSquares([{ u: data.x.map(String), v: data.y.map(String), order: 3, intercept: true }]);
    for (const name of ['K', '°F']) {
      const form = scale(fit, name);
      expect(form.shown).toBe(true);
      const worst = python(
        `a = [F(t) for t in job["exact"]]
toC = (lambda x: x - F("273.15")) if job["scale"] == "K" else (lambda x: (x - 32) * F(5, 9))
worst = F(0)
lo, hi = F(job["min"]), F(job["max"])
for i in range(201):
    x = lo + (hi - lo) * i / 200
    printed = sum(F(c) * x ** k for k, c in enumerate(job["printed"]))
    exact = sum(c * toC(x) ** k for k, c in enumerate(a))
    worst = max(worst, abs(printed - exact))
json.dump(float(worst), sys.stdout)`,
        { exact: solution!.exact, printed: form.printedCoefficients, scale: name, min: String(form.range.min), max: String(form.range.max) },
      ) as number;
      expect(worst).toBeLessThanOrEqual(0.01 * s);
    }
  });

  it('carries nothing for a transformed x or an x that is not a temperature', () => {
    const data = celsiusData(2, 0.05);
    const shifted = { x: data.x.map((t) => t + 300), y: data.y };
    expect(fitPolynomial(shifted, { order: 2, transformX: 'reciprocal', temperatureScale: 'K' }).temperatureScales).toBeNull();
    expect(fitPolynomial(shifted, { order: 2 }).temperatureScales).toBeNull();
    expect(toNumber(parseDecimal('273.15'))).toBe(273.15);
  });
});
