/**
 * Packed JSON: the caches' JSON (cacheJson.ts) with the large, regular parts of a value in forms that are much
 * cheaper to write and to read back than JSON's text, for the fit records (fitCache.ts) and the page parts
 * (src/components/lib/pageParts.ts) that a build writes in one thread and reads in another:
 * - an array of numbers is the base64 text of its IEEE-754 doubles (little-endian): no number is turned into
 *   decimal text and back, and every double comes back bit for bit, NaN, ±Infinity and −0 included
 *   (`{"$f64": "…"}`, with `"$null": [i, …]` for the places of null in an array of numbers and nulls);
 * - a long string is written raw after the JSON, not escaped inside it (`{"$text": length}`), so that markup and
 *   JSON texts are neither escaped when written nor unescaped when read.
 * Anything else is left to cacheJson (arrays of objects cost no more as JSON: V8 writes and reads objects of one
 * shape fast, and a table of columns measured slower both ways on fit records). A packed text reads back as the value
 * JSON would give (keys whose value is undefined are dropped; an object's toJSON, a typed array or an array holding
 * undefined is left to JSON). An object of the value whose own key starts with "$" is wrapped (`{"$object": …}`) so
 * that it is never read as a marker.
 *
 * The text is the skeleton's JSON on the first line (JSON text never holds a raw line break), then the raw strings,
 * back to back; string lengths count UTF-16 units. Reading it walks only the skeleton, whose large parts are gone.
 *
 * @example fromPackedJson(toPackedJson({ x: [1, -0, NaN, 4, 5, 6, 7, 8] })) // => { x: [1, -0, NaN, 4, 5, 6, 7, 8] }
 */
import { Buffer } from 'node:buffer';
import { endianness } from 'node:os';
import { fromCacheJson, toCacheJson } from './cacheJson.ts';

/** Arrays shorter than this stay JSON (a marker and base64 cost more than they save on a few numbers). */
const MIN_PACKED = 8;
/** Strings at least this long are written raw. */
const MIN_TEXT = 256;

const BIG_ENDIAN = endianness() === 'BE';

/** Little-endian doubles of `values` (null as NaN), as base64. */
function doublesText(values: readonly (number | null)[], length: number): string {
  const doubles = new Float64Array(length);
  for (let i = 0; i < length; i++) doubles[i] = values[i] ?? NaN;
  const bytes = Buffer.from(doubles.buffer, doubles.byteOffset, doubles.byteLength);
  if (BIG_ENDIAN) bytes.swap64();
  return bytes.toString('base64');
}

/** The doubles of a doublesText, as a plain array. */
function doublesOf(text: string): (number | null)[] {
  const bytes = Buffer.from(text, 'base64');
  if (BIG_ENDIAN) bytes.swap64();
  const length = bytes.length >> 3;
  const values = new Array<number | null>(length);
  // A loop, not Array.from (which goes through the typed array's iterator: ten times slower).
  if (bytes.byteOffset % 8 === 0) {
    const doubles = new Float64Array(bytes.buffer, bytes.byteOffset, length);
    for (let i = 0; i < length; i++) values[i] = doubles[i]!;
  } else {
    for (let i = 0; i < length; i++) values[i] = bytes.readDoubleLE(i * 8);
  }
  return values;
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (value === null || typeof value !== 'object' || Array.isArray(value) || ArrayBuffer.isView(value)) return false;
  return typeof (value as { toJSON?: unknown }).toJSON !== 'function';
}

/** Is every item a number or null (with at most a quarter null)? */
function numbersAndNulls(items: readonly unknown[]): boolean {
  let nulls = 0;
  for (let i = 0; i < items.length; i++) {
    const item = items[i];
    if (typeof item === 'number') continue;
    if (item !== null) return false;
    nulls++;
  }
  return nulls * 4 <= items.length;
}

