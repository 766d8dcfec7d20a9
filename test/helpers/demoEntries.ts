/**
 * The demo handbook's correlations with a fit, as the content loader stores them (storedEntry, checked by the
 * collection's schema), fitted into a fit cache in a temporary folder: for the tests that compare what the files
 * workers write with what the components compute.
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { fitHandbook, handbookHistory } from '../../src/load/index.ts';
import { forgetStoredFits } from '../../src/load/storedFit.ts';
import { storedEntry } from '../../src/loaders/storedEntry.ts';
import { correlationEntrySchema, type CorrelationEntry } from '../../src/schema/index.ts';

/** @example const demo = await fittedDemoEntries('page-parts'); …; await demo.remove() */
export async function fittedDemoEntries(name: string): Promise<{ entries: CorrelationEntry[]; remove: () => Promise<void> }> {
  const root = await mkdtemp(path.join(tmpdir(), `correlary-${name}-`));
  const fitCache = { directory: path.join(root, 'fits'), version: 'test-1' };
  const handbook = await fitHandbook('content', { fitCache });
  const histories = await handbookHistory('content', handbook.datasets);
  const entries = handbook.datasets
    .map((item) => storedEntry(item, fitCache.directory, histories))
    .filter((entry): entry is CorrelationEntry => entry !== undefined && entry.fit !== null)
    .map((entry) => correlationEntrySchema.parse(entry) as CorrelationEntry);
  return {
    entries,
    remove: async () => {
      forgetStoredFits();
      await rm(root, { recursive: true, force: true });
    },
  };
}

/**
 * fittedDemoEntries for one test file: fitted before its tests (beforeAll) and removed after them (afterAll).
 * @returns the entries, once fitted (empty before)
 * @example const entries = demoEntriesForSuite('page-parts'); it('…', () => expect(entries().length).toBeGreaterThan(10));
 */
export function demoEntriesForSuite(name: string): () => CorrelationEntry[] {
  let demo: Awaited<ReturnType<typeof fittedDemoEntries>> | undefined;
  beforeAll(async () => {
    demo = await fittedDemoEntries(name);
  }, 120_000);
  afterAll(async () => {
    await demo?.remove();
  });
  return () => demo?.entries ?? [];
}
