/**
 * bench:files — the CPU time of building one correlation's folder as a files worker does it
 * (src/loaders/correlationFolder.ts writeCorrelationFolder, src/loaders/filesWorker.ts): correlationFiles (the
 * downloads), then pageParts (the page's costly parts, from the snippets just built), then forgetStoredFits, for
 * every correlation of the seeded synthetic handbook of bench:build, in this one thread, without Astro and
 * without writing the files (the page parts are timed up to their text, as written). The handbook is fitted once first (in this thread, with a fit cache, as the build
 * does), and each stored entry is made as the content loader makes it (src/loaders/correlationLoader.ts: the fit,
 * order selection and points are references to the fit cache; parsed by the collection's schema; cloned as a
 * worker receives it). Prints wall time per phase and CPU time (process.cpuUsage) per pass and per correlation;
 * nothing here asserts a time.
 *
 * With `--baseline DIR` (another checkout's root, e.g. `git archive main src package.json | tar -x -C DIR` with
 * node_modules linked) every folder is also built by that checkout's code, so that before and after are measured in
 * the same run under the same load: in the first pass folder by folder (each folder's files are compared between the
 * two, the page parts by the value each checkout's page reads back from its text, and the number of identical files
 * is printed), then pass by pass, alternating. Each checkout fits the handbook into a fit cache of its own first (its
 * record format may differ).
 *
 * The first pass is the one a build makes (each correlation once, after a warm-up on 50 other correlations); later
 * passes find memos (texHtml's KaTeX markup) filled by the earlier ones, so they flatter code that memoizes.
 *
 * Run: npm run bench:files -- [--count 1000] [--seed 1] [--passes 3] [--baseline DIR] [--only current|baseline]
 * A V8 profile: node --cpu-prof --cpu-prof-dir=DIR --import tsx scripts/bench/files.ts --count 1000 --passes 1
 */
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { writeSyntheticHandbook } from './build/syntheticHandbook.ts';
import { benchOption } from './options.ts';
import type { CorrelationEntry } from '../../src/schema/index.ts';
import type { HandbookIdentity } from '../../src/export/index.ts';

const repository = fileURLToPath(new URL('../..', import.meta.url));
const argv = process.argv.slice(2);
const option = (name: string, fallback: string): string => benchOption(argv, name, fallback);
const count = Number(option('count', '1000'));
const seed = Number(option('seed', '1'));
const passes = Number(option('passes', '3'));
const baselineRoot = option('baseline', '');
const only = option('only', '');
/** Correlations besides the N measured, for the warm-up. */
const WARM_UP = 50;
if (!Number.isInteger(count) || count < 1) throw new Error(`bench:files requires --count to be a positive whole number; got ${option('count', '')}`);
if (!Number.isInteger(passes) || passes < 1) throw new Error(`bench:files requires --passes to be a positive whole number; got ${option('passes', '')}`);

interface File {
  readonly file: string;
  readonly text: string;
}
interface Code {
  readonly name: string;
  readonly correlationFiles: (entry: CorrelationEntry, handbook: HandbookIdentity) => File[];
  readonly pageParts: (entry: CorrelationEntry, snippets: Readonly<Record<string, string>>) => unknown;
  readonly snippetKinds: (slug: string) => readonly { kind: string; file: string }[];
  readonly pagePartsFile: string;
  readonly forgetStoredFits: () => void;
  /** The page parts' text as writeCorrelationFolder writes it (pagePartsText), where the checkout has it… */
  readonly pagePartsText?: (entry: CorrelationEntry, downloads: ReadonlyMap<string, string>) => string;
  /** …and as it wrote it before (the cache's JSON). */
  readonly toCacheJson: (value: unknown) => string;
  /** The page parts' value from their text, as the page reads it. */
  readonly readPageParts: (text: string) => unknown;
  /** The checkout's stored entries (each fitted into its own fit cache, in its own record format). */
  jobs: Job[];
}

