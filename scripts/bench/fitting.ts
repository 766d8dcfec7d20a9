/**
 * bench:fitting — the CPU time of fitting one dataset as a fitting worker does it (src/load/fitWorker.ts): fitDataset,
 * then the cache record (the previews of the other orders, src/load/cacheRecord.ts), then writing it
 * (writeCachedFit), for every dataset of the seeded synthetic handbook of bench:build, in this one thread, without
 * Astro. Prints wall time per phase and CPU time (process.cpuUsage) and wall time per pass; nothing here asserts a time.
 *
 * With `--baseline DIR` (another checkout's root, e.g. `git archive main src package.json | tar -x -C DIR` with
 * node_modules linked) the same datasets are also fitted by that checkout's code, passes alternating, so before and
 * after are measured in the same run under the same load; the cache records of both are compared byte for byte
 * (their JSON text), as made and as read back from the files each wrote, and the numbers of identical records are
 * printed.
 *
 * Run: npm run bench:fitting -- [--count 1000] [--seed 1] [--passes 2] [--baseline DIR] [--only current|baseline]
 * A V8 profile: node --cpu-prof --cpu-prof-dir=DIR --import tsx scripts/bench/fitting.ts --count 1000 --passes 1
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { writeSyntheticHandbook } from './build/syntheticHandbook.ts';
import { benchOption } from './options.ts';

const repository = fileURLToPath(new URL('../..', import.meta.url));
const argv = process.argv.slice(2);
const option = (name: string, fallback: string): string => benchOption(argv, name, fallback);
const count = Number(option('count', '1000'));
const seed = Number(option('seed', '1'));
const passes = Number(option('passes', '2'));
const baselineRoot = option('baseline', '');
const only = option('only', '');
if (!Number.isInteger(count) || count < 1) throw new Error(`bench:fitting requires --count to be a positive whole number; got ${option('count', '')}`);
if (!Number.isInteger(passes) || passes < 1) throw new Error(`bench:fitting requires --passes to be a positive whole number; got ${option('passes', '')}`);

type Correlation = unknown;
interface Code {
  readonly name: string;
  readonly fitDataset: (correlation: Correlation) => unknown;
  readonly cacheRecord: (correlation: Correlation, fitted: unknown) => unknown;
  readonly writeCachedFit: (directory: string, key: string, record: unknown) => void;
  readonly toCacheJson: (value: unknown) => string;
  readonly readCachedFit: (directory: string, key: string) => unknown;
}

async function load(name: string, root: string): Promise<Code> {
  const at = (file: string) => pathToFileURL(path.join(root, 'src', 'load', file)).href;
  const [{ fitDataset }, { cacheRecord }, { writeCachedFit, toCacheJson, readCachedFit }] = await Promise.all([import(at('fitDataset.ts')), import(at('cacheRecord.ts')), import(at('fitCache.ts'))]);
  return { name, fitDataset, cacheRecord, writeCachedFit, toCacheJson, readCachedFit };
}

interface Figures {
  fit: number;
  previews: number;
  write: number;
  cpu: number;
  wall: number;
}

const cpuMs = () => {
  const usage = process.cpuUsage();
  return (usage.user + usage.system) / 1000;
};

/** One pass over every dataset: CPU ms per phase, and CPU and wall ms of the pass. */
function pass(code: Code, correlations: readonly Correlation[], directory: string, records?: string[]): Figures {
  const figures: Figures = { fit: 0, previews: 0, write: 0, cpu: 0, wall: 0 };
  const wallStart = performance.now();
  const cpuStart = cpuMs();
  correlations.forEach((correlation, i) => {
    // Phases by the wall clock (one thread, so nearly CPU time; process.cpuUsage per call costs more than it measures).
    const a = performance.now();
    const fitted = code.fitDataset(correlation);
    const b = performance.now();
    const record = code.cacheRecord(correlation, fitted);
    const c = performance.now();
    code.writeCachedFit(directory, `${String(i).padStart(64, '0')}`, record);
    const d = performance.now();
    figures.fit += b - a;
    figures.previews += c - b;
    figures.write += d - c;
    if (records) records[i] = code.toCacheJson(record);
  });
  figures.cpu = cpuMs() - cpuStart;
  figures.wall = performance.now() - wallStart;
  // The records as read back (not timed), in the cache's JSON: two checkouts' files may differ in format.
  if (records) correlations.forEach((_, i) => (records[correlations.length + i] = code.toCacheJson(code.readCachedFit(directory, `${String(i).padStart(64, '0')}`))));
  return figures;
}

