/**
 * A pool of worker threads running one bundled worker (src/load/workerBundle.ts), each given one job at a time
 * (or a few, for jobs that wait on files).
 * Protocol: the pool posts `{ id, ...job }`; the worker answers `{ id, ...result }`, or `{ id, failure }` with a
 * message when the job failed. Jobs are handed out in the order they were asked for.
 */
import { Worker } from 'node:worker_threads';

export interface WorkerPool<Job extends object, Result extends object> {
  /** Run one job in the next free worker; rejects when the worker reports a failure or dies. */
  run(job: Job): Promise<Result>;
  /** Stop the workers. */
  close(): Promise<void>;
}

/**
 * @param bundle the worker's bundled code (workerBundle)
 * @param size how many workers (at least one)
 * @param jobsPerWorker how many jobs each worker is given at once (default 1); more than one when the thread that
 *   hands them out may be busy with other work for a while (the loader reading folders, Astro rendering pages), so
 *   that a worker that finishes a job finds the next one already queued
 * @example const pool = createWorkerPool<{ n: number }, { square: number }>(bundle, 2); await pool.run({ n: 3 }) // => { square: 9 }
 */
export function createWorkerPool<Job extends object, Result extends object>(bundle: string, size: number, jobsPerWorker = 1): WorkerPool<Job, Result> {
  const workers = Array.from({ length: Math.max(1, size) }, () => new Worker(bundle));
  // One entry per job a worker may take now.
  const idle = Array.from({ length: Math.max(1, jobsPerWorker) }, () => workers).flat();
  type Waiting = { resolve: (result: Result) => void; reject: (error: Error) => void };
  const queue: ({ message: object } & Waiting)[] = [];
  const pending = new Map<number, { worker: Worker } & Waiting>();
  let nextId = 0;
  let live = workers.length;
  const dispatch = () => {
    while (idle.length > 0 && queue.length > 0) {
      const worker = idle.pop()!;
      const { message, resolve, reject } = queue.shift()!;
      pending.set((message as { id: number }).id, { worker, resolve, reject });
      worker.postMessage(message);
    }
  };
  for (const worker of workers) {
    worker.on('message', (message: { id: number; failure?: string }) => {
      const waiting = pending.get(message.id);
      if (waiting === undefined) return;
      pending.delete(message.id);
      idle.push(worker);
      const { id: _id, failure, ...result } = message;
      if (failure === undefined) waiting.resolve(result as unknown as Result);
      else waiting.reject(new Error(`worker failed: ${failure}`));
      dispatch();
    });
    worker.on('error', (error) => {
      for (const [id, waiting] of pending) {
        if (waiting.worker !== worker) continue;
        pending.delete(id);
        waiting.reject(error);
      }
      // A worker that failed is gone: it takes no more jobs, and with none left, nothing queued would ever run.
      for (let at = idle.length - 1; at >= 0; at--) if (idle[at] === worker) idle.splice(at, 1);
      if (--live === 0) for (const { reject } of queue.splice(0)) reject(error);
    });
  }
  return {
    run: (job) =>
      new Promise<Result>((resolve, reject) => {
        queue.push({ message: { ...job, id: nextId++ }, resolve, reject });
        dispatch();
      }),
    close: async () => {
      await Promise.all(workers.map((worker) => worker.terminate()));
    },
  };
}
