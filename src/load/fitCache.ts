/**
 * On-disk fit cache: the result of fitDataset for one correlation, with what the pages derive from it once per
 * dataset (the previews of the other orders) and the data rows they show, stored as a JSON file named by a SHA-256
 * key of everything the record depends on: every data row (row, line, x, y, uncertainty, note), the points used,
 * the fit options, the validity range, the file paths and metadata positions that its messages name, and the
 * fitting code's version (fitCodeVersion). Unchanged datasets are read back instead of refitted; a changed one
 * gets a new key. The key never depends on time or machine, so two builds of the same content produce the same
 * files.
 *
 * The same files serve the built pages: the site's content store keeps only a reference (directory and key) and
 * pages read the fit, its order table, the previews and the data rows from here (src/load/storedFit.ts), which
 * keeps Astro's store, and the JavaScript module Astro bundles it into, small.
 *
 * Beside each record, `<key>.summary.json` holds the fit and its order selection without the fit's per-point
 * statistics, and none of the record's other large parts (the data rows, the previews): what reading and fitting
 * needs on a cache hit (fingerprint, order, criterion, messages) and what the pages and exports show of the fit
 * (its order table included). A hit reads only the summary, and so does a correlation page, whose data table and
 * previews come with its page parts (src/components/lib/pageParts.ts); the per-point statistics are read from the
 * full record the first time something asks for them (readCachedSummary). At N = 1000 this keeps a build from
 * parsing about 50 KB of JSON per dataset where 15 KB serve.
 *
 * JSON has no NaN, ±Infinity or −0; they are written as {"$number": "NaN"} and restored on reading, so a cached
 * fit equals a fresh one.
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { OrderPreviews } from '../render/orderPreviews.ts';
import type { PolynomialFit } from '../core/index.ts';
import type { DataPoint } from '../schema/index.ts';
import type { DatasetFit } from './fitDataset.ts';
import type { LoadedCorrelation } from './types.ts';
import { pruneKeyedFiles } from './pruneKeyedFiles.ts';

/** One cache file: the dataset's fit, the previews of its other orders, and every data row (for the pages). */
export interface CachedFit extends DatasetFit {
  /** Every data row, in file order (what the page's data table and data.csv show). */
  readonly points: readonly DataPoint[];
  /** Previews of the orders not published (src/render/orderPreviews.ts), or null. */
  readonly previews: OrderPreviews | null;
}

/** Bumped when the layout of a cache file changes. */
const CACHE_FORMAT = 3;

/** Where fits are cached and under which code version. */
export interface FitCache {
  /** Absolute directory of the cache files (created when missing). */
  readonly directory: string;
  /** The fitting code's version (fitCodeVersion): a change invalidates every entry. */
  readonly version: string;
}

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

/**
 * The cache key of a correlation's fit: SHA-256 (hex) of the version and every input of fitDataset, including the
 * positions its messages point at.
 * @example fitCacheKey(loaded, 'v1').length // => 64
 */
export function fitCacheKey(correlation: LoadedCorrelation, version: string): string {
  const inputs = {
    format: CACHE_FORMAT,
    version,
    points: correlation.points.map((point) => [point.row, point.line, point.x, point.y, point.uncertainty ?? null, point.note ?? null]),
    used: correlation.used.map((point) => [point.x, point.y, point.uncertainty ?? null, point.line]),
    fit: correlation.meta.fit,
    range: correlation.range,
    metadataPath: correlation.metadataPath,
    dataPath: correlation.dataPath,
    orderPosition: correlation.orderPosition,
  };
  return createHash('sha256').update(toCacheJson(inputs)).digest('hex');
}

function fileOf(directory: string, key: string): string {
  return path.join(directory, `${key}.json`);
}

function summaryFileOf(directory: string, key: string): string {
  return path.join(directory, `${key}.summary.json`);
}

/** The fit without fit.points, the order selection and the messages (what a summary file holds). */
function summaryOf(record: CachedFit): DatasetFit {
  const { points: _points, ...fit } = record.fit ?? ({} as PolynomialFit);
  return {
    fit: record.fit === undefined ? undefined : (fit as PolynomialFit),
    selection: record.selection,
    diagnostics: record.diagnostics,
  };
}