const seconds = (ms: number) => (ms / 1000).toFixed(2);

async function main(): Promise<void> {
  const work = await mkdtemp(path.join(tmpdir(), 'correlary-bench-fitting-'));
  try {
    const content = path.join(work, 'content');
    await writeSyntheticHandbook(content, { count, seed });
    const { readHandbook } = (await import(pathToFileURL(path.join(repository, 'src', 'load', 'readHandbook.ts')).href)) as typeof import('../../src/load/readHandbook.ts');
    const handbook = await readHandbook(content);
    const correlations = handbook.datasets.flatMap((dataset) => (dataset.correlation === undefined ? [] : [dataset.correlation]));
    const codes: Code[] = [];
    if (baselineRoot !== '' && only !== 'current') codes.push(await load('baseline', path.resolve(baselineRoot)));
    if (only !== 'baseline') codes.push(await load('current', repository));
    const points = correlations.reduce((sum: number, correlation) => sum + correlation.used.length, 0);
    console.log(`bench:fitting: ${correlations.length} synthetic datasets (seed ${seed}, ${points} points used), one thread, node ${process.version}`);

    // Warm-up on a slice of the datasets, then compare the records of every dataset (first pass).
    const records = new Map<string, string[]>();
    for (const code of codes) pass(code, correlations.slice(0, Math.min(50, correlations.length)), path.join(work, `warm-${code.name}`));
    const results = new Map<string, Figures[]>(codes.map((code) => [code.name, []]));
    for (let round = 0; round < passes; round++) {
      for (const code of round % 2 === 0 ? codes : [...codes].reverse()) {
        const kept: string[] | undefined = round === 0 && codes.length > 1 ? [] : undefined;
        results.get(code.name)!.push(pass(code, correlations, path.join(work, `cache-${code.name}`), kept));
        if (kept) records.set(code.name, kept);
      }
    }
    console.log('| code | pass | fitDataset s | cacheRecord s | writeCachedFit s | pass CPU s | pass wall s | CPU ms per dataset |');
    console.log('|---|---:|---:|---:|---:|---:|---:|---:|');
    for (const [name, list] of results) {
      list.forEach((figures, i) => {
        console.log(
          `| ${name} | ${i + 1} | ${seconds(figures.fit)} | ${seconds(figures.previews)} | ${seconds(figures.write)} | ${seconds(figures.cpu)} | ${seconds(figures.wall)} | ${(figures.cpu / correlations.length).toFixed(2)} |`,
        );
      });
    }
    if (results.has('baseline') && results.has('current')) {
      const best = (name: string) => Math.min(...results.get(name)!.map((figures) => figures.cpu));
      console.log(`current/baseline CPU ratio (best pass of each): ${(best('current') / best('baseline')).toFixed(3)}`);
      const before = records.get('baseline')!;
      const after = records.get('current')!;
      const n = correlations.length;
      const identical = before.slice(0, n).filter((text, i) => text === after[i]).length;
      console.log(`cache records identical to the baseline's: ${identical} of ${n}`);
      const readBack = before.slice(n).filter((text, i) => text === after[n + i]).length;
      console.log(`cache records read back from their files identical to the baseline's: ${readBack} of ${n}`);
    }
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

await main();