async function load(name: string, root: string): Promise<Code> {
  const at = (...parts: string[]) => pathToFileURL(path.join(root, 'src', ...parts)).href;
  const [files, parts, snippets, stored, folder, cache, packed] = await Promise.all([
    import(at('components', 'lib', 'correlationFiles.ts')),
    import(at('components', 'lib', 'pageParts.ts')),
    import(at('components', 'lib', 'entrySnippets.ts')),
    import(at('load', 'storedFit.ts')),
    import(at('loaders', 'correlationFolder.ts')),
    import(at('load', 'fitCache.ts')),
    import(at('load', 'packedJson.ts')).catch(() => undefined),
  ]);
  return {
    name,
    correlationFiles: files.correlationFiles,
    pageParts: parts.pageParts,
    snippetKinds: snippets.snippetKinds,
    pagePartsFile: parts.PAGE_PARTS_FILE,
    forgetStoredFits: stored.forgetStoredFits,
    pagePartsText: folder.pagePartsText,
    toCacheJson: cache.toCacheJson,
    // Page parts are packed JSON where the checkout writes them with pagePartsText, the cache's JSON before.
    readPageParts: folder.pagePartsText !== undefined && packed !== undefined ? packed.fromPackedJson : cache.fromCacheJson,
    jobs: [],
  };
}

/** One folder's files, as writeCorrelationFolder (src/loaders/correlationFolder.ts) computes them; CPU-timed phases. */
function folder(code: Code, entry: CorrelationEntry, handbook: HandbookIdentity, figures: Figures): File[] {
  const a = performance.now();
  const files = code.correlationFiles(entry, handbook);
  const b = performance.now();
  let text: string;
  if (code.pagePartsText !== undefined) text = code.pagePartsText(entry, new Map(files.map((file) => [file.file, file.text])));
  else {
    const texts = new Map(files.map((file) => [file.file, file.text]));
    const snippets = Object.fromEntries(code.snippetKinds(entry.slug).filter((kind) => kind.kind !== 'typescript').map((kind) => [kind.kind, texts.get(kind.file)!]));
    text = code.toCacheJson(code.pageParts(entry, snippets));
  }
  const c = performance.now();
  // As the files worker does after each folder: the fit records read are not kept.
  code.forgetStoredFits();
  figures.files += b - a;
  figures.parts += c - b;
  return [...files, { file: code.pagePartsFile, text }];
}

interface Figures {
  files: number;
  parts: number;
  cpu: number;
  wall: number;
}

const cpuMs = () => {
  const usage = process.cpuUsage();
  return (usage.user + usage.system) / 1000;
};

interface Job {
  readonly entry: CorrelationEntry;
  readonly handbook: HandbookIdentity;
}

/** One pass over every folder: wall ms per phase, and CPU and wall ms of the pass. */
function pass(code: Code, jobs: readonly Job[] = code.jobs): Figures {
  const figures: Figures = { files: 0, parts: 0, cpu: 0, wall: 0 };
  const wallStart = performance.now();
  const cpuStart = cpuMs();
  for (const { entry, handbook } of jobs) folder(code, entry, handbook, figures);
  figures.cpu = cpuMs() - cpuStart;
  figures.wall = performance.now() - wallStart;
  return figures;
}

/** How the files of the checkouts compared in the first pass. */
interface Comparison {
  total: number;
  identical: number;
  differing: Map<string, number>;
}

/**
 * The first pass: every folder built by each checkout in turn (which goes first alternates), its files compared and
 * dropped (kept, they would make every later collection slower), CPU and wall ms counted per folder and checkout.
 */
