/**
 * hundredthsText against its definition, String(Math.round(value * 100) / 100) (ECMA-262 Number::toString as the
 * engine implements it: an independent computation), on random doubles of every magnitude, on pixel-sized values,
 * on exact hundredths and their neighbours, and on the edges (zero, −0, halves, 10^13, non-finite).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hundredthsText } from '../../src/render/hundredthsText.ts';

const reference = (value: number): string => String(Math.round(value * 100) / 100);

describe('hundredthsText', () => {
  it('hundredthsText(value) is String(Math.round(value * 100) / 100) on random doubles of every magnitude', () => {
    fc.assert(
      fc.property(fc.double(), (value) => {
        expect(hundredthsText(value)).toBe(reference(value));
      }),
      { numRuns: 20_000 },
    );
  });

  it('is the same text on pixel-sized values and on hundredths and their neighbours up to 10^13', () => {
    fc.assert(
      fc.property(fc.double({ min: -5000, max: 5000, noNaN: true }), (value) => {
        expect(hundredthsText(value)).toBe(reference(value));
      }),
      { numRuns: 20_000 },
    );
    fc.assert(
      fc.property(fc.integer({ min: -1e15 + 1, max: 1e15 - 1 }), fc.constantFrom(-1e-9, 0, 1e-9, 0.005, -0.005, 0.004999), (hundredths, offset) => {
        const value = hundredths / 100 + offset;
        expect(hundredthsText(value)).toBe(reference(value));
      }),
      { numRuns: 20_000 },
    );
  });

  it('writes the edges as String does (computed by hand)', () => {
    for (const value of [0, -0, 0.004, -0.004, 0.005, -0.005, 0.1, -0.1, 1.05, 100, -100.5, 1e13, -1e13, 1e15, 1e21, NaN, Infinity, -Infinity]) {
      expect(hundredthsText(value), String(value)).toBe(reference(value));
    }
    expect(hundredthsText(-0.004)).toBe('0');
    expect(hundredthsText(12.3456)).toBe('12.35');
    expect(hundredthsText(-7.1)).toBe('-7.1');
    expect(hundredthsText(3.07)).toBe('3.07');
  });
});
