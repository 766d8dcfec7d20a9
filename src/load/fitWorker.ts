/**
 * A fitting worker thread (src/load/fitPool.ts): fits the correlations it is sent, writes each one's cache record
 * and says when it is written. Run from a bundle of this file (the pool builds it), never imported.
 */
import { parentPort } from 'node:worker_threads';
import { cacheRecord } from './cacheRecord.ts';
import { writeCachedFit } from './fitCache.ts';
import { fitDataset } from './fitDataset.ts';
import type { LoadedCorrelation } from './types.ts';

interface Job {
  readonly id: number;
  readonly correlation: LoadedCorrelation;
  readonly directory: string;
  readonly key: string;
}

parentPort?.on('message', (job: Job) => {
  try {
    const fitted = fitDataset(job.correlation);
    writeCachedFit(job.directory, job.key, cacheRecord(job.correlation, fitted));
    // The pool reads the fit back from the record's summary (src/load/fitPool.ts).
    parentPort!.postMessage({ id: job.id });
  } catch (caught) {
    parentPort!.postMessage({ id: job.id, failure: caught instanceof Error ? (caught.stack ?? caught.message) : String(caught) });
  }
});