function firstPass(codes: readonly Code[]): { figures: Map<string, Figures>; comparison: Comparison } {
  const figures = new Map(codes.map((code) => [code.name, { files: 0, parts: 0, cpu: 0, wall: 0 } as Figures]));
  const comparison: Comparison = { total: 0, identical: 0, differing: new Map() };
  codes[0]!.jobs.forEach((_, i) => {
    const built = new Map<string, File[]>();
    for (const code of i % 2 === 0 ? codes : [...codes].reverse()) {
      const { entry, handbook } = code.jobs[i]!;
      const mine = figures.get(code.name)!;
      const wallStart = performance.now();
      const cpuStart = cpuMs();
      built.set(code.name, folder(code, entry, handbook, mine));
      mine.cpu += cpuMs() - cpuStart;
      mine.wall += performance.now() - wallStart;
    }
    const before = built.get('baseline');
    const after = built.get('current');
    if (before === undefined || after === undefined) return;
    const theirs = new Map(after.map((file) => [file.file, file.text]));
    const [baseline, current] = codes.map((code) => code.name);
    const code = (name: string | undefined) => codes.find((item) => item.name === name)!;
    for (const name of new Set([...before.map((file) => file.file), ...theirs.keys()])) {
      comparison.total++;
      const text = before.find((file) => file.file === name)?.text;
      const other = theirs.get(name);
      // The page parts may be written in another format: compared as what the page reads back (the value, written
      // out by the baseline's cache JSON, which keeps NaN, ±Infinity, −0 and the order of keys).
      const same =
        text !== undefined && other !== undefined &&
        (text === other ||
          (name === code(current).pagePartsFile &&
            code(baseline).toCacheJson(code(baseline).readPageParts(text)) === code(baseline).toCacheJson(code(current).readPageParts(other))));
      if (same) comparison.identical++;
      else comparison.differing.set(name, (comparison.differing.get(name) ?? 0) + 1);
    }
  });
  return { figures, comparison };
}

/** The stored entries of the handbook, made as src/loaders/correlationLoader.ts makes them, with their identities. */
async function storedJobs(content: string, cacheDirectory: string, root: string): Promise<Job[]> {
  const src = (...parts: string[]) => pathToFileURL(path.join(root, 'src', ...parts)).href;
  const { fitHandbook, handbookHistory, readHandbookSettings } = (await import(src('load', 'index.ts'))) as typeof import('../../src/load/index.ts');
  const { fitCodeVersion } = (await import(src('load', 'fitCodeVersion.ts'))) as typeof import('../../src/load/fitCodeVersion.ts');
  const { correlationEntrySchema, handbookSettingsSchema } = (await import(src('schema', 'index.ts'))) as typeof import('../../src/schema/index.ts');
  const { identityOf } = (await import(src('components', 'lib', 'identityOf.ts'))) as typeof import('../../src/components/lib/identityOf.ts');
  const { storedEntry } = (await import(src('loaders', 'storedEntry.ts'))) as typeof import('../../src/loaders/storedEntry.ts');
  const fitCache = { directory: cacheDirectory, version: fitCodeVersion(root) };
  const handbook = await fitHandbook(content, { fitCache });
  const histories = await handbookHistory(content, handbook.datasets);
  // The site address and base path of astro.config.mjs: the settings' (bench:build sets no override).
  const settings = (await readHandbookSettings(content)).settings ?? handbookSettingsSchema.parse({});
  const jobs: Job[] = [];
  for (const item of handbook.datasets) {
    const entry = storedEntry(item, fitCache.directory, histories);
    if (entry === undefined) continue;
    // context.parseData validates it by the collection's schema; the worker gets a structured clone.
    const stored = structuredClone(correlationEntrySchema.parse(entry));
    if (stored.fit === null) continue; // writeCorrelationFiles writes folders of fitted entries only
    jobs.push({ entry: stored, handbook: identityOf(stored.slug, settings, settings.basePath, settings.url) });
  }
  // The files workers are given the folders in slug order.
  return jobs.sort((a, b) => (a.entry.slug < b.entry.slug ? -1 : 1));
}

