/**
 * storedFitSummary: the fit that lists and overlays read from the fit cache's summary file is the full record's
 * fit (the independent computation is the full record read through storedFit), whether or not the record is kept
 * in memory, and its per-point statistics are still there when asked for.
 */
import { cp, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitHandbook } from '../../src/load/index.ts';
import { forgetStoredFits, storedFit, storedFitSummary } from '../../src/load/storedFit.ts';

let root = '';
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-stored-fit-'));
  await cp(path.join('content', 'quillane-vapour-pressure'), path.join(root, 'content', 'quillane-vapour-pressure'), { recursive: true });
});
afterAll(async () => {
  forgetStoredFits();
  if (root) await rm(root, { recursive: true, force: true });
});

describe('storedFitSummary', () => {
  it('storedFitSummary(reference) equals the record\'s fit, read from the summary or from memory', async () => {
    const fitCache = { directory: path.join(root, 'cache'), version: 'test-1' };
    const handbook = await fitHandbook(path.join(root, 'content'), { fitCache });
    const key = handbook.datasets[0]!.fitted!.cacheKey!;
    const reference = { fitCache: { directory: fitCache.directory, key } };
    forgetStoredFits();
    const fromSummary = storedFitSummary(reference)!;
    const full = structuredClone(storedFit(reference)!);
    expect(fromSummary.order).toBe(full.order);
    expect(fromSummary.coefficients).toEqual(full.coefficients);
    expect(fromSummary.statistics).toEqual(full.statistics);
    expect(fromSummary.points).toEqual(full.points);
    // Now that the record is kept, the summary is its fit.
    expect(storedFitSummary(reference)).toBe(storedFit(reference));
  });
});
