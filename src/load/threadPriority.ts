/**
 * Lower the scheduling priority of the calling thread (Linux: its nice value), so that it takes only the CPU that
 * threads of normal priority leave: the files workers write while Astro's own thread bundles and renders, and on a
 * machine with few cores they must not slow it (src/loaders/correlationFiles.ts). Linux keeps a nice value per
 * thread; Node's os.setPriority sets the one of the id it is given, and a thread finds its own id in
 * /proc/thread-self. Elsewhere, or when refused, nothing changes.
 * @returns whether the priority was lowered
 * @example lowerThreadPriority(10) // => true on Linux
 */
import { readlinkSync } from 'node:fs';
import os from 'node:os';

export function lowerThreadPriority(nice: number): boolean {
  try {
    const thread = Number(readlinkSync('/proc/thread-self').split('/').pop());
    if (!Number.isInteger(thread) || thread <= 0) return false;
    // Only ever lowered: raising a priority needs privileges, and another thread's setting is never touched.
    if (os.getPriority(thread) >= nice) return false;
    os.setPriority(thread, nice);
    return true;
  } catch {
    return false;
  }
}
