/**
 * A worker thread that writes correlations' folders of downloads (src/loaders/correlationFiles.ts) in parallel
 * with others. Protocol (src/load/workerPool.ts): `{ id, target, entry, handbook, digest }` in, `{ id, files }`
 * or `{ id, failure }` out. Run from a bundle of this file, never imported.
 */
import { parentPort } from 'node:worker_threads';
import type { HandbookIdentity } from '../export/index.ts';
import type { CorrelationEntry } from '../schema/index.ts';
import { forgetStoredFits } from '../load/storedFit.ts';
import { writeCorrelationFolder } from './correlationFolder.ts';

interface Job {
  readonly id: number;
  readonly target: string;
  readonly entry: CorrelationEntry;
  readonly handbook: HandbookIdentity;
  readonly digest: string;
}

parentPort?.on('message', (job: Job) => {
  writeCorrelationFolder(job.target, job.entry, job.handbook, job.digest)
    .then(
      (files) => parentPort!.postMessage({ id: job.id, files }),
      (caught: unknown) => parentPort!.postMessage({ id: job.id, failure: caught instanceof Error ? (caught.stack ?? caught.message) : String(caught) }),
    )
    // Each record is read for one correlation only: keep none of them (memory stays flat whatever the handbook).
    .finally(forgetStoredFits);
});
