/**
 * Fitting in worker threads and pruning the fit cache: fitHandbook with workers gives exactly the fits, messages and
 * review trails of fitHandbook in one thread (the independent computation here: no cache, no workers), and a
 * pruned cache keeps only the records the handbook still uses.
 */
import { cp, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitHandbook } from '../../src/load/index.ts';
import { poolSize } from '../../src/load/fitPool.ts';
import { startWorkersEarly } from '../../src/load/fitHandbook.ts';
import { mkdir } from 'node:fs/promises';

let root = '';
beforeAll(async () => {
  root = await mkdtemp(path.join(tmpdir(), 'correlary-fit-pool-'));
  await cp('content', path.join(root, 'content'), { recursive: true });
});
afterAll(async () => {
  if (root) await rm(root, { recursive: true, force: true });
});

const fitsOf = (handbook: Awaited<ReturnType<typeof fitHandbook>>) =>
  handbook.datasets.map(({ fitted, review }) => (fitted === undefined ? undefined : { fit: fitted.fit, selection: fitted.selection, diagnostics: fitted.diagnostics, review }));

describe('fitHandbook in worker threads', () => {
  it('poolSize: no workers for a handful of datasets, at most one per core and four', () => {
    expect(poolSize(3)).toBe(0);
    expect(poolSize(3, 1)).toBeGreaterThanOrEqual(1);
    expect(poolSize(1000)).toBeGreaterThanOrEqual(1);
    expect(poolSize(1000)).toBeLessThanOrEqual(4);
  });

  it('startWorkersEarly: before reading only for a cold cache and enough folders for workers', () => {
    expect(startWorkersEarly(1000, 0, 40)).toBe(true);
    expect(startWorkersEarly(1000, 39, 40)).toBe(true);
    // A rebuild: most folders will come from the cache; workers start only if 40 turn out to need fitting.
    expect(startWorkersEarly(1000, 40, 40)).toBe(false);
    expect(startWorkersEarly(39, 0, 40)).toBe(false);
  });

  it('the demo handbook fitted by workers equals the same handbook fitted in one thread', async () => {
    const content = path.join(root, 'content');
    const fitCache = { directory: path.join(root, 'cache', 'correlary-fits'), version: 'pool-test-1' };
    const fresh = await fitHandbook(content);
    expect(fresh.datasets.length).toBeGreaterThanOrEqual(8);
    const pooled = await fitHandbook(content, { fitCache, workers: { root: process.cwd(), minimumJobs: 1 } });
    // The worker bundle was built (so the fits below came from worker threads).
    expect((await readdir(path.join(root, 'cache', 'correlary-worker'))).filter((name) => name.startsWith('fit-worker-'))).toHaveLength(1);
    expect(pooled.cachedFits).toBe(0);
    expect(fitsOf(pooled)).toEqual(fitsOf(fresh));
    expect(pooled.diagnostics).toEqual(fresh.diagnostics);
    const again = await fitHandbook(content, { fitCache, workers: { root: process.cwd(), minimumJobs: 1 } });
    expect(again.cachedFits).toBe(fresh.datasets.filter((item) => item.fitted !== undefined).length);
    expect(fitsOf(again)).toEqual(fitsOf(fresh));
  });

  it('workers that start while folders are still being read, and folders whose slugs clash or are invalid, give the one-thread result', async () => {
    // fitHandbook starts fitting once `minimumJobs` folders need it, while the rest are still being read; folders
    // with folder-wide errors (a duplicate slug, a name that is not a slug) are known only after reading, and any
    // fit made for them meanwhile must not be used.
    const content = path.join(root, 'content-clash');
    await cp('content', content, { recursive: true });
    await cp(path.join(content, 'corvane-12-density'), path.join(content, 'Not_A_Slug'), { recursive: true });
    await cp(path.join(content, 'corvane-12-density'), path.join(content, 'zz-copy'), { recursive: true });
    const metadata = path.join(content, 'zz-copy', 'correlation.yaml');
    await writeFile(metadata, `slug: corvane-12-density\n${await readFile(metadata, 'utf8')}`);
    const fresh = await fitHandbook(content);
    expect(fresh.diagnostics.filter((item) => item.severity === 'error').map((item) => item.message)).toEqual(
      expect.arrayContaining([expect.stringContaining("is not a valid slug"), expect.stringContaining("slug 'corvane-12-density' is also used by")]),
    );
    // An empty cache starts the workers before reading (startWorkersEarly); one holding stale records (of other
    // inputs) starts them once `minimumJobs` folders are found to need fitting, while the rest are being read.
    for (const [minimumJobs, stale] of [[1, 0], [5, 0], [5, 6]] as const) {
      const fitCache = { directory: path.join(root, `cache-clash-${minimumJobs}-${stale}`, 'correlary-fits'), version: 'pool-test-1' };
      await mkdir(fitCache.directory, { recursive: true });
      for (let i = 0; i < stale; i++) await writeFile(path.join(fitCache.directory, `${String(i).padStart(64, 'f')}.json`), '{}\n');
      const pooled = await fitHandbook(content, { fitCache, workers: { root: process.cwd(), minimumJobs }, prune: true });
      expect(fitsOf(pooled)).toEqual(fitsOf(fresh));
      expect(pooled.diagnostics).toEqual(fresh.diagnostics);
      expect(pooled.datasets.map((item) => item.dataset)).toEqual(fresh.datasets.map((item) => item.dataset));
      // Only records of folders that are used stay in the cache (none for the three folders in error).
      const used = pooled.datasets.filter((item) => item.fitted?.cacheKey !== undefined).length;
      expect(used).toBe(fresh.datasets.filter((item) => item.fitted !== undefined).length);
      expect(await readdir(fitCache.directory)).toHaveLength(used);
    }
  });

  it('prune: after a data file changes, the old record is deleted and every record left is one the handbook uses', async () => {
    const content = path.join(root, 'content');
    const fitCache = { directory: path.join(root, 'cache-prune', 'correlary-fits'), version: 'pool-test-1' };
    const first = await fitHandbook(content, { fitCache, prune: true });
    const before = new Set(await readdir(fitCache.directory));
    const csvPath = path.join(content, 'brindlewick-bw3-conductivity', 'data.csv');
    const csv = await readFile(csvPath, 'utf8');
    await writeFile(csvPath, csv.replace(/\n300,14\.147,/, '\n300,14.148,'));
    try {
      const second = await fitHandbook(content, { fitCache, prune: true });
      const after = new Set(await readdir(fitCache.directory));
      const keys = (handbook: typeof first) => new Set(handbook.datasets.flatMap((item) => (item.fitted?.cacheKey ? [`${item.fitted.cacheKey}.json`] : [])));
      expect(after).toEqual(keys(second));
      expect(after.size).toBe(before.size);
      // The changed dataset's record (one file, its summary on the first line).
      expect([...before].filter((name) => !after.has(name))).toHaveLength(1);
    } finally {
      await writeFile(csvPath, csv);
    }
  });
});
