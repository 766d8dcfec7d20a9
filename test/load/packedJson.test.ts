/**
 * Packed JSON (src/load/packedJson.ts) reads back exactly what the cache's JSON (cacheJson.ts, the format it
 * replaces for fit records and page parts) reads back: the same values, NaN, ±Infinity and −0 included, with the
 * keys of every object in the same order. The reference here is toCacheJson/fromCacheJson, whose own tests check
 * them against JSON.stringify with an independently written replacer (test/load/fitCache.test.ts).
 */
import { Buffer } from 'node:buffer';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fromCacheJson, toCacheJson } from '../../src/load/cacheJson.ts';
import { fromPackedJson, toPackedJson } from '../../src/load/packedJson.ts';

/** The value the old format gives back, and the new one's, compared value by value and as the old format's text. */
function expectSameReadBack(value: unknown): void {
  const reference = fromCacheJson(toCacheJson(value));
  const packed = fromPackedJson(toPackedJson(value));
  expect(packed).toEqual(reference);
  // toEqual ignores the order of keys; the text of the old format does not (nor NaN against null, nor −0 against 0).
  expect(toCacheJson(packed)).toBe(toCacheJson(reference));
}

const special = fc.constantFrom(NaN, Infinity, -Infinity, -0, 0, 5e-324, -1.7976931348623157e308, 0.1 + 0.2);
const number = fc.oneof(fc.double(), special);
const longText = fc.string({ unit: 'grapheme', minLength: 250, maxLength: 600 });
const leaf = fc.oneof(number, fc.string(), longText, fc.boolean(), fc.constant(null), fc.constant(undefined));
const key = fc.oneof(fc.constantFrom('x', 'y', 'row', 'note', '$f64', '$text', '$rows', '0', '12', 'constructor'), fc.string({ maxLength: 4 }));

describe('toPackedJson / fromPackedJson', () => {
  it('fromPackedJson(toPackedJson(value)) equals fromCacheJson(toCacheJson(value)) for any value', () => {
    const value = fc.letrec((tie) => ({
      node: fc.oneof({ depthSize: 'small' }, leaf, fc.array(tie('node')), fc.dictionary(key, tie('node'))),
    })).node;
    // (JSON has no text for undefined alone: neither format writes it.)
    fc.assert(fc.property(value.filter((item) => item !== undefined), expectSameReadBack), { numRuns: 400, seed: 4 });
  });

  it('large regular values read back the same: arrays of numbers (with nulls), rows of numbers, arrays of objects, long texts', () => {
    // Large, regular values of each packed kind, with the special numbers and keys that are missing or in another order.
    const numbers = fc.array(number, { minLength: 8, maxLength: 200 });
    const withNulls = fc.array(fc.oneof({ weight: 9, arbitrary: number }, { weight: 1, arbitrary: fc.constant(null) }), { minLength: 8, maxLength: 200 });
    const block = fc.integer({ min: 1, max: 17 }).chain((width) => fc.array(fc.array(fc.oneof({ weight: 9, arbitrary: number }, { weight: 1, arbitrary: fc.constant(null) }), { minLength: width, maxLength: width }), { minLength: 8, maxLength: 60 }));
    const point = fc.record(
      { row: fc.nat(), line: fc.nat(), x: number, y: number, uncertainty: number, note: fc.oneof(fc.string(), longText), $tag: fc.string() },
      { requiredKeys: ['row', 'line', 'x', 'y'] },
    );
    // Objects whose keys come in another order than the first one's (a table must keep each object's own order).
    const shuffled = fc.array(fc.oneof({ weight: 4, arbitrary: point }, { weight: 1, arbitrary: point.map((item) => Object.fromEntries(Object.entries(item).reverse())) }), { minLength: 8, maxLength: 80 });
    const rows = fc.array(fc.record({ point, residual: fc.option(number, { nil: undefined }), flagged: fc.boolean() }), { minLength: 8, maxLength: 80 });
    const value = fc.record({ numbers, withNulls, block, points: fc.array(point, { minLength: 8, maxLength: 80 }), shuffled, rows, text: longText });
    fc.assert(fc.property(value, expectSameReadBack), { numRuns: 300, seed: 7 });
  });

  it('toPackedJson packs: the doubles of an array as base64 (8 bytes each), long strings raw after the JSON', () => {
    const xs = Array.from({ length: 1000 }, (_, i) => Math.sqrt(i) / 7);
    const markup = `<span class="katex">${'x'.repeat(2000)}</span>`;
    const text = toPackedJson({ xs, markup });
    const skeleton = text.slice(0, text.indexOf('\n'));
    // 1000 doubles in base64: 8000 bytes → 10 668 characters (computed by hand: ceil(8000 / 3) · 4).
    expect(skeleton.length).toBeLessThan(10668 + 100);
    expect(skeleton).not.toContain('katex');
    expect(text.endsWith(markup)).toBe(true);
    expect(fromPackedJson(text)).toEqual({ xs, markup });
  });

  it('fromPackedJson keeps every double bit for bit: −0, NaN, ±Infinity, subnormals, the largest double', () => {
    const values = [-0, 0, NaN, Infinity, -Infinity, 5e-324, -5e-324, 1.7976931348623157e308, 2 ** -1074 * 3, 0.1, 1 / 3, -2.5];
    const back = fromPackedJson(toPackedJson({ values, rows: [values, values, values, values, values, values, values, values] })) as { values: number[]; rows: number[][] };
    values.forEach((value, i) => {
      expect(Object.is(back.values[i], value), `value ${i}`).toBe(true);
      for (const row of back.rows) expect(Object.is(row[i], value)).toBe(true);
    });
    // Plain arrays, not typed ones: JSON.stringify and Array methods treat them as before.
    expect(Array.isArray(back.values)).toBe(true);
  });

  it('a packed text survives a file (UTF-8): raw texts with any characters, a string with a lone surrogate', () => {
    const value = { markup: `<p>λ ≤ 5 °C, 𝑥², \n"quoted"</p>${'é'.repeat(300)}`, lone: `${'a'.repeat(300)}\ud800${'b'.repeat(10)}`, numbers: [0.1, -0, NaN, 1e300, 2, 3, 4, 5] };
    const throughFile = Buffer.from(toPackedJson(value), 'utf8').toString('utf8');
    expect(toCacheJson(fromPackedJson(throughFile))).toBe(toCacheJson(value));
  });

  it('fromPackedJson refuses a text that is not packed JSON', () => {
    expect(() => fromPackedJson('{"a":1}')).toThrow(/line break/);
    expect(() => fromPackedJson('{"$text":5}\nabc')).toThrow();
    expect(() => fromPackedJson('{"$unknown":1}\n')).toThrow(/known marker/);
    expect(() => fromPackedJson('{"a":"b"}\nleft over')).toThrow(/left/);
  });
});
