/**
 * literal (the numbers of every code snippet) against its first definition: String(value), with ".0" appended when
 * that text has neither a point nor an exponent (ECMA-262 Number::toString is the outside reference), on random
 * doubles of every magnitude, whole numbers around 10^21 and the edges; and its refusal of non-finite numbers.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { literal } from '../../src/export/snippets/snippetText.ts';

function reference(value: number): string {
  const text = String(value);
  return /[.eE]/.test(text) ? text : `${text}.0`;
}

describe('literal', () => {
  it('literal(value) is String(value) with ".0" after a text without point or exponent, on random doubles', () => {
    const whole = fc.tuple(fc.integer({ min: -30, max: 30 }), fc.integer({ min: 1, max: 999 }), fc.boolean()).map(([exponent, digits, negative]) => (negative ? -1 : 1) * digits * 10 ** exponent);
    fc.assert(
      fc.property(fc.oneof(fc.double({ noNaN: true, noDefaultInfinity: true }), whole, fc.integer()), (value) => {
        expect(literal(value)).toBe(reference(value));
      }),
      { numRuns: 20_000 },
    );
  });

  it('writes the edges as the definition does (computed by hand)', () => {
    for (const value of [0, -0, 1, -1, 1e20, 1e21, -1e21, 999999999999999900000, 1e-7, 0.5, 2 ** 53, Number.MAX_VALUE, Number.MIN_VALUE]) {
      expect(literal(value), String(value)).toBe(reference(value));
    }
    expect(literal(-0)).toBe('0.0');
    expect(literal(1e21)).toBe('1e+21');
    expect(() => literal(Number.NaN)).toThrow(/requires a finite number/);
    expect(() => literal(null)).toThrow(/requires a finite number/);
  });
});