function nullPlaces(items: readonly unknown[], into: Record<string, unknown>): void {
  const places: number[] = [];
  for (let i = 0; i < items.length; i++) if (items[i] === null) places.push(i);
  if (places.length > 0) into['$null'] = places;
}

function isKept(value: unknown): boolean {
  return value !== undefined && typeof value !== 'function' && typeof value !== 'symbol';
}

function packArray(items: readonly unknown[], texts: string[]): unknown {
  if (items.length >= MIN_PACKED && numbersAndNulls(items)) {
    const marker: Record<string, unknown> = { $f64: doublesText(items as (number | null)[], items.length) };
    nullPlaces(items, marker);
    return marker;
  }
  // JSON writes undefined, a function or a symbol in an array as null: left as it is, for cacheJson to write.
  return items.map((item) => (isKept(item) ? pack(item, texts) : item));
}

function pack(value: unknown, texts: string[]): unknown {
  if (typeof value === 'string') {
    // A lone surrogate would not survive the file's UTF-8: such a string stays JSON (escaped). (isWellFormed is in
    // Node 20; TypeScript's ES2022 library does not declare it.)
    if (value.length < MIN_TEXT || !(value as string & { isWellFormed(): boolean }).isWellFormed()) return value;
    texts.push(value);
    return { $text: value.length };
  }
  if (Array.isArray(value)) return packArray(value, texts);
  if (!isPlainObject(value)) return value;
  const packed: Record<string, unknown> = {};
  let marked = false;
  for (const key of Object.keys(value)) {
    const item = value[key];
    if (!isKept(item)) continue;
    if (key.charCodeAt(0) === 36) marked = true; // "$"
    packed[key] = pack(item, texts);
  }
  return marked ? { $object: packed } : packed;
}

/**
 * The packed text of `value` (see the file's comment).
 * @example toPackedJson({ a: 'x' }) // => '{"a":"x"}\n'
 */
export function toPackedJson(value: unknown): string {
  const texts: string[] = [];
  const skeleton = toCacheJson(pack(value, texts));
  return `${skeleton}\n${texts.join('')}`;
}

interface Reading {
  readonly text: string;
  at: number;
}

function unpack(value: unknown, reading: Reading): unknown {
  if (value === null || typeof value !== 'object') return value;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) value[i] = unpack(value[i], reading);
    return value;
  }
  const object = value as Record<string, unknown>;
  let first: string | undefined;
  for (const key in object) {
    first = key;
    break;
  }
  if (first === undefined || first.charCodeAt(0) !== 36) {
    for (const key in object) object[key] = unpack(object[key], reading);
    return object;
  }
  if (first === '$text') {
    const length = object['$text'] as number;
    const text = reading.text.slice(reading.at, reading.at + length);
    reading.at += length;
    return text;
  }
  if (first === '$f64') {
    const numbers = doublesOf(object['$f64'] as string);
    for (const place of (object['$null'] as number[] | undefined) ?? []) numbers[place] = null;
    return numbers;
  }
  if (first === '$object') {
    const inner = object['$object'] as Record<string, unknown>;
    for (const key in inner) inner[key] = unpack(inner[key], reading);
    return inner;
  }
  throw new Error(`fromPackedJson requires a known marker; found ${first}`);
}

/**
 * The value of a toPackedJson text.
 * @throws Error when the text is not one (no line break, JSON that does not parse, an unknown marker)
 * @example fromPackedJson('{"a":"x"}\n') // => { a: 'x' }
 */
export function fromPackedJson(text: string): unknown {
  const end = text.indexOf('\n');
  if (end < 0) throw new Error('fromPackedJson requires a line break after the JSON');
  const skeleton = fromCacheJson(text.slice(0, end));
  const reading: Reading = { text, at: end + 1 };
  const value = unpack(skeleton, reading);
  if (reading.at !== text.length) throw new Error(`fromPackedJson requires the raw texts to fill the rest; ${text.length - reading.at} characters are left`);
  return value;
}
