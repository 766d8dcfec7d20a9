/**
 * correlationFilesIntegration and pendingFiles: the files the loader leaves being written start when the build
 * starts, and each correlation page waits for its own folder before it reads the parts written there.
 */
import { describe, expect, it } from 'vitest';
import { correlationFilesIntegration } from '../../src/loaders/correlationFilesIntegration.ts';
import { deferFiles, filesWritten, folderWritten, startFiles } from '../../src/loaders/pendingFiles.ts';

describe('correlationFilesIntegration()', () => {
  it("a correlation page waits for its own folder only; a failure of the files fails the pages still waiting", async () => {
    // Pages read the page parts written beside the downloads (src/loaders/writtenDownload.ts), which are written
    // while Astro bundles and renders (pendingFiles.ts).
    let markDone: (slug: string) => void = () => {};
    let finish = () => {};
    deferFiles((done) => {
      markDone = done;
      return new Promise<void>((resolve) => (finish = resolve));
    });
    const ready: string[] = [];
    const first = folderWritten('alpha').then(() => void ready.push('alpha'));
    const second = folderWritten('beta').then(() => void ready.push('beta'));
    const unfitted = folderWritten('no-fit').then(() => void ready.push('no-fit'));
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(ready).toEqual([]);
    markDone('beta');
    await second;
    expect(ready).toEqual(['beta']); // alpha's folder is not written yet
    markDone('alpha');
    await first;
    await folderWritten('alpha'); // done already: at once
    expect(ready).toEqual(['beta', 'alpha']);
    // A correlation with no folder (no fit) waits for the whole work.
    finish();
    await unfitted;
    expect(ready).toEqual(['beta', 'alpha', 'no-fit']);
    await filesWritten();
    // A failure reaches the pages still waiting.
    deferFiles(() => Promise.reject(new Error('disk full')));
    await expect(folderWritten('gamma')).rejects.toThrow('disk full');
    await expect(filesWritten()).rejects.toThrow('disk full');
    startFiles(Promise.resolve());
    // The server build no longer waits for the files (its hooks add no plugin).
    expect((correlationFilesIntegration().hooks as Record<string, unknown>)['astro:build:setup']).toBeUndefined();
  });

  it('the files the loader prepared start only when the build starts, after Astro has saved its content store', async () => {
    // Astro 5.18 loses a store save asked for while an earlier save is still being written (pendingFiles.ts); the
    // downloads' thousands of file operations must not be queued before the store is saved, so they wait for the
    // build to start (astro/dist/core/build/index.js runs astro:build:start after syncing the content).
    const start = (correlationFilesIntegration().hooks as unknown as { 'astro:build:start': () => void })['astro:build:start'];
    let started = 0;
    deferFiles(async () => {
      started++;
    });
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(started).toBe(0);
    start();
    expect(started).toBe(1);
    await filesWritten();
    start(); // once only
    expect(started).toBe(1);
    // Without the hook (a test, or a tool that renders without Astro's build), waiting for the files starts them.
    deferFiles(async () => {
      started++;
    });
    await filesWritten();
    expect(started).toBe(2);
  });
});
