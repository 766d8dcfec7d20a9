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
 * Each record is one file of two parts. Its first line is the summary: the fit and its order selection without the
 * fit's per-point statistics, and none of the record's other large parts (the data rows, the previews), as JSON
 * (cacheJson.ts): what reading and fitting needs on a cache hit (fingerprint, order, criterion, messages) and what
 * the pages and exports show of the fit (its order table included). A hit parses only that line, and so does a
 * correlation page, whose data table and previews come with its page parts (src/components/lib/pageParts.ts); the
 * per-point statistics are read from the whole record the first time something asks for them (readCachedSummary).
 * The data rows follow on the second line, the previews on the third, then the fit's per-point statistics, packed
 * (packedJson.ts: each array of numbers as its doubles in base64), which is several times cheaper to write and read
 * back than JSON's 17-digit text and keeps every double bit for bit. One file, written once: before format 4 the
 * summary was a second file, and the record repeated it.
 *
 * JSON has no NaN, ±Infinity or −0; they are written as {"$number": "NaN"} and restored on reading, so a cached
 * fit equals a fresh one.
 */
import { createHash } from 'node:crypto';
import { Buffer } from 'node:buffer';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, readSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { threadId } from 'node:worker_threads';
import type { OrderPreviews } from '../render/orderPreviews.ts';
import type { PolynomialFit } from '../core/index.ts';
import type { DataPoint } from '../schema/index.ts';
import type { DatasetFit } from './fitDataset.ts';
import type { LoadedCorrelation } from './types.ts';
import { pruneKeyedFiles } from './pruneKeyedFiles.ts';
import { fromCacheJson, toCacheJson } from './cacheJson.ts';
import { fromPackedJson, toPackedJson } from './packedJson.ts';
import { rememberPreviewsJson } from './previewsJson.ts';

export { fromCacheJson, toCacheJson };

/** One cache file: the dataset's fit, the previews of its other orders, and every data row (for the pages). */
export interface CachedFit extends DatasetFit {
  /** Every data row, in file order (what the page's data table and data.csv show). */
  readonly points: readonly DataPoint[];
  /** Previews of the orders not published (src/render/orderPreviews.ts), or null. */
  readonly previews: OrderPreviews | null;
}

/** Bumped when the layout of a cache file changes. */
const CACHE_FORMAT = 4;

