/**
 * correlationLoader(): the Astro adapter, driven with a minimal stand-in for Astro's LoaderContext.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import type { LoaderContext } from 'astro/loaders';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { correlationLoader } from '../../src/loaders/correlationLoader.ts';
import { correlationEntrySchema, type CorrelationEntry } from '../../src/schema/index.ts';
import { fitOf, pointsOf } from '../../src/components/lib/entryView.ts';

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

  it('the stored entry passes the collection schema unchanged (Astro re-validates it)', async () => {
    const { context, entries } = fakeContext();
    await correlationLoader({ directory: 'test/fixtures/content/valid' }).load(context);
    const data = entries.get('liquid-a')!.data;
    expect(correlationEntrySchema.parse(data)).toEqual(data);
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
