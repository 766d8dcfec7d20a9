/**
 * correlationLoader(): the Astro adapter, driven with a minimal stand-in for Astro's LoaderContext.
 */
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { LoaderContext } from 'astro/loaders';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { correlationLoader } from '../../src/loaders/correlationLoader.ts';
import { correlationEntrySchema, type CorrelationEntry } from '../../src/schema/index.ts';
import { fitOf, pointsOf } from '../../src/components/lib/entryView.ts';
import { correlationFiles } from '../../src/components/lib/correlationFiles.ts';
import { identityOf } from '../../src/components/lib/identityOf.ts';
import { handbookHistory, readHandbookSettings } from '../../src/load/index.ts';
import { handbookSettingsSchema } from '../../src/schema/index.ts';
import { copyCorrelationFiles, writeCorrelationFiles } from '../../src/loaders/correlationFiles.ts';
import { filesWritten, startFiles } from '../../src/loaders/pendingFiles.ts';
import { offerCheckedHandbook } from '../../src/loaders/checkedHandbook.ts';
import { fitHandbook } from '../../src/load/fitHandbook.ts';
import { fitCodeVersion } from '../../src/load/fitCodeVersion.ts';

/** Astro's cache folder stand-in: the loader caches fits in it and the store refers to them. */
const cacheDir = mkdtempSync(path.join(tmpdir(), 'correlary-loader-cache-'));
afterAll(() => rmSync(cacheDir, { recursive: true, force: true }));

function fakeContext() {
  const entries = new Map<string, { id: string; data: Record<string, unknown>; digest?: string | number; filePath?: string }>();
  const logger = { info: vi.fn(), warn: vi.fn(), error: vi.fn() };
  const context = {
    collection: 'correlations',
    store: {
      clear: () => entries.clear(),
      set: (entry: { id: string; data: Record<string, unknown> }) => (entries.set(entry.id, entry), true),
    },
    parseData: async ({ data }: { data: Record<string, unknown> }) => correlationEntrySchema.parse(data),
    generateDigest: (data: unknown) => JSON.stringify(data).length.toString(16),
    logger,
    config: { root: pathToFileURL(`${process.cwd()}/`), cacheDir: pathToFileURL(`${cacheDir}/`), base: '/', site: 'https://handbook.example.org' },
  } as unknown as LoaderContext;
  return { context, entries, logger };
}