/** Where fits are cached and under which code version. */
export interface FitCache {
  /** Absolute directory of the cache files (created when missing). */
  readonly directory: string;
  /** The fitting code's version (fitCodeVersion): a change invalidates every entry. */
  readonly version: string;
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

/** The fit without fit.points, the order selection and the messages (the record's first line). */
function summaryOf(record: CachedFit): DatasetFit {
  const { points: _points, ...fit } = record.fit ?? ({} as PolynomialFit);
  return {
    fit: record.fit === undefined ? undefined : (fit as PolynomialFit),
    selection: record.selection,
    diagnostics: record.diagnostics,
  };
}

/** What a record holds besides its summary, its previews and fit.points (its second line). */
interface RecordRest {
  /** The place of fit.points among the keys of the fit that JSON writes (so that the fit comes back in order). */
  readonly fitPointsAt?: number;
  readonly points: readonly DataPoint[];
}

function restOf(record: CachedFit): RecordRest {
  const fit = record.fit as unknown as Record<string, unknown> | undefined;
  if (fit?.['points'] === undefined) return { points: record.points };
  let fitPointsAt = 0;
  for (const key of Object.keys(fit)) {
    if (key === 'points') break;
    if (fit[key] !== undefined) fitPointsAt++;
  }
  return { fitPointsAt, points: record.points };
}

/**
 * The record's text, in four parts: the summary (cacheJson.ts) on the first line; the data rows (cacheJson.ts) on
 * the second; the previews (cacheJson.ts) on the third, whose text a page's previews JSON takes as it is
 * (previewsJson.ts); then fit.points, packed (packedJson.ts: its arrays of full-precision doubles are the costly part
 * of a record's JSON). The rows and the previews stay JSON: their numbers are short (as written in the data file;
 * rounded for drawing), which V8 writes and reads about as fast as any packed form, and a walk over the rows'
 * objects would cost more than it saves.
 */
function recordText(record: CachedFit): string {
  const previews = record.previews === undefined ? 'null' : toCacheJson(record.previews);
  return `${toCacheJson(summaryOf(record))}\n${toCacheJson(restOf(record))}\n${previews}\n${toPackedJson(record.fit?.points ?? null)}`;
}

/** The record of a recordText. */
function recordOf(text: string): CachedFit {
  const first = text.indexOf('\n');
  const second = first < 0 ? -1 : text.indexOf('\n', first + 1);
  const third = second < 0 ? -1 : text.indexOf('\n', second + 1);
  if (third < 0) throw new Error('recordOf requires a summary line, a line of data rows and a line of previews');
  const summary = fromCacheJson(text.slice(0, first)) as DatasetFit;
  const rest = fromCacheJson(text.slice(first + 1, second)) as RecordRest;
  const previewsText = text.slice(second + 1, third);
  const previews = fromCacheJson(previewsText) as OrderPreviews | null;
  // Plain JSON (no tagged number): JSON.stringify's text of what it parses to.
  if (previews !== null && !previewsText.includes('"$number"')) rememberPreviewsJson(previews, previewsText);
  const fitPoints = fromPackedJson(text.slice(third + 1)) as PolynomialFit['points'] | null;
  let fit = summary.fit;
  if (fit !== undefined && rest.fitPointsAt !== undefined) {
    const keys = Object.keys(fit);
    const whole: Record<string, unknown> = {};
    keys.forEach((key, i) => {
      if (i === rest.fitPointsAt) whole['points'] = fitPoints;
      whole[key] = (fit as unknown as Record<string, unknown>)[key];
    });
    if (rest.fitPointsAt === keys.length) whole['points'] = fitPoints;
    fit = whole as unknown as PolynomialFit;
  }
  // The keys JSON kept, in the order written.
  const record: Record<string, unknown> = {};
  if (fit !== undefined) record['fit'] = fit;
  if (summary.selection !== undefined) record['selection'] = summary.selection;
  if (summary.diagnostics !== undefined) record['diagnostics'] = summary.diagnostics;
  if (rest.points !== undefined) record['points'] = rest.points;
  record['previews'] = previews;
  return record as unknown as CachedFit;
}

function writeAtomically(target: string, text: string): void {
  const temporary = `${target}.${process.pid}-${threadId}.tmp`;
  writeFileSync(temporary, text);
  renameSync(temporary, target);
}

/** Where first lines are read into (grown when a line is longer): one buffer, not one per file. */
let lineBuffer = Buffer.allocUnsafe(64 * 1024);

/**
 * The first line of `file` (without its line break), or undefined when the file has none. Reads only as far as the
 * line goes, into a buffer kept between calls: a record's summary is about half of its file, and reading the whole
 * file allocated a buffer for it every time (N = 1000 cold build, main thread: 94 ms of 590 in readCachedSummary).
 * @throws Error when the file cannot be opened or read
 */
function firstLine(file: string): string | undefined {
  const descriptor = openSync(file, 'r');
  try {
    let filled = 0;
    let searched = 0;
    for (;;) {
      if (filled === lineBuffer.length) {
        const larger = Buffer.allocUnsafe(lineBuffer.length * 2);
        lineBuffer.copy(larger, 0, 0, filled);
        lineBuffer = larger;
      }
      const read = readSync(descriptor, lineBuffer, filled, lineBuffer.length - filled, filled);
      if (read === 0) return undefined;
      filled += read;
      const end = lineBuffer.subarray(searched, filled).indexOf(10);
      if (end >= 0) return lineBuffer.toString('utf8', 0, searched + end);
      searched = filled;
    }
  } finally {
    closeSync(descriptor);
  }
}

/**
 * The fit, order selection and messages under `key`, from the first line of its record; `fit.points` is read from
 * the whole record only when first asked for. Undefined when the cache does not hold the key (or it cannot be read).
 * @example readCachedSummary(cache.directory, key)?.fit?.order // => 2
 */
export function readCachedSummary(directory: string, key: string): DatasetFit | undefined {
  let summary: DatasetFit;
  try {
    const line = firstLine(fileOf(directory, key));
    if (line === undefined) return undefined;
    summary = fromCacheJson(line) as DatasetFit;
  } catch {
    return undefined; // a damaged file is refitted and rewritten
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
    return { record: recordOf(text), size: text.length };
  } catch {
    return undefined; // a damaged file is refitted and rewritten
  }
}

/**
 * Store a record under `key`, in one file: written to a temporary name and renamed, so a reader never sees half a
 * file. The folder is created when a write finds it missing (not checked before every write: a build writes many
 * records into the same folder).
 * @example writeCachedFit(cache.directory, key, cacheRecord(correlation, fitDataset(correlation)))
 */
export function writeCachedFit(directory: string, key: string, fitted: CachedFit): void {
  const text = recordText(fitted);
  try {
    writeAtomically(fileOf(directory, key), text);
  } catch (caught) {
    if ((caught as NodeJS.ErrnoException).code !== 'ENOENT') throw caught;
    mkdirSync(directory, { recursive: true });
    writeAtomically(fileOf(directory, key), text);
  }
}

/**
 * Delete the records of a cache folder whose keys are not in `keep` (what a handbook no longer uses: older versions
 * of changed datasets, removed folders, an older fitting code), so the folder does not grow with every edit. Only
 * files named like records (64 hex digits, .json) or the summaries that format 3 wrote beside them (.summary.json)
 * are touched.
 * @example pruneFitCache(cache.directory, new Set(keys)) // => 3 (records deleted)
 */
export function pruneFitCache(directory: string, keep: ReadonlySet<string>): number {
  // Temporary files (…json.<pid>.tmp) may belong to a build running now: left alone (the pattern does not match them).
  return pruneKeyedFiles(directory, /^([0-9a-f]{64})(?:\.summary)?\.json$/, keep);
}
