/**
 * Folder records (src/load/folderRecord.ts): an unchanged folder taken from its record gives exactly what a fresh
 * read gives, every warning and error included, and a folder whose bytes or files changed is read afresh. The
 * independent computation each check compares with is a fresh read without any cache (readDataset, fitHandbook
 * without a fit cache); results are compared with toStrictEqual, which also tells a missing key from an undefined
 * one and −0 from 0.
 */
import { cp, mkdtemp, readFile, readdir, rm, symlink, unlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitHandbook, formatDiagnostic, readDataset, type FittedHandbook } from '../../src/load/index.ts';
import { readFolder } from '../../src/load/readDataset.ts';
import { folderRecordKey, readFolderRecord, writeFolderRecord } from '../../src/load/folderRecord.ts';
import { fitCodeVersion, readingCodeVersion } from '../../src/load/fitCodeVersion.ts';

const FIXTURES = path.join('test', 'fixtures', 'content');
let root = '';
/** Every correlation folder of the content fixtures (valid and broken), as `fixture/folder`. */
let folders: string[] = [];

beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-folder-records-'));
  for (const fixture of await readdir(FIXTURES)) {
    for (const entry of await readdir(path.join(FIXTURES, fixture), { withFileTypes: true })) {
      if (entry.isDirectory()) folders.push(`${fixture}/${entry.name}`);
    }
  }
  folders = folders.sort();
});
afterAll(async () => {
  if (root) await rm(root, { recursive: true, force: true });
});

/** One handbook holding a copy of every fixture folder (`<fixture>-<folder>`; links kept as they are). */
async function mixedHandbook(name: string): Promise<string> {
  const content = path.join(root, name, 'content');
  for (const folder of folders) {
    // The settings fixtures are about handbook.yaml, which this handbook does not have.
    if (folder.startsWith('settings-')) continue;
    await cp(path.join(FIXTURES, folder), path.join(content, folder.replace('/', '-')), { recursive: true, verbatimSymlinks: true });
  }
  return content;
}

/** Everything a build takes from the pass, in a form that compares exactly. */
function published(handbook: FittedHandbook) {
  return {
    printed: handbook.diagnostics.map(formatDiagnostic),
    diagnostics: handbook.diagnostics,
    datasets: handbook.datasets.map(({ dataset, fitted, review }) => ({
      dataset,
      fitted: fitted === undefined ? undefined : { fit: fitted.fit, selection: fitted.selection, diagnostics: fitted.diagnostics },
      review,
    })),
  };
}

describe('readFolder', () => {
  it('readFolder(folder, record) of every fixture folder gives what readDataset gives, warnings and errors included', async () => {
    const directory = path.join(root, 'records');
    let reused = 0;
    let withErrors = 0;
    let withWarnings = 0;
    for (const folder of folders) {
      const at = path.join(FIXTURES, folder);
      const fresh = await readDataset(at);
      const first = await readFolder(at);
      expect(first.result).toStrictEqual(fresh);
      expect(first.reused).toBe(false);
      // Folders whose files cannot both be read (missing metadata, a data file outside the folder) get no record.
      if (first.sources === undefined) continue;
      const key = folderRecordKey('test', at);
      writeFolderRecord(directory, key, { ...first.sources, result: first.result });
      const again = await readFolder(at, readFolderRecord(directory, key));
      expect(again.reused).toBe(true);
      expect(again.result).toStrictEqual(fresh);
      expect(again.result.diagnostics.map(formatDiagnostic)).toEqual(fresh.diagnostics.map(formatDiagnostic));
      // The rows, kept apart in the record, are read back sharing their objects as a fresh read's do.
      const correlation = again.result.correlation;
      if (correlation !== undefined) {
        expect(correlation.points).toStrictEqual(fresh.correlation!.points);
        for (const point of correlation.used) expect(correlation.points).toContain(point);
        expect(Object.keys(correlation)).toEqual(Object.keys(fresh.correlation!));
      }
      reused++;
      if (fresh.diagnostics.some((diagnostic) => diagnostic.severity === 'error')) withErrors++;
      if (fresh.diagnostics.some((diagnostic) => diagnostic.severity === 'warning')) withWarnings++;
    }
    // The comparison covered folders with errors and with warnings, not only valid ones.
    expect(reused).toBeGreaterThan(30);
    expect(withErrors).toBeGreaterThan(20);
    expect(withWarnings).toBeGreaterThanOrEqual(3);
  });

  it('readFolder reads afresh a folder whose data or metadata bytes changed, or whose data file became a link out of it', async () => {
    const content = path.join(root, 'changed');
    const folder = path.join(content, 'liquid-a');
    await cp(path.join(FIXTURES, 'duplicate-x', 'liquid-a'), folder, { recursive: true });
    const first = await readFolder(folder);
    const record = { format: 1, ...first.sources!, result: first.result };
    expect((await readFolder(folder, record)).reused).toBe(true);

    // One digit of one value (same length): the points change.
    const data = await readFile(path.join(folder, 'data.csv'), 'utf8');
    const digit = data.search(/[1-8](?=[^\n]*\n[^\n]*$)/);
    const changedData = `${data.slice(0, digit)}${Number(data[digit]) + 1}${data.slice(digit + 1)}`;
    await writeFile(path.join(folder, 'data.csv'), changedData);
    const afterData = await readFolder(folder, record);
    expect(afterData.reused).toBe(false);
    expect(afterData.result).toStrictEqual(await readDataset(folder));
    expect(afterData.result.correlation?.points).not.toStrictEqual(first.result.correlation?.points);
    await writeFile(path.join(folder, 'data.csv'), data);
    expect((await readFolder(folder, record)).reused).toBe(true);

    // A comment line at the top of a broken metadata file: every message about it moves down a line.
    const broken = path.join(content, 'liquid-b');
    await cp(path.join(FIXTURES, 'many-mistakes', 'liquid-a'), broken, { recursive: true });
    const brokenFirst = await readFolder(broken);
    const brokenRecord = { format: 1, ...brokenFirst.sources!, result: brokenFirst.result };
    expect((await readFolder(broken, brokenRecord)).reused).toBe(true);
    const metadata = await readFile(path.join(broken, 'correlation.yaml'), 'utf8');
    await writeFile(path.join(broken, 'correlation.yaml'), `# a comment\n${metadata}`);
    const afterMetadata = await readFolder(broken, brokenRecord);
    expect(afterMetadata.reused).toBe(false);
    expect(afterMetadata.result).toStrictEqual(await readDataset(broken));
    expect(afterMetadata.result.diagnostics.map(formatDiagnostic)).not.toEqual(brokenFirst.result.diagnostics.map(formatDiagnostic));

    // The same bytes, but the data file is now a link to a copy outside the folder: the fresh read's error.
    await writeFile(path.join(content, 'outside.csv'), data);
    await unlink(path.join(folder, 'data.csv'));
    await symlink(path.join(content, 'outside.csv'), path.join(folder, 'data.csv'));
    const linked = await readFolder(folder, record);
    expect(linked.reused).toBe(false);
    expect(linked.result.diagnostics.map(formatDiagnostic)).toEqual((await readDataset(folder)).diagnostics.map(formatDiagnostic));
    expect(linked.result.diagnostics.map(formatDiagnostic).join('\n')).toMatch(/symbolic link to a file outside the correlation folder/);

    // The data file removed: not found, as a fresh read says.
    await unlink(path.join(folder, 'data.csv'));
    const missing = await readFolder(folder, record);
    expect(missing.reused).toBe(false);
    expect(missing.result.diagnostics.map(formatDiagnostic)).toEqual((await readDataset(folder)).diagnostics.map(formatDiagnostic));
  });
});

