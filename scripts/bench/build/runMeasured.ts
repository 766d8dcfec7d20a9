/**
 * Run a command as a child process and measure it: wall time, CPU time (user + system, of the child and every
 * descendant it waited for), the peak of the summed resident memory of the child and all its descendants (sampled
 * from /proc every 100 ms, so worker processes count), and each output line with the time it arrived (for splitting
 * Astro's phases).
 */
import { spawn } from 'node:child_process';
import { readFileSync, readdirSync } from 'node:fs';

export interface MeasuredRun {
  readonly code: number | null;
  readonly wallMs: number;
  /**
   * CPU seconds × 1000 (user + system) of the child and the descendants it waited for, all threads; undefined where
   * /proc is unavailable. Less sensitive to other load on the machine than the wall time.
   */
  readonly cpuMs: number | undefined;
  /** Peak summed RSS of the process tree in bytes; 0 where /proc is unavailable. */
  readonly peakRss: number;
  readonly lines: readonly { readonly atMs: number; readonly text: string }[];
}

/** Resident set sizes of every process whose ancestry reaches `root`, summed. */
function treeRss(root: number): number {
  let entries: string[];
  try {
    entries = readdirSync('/proc').filter((name) => /^\d+$/.test(name));
  } catch {
    return 0;
  }
  const parent = new Map<number, number>();
  const rss = new Map<number, number>();
  for (const name of entries) {
    try {
      const status = readFileSync(`/proc/${name}/status`, 'utf8');
      const ppid = /PPid:\s+(\d+)/.exec(status);
      const resident = /VmRSS:\s+(\d+) kB/.exec(status);
      parent.set(Number(name), ppid ? Number(ppid[1]) : 0);
      rss.set(Number(name), resident ? Number(resident[1]) * 1024 : 0);
    } catch {
      // the process ended while we looked
    }
  }
  let total = 0;
  for (const [pid, bytes] of rss) {
    let ancestor: number | undefined = pid;
    for (let depth = 0; ancestor !== undefined && ancestor > 1 && depth < 64; depth++) {
      if (ancestor === root) {
        total += bytes;
        break;
      }
      ancestor = parent.get(ancestor);
    }
  }
  return total;
}

/**
 * User + system CPU milliseconds of this process's children that have ended and been waited for (fields cutime and
 * cstime of /proc/self/stat, in clock ticks of 1/100 s, USER_HZ on Linux), or undefined without /proc.
 */
function childrenCpuMs(): number | undefined {
  try {
    const stat = readFileSync('/proc/self/stat', 'utf8');
    // Fields after the command name (which may hold spaces) start at state, field 3; cutime and cstime are 16 and 17.
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    return (Number(fields[13]) + Number(fields[14])) * 10;
  } catch {
    return undefined;
  }
}

export function runMeasured(command: string, args: readonly string[], options: { cwd: string; env?: NodeJS.ProcessEnv; echo?: boolean }): Promise<MeasuredRun> {
  return new Promise((resolve, reject) => {
    const start = performance.now();
    const cpuBefore = childrenCpuMs();
    const lines: { atMs: number; text: string }[] = [];
    const child = spawn(command, args, { cwd: options.cwd, env: options.env ?? process.env, stdio: ['ignore', 'pipe', 'pipe'] });
    let peakRss = 0;
    const sample = (): void => {
      if (child.pid !== undefined) peakRss = Math.max(peakRss, treeRss(child.pid));
    };
    const timer = setInterval(sample, 100);
    let pending = '';
    const take = (chunk: Buffer): void => {
      const atMs = performance.now() - start;
      pending += chunk.toString();
      const parts = pending.split('\n');
      pending = parts.pop() ?? '';
      for (const text of parts) {
        lines.push({ atMs, text });
        if (options.echo) process.stderr.write(`  | ${text}\n`);
      }
    };
    child.stdout.on('data', take);
    child.stderr.on('data', take);
    child.on('error', (caught) => {
      clearInterval(timer);
      reject(caught);
    });
    child.on('close', (code) => {
      clearInterval(timer);
      if (pending) lines.push({ atMs: performance.now() - start, text: pending });
      const cpuAfter = childrenCpuMs();
      const cpuMs = cpuBefore === undefined || cpuAfter === undefined ? undefined : cpuAfter - cpuBefore;
      resolve({ code, wallMs: performance.now() - start, cpuMs, peakRss, lines });
    });
  });
}
