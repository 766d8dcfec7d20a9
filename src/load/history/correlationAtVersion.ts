/**
 * One past version of a correlation, read from the texts of its files (from git) with the same validators as a
 * folder on disk, then fitted, so that its fingerprint and curve can be compared with today's. A version that does
 * not validate or fit is reported as such (undefined), never as an error of the build.
 */
import type { PolynomialFit } from '../../core/index.ts';
import { hasErrors } from '../diagnostic.ts';
import { checkDataset } from '../checkDataset.ts';
import { fitDataset } from '../fitDataset.ts';
import { readCsv } from '../readCsv.ts';
import { readMetadata } from '../readMetadata.ts';
import { tableToPoints } from '../tableToPoints.ts';
import type { LoadedCorrelation } from '../types.ts';
import { fingerprint, type Fingerprint } from '../review/fingerprint.ts';

export interface FittedVersion {
  readonly correlation: LoadedCorrelation;
  readonly fit: PolynomialFit;
  readonly fingerprint: Fingerprint;
}

/** Text of a file as stored, BOM removed (as readText does). */
function decode(buffer: Buffer): string {
  const text = buffer.toString('utf8');
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * @param metadata the metadata file's bytes at that version
 * @param dataFile the bytes of a data file at that version, by its path inside the folder
 * @example correlationAtVersion('liquid-a', metadataBytes, (name) => files.get(name))?.fingerprint.text // => "fp1-…"
 */
export function correlationAtVersion(slug: string, metadata: Buffer, dataFile: (name: string) => Buffer | undefined): FittedVersion | undefined {
  const metadataPath = `${slug}/correlation.yaml`;
  const read = readMetadata(decode(metadata), metadataPath);
  const meta = read.meta;
  if (meta === undefined || hasErrors(read.diagnostics)) return undefined;
  const dataBytes = dataFile(meta.data.file);
  if (dataBytes === undefined) return undefined;
  const dataPath = `${slug}/${meta.data.file}`;
  const csv = readCsv(decode(dataBytes), dataPath);
  if (csv.table === undefined) return undefined;
  const converted = tableToPoints(csv.table, meta.data, dataPath);
  if (converted.points === undefined) return undefined;
  const checked = checkDataset({
    meta,
    points: converted.points,
    dataPath,
    metadataPath,
    headerLine: csv.table.headerLine,
    valueAt: read.valueAt,
    cellColumn: () => undefined,
  });
  if (hasErrors(checked.diagnostics)) return undefined;
  const correlation: LoadedCorrelation = {
    slug,
    folder: slug,
    metadataPath,
    dataPath,
    meta,
    points: converted.points,
    used: checked.used,
    excluded: checked.excluded,
    dataRange: checked.dataRange,
    range: checked.range,
    warnings: [],
    orderPosition: { line: 1 },
    reviewPosition: { line: 1 },
  };
  const fitted = fitDataset(correlation);
  if (fitted.fit === undefined) return undefined;
  return { correlation, fit: fitted.fit, fingerprint: fingerprint(correlation, fitted.fit) };
}
