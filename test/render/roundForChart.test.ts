/**
 * roundForChart's arithmetic fast path against its definition, Number(value.toPrecision(digits)) (ECMA-262
 * Number.prototype.toPrecision and StringToNumber, as the engine implements them: an independent computation), bit
 * for bit (Object.is) on random doubles of every magnitude, on values at and next to halves of the last digit kept
 * (where rounding is decided by the last bits) and at and next to powers of ten (where the exponent changes), for
 * 1 to 12 digits.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundForChart } from '../../src/render/roundForChart.ts';

/** The definition. */
function reference(value: number, digits: number): number | null {
  return Number.isFinite(value) ? Number(value.toPrecision(digits)) : null;
}

/** The double next to `value` towards +∞ (up) or −∞, by its bits. */
function neighbour(value: number, up: boolean): number {
  if (value === 0) return up ? Number.MIN_VALUE : -Number.MIN_VALUE;
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, value);
  const bits = view.getBigUint64(0);
  view.setBigUint64(0, value > 0 === up ? bits + 1n : bits - 1n);
  return view.getFloat64(0);
}

const digits = fc.integer({ min: 1, max: 12 });
/** Decimals of `digits + 1` significant digits ending in 5 (halves of the last digit kept), their neighbours. */
const halves = fc
  .tuple(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 0, max: 99_999_999 }), fc.integer({ min: -30, max: 30 }), fc.constantFrom(-1, 0, 1), fc.boolean())
  .map(([kept, mantissa, exponent, step, negative]) => {
    const lead = String(mantissa % 10 ** kept).padStart(kept, '1');
    const decimal = Number(`${negative ? '-' : ''}${lead}5e${exponent}`);
    return { value: step === 0 ? decimal : neighbour(decimal, step > 0), digits: kept };
  });
/** Powers of ten, values just below them (…999 95) and their neighbours. */
const edges = fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: 1, max: 8 }), fc.constantFrom(-1, 0, 1), fc.boolean()).map(([exponent, kept, step, below]) => {
  const decimal = below ? Number(`${'9'.repeat(kept)}5e${exponent - kept - 1}`) : Number(`1e${exponent}`);
  return { value: step === 0 ? decimal : neighbour(decimal, step > 0), digits: kept };
});

describe('roundForChart', () => {
  it('equals Number(value.toPrecision(digits)) bit for bit on random doubles of every magnitude', () => {
    fc.assert(
      fc.property(fc.double(), digits, (value, d) => {
        expect(Object.is(roundForChart(value, d), reference(value, d)), `${value} to ${d} digits`).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  });

  it('equals it on chart-sized values (what the curve rows and points hold)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e7, max: 1e7, noNaN: true }), fc.double({ min: 1e-9, max: 1, noNaN: true }), (value, scale) => {
        const scaled = value * scale;
        expect(Object.is(roundForChart(scaled), reference(scaled, 6)), `${scaled}`).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  });

  it('equals it at and next to halves of the last digit kept and at powers of ten', () => {
    fc.assert(
      fc.property(fc.oneof(halves, edges), ({ value, digits: d }) => {
        expect(Object.is(roundForChart(value, d), reference(value, d)), `${value} to ${d} digits`).toBe(true);
      }),
      { numRuns: 20_000 },
    );
  });

  it('rounds exact halves as toPrecision does (away from zero), −0 to 0, and non-finite values to null', () => {
    // Exact in binary, so these are true ties (computed by hand): 6 digits of 1234565 and 123456.5, 1 digit of 0.25.
    for (const [value, d] of [[1234565, 6], [-1234565, 6], [123456.5, 6], [0.25, 1], [-0.25, 1], [2.5, 1]] as const) {
      expect(Object.is(roundForChart(value, d), reference(value, d)), `${value}`).toBe(true);
    }
    expect(roundForChart(1234565)).toBe(1234570);
    expect(Object.is(roundForChart(-0), 0)).toBe(true);
    expect(roundForChart(Number.NEGATIVE_INFINITY)).toBeNull();
  });
});
