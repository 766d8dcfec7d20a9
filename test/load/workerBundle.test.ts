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
import { workerBundle } from '../../src/load/workerBundle.ts';

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

  it('an entry that does not exist gives no bundle', async () => {
    expect(await workerBundle(path.join(folder, 'missing.ts'), 'missing-worker', 'f'.repeat(64), folder)).toBeUndefined();
  });
});
