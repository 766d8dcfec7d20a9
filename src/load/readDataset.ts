/**
 * Read and validate one correlation folder: metadata, data file and the checks that need both.
 * Every problem in both files is collected; nothing in the folder is ever written.
 */
import { lstat, readdir, stat } from 'node:fs/promises';
import path from 'node:path';
import { METADATA_FILE } from '../schema/index.ts';
import { error, hasErrors, sortDiagnostics, type Diagnostic } from './diagnostic.ts';
import { checkDataset } from './checkDataset.ts';
import { bytesHash, type FolderRecord, type FolderSources } from './folderRecord.ts';
import { DATA_FILE_LIMIT_BYTES, MESSAGES_PER_FILE, METADATA_FILE_LIMIT_BYTES } from './limits.ts';
import { readCsv } from './readCsv.ts';
import { readMetadata } from './readMetadata.ts';
import { readText } from './readText.ts';
import { resolveDataFile } from './resolveDataFile.ts';
import { tableToPoints } from './tableToPoints.ts';
import type { DatasetResult } from './types.ts';

/** Keep at most MESSAGES_PER_FILE messages per file, then one line counting the rest. */
function capPerFile(diagnostics: readonly Diagnostic[]): Diagnostic[] {
  const kept: Diagnostic[] = [];
  const dropped = new Map<string, number>();
  const counts = new Map<string, number>();
  for (const diagnostic of diagnostics) {
    const count = (counts.get(diagnostic.file) ?? 0) + 1;
    counts.set(diagnostic.file, count);
    if (count <= MESSAGES_PER_FILE) kept.push(diagnostic);
    else dropped.set(diagnostic.file, (dropped.get(diagnostic.file) ?? 0) + 1);
  }
  dropped.forEach((count, file) => kept.push(error(file, { line: 0 }, `${count} more problems in this file are not shown`)));
  return kept;
}

/** What readFolder gives: the result, the hashes of the files it was made from, and where it came from. */
export interface FolderRead {
  readonly result: DatasetResult;
  /** The hashes of both files, when both were read (a result that stopped earlier has none and is not recorded). */
  readonly sources: FolderSources | undefined;
  /** True when the result is the record's (`known`), both files being byte for byte those it was made from. */
  readonly reused: boolean;
}

/**
 * Read one correlation folder.
 * @param folder path of the folder as it should appear in messages (relative or absolute)
 * @throws Error `readDataset requires a directory` when `folder` is not one (a programming error, not a user's)
 */
export async function readDataset(folder: string): Promise<DatasetResult> {
  return (await readFolder(folder)).result;
}

/**
 * Read one correlation folder as readDataset does, given what an earlier read of the same folder path recorded
 * (src/load/folderRecord.ts). Every file-system check is made and both files are read as in a fresh read; when
 * their bytes are the recorded ones, the recorded result is returned instead of parsing and validating them again
 * (the result is a function of those bytes and the path). Anything else reads the folder afresh.
 * @example (await readFolder('content/corvane-cp', record)).reused // => true when neither file changed
 */