function writeAtomically(target: string, text: string): void {
  const temporary = `${target}.${process.pid}.tmp`;
  writeFileSync(temporary, text);
  renameSync(temporary, target);
}

/**
 * The fit, order selection and messages under `key`, read from the small summary file; `fit.points` is read from
 * the full record only when first asked for. Undefined when the cache does not
 * hold the key (or a file cannot be read); a record without a summary (written before summaries existed) is read in
 * full and its summary written.
 * @example readCachedSummary(cache.directory, key)?.fit?.order // => 2
 */
export function readCachedSummary(directory: string, key: string): DatasetFit | undefined {
  let summary: DatasetFit;
  try {
    summary = fromCacheJson(readFileSync(summaryFileOf(directory, key), 'utf8')) as DatasetFit;
  } catch {
    const full = readCachedFit(directory, key);
    if (full === undefined) return undefined;
    try {
      writeAtomically(summaryFileOf(directory, key), toCacheJson(summaryOf(full)));
    } catch {
      // a read-only cache still serves the full record
    }
    return { fit: full.fit, selection: full.selection, diagnostics: full.diagnostics };
  }
  let full: CachedFit | undefined;
  const record = (): CachedFit => {
    full ??= readCachedFit(directory, key);
    if (full === undefined) throw new Error(`readCachedSummary requires the cached fit ${key} in ${directory}; it is missing (was the cache folder removed during the build?)`);
    return full;
  };
  const lazy = <T extends object>(value: T | undefined, name: string, get: () => unknown): T | undefined => {
    if (value === undefined) return undefined;
    let known: unknown;
    let loaded = false;
    return Object.defineProperty({ ...value }, name, {
      enumerable: true,
      get: () => {
        if (!loaded) {
          known = get();
          loaded = true;
        }
        return known;
      },
    });
  };
  return {
    fit: lazy(summary.fit, 'points', () => record().fit!.points),
    selection: summary.selection,
    diagnostics: summary.diagnostics,
  };
}

/**
 * Whether the cache holds a record under `key` (without reading it).
 * @example hasCachedFit(cache.directory, key) // => true
 */
export function hasCachedFit(directory: string, key: string): boolean {
  return existsSync(fileOf(directory, key));
}

/** The cached record under `key`, or undefined when there is none (or it cannot be read). */
export function readCachedFit(directory: string, key: string): CachedFit | undefined {
  return readCachedRecord(directory, key)?.record;
}

/** The cached record under `key` with the length of its file's text (for callers that keep records in memory). */
export function readCachedRecord(directory: string, key: string): { record: CachedFit; size: number } | undefined {
  let text: string;
  try {
    text = readFileSync(fileOf(directory, key), 'utf8');
  } catch {
    return undefined;
  }
  try {
    return { record: fromCacheJson(text) as CachedFit, size: text.length };
  } catch {
    return undefined; // a damaged file is refitted and rewritten
  }
}

/** Store a record under `key`; written to a temporary name and renamed, so a reader never sees half a file. */
export function writeCachedFit(directory: string, key: string, fitted: CachedFit): void {
  const record = toCacheJson(fitted);
  // The record first: a summary is only ever found beside its record. The folder is created when a write finds it
  // missing (not checked before every write: a build writes many records into the same folder).
  try {
    writeAtomically(fileOf(directory, key), record);
  } catch (caught) {
    if ((caught as NodeJS.ErrnoException).code !== 'ENOENT') throw caught;
    mkdirSync(directory, { recursive: true });
    writeAtomically(fileOf(directory, key), record);
  }
  writeAtomically(summaryFileOf(directory, key), toCacheJson(summaryOf(fitted)));
}

/**
 * Delete the records of a cache folder whose keys are not in `keep` (what a handbook no longer uses: older versions
 * of changed datasets, removed folders, an older fitting code), so the folder does not grow with every edit. Only
 * files named like records or their summaries (64 hex digits, .json or .summary.json) are touched.
 * @example pruneFitCache(cache.directory, new Set(keys)) // => 3 (records deleted)
 */
export function pruneFitCache(directory: string, keep: ReadonlySet<string>): number {
  // Temporary files (…json.<pid>.tmp) may belong to a build running now: left alone (the pattern does not match them).
  return pruneKeyedFiles(directory, /^([0-9a-f]{64})(?:\.summary)?\.json$/, keep);
}