const seconds = (ms: number) => (ms / 1000).toFixed(2);

async function main(): Promise<void> {
  const work = await mkdtemp(path.join(tmpdir(), 'correlary-bench-files-'));
  try {
    const content = path.join(work, 'content');
    // WARM_UP more correlations than measured (indices count, count + 1, …): the warm-up runs on them, so that no
    // memo (e.g. texHtml's) holds a measured correlation before its first pass.
    await writeSyntheticHandbook(content, { count: count + WARM_UP, seed });
    const codes: Code[] = [];
    if (baselineRoot !== '' && only !== 'current') codes.push(await load('baseline', path.resolve(baselineRoot)));
    if (only !== 'baseline') codes.push(await load('current', repository));
    const index = (job: Job) => Number(job.entry.slug.replace(/^synthetic-/, ''));
    const fitStarted = performance.now();
    const warmUps = new Map<string, Job[]>();
    for (const code of codes) {
      // Each checkout fits the handbook into a fit cache of its own: each reads records in its own format.
      const all = await storedJobs(content, path.join(work, `correlary-fits-${code.name}`), code.name === 'current' ? repository : path.resolve(baselineRoot));
      code.jobs = all.filter((job) => index(job) < count);
      warmUps.set(code.name, all.filter((job) => index(job) >= count));
    }
    const fitSeconds = (performance.now() - fitStarted) / 1000;
    const jobs = codes[0]!.jobs;
    console.log(`bench:files: ${jobs.length} folders of synthetic correlations (seed ${seed}; fitted in ${fitSeconds.toFixed(1)} s), one thread, node ${process.version}`);

    // Warm-up on other correlations; the first pass compares the files; then the other passes, alternating.
    for (const code of codes) pass(code, warmUps.get(code.name)!);
    const first = firstPass(codes);
    const results = new Map<string, Figures[]>(codes.map((code) => [code.name, [first.figures.get(code.name)!]]));
    for (let round = 1; round < passes; round++) {
      for (const code of round % 2 === 0 ? codes : [...codes].reverse()) results.get(code.name)!.push(pass(code));
    }
    console.log('| code | pass | correlationFiles s | pageParts s | pass CPU s | pass wall s | CPU ms per correlation |');
    console.log('|---|---:|---:|---:|---:|---:|---:|');
    for (const [name, list] of results) {
      list.forEach((figures, i) => {
        console.log(`| ${name} | ${i + 1} | ${seconds(figures.files)} | ${seconds(figures.parts)} | ${seconds(figures.cpu)} | ${seconds(figures.wall)} | ${(figures.cpu / jobs.length).toFixed(2)} |`);
      });
    }
    if (results.has('baseline') && results.has('current')) {
      const firstCpu = (name: string) => results.get(name)![0]!.cpu;
      const best = (name: string) => Math.min(...results.get(name)!.map((figures) => figures.cpu));
      const perCorrelation = (ms: number) => (ms / jobs.length).toFixed(2);
      // The first pass is what a build does (each correlation once); later passes find memos filled by earlier ones.
      console.log(`CPU ms per correlation, first pass: baseline ${perCorrelation(firstCpu('baseline'))}, current ${perCorrelation(firstCpu('current'))}; ratio ${(firstCpu('current') / firstCpu('baseline')).toFixed(3)}`);
      console.log(`CPU ms per correlation, best pass: baseline ${perCorrelation(best('baseline'))}, current ${perCorrelation(best('current'))}; ratio ${(best('current') / best('baseline')).toFixed(3)}`);
      const { total, identical, differing } = first.comparison;
      console.log(`files identical to the baseline's: ${identical} of ${total}`);
      if (differing.size > 0) console.log(`differing, by file name: ${[...differing].map(([name, n]) => `${name} ${n}`).join(', ')}`);
    }
  } finally {
    await rm(work, { recursive: true, force: true });
  }
}

await main();