describe('correlationLoader()', () => {
  it('correlationLoader({ directory }) stores one validated, fitted entry per correlation', async () => {
    const { context, entries, logger } = fakeContext();
    await correlationLoader({ directory: 'test/fixtures/content/duplicate-x' }).load(context);
    const entry = entries.get('liquid-a');
    expect(entry?.filePath).toBe('test/fixtures/content/duplicate-x/liquid-a/correlation.yaml');
    const data = entry?.data as CorrelationEntry;
    expect(data.meta.title).toBe('Specific heat of test liquid A');
    // The rows stay in the fit cache (the store keeps a reference); the fixture's data file has 9 rows.
    expect(data.points).not.toBeInstanceOf(Array);
    expect(pointsOf(data)).toHaveLength(9);
    expect(fitOf(data)?.order).toBe(1);
    expect(data.warnings.map((warning) => warning.line)).toEqual([10]);
    expect(logger.warn).toHaveBeenCalledTimes(1);
  });

  it("takes the check pass that `correlary build` offered for exactly this call, and reads the handbook itself otherwise", async () => {
    const directory = 'test/fixtures/content/valid';
    const fitCache = { directory: path.join(cacheDir, 'correlary-fits'), version: fitCodeVersion(process.cwd()) };
    const checked = await fitHandbook(directory, { fitCache });
    // Marked, so that using it shows: a title that no folder has.
    const marked = {
      ...checked,
      datasets: checked.datasets.map((item, at) => {
        const correlation = item.dataset.correlation!;
        return at > 0 ? item : { ...item, dataset: { ...item.dataset, correlation: { ...correlation, meta: { ...correlation.meta, title: 'Offered by the check pass' } } } };
      }),
    };
    const titles = async () => {
      const { context, entries } = fakeContext();
      await correlationLoader({ directory }).load(context);
      await filesWritten();
      return [...entries.values()].map((entry) => (entry.data as CorrelationEntry).meta.title);
    };
    offerCheckedHandbook({ call: { directory, workingDirectory: process.cwd(), fitCache }, handbook: marked });
    expect(await titles()).toContain('Offered by the check pass');
    expect(await titles()).not.toContain('Offered by the check pass'); // taken once
    // Another code version or content folder, or another working directory without the histories: the loader reads
    // the handbook itself.
    for (const call of [
      { directory, workingDirectory: process.cwd(), fitCache: { ...fitCache, version: 'another' } },
      { directory, workingDirectory: path.join(process.cwd(), 'src'), fitCache },
      { directory: 'test/fixtures/content', workingDirectory: process.cwd(), fitCache },
    ]) {
      offerCheckedHandbook({ call, handbook: marked });
      expect(await titles()).not.toContain('Offered by the check pass');
    }
  });

  it('takes the check pass offered with its histories also when Astro runs from another working directory (a staged build), naming files from the check pass\'s', async () => {
    const directory = 'test/fixtures/content/valid';
    const userDirectory = process.cwd();
    const fitCache = { directory: path.join(cacheDir, 'correlary-fits'), version: fitCodeVersion(userDirectory) };
    const checked = await fitHandbook(directory, { fitCache });
    const histories = await handbookHistory(directory, checked.datasets);
    const marked = { ...checked, datasets: checked.datasets.map((item) => ({ ...item, dataset: { ...item.dataset, correlation: { ...item.dataset.correlation!, meta: { ...item.dataset.correlation!.meta, title: 'Offered by the check pass' } } } })) };
    offerCheckedHandbook({ call: { directory, workingDirectory: userDirectory, fitCache }, handbook: marked, histories });
    // `correlary build --out` outside the working directory runs Astro from a staging folder (the project root stays).
    const { context, entries } = fakeContext();
    const staged = vi.spyOn(process, 'cwd').mockReturnValue(path.join(userDirectory, 'src'));
    try {
      await correlationLoader({ directory: path.join(userDirectory, directory) }).load(context);
      await filesWritten();
      const entry = entries.get('liquid-a')!;
      expect((entry.data as CorrelationEntry).meta.title).toBe('Offered by the check pass');
      expect(entry.filePath).toBe('test/fixtures/content/valid/liquid-a/correlation.yaml');
    } finally {
      staged.mockRestore();
    }
  });

  it('the stored entry passes the collection schema unchanged (Astro re-validates it)', async () => {
    const { context, entries } = fakeContext();
    await correlationLoader({ directory: 'test/fixtures/content/valid' }).load(context);
    const data = entries.get('liquid-a')!.data;
    expect(correlationEntrySchema.parse(data)).toEqual(data);
  });

  it("a build's loader writes each correlation's downloads once; unchanged entries are not rewritten, removed ones are deleted, and the copy into the output holds them", async () => {
    const { context, entries } = fakeContext();
    await correlationLoader({ directory: 'content' }).load(context);
    await filesWritten(); // the loader leaves the downloads being written while Astro goes on
    const folder = path.join(cacheDir, 'correlary-files');
    const stored = [...entries.values()].map((item) => item.data as CorrelationEntry).filter((entry) => entry.fit !== null);
    const slugs = stored.map((entry) => entry.slug).sort();
    // The site address set in the configuration wins over the settings' url for the page addresses.
    const settings = (await readHandbookSettings('content')).settings ?? handbookSettingsSchema.parse({});
    const identity = (slug: string) => identityOf(slug, settings, '/', 'https://handbook.example.org');
    expect(readdirSync(folder).sort()).toEqual([...slugs, 'manifest.json'].sort());
    // The files are those of correlationFiles, byte for byte.
    const first = stored[0]!;
    for (const file of correlationFiles(first, identity(first.slug))) expect(readFileSync(path.join(folder, first.slug, file.file), 'utf8')).toBe(file.text);
    const written = JSON.parse(readFileSync(path.join(folder, first.slug, 'coefficients.json'), 'utf8')) as { handbook: { url: string } };
    expect(written.handbook.url).toBe(`https://handbook.example.org/correlations/${first.slug}/`);
    expect((await writeCorrelationFiles(folder, stored, 'same-version', identity)).written).toBe(stored.length);
    expect((await writeCorrelationFiles(folder, stored, 'same-version', identity)).written).toBe(0);
    expect((await writeCorrelationFiles(folder, stored.slice(1), 'same-version', identity)).written).toBe(0);
    expect(readdirSync(folder)).not.toContain(first.slug);
    const out = mkdtempSync(path.join(tmpdir(), 'correlary-loader-out-'));
    try {
      const copied = await copyCorrelationFiles(folder, out);
      const second = stored[1]!;
      expect(copied.files).toBe(stored.slice(1).reduce((sum, entry) => sum + correlationFiles(entry, identity(entry.slug)).length, 0));
      expect(copied.copied).toBe(0); // hard links: the cache and the output are on one file system here
      expect(readdirSync(path.join(out, 'correlations', second.slug)).sort()).toEqual(correlationFiles(second, identity(second.slug)).map((file) => file.file).sort());
      // A later build that rewrites the cache (a changed title) leaves the linked files of this output as they were.
      const published = path.join(out, 'correlations', second.slug, 'coefficients.json');
      const before = readFileSync(published, 'utf8');
      const retitled = stored.slice(1).map((entry) => (entry === second ? { ...entry, meta: { ...entry.meta, title: `${entry.meta.title} (changed)` } } : entry));
      expect((await writeCorrelationFiles(folder, retitled, 'same-version', identity)).written).toBe(1);
      expect(readFileSync(path.join(folder, second.slug, 'coefficients.json'), 'utf8')).toContain('(changed)');
      expect(readFileSync(published, 'utf8')).toBe(before);
      expect(before).not.toContain('(changed)');
    } finally {
      rmSync(out, { recursive: true, force: true });
    }
  });

  it('folders written by worker threads hold exactly the files written in one thread (every file, byte for byte)', async () => {
    const { context, entries } = fakeContext();
    await correlationLoader({ directory: 'content' }).load(context);
    await filesWritten(); // the loader leaves the downloads being written while Astro goes on
    const stored = [...entries.values()].map((item) => item.data as CorrelationEntry);
    const settings = (await readHandbookSettings('content')).settings ?? handbookSettingsSchema.parse({});
    const identity = (slug: string) => identityOf(slug, settings, '/', 'https://handbook.example.org');
    const here = path.join(cacheDir, 'files-here');
    const pooled = path.join(cacheDir, 'files-pooled');
    const bundles = path.join(cacheDir, 'files-bundles');
    const fitted = stored.filter((entry) => entry.fit !== null).length;
    const fittedSlugs = stored.filter((entry) => entry.fit !== null).map((entry) => entry.slug).sort();
    // Each folder is said complete once, as soon as it is (pages wait for that: pendingFiles.ts folderWritten).
    const saidHere: string[] = [];
    expect(await writeCorrelationFiles(here, stored, 'v', identity, { onFolder: (slug) => saidHere.push(slug) })).toEqual({ written: fitted, byWorkers: 0 });
    expect(saidHere).toEqual(fittedSlugs); // in this thread, in slug order
    // Every folder of the second one is written by a worker.
    const saidPooled: string[] = [];
    expect(await writeCorrelationFiles(pooled, stored, 'v', identity, { workers: { root: process.cwd(), folder: bundles, minimumJobs: 1 }, onFolder: (slug) => saidPooled.push(slug) })).toEqual({ written: fitted, byWorkers: fitted });
    expect([...saidPooled].sort()).toEqual(fittedSlugs);
    expect(readdirSync(bundles).filter((name) => /^files-worker-[0-9a-f]{16}\.mjs$/.test(name))).toHaveLength(1);
    const listing = (root: string) => readdirSync(root, { recursive: true, withFileTypes: true }).filter((item) => item.isFile()).map((item) => path.relative(root, path.join(item.parentPath, item.name))).sort();
    expect(listing(pooled)).toEqual(listing(here));
    expect(listing(here).length).toBeGreaterThan(fitted * 5);
    for (const file of listing(here)) expect(readFileSync(path.join(pooled, file)).equals(readFileSync(path.join(here, file))), file).toBe(true);
    // Unchanged: nothing to write, no worker started; every folder is still said complete.
    const saidUnchanged: string[] = [];
    expect(await writeCorrelationFiles(pooled, stored, 'v', identity, { workers: { root: process.cwd(), folder: bundles, minimumJobs: 1 }, onFolder: (slug) => saidUnchanged.push(slug) })).toEqual({ written: 0, byWorkers: 0 });
    expect([...saidUnchanged].sort()).toEqual(fittedSlugs);
  });

  it('filesWritten waits for the files last started and passes on their failure', async () => {
    let finish = () => {};
    let done = false;
    startFiles(new Promise<void>((resolve) => (finish = resolve)).then(() => void (done = true)));
    const waiting = filesWritten();
    expect(done).toBe(false);
    finish();
    await waiting;
    expect(done).toBe(true);
    startFiles(Promise.reject(new Error('disk full')));
    await expect(filesWritten()).rejects.toThrow('disk full');
    startFiles(Promise.resolve());
    await expect(filesWritten()).resolves.toBeUndefined();
  });

  it('correlationLoader fails the build on any error, logging every message', async () => {
    const { context, entries, logger } = fakeContext();
    await expect(correlationLoader({ directory: 'test/fixtures/content/non-numeric' }).load(context)).rejects.toThrow(
      "1 problem in test/fixtures/content/non-numeric; run 'npx correlary check test/fixtures/content/non-numeric' for the list",
    );
    expect(logger.error).toHaveBeenCalledWith("test/fixtures/content/non-numeric/liquid-a/data.csv:5:5: non-numeric value 'abc' in column 'cp'");
    expect(entries.size).toBe(0);
  });
});