export async function readFolder(folder: string, known?: FolderRecord): Promise<FolderRead> {
  const info = await stat(folder).catch(() => undefined);
  if (info === undefined || !info.isDirectory()) throw new Error('readDataset requires a directory');
  const absoluteFolder = path.resolve(folder);
  const metadataPath = path.join(folder, METADATA_FILE);
  const folderSlug = path.basename(absoluteFolder);
  const diagnostics: Diagnostic[] = [];
  let slugLine = 1;
  let sources: FolderSources | undefined;
  const done = (slug: string, correlation?: DatasetResult['correlation']): FolderRead => ({
    result: { slug, folder, metadataPath, slugLine, correlation, diagnostics: capPerFile(sortDiagnostics(diagnostics)) },
    sources,
    reused: false,
  });

  // Metadata. A regular file (not a link) is known to exist and to be inside the folder from its lstat alone.
  const metadataStats = await lstat(path.join(absoluteFolder, METADATA_FILE)).catch(() => undefined);
  const plainMetadata = metadataStats?.isFile() === true ? metadataStats : undefined;
  const metadataExists = plainMetadata !== undefined || (metadataStats !== undefined && (await stat(metadataPath).then(() => true, () => false)));
  if (!metadataExists) {
    const others = (await readdir(folder)).filter((name) => /\.ya?ml$/i.test(name));
    diagnostics.push(
      error(
        metadataPath,
        { line: 0 },
        'file not found; every correlation folder needs one',
        others.length > 0 ? `found ${others.map((name) => `'${name}'`).join(', ')}; the metadata file must be named ${METADATA_FILE}` : "run 'correlary new <slug>' for a commented template",
      ),
    );
    return done(folderSlug);
  }
  const metadataRealpath = plainMetadata !== undefined ? { ok: true } : await resolveDataFile(absoluteFolder, METADATA_FILE);
  if (!metadataRealpath.ok) {
    diagnostics.push(error(metadataPath, { line: 0 }, 'metadata file is a symbolic link to a file outside the correlation folder', 'copy the metadata into the folder instead of linking to it'));
    return done(folderSlug);
  }
  const metadataText = await readText(path.resolve(folder, METADATA_FILE), metadataPath, METADATA_FILE_LIMIT_BYTES, plainMetadata);
  if (!metadataText.ok) {
    diagnostics.push(metadataText.diagnostic);
    return done(folderSlug);
  }
  const metadataHash = bytesHash(metadataText.bytes);
  if (known !== undefined && known.metadata === metadataHash) {
    // The same metadata names the same data file: read it as below; the same bytes give the recorded result.
    const knownData = await resolveDataFile(absoluteFolder, known.dataFile);
    const knownText = knownData.ok ? await readText(knownData.absolutePath, path.join(folder, known.dataFile), DATA_FILE_LIMIT_BYTES, knownData.stats) : undefined;
    if (knownText?.ok && bytesHash(knownText.bytes) === known.data) {
      return { result: known.result, sources: { metadata: known.metadata, dataFile: known.dataFile, data: known.data }, reused: true };
    }
  }
  const metadata = readMetadata(metadataText.text, metadataPath);
  diagnostics.push(...metadata.diagnostics);
  const slug = metadata.meta?.slug ?? folderSlug;
  if (metadata.meta?.slug !== undefined) slugLine = metadata.valueAt(['slug']).line;

  // Data file: inside the folder, within the size limit, well-formed.
  const dataFile = metadata.dataColumns?.file ?? 'data.csv';
  const dataPath = path.join(folder, dataFile);
  const resolved = await resolveDataFile(absoluteFolder, dataFile);
  if (!resolved.ok) {
    diagnostics.push(error(metadataPath, metadata.valueAt(['data', 'file']), resolved.problem, resolved.hint));
    return done(slug);
  }
  const dataText = await readText(resolved.absolutePath, dataPath, DATA_FILE_LIMIT_BYTES, resolved.stats);
  if (!dataText.ok) {
    diagnostics.push(dataText.diagnostic);
    return done(slug);
  }
  sources = { metadata: metadataHash, dataFile, data: bytesHash(dataText.bytes) };
  const csv = readCsv(dataText.text, dataPath);
  diagnostics.push(...csv.diagnostics);
  if (csv.table === undefined) return done(slug);
  const table = csv.table;
  const converted = tableToPoints(table, metadata.dataColumns, dataPath);
  diagnostics.push(...converted.diagnostics);
  const meta = metadata.meta;
  // The data are checked against the fit block even when either file has other errors (on what is valid), so
  // that one run reports every problem; such a folder is not fitted.
  const checkable = meta ?? (metadata.dataColumns && metadata.partialFit ? { data: metadata.dataColumns, fit: metadata.partialFit } : undefined);
  if (checkable === undefined) return done(slug);

  // Checks across both files.
  const roleIndex = { x: table.header.findIndex((cell) => cell.text === checkable.data.x), y: table.header.findIndex((cell) => cell.text === checkable.data.y) };
  const rowsByLine = new Map(table.rows.map((row) => [row.line, row]));
  const checked = checkDataset({
    meta: checkable,
    points: converted.points ?? converted.validPoints,
    complete: converted.points !== undefined,
    rowCount: converted.rowCount,
    dataPath,
    metadataPath,
    headerLine: table.headerLine,
    valueAt: metadata.valueAt,
    cellColumn: (line, role) => rowsByLine.get(line)?.cells[roleIndex[role]]?.column,
  });
  diagnostics.push(...checked.diagnostics);
  if (meta === undefined || converted.points === undefined || hasErrors(diagnostics)) return done(slug);
  const sorted = sortDiagnostics(diagnostics);
  return done(slug, {
    slug,
    folder,
    metadataPath,
    dataPath,
    meta,
    points: converted.points,
    used: checked.used,
    excluded: checked.excluded,
    dataRange: checked.dataRange,
    range: checked.range,
    warnings: sorted.filter((diagnostic) => diagnostic.severity === 'warning'),
    orderPosition: metadata.valueAt(['fit', 'order']),
    reviewPosition: metadata.valueAt(['review', 'fingerprint']),
  });
}
