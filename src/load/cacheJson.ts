/**
 * The JSON of the caches (fit records, folder records, page parts): JSON has no NaN, ±Infinity or −0, so they are
 * written as {"$number": "NaN"} (and "Infinity", "-Infinity", "-0") and restored on reading, so that a value read back
 * equals the one written.
 */
const NUMBER_TAG = '$number';

function replacer(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && (!Number.isFinite(value) || Object.is(value, -0))) return { [NUMBER_TAG]: Object.is(value, -0) ? '-0' : String(value) };
  return value;
}

function reviver(_key: string, value: unknown): unknown {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    const keys = Object.keys(value);
    if (keys.length === 1 && keys[0] === NUMBER_TAG) return Number((value as Record<string, string>)[NUMBER_TAG]);
  }
  return value;
}

/**
 * True when the replacer could change what JSON.stringify writes for `value`: it holds a number JSON has no text for
 * (NaN, ±Infinity, −0), or an object with a toJSON method (whose result the scan does not follow), or it nests deeper
 * than the scan goes. Visits what JSON.stringify visits: array elements and own enumerable string keys.
 */
function needsReplacer(value: unknown, depth: number): boolean {
  if (typeof value === 'number') return !Number.isFinite(value) || Object.is(value, -0);
  if (value === null || typeof value !== 'object') return false;
  if (depth > 200 || typeof (value as { toJSON?: unknown }).toJSON === 'function') return true;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) if (needsReplacer(value[i], depth + 1)) return true;
    return false;
  }
  for (const key of Object.keys(value)) if (needsReplacer((value as Record<string, unknown>)[key], depth + 1)) return true;
  return false;
}

/**
 * JSON text of any plain value, keeping NaN, ±Infinity and −0. The replacer returns every other value unchanged, so a
 * value without such numbers is written by JSON.stringify alone (same text, without a call back per value).
 * @example toCacheJson([NaN]) // => '[{"$number":"NaN"}]'
 */
export function toCacheJson(value: unknown): string {
  return needsReplacer(value, 0) ? JSON.stringify(value, replacer) : JSON.stringify(value);
}

/**
 * Tagged numbers JSON itself can spell: a number too large for a double parses as ±Infinity, and "-0" as −0
 * (ECMA-262 JSON.parse reads numbers as StringToNumber does). A tag can only stand where a value does (inside a
 * string its quotes would be escaped), so replacing its text by the number's is exact.
 */
const SPELLED: readonly (readonly [string, string])[] = [
  [`{"${NUMBER_TAG}":"Infinity"}`, '1e999'],
  [`{"${NUMBER_TAG}":"-Infinity"}`, '-1e999'],
  [`{"${NUMBER_TAG}":"-0"}`, '-0'],
];

/**
 * The value back from toCacheJson's text. Text without a tagged number is parsed without a reviver (fast path);
 * ±Infinity and −0 are spelled as JSON numbers first, so only text holding a NaN needs the reviver (a reviver
 * call per value makes parsing several times slower).
 */
export function fromCacheJson(text: string): unknown {
  if (!text.includes(`"${NUMBER_TAG}"`)) return JSON.parse(text);
  let spelled = text;
  for (const [tag, number] of SPELLED) spelled = spelled.replaceAll(tag, number);
  return spelled.includes(`"${NUMBER_TAG}"`) ? JSON.parse(text, reviver) : JSON.parse(spelled);
}