describe('fitHandbook with folder records', () => {
  it('fitHandbook gives what a pass without any cache gives, on the first run, from the records, and after changes', async () => {
    const content = await mixedHandbook('mixed');
    const cacheRoot = path.join(root, 'mixed', 'cache');
    const options = {
      fitCache: { directory: path.join(cacheRoot, 'correlary-fits'), version: fitCodeVersion('.') },
      folderRecords: { directory: path.join(cacheRoot, 'correlary-folders'), version: readingCodeVersion('.') },
      prune: true,
    };
    const fresh = published(await fitHandbook(content));
    expect(fresh.diagnostics.some((diagnostic) => diagnostic.severity === 'warning')).toBe(true);
    expect(fresh.diagnostics.some((diagnostic) => diagnostic.severity === 'error')).toBe(true);
    expect(published(await fitHandbook(content, options))).toStrictEqual(fresh);

    // Second run: every fitted folder's fit comes from its record (`outcome` is set only there).
    const second = await fitHandbook(content, options);
    const fittedCount = second.datasets.filter((item) => item.fitted !== undefined).length;
    expect(fittedCount).toBeGreaterThan(3);
    expect(second.datasets.filter((item) => item.fitted?.outcome !== undefined).length).toBe(fittedCount);
    expect(second.cachedFits).toBe(fittedCount);
    expect(published(second)).toStrictEqual(fresh);

    // A changed value in a folder with a warning, a comment line in a broken folder's metadata, a damaged record.
    const warned = path.join(content, 'duplicate-x-liquid-a');
    const data = await readFile(path.join(warned, 'data.csv'), 'utf8');
    const digit = data.search(/[1-8](?=[^\n]*\n[^\n]*$)/);
    await writeFile(path.join(warned, 'data.csv'), `${data.slice(0, digit)}${Number(data[digit]) + 1}${data.slice(digit + 1)}`);
    const broken = path.join(content, 'many-mistakes-liquid-a', 'correlation.yaml');
    await writeFile(broken, `# a comment\n${await readFile(broken, 'utf8')}`);
    const damaged = path.join(options.folderRecords.directory, `${folderRecordKey(options.folderRecords.version, path.join(content, 'valid-liquid-a'))}.v8`);
    await writeFile(damaged, (await readFile(damaged)).subarray(0, 40));
    const changedFresh = published(await fitHandbook(content));
    expect(changedFresh).not.toEqual(fresh);
    const third = await fitHandbook(content, options);
    expect(published(third)).toStrictEqual(changedFresh);
    const fromRecord = (slug: string) => third.datasets.find((item) => item.dataset.folder.endsWith(slug))?.fitted?.outcome !== undefined;
    expect(fromRecord('duplicate-x-liquid-a')).toBe(false);
    expect(fromRecord('valid-liquid-a')).toBe(false);
    expect(fromRecord('bom-crlf-liquid-a')).toBe(true);
    // And the records written by that run serve the next one.
    expect(published(await fitHandbook(content, options))).toStrictEqual(changedFresh);

    // A fit cache emptied under the records: refitted, the same again.
    await rm(options.fitCache.directory, { recursive: true, force: true });
    const refitted = await fitHandbook(content, options);
    expect(refitted.cachedFits).toBe(0);
    expect(published(refitted)).toStrictEqual(changedFresh);
  });
});
