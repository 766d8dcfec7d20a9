/**
 * The one rule for numbers that are not finite in every export (`correlary fit --json`, coefficients.json/.csv,
 * handbook.json): NaN, Infinity and −Infinity become null. JSON has no NaN, and a null always means "not defined
 * for this fit" — a statistic without residual degrees of freedom, a test that could not be run, an interval of a
 * coefficient fixed by a constraint — never zero. CSV prints null as an empty field.
 *
 * @example jsonNumbers({ s: NaN, n: 3, row: [1, Infinity] }) // => { s: null, n: 3, row: [1, null] }
 */
export type JsonValue = null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

/** The type of a value after jsonNumbers: every number may be null. */
export type Jsonified<T> = T extends number
  ? number | null
  : T extends string | boolean | null | undefined
    ? T
    : T extends readonly (infer U)[]
      ? Jsonified<U>[]
      : { [K in keyof T]: Jsonified<T[K]> };

/** A copy of a plain value with every non-finite number replaced by null (undefined properties are dropped). */
export function jsonNumbers(value: unknown): JsonValue {
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  if (value === null || value === undefined) return null;
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  if (Array.isArray(value)) return value.map(jsonNumbers);
  if (typeof value === 'object') {
    const result: { [key: string]: JsonValue } = {};
    // Object.keys, not Object.entries: the same own enumerable keys in the same order, without a pair per key.
    for (const key of Object.keys(value)) {
      const entry = (value as Record<string, unknown>)[key];
      if (entry !== undefined) result[key] = jsonNumbers(entry);
    }
    return result;
  }
  return null;
}

/** One number under the rule: finite as it is, else null. @example finiteOrNull(NaN) // => null */
export function finiteOrNull(value: number | null | undefined): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}
