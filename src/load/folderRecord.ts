/**
 * Folder records: what reading and validating one correlation folder gave (its DatasetResult, every message
 * included), kept on disk between builds with the SHA-256 of the bytes of the two files it was made from, so that a
 * rebuild does not parse and validate the folders that did not change. readFolder (src/load/readDataset.ts) still
 * makes every file-system check of a fresh read (the folder, the metadata file, the data file: existence, symbolic
 * links, regular file, size limit) and reads both files' bytes; only when both hash to what the record holds does it
 * return the recorded result instead of parsing them. The result is a function of those bytes, the folder's path
 * and the reading code (readingCodeVersion, in the record's key), so it is the one a fresh read gives, messages
 * and their order included; a changed byte reads the folder afresh.
 *
 * A record also keeps what fitting the folder gave (FitFacts: the fit cache key, the fit's messages, whether there
 * is a fit and an order selection, the fingerprint) under the fitting code's version, so that a rebuild needs
 * neither the fit cache key (a hash over every data row) nor the fit's summary nor the fingerprint of an unchanged
 * folder (src/load/fitHandbook.ts).
 *
 * Records are written with node:v8's serializer (the structured clone format: it keeps undefined, −0, NaN,
 * ±Infinity and shared objects exactly, so a recorded result equals a fresh one) into
 * `<cache>/correlary-folders/<key>.v8`, one file per folder path. The folder may be deleted at any time. The data
 * rows (the correlation's `points` and `used`, which share their objects) are serialized on their own inside the
 * record and deserialized only when first asked for: a rebuild rarely needs an unchanged folder's rows (its fit
 * comes from the cache), and they are most of a record (at N = 1000, 78–87 ms of CPU to deserialize whole
 * records, 9–19 ms without the rows).
 */
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { deserialize, serialize } from 'node:v8';
import type { Diagnostic } from './diagnostic.ts';
import type { Fingerprint } from './review/fingerprint.ts';
import type { DatasetResult } from './types.ts';
import { pruneKeyedFiles } from './pruneKeyedFiles.ts';

/** Bumped when the layout of a record changes. */
const RECORD_FORMAT = 2;

/** What fitting a folder gave, as fitHandbook needs it for an unchanged folder. */
export interface FitFacts {
  /** The fitting code's version (FitCache.version) the facts were made with; other versions ignore them. */
  readonly version: string;
  /** The fit's key in the fit cache (fitCacheKey). */
  readonly key: string;
  /** The fit's messages (DatasetFit.diagnostics). */
  readonly diagnostics: readonly Diagnostic[];
  /** Whether the fit and the order selection are defined. */
  readonly fit: boolean;
  readonly selection: boolean;
  /** The review trail's fingerprint (undefined without a fit). */
  readonly fingerprint: Fingerprint | undefined;
}

/** One folder's record. */
export interface FolderRecord {
  readonly format: number;
  /** SHA-256 (hex) of the metadata file's bytes. */
  readonly metadata: string;
  /** The data file as the metadata names it (what readDataset resolves). */
  readonly dataFile: string;
  /** SHA-256 (hex) of the data file's bytes. */
  readonly data: string;
  /** What reading the folder gave (without the errors about the handbook as a whole, such as a clashing slug). */
  readonly result: DatasetResult;
  readonly fit?: FitFacts;
}

/** What a read from the files (not from a record) hashed: what a new record is made of besides the result. */
export type FolderSources = Pick<FolderRecord, 'metadata' | 'dataFile' | 'data'>;

/**
 * SHA-256 (hex) of a file's bytes.
 * @example bytesHash(Buffer.from('')) // => 'e3b0c442…b855'
 */
export function bytesHash(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex');
}

/**
 * The record key of a folder: SHA-256 of the record format, the reading code's version and the folder's path as
 * given (it names the files in every message) and as an absolute path.
 * @example folderRecordKey(version, 'content/corvane-cp').length // => 64
 */
export function folderRecordKey(version: string, folder: string): string {
  return createHash('sha256').update(`${RECORD_FORMAT}\0${version}\0${folder}\0${path.resolve(folder)}`).digest('hex');
}

function fileOf(directory: string, key: string): string {
  return path.join(directory, `${key}.v8`);
}

/** A record as stored: the correlation's rows apart, serialized on their own. */
type StoredRecord = FolderRecord & { readonly rows?: Uint8Array };

/**
 * The record under `key`, or undefined when there is none or it cannot be read. The correlation's `points` and
 * `used` are deserialized when first read.
 * @example readFolderRecord(directory, key)?.result.slug // => 'corvane-cp'
 */
export function readFolderRecord(directory: string, key: string): FolderRecord | undefined {
  let stored: StoredRecord;
  try {
    stored = deserialize(readFileSync(fileOf(directory, key))) as StoredRecord;
  } catch {
    return undefined; // missing or damaged: the folder is read afresh and its record written again
  }
  if (stored?.format !== RECORD_FORMAT) return undefined;
  const { rows, ...record } = stored;
  const correlation = record.result.correlation;
  if (rows !== undefined && correlation !== undefined) {
    let read: Pick<NonNullable<DatasetResult['correlation']>, 'points' | 'used'> | undefined;
    const load = () => (read ??= deserialize(rows) as NonNullable<typeof read>);
    // The keys are already there (as undefined), so they keep their place among the correlation's keys.
    Object.defineProperties(correlation, {
      points: { enumerable: true, configurable: true, get: () => load().points },
      used: { enumerable: true, configurable: true, get: () => load().used },
    });
  }
  return record;
}

/**
 * Store a record under `key` (written to a temporary name and renamed, so a reader never sees half a file).
 * @example writeFolderRecord(directory, key, { ...sources, result, fit })
 */
export function writeFolderRecord(directory: string, key: string, record: Omit<FolderRecord, 'format'>): void {
  const correlation = record.result.correlation;
  const stored =
    correlation === undefined
      ? record
      : {
          ...record,
          result: { ...record.result, correlation: { ...correlation, points: undefined, used: undefined } },
          rows: serialize({ points: correlation.points, used: correlation.used }),
        };
  const bytes = serialize({ format: RECORD_FORMAT, ...stored });
  const target = fileOf(directory, key);
  const temporary = `${target}.${process.pid}.tmp`;
  try {
    writeFileSync(temporary, bytes);
  } catch (caught) {
    if ((caught as NodeJS.ErrnoException).code !== 'ENOENT') throw caught;
    mkdirSync(directory, { recursive: true });
    writeFileSync(temporary, bytes);
  }
  renameSync(temporary, target);
}

/**
 * Delete the records whose keys are not in `keep` (folders removed or renamed, an older reading code). Only files
 * named like records are touched.
 * @example pruneFolderRecords(directory, new Set(keys)) // => 1 (records deleted)
 */
export function pruneFolderRecords(directory: string, keep: ReadonlySet<string>): number {
  return pruneKeyedFiles(directory, /^([0-9a-f]{64})\.v8$/, keep);
}
