/**
 * lowerThreadPriority lowers the nice value of the calling thread only: Linux keeps one per thread, and
 * setpriority(2) on a thread id acts on that thread alone (common practice; man 2 setpriority, NOTES). Checked from
 * /proc in a child process: a worker thread calls it, the child's main thread must keep its own value.
 */
import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));

describe.skipIf(!existsSync('/proc/thread-self'))('lowerThreadPriority', () => {
  it('lowers the calling worker thread to nice 10, never raises it again, and leaves the main thread alone', async () => {
    const folder = await mkdtemp(path.join(tmpdir(), 'correlary-priority-'));
    try {
      // A worker thread does not inherit tsx's hooks: it registers them itself, then imports the TypeScript source.
      const worker = path.join(folder, 'worker.mjs');
      await writeFile(
        worker,
        `import { readlinkSync } from 'node:fs';
import { parentPort } from 'node:worker_threads';
const { register } = await import(${JSON.stringify(pathToFileURL(path.join(root, 'node_modules', 'tsx', 'dist', 'esm', 'api', 'index.mjs')).href)});
register();
const { lowerThreadPriority } = await import(${JSON.stringify(pathToFileURL(path.join(root, 'src', 'load', 'threadPriority.ts')).href)});
const thread = Number(readlinkSync('/proc/thread-self').split('/').pop());
const lowered = lowerThreadPriority(10);
const raised = lowerThreadPriority(5);
parentPort.postMessage({ thread, lowered, raised });
parentPort.once('message', () => process.exit(0));
`,
      );
      const main = path.join(folder, 'main.mjs');
      await writeFile(
        main,
        `import { readFileSync } from 'node:fs';
import { Worker } from 'node:worker_threads';
const nice = (thread) => { const stat = readFileSync('/proc/' + process.pid + '/task/' + thread + '/stat', 'utf8'); return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[16]); };
const worker = new Worker(${JSON.stringify(worker)});
worker.once('message', (said) => {
  console.log(JSON.stringify({ ...said, workerNice: nice(said.thread), mainNice: nice(process.pid) }));
  worker.postMessage('done');
});
`,
      );
      const out = execFileSync(process.execPath, [main], { cwd: root, encoding: 'utf8' });
      const said = JSON.parse(out.trim().split('\n').pop()!);
      expect(said).toMatchObject({ lowered: true, raised: false, workerNice: 10 });
      expect(said.thread).toBeGreaterThan(0);
      expect(said.mainNice).toBeLessThan(10);
    } finally {
      await rm(folder, { recursive: true, force: true });
    }
  });
});
