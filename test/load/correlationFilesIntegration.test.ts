/**
 * correlationFilesIntegration: the files the loader leaves being written (pendingFiles.ts) are complete before any
 * page renders — the server build's last hook waits for them — and only the server build gets that wait.
 * (Astro 5 builds the server code, then the client code when there is any, then renders: static-build.js.)
 */
import { describe, expect, it } from 'vitest';
import { correlationFilesIntegration } from '../../src/loaders/correlationFilesIntegration.ts';
import { deferFiles, filesWritten, startFiles } from '../../src/loaders/pendingFiles.ts';

type Plugin = { name: string; closeBundle: () => Promise<void> };
type Setup = (options: { target: 'server' | 'client'; vite: { plugins?: Plugin[] } }) => void;

describe('correlationFilesIntegration()', () => {
  it('the server build ends only when the files started by the loader are written; a failure there fails it', async () => {
    const setup = (correlationFilesIntegration().hooks as unknown as { 'astro:build:setup': Setup })['astro:build:setup'];
    const client: { plugins?: Plugin[] } = {};
    setup({ target: 'client', vite: client });
    expect(client.plugins ?? []).toHaveLength(0);
    const server: { plugins?: Plugin[] } = { plugins: [] };
    setup({ target: 'server', vite: server });
    expect(server.plugins).toHaveLength(1);
    let finish = () => {};
    let written = false;
    startFiles(new Promise<void>((resolve) => (finish = resolve)).then(() => void (written = true)));
    let ended = false;
    const end = server.plugins![0]!.closeBundle().then(() => void (ended = true));
    await new Promise((resolve) => setTimeout(resolve, 20));
    expect(ended).toBe(false);
    finish();
    await end;
    expect(written && ended).toBe(true);
    startFiles(Promise.reject(new Error('disk full')));
    await expect(server.plugins![0]!.closeBundle()).rejects.toThrow('disk full');
    startFiles(Promise.resolve());
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
