/**
 * workerBundle: a worker's TypeScript entry bundled once per code version; asked for twice at the same time in one
 * process (the build's integration starts the bundles early, the pools ask for them later), it is built once and
 * both callers get the same file; a missing entry gives no bundle.
 */
import { mkdtempSync, readdirSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { fitWorkerBundle } from '../../src/load/fitPool.ts';
import { workerBundle, workerBundles } from '../../src/load/workerBundle.ts';

const folder = mkdtempSync(path.join(tmpdir(), 'correlary-worker-bundle-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('workerBundle()', () => {
  it('two requests at once build the bundle once and get the same file, which runs', async () => {
    const [first, second] = await Promise.all([fitWorkerBundle(process.cwd(), folder), fitWorkerBundle(process.cwd(), folder)]);
    expect(first).toBeDefined();
    expect(second).toBe(first);
    // One bundle, no temporary file left behind.
    expect(readdirSync(folder)).toEqual([path.basename(first!)]);
    const built = statSync(first!).mtimeMs;
    // Asked again later: the file is reused, not rebuilt.
    expect(await fitWorkerBundle(process.cwd(), folder)).toBe(first);
    expect(statSync(first!).mtimeMs).toBe(built);
    // The bundle is an ES module that loads (its worker code waits for messages only when run as a worker).
    await expect(import(pathToFileURL(first!).href)).resolves.toBeDefined();
  });

  it('workerBundles makes several in one run: each file where workerBundle would put it, none for a missing entry, no temporary file left', async () => {
    const several = mkdtempSync(path.join(tmpdir(), 'correlary-worker-bundles-'));
    try {
      const version = 'a'.repeat(64);
      const made = await Promise.all(
        workerBundles(
          [
            { entry: path.join(process.cwd(), 'src', 'load', 'fitWorker.ts'), prefix: 'fit-worker' },
            { entry: path.join(several, 'missing.ts'), prefix: 'missing-worker' },
            { entry: path.join(process.cwd(), 'src', 'core', 'index.ts'), prefix: 'core' },
          ],
          version,
          several,
        ),
      );
      expect(made).toEqual([path.join(several, 'fit-worker-aaaaaaaaaaaaaaaa.mjs'), undefined, path.join(several, 'core-aaaaaaaaaaaaaaaa.mjs')]);
      expect(readdirSync(several).sort()).toEqual(['core-aaaaaaaaaaaaaaaa.mjs', 'fit-worker-aaaaaaaaaaaaaaaa.mjs']);
      // Asked for one of them again, alone: the same file, not rebuilt.
      const built = statSync(made[2]!).mtimeMs;
      expect(await workerBundle(path.join(process.cwd(), 'src', 'core', 'index.ts'), 'core', version, several)).toBe(made[2]);
      expect(statSync(made[2]!).mtimeMs).toBe(built);
      // The core's bundle is an ES module with the core's functions.
      expect(typeof ((await import(pathToFileURL(made[2]!).href)) as Record<string, unknown>)['formatNumber']).toBe('function');
    } finally {
      rmSync(several, { recursive: true, force: true });
    }
  });

  it('an entry that does not exist gives no bundle', async () => {
    expect(await workerBundle(path.join(folder, 'missing.ts'), 'missing-worker', 'f'.repeat(64), folder)).toBeUndefined();
  });
});
