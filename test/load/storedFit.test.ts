/**
 * storedFitSummary: the fit that lists and overlays read from the fit cache record's summary (its first line) is the full record's
 * fit (the independent computation is the full record read through storedFit), whether or not the record is kept
 * in memory, and its per-point statistics are still there when asked for. A correlation page and the exports read
 * only the summary: the fit without per-point statistics and the order selection with its order table.
 */
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitHandbook } from '../../src/load/index.ts';
import { forgetStoredFits, storedFit, storedFitSummary, storedSelection } from '../../src/load/storedFit.ts';

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

  it('the fit and the order selection with its order table are served from the summary without reading the full record', async () => {
    const fitCache = { directory: path.join(root, 'cache-summary-only'), version: 'test-1' };
    const handbook = await fitHandbook(path.join(root, 'content'), { fitCache });
    const fitted = handbook.datasets[0]!.fitted!;
    const reference = { fitCache: { directory: fitCache.directory, key: fitted.cacheKey! } };
    const recordFile = path.join(fitCache.directory, `${fitted.cacheKey}.json`);
    const recordText = await readFile(recordFile, 'utf8');
    forgetStoredFits();
    // The summary line intact, the rest of the record damaged.
    await writeFile(recordFile, `${recordText.slice(0, recordText.indexOf('\n') + 1)}{ damaged`);
    try {
      const fit = storedFitSummary(reference)!;
      expect(fit.printedCoefficients).toEqual(fitted.fit!.printedCoefficients);
      expect(fit.statistics).toEqual(fitted.fit!.statistics);
      expect(storedSelection(reference)!.orders).toEqual(fitted.selection!.orders);
      // Only what needs the full record reads it (here: fails, naming it).
      expect(() => storedFit(reference)).toThrow(/requires the cached fit .* it is missing/);
    } finally {
      await writeFile(recordFile, recordText);
      forgetStoredFits();
    }
  });
});
