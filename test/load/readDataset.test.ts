/**
 * readDataset / readHandbook beyond the pinned messages: what a loaded correlation holds, BOM and CRLF,
 * the size limit, and that nothing a user wrote is modified.
 */
import { createHash } from 'node:crypto';
import { cp, mkdtemp, readFile, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DATA_FILE_LIMIT_BYTES, formatDiagnostic, readDataset, readHandbook } from '../../src/load/index.ts';

const FIXTURES = 'test/fixtures/content';
const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

async function fingerprint(directory: string): Promise<Record<string, string>> {
  const result: Record<string, string> = {};
  for (const entry of await readdir(directory, { recursive: true, withFileTypes: true })) {
    const full = path.join(entry.parentPath, entry.name);
    if (!entry.isFile()) continue;
    const info = await stat(full);
    result[full] = `${createHash('sha256').update(await readFile(full)).digest('hex')} ${info.mtimeMs}`;
  }
  return result;
}

describe('readDataset(folder)', () => {
  it('readDataset(valid) returns points with their data rows and file lines, and the data range', async () => {
    const result = await readDataset(`${FIXTURES}/valid/liquid-a`);
    expect(result.diagnostics).toEqual([]);
    const correlation = result.correlation!;
    expect(correlation.slug).toBe('liquid-a');
    expect(correlation.points[0]).toEqual({ row: 1, line: 2, x: 280, y: 1901.2 });
    expect(correlation.used).toHaveLength(8);
    expect(correlation.range).toEqual({ min: 280, max: 350 });
    expect(correlation.meta.fit).toEqual({
      order: 'auto',
      maxOrder: 10,
      intercept: true,
      transform: { x: 'identity', y: 'identity' },
      weights: 'none',
      passThrough: [],
      exclude: [],
    });
    expect(correlation.meta.review).toEqual({ status: 'draft' });
  });

  it('readDataset(bom-crlf) accepts a BOM and CRLF line ends and reads the same data as LF without BOM', async () => {
    const plain = await readDataset(`${FIXTURES}/valid/liquid-a`);
    const windows = await readDataset(`${FIXTURES}/bom-crlf/liquid-a`);
    expect(windows.diagnostics).toEqual([]);
    expect(windows.correlation?.points).toEqual(plain.correlation?.points);
    expect(windows.correlation?.meta).toEqual(plain.correlation?.meta);
  });

  it('readDataset(duplicate-x) keeps the warning with the loaded correlation', async () => {
    const result = await readDataset(`${FIXTURES}/duplicate-x/liquid-a`);
    expect(result.correlation?.warnings.map(formatDiagnostic)).toEqual([
      `${FIXTURES}/duplicate-x/liquid-a/data.csv:10: warning: x = 300 repeats line 4 with a different y, and there is no uncertainty column; set data.replicates: true if these are replicate measurements, or add an uncertainty column`,
    ]);
  });

  it('readDataset(file) throws readDataset requires a directory', async () => {
    await expect(readDataset(`${FIXTURES}/valid/liquid-a/data.csv`)).rejects.toThrow('readDataset requires a directory');
    await expect(readHandbook(`${FIXTURES}/does-not-exist`)).rejects.toThrow('readHandbook requires a directory');
  });

  it('readDataset(oversized) refuses a data file over the size limit (4 MiB)', async () => {
    const directory = await mkdtemp(path.join(tmpdir(), 'correlary-size-'));
    temporary.push(directory);
    const folder = path.join(directory, 'big');
    await cp(`${FIXTURES}/valid/liquid-a`, folder, { recursive: true });
    const row = '300,1925.1\n';
    const text = 'T,cp\n' + row.repeat(Math.ceil(DATA_FILE_LIMIT_BYTES / row.length) + 1);
    await writeFile(path.join(folder, 'data.csv'), text);
    const result = await readDataset(folder);
    expect(result.diagnostics.map(formatDiagnostic)).toEqual([`${folder}/data.csv: file is ${Buffer.byteLength(text)} bytes, over the 4 MiB limit; split the data or thin it before adding it to the handbook`]);
  });

  it('readHandbook(every fixture) leaves every file unchanged', async () => {
    const before = await fingerprint(FIXTURES);
    for (const fixtureCase of await readdir(FIXTURES)) await readHandbook(path.join(FIXTURES, fixtureCase));
    expect(await fingerprint(FIXTURES)).toEqual(before);
  });
});
