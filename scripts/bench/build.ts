/**
 * bench:build — how the handbook build scales. Writes a seeded synthetic handbook of N correlations
 * (scripts/bench/build/syntheticHandbook.ts) into a temporary project, builds it cold with Astro, changes one
 * dataset and builds again, then builds a bare Astro site of N trivial pages as the baseline, and prints the
 * figures and the targets. Prints figures only; nothing here asserts a time.
 *
 * Run: npm run bench:build -- --count 1000 [--seed 1] [--keep] [--verbose] [--cpu-prof [--cpu-prof-dir DIR]]
 */
import { readFile, readdir, rm, stat, writeFile, mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { makeBareProject, makeSiteProject } from './build/benchProjects.ts';
import { runMeasured, type MeasuredRun } from './build/runMeasured.ts';
import { writeSyntheticHandbook } from './build/syntheticHandbook.ts';
import { benchOption } from './options.ts';

const repository = fileURLToPath(new URL('../..', import.meta.url));
const argv = process.argv.slice(2);
const option = (name: string, fallback: string): string => benchOption(argv, name, fallback);
const count = Number(option('count', '100'));
const seed = Number(option('seed', '1'));
const keep = argv.includes('--keep');
const verbose = argv.includes('--verbose');
/** --cpu-prof: the cold build writes a V8 CPU profile (open it in a browser's developer tools) into --cpu-prof-dir. */
const cpuProfileDir = argv.includes('--cpu-prof') ? path.resolve(option('cpu-prof-dir', 'bench-profiles')) : undefined;
if (!Number.isInteger(count) || count < 1) throw new Error(`bench:build requires --count to be a positive whole number; got ${option('count', '')}`);

const astro = path.join(repository, 'node_modules', 'astro', 'astro.js');
const env = { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NODE_ENV: 'production', FORCE_COLOR: '0', NO_COLOR: '1' };

function build(cwd: string, profile = false): Promise<MeasuredRun> {
  const flags = profile && cpuProfileDir ? ['--cpu-prof', `--cpu-prof-dir=${cpuProfileDir}`] : [];
  return runMeasured(process.execPath, [...flags, astro, 'build'], { cwd, env, echo: verbose });
}

const plain = (text: string): string => text.replace(/\x1b\[[0-9;]*m/g, '');

/** Seconds of an Astro phase, from its "✓ Completed in …" line after the line that opens it. */
function phaseSeconds(run: MeasuredRun, opener: RegExp): number | undefined {
  const lines = run.lines.map((line) => plain(line.text));
  const start = lines.findIndex((text) => opener.test(text));
  if (start < 0) return undefined;
  for (const text of lines.slice(start + 1)) {
    const match = /Completed in ([\d.]+)(ms|s)/.exec(text);
    if (match) return Number(match[1]) / (match[2] === 'ms' ? 1000 : 1);
  }
  return undefined;
}

/**
 * Seconds the loader reports for reading and fitting, how many fits came from the cache, and the seconds spent
 * fitting what was not cached (part of the fitting pass, which also computes every cache key, reads the cached
 * summaries and the review trails, and prunes).
 */
function loaderFigures(run: MeasuredRun): { seconds?: number; fitSeconds?: number; cached?: number; refitSeconds?: number } {
  for (const { text } of run.lines) {
    const match = /loaded \d+ correlations? from .* in ([\d.]+) s(?: \(fitting ([\d.]+) s(?:, (\d+) from the fit cache)?(?:; fitting what was not cached ([\d.]+) s)?\))?/.exec(plain(text));
    if (match) {
      const number = (value: string | undefined) => (value ? Number(value) : undefined);
      return { seconds: Number(match[1]), fitSeconds: number(match[2]), cached: number(match[3]), refitSeconds: number(match[4]) };
    }
  }
  return {};
}

async function walk(folder: string): Promise<{ file: string; size: number }[]> {
  const out: { file: string; size: number }[] = [];
  for (const item of await readdir(folder, { withFileTypes: true })) {
    const full = path.join(folder, item.name);
    if (item.isDirectory()) out.push(...(await walk(full)));
    else out.push({ file: full, size: (await stat(full)).size });
  }
  return out;
}

const mb = (bytes: number): string => `${(bytes / 1e6).toFixed(1)} MB`;
const kb = (bytes: number): string => `${(bytes / 1e3).toFixed(1)} KB`;
const gb = (bytes: number): string => `${(bytes / 1e9).toFixed(2)} GB`;
const s = (seconds: number | undefined): string => (seconds === undefined ? 'n/a' : `${seconds.toFixed(1)} s`);
/** ", C s CPU" for a run whose CPU time is known (user + system, all threads and child processes). */
const cpu = (run: MeasuredRun): string => (run.cpuMs === undefined ? '' : `, ${s(run.cpuMs / 1000)} CPU`);

function failIfBroken(run: MeasuredRun, what: string): void {
  if (run.code === 0) return;
  const tail = run.lines.slice(-40).map((line) => line.text).join('\n');
  throw new Error(`${what} failed with exit code ${run.code}:\n${tail}`);
}

const root = await mkdtemp(path.join(tmpdir(), 'correlary-bench-build-'));
const site = path.join(root, 'site');
const bare = path.join(root, 'bare');
try {
  console.log(`bench:build — ${count} synthetic correlations (seed ${seed}), node ${process.version}, ${path.basename(root)}`);
  await makeSiteProject(repository, site);
  await writeSyntheticHandbook(path.join(site, 'content'), { count, seed });

  const cold = await build(site, true);
  if (cpuProfileDir) console.log(`CPU profile of the cold build written to ${cpuProfileDir}`);
  failIfBroken(cold, 'the handbook build');
  const files = await walk(path.join(site, 'dist'));
  const pages = files.filter((item) => item.file.endsWith('.html'));
  const largest = pages.reduce((best, item) => (item.size > best.size ? item : best), { file: '', size: 0 });
  const scripts = files.filter((item) => item.file.includes(`${path.sep}_astro${path.sep}`) && item.file.endsWith('.js'));
  const distBytes = files.reduce((sum, item) => sum + item.size, 0);
  const loaded = loaderFigures(cold);
  const entrypoints = phaseSeconds(cold, /Building static entrypoints/);
  const rendering = phaseSeconds(cold, /generating static routes/);

  const coldLines = [
    `handbook build (cold):        ${s(cold.wallMs / 1000)} wall${cpu(cold)}, peak memory ${gb(cold.peakRss)} (RSS of the build's process tree)`,
    `  reading + fitting:          ${s(loaded.seconds)}${loaded.fitSeconds === undefined ? '' : ` (fitting ${s(loaded.fitSeconds)})`}${loaded.refitSeconds === undefined ? '' : `; fitting what was not cached, from the first fit started to the last done: ${s(loaded.refitSeconds)}`}`,
    `  static entrypoints:         ${s(entrypoints)}`,
    `  rendering pages:            ${s(rendering)}, ${pages.length} HTML pages, ${rendering ? (pages.length / rendering).toFixed(0) : 'n/a'} pages/s (${(pages.length / (cold.wallMs / 1000)).toFixed(0)} pages/s over the whole build)`,
    `  dist/:                      ${mb(distBytes)} in ${files.length} files; largest page ${kb(largest.size)} (${path.relative(path.join(site, 'dist'), largest.file)}); shared scripts ${kb(scripts.reduce((sum, item) => sum + item.size, 0))} in ${scripts.length} file(s)`,
  ];
  console.log(coldLines.join('\n'));

  // Change one dataset (the last y of the first folder) and build again on the warm cache.
  const changed = path.join(site, 'content', 'synthetic-00000', 'data.csv');
  const csv = (await readFile(changed, 'utf8')).trimEnd().split('\n');
  const last = csv[csv.length - 1]!.split(',');
  last[1] = String(Number(last[1]) + 1e-3);
  csv[csv.length - 1] = last.join(',');
  await writeFile(changed, `${csv.join('\n')}\n`);
  const rebuild = await build(site);
  failIfBroken(rebuild, 'the rebuild');
  const reloaded = loaderFigures(rebuild);

  await makeBareProject(repository, bare, count);
  const baseline = await build(bare);
  failIfBroken(baseline, 'the bare Astro build');

  const ratio = cold.wallMs / baseline.wallMs;
  const lines = [
    `rebuild after changing 1 of ${count} datasets: ${s(rebuild.wallMs / 1000)} wall${cpu(rebuild)}, reading + fitting ${s(reloaded.seconds)}${reloaded.fitSeconds === undefined ? '' : ` (fitting ${s(reloaded.fitSeconds)}${reloaded.cached === undefined ? '' : `, ${reloaded.cached} from the fit cache`})`}, peak memory ${gb(rebuild.peakRss)}`,
    // The cold build's fitting time is the span from its first fit started to its last done: folders go to fitting
    // as they are read (src/load/readHandbook.ts), so its fitting pass after reading is only the tail of it.
    `  rebuild fitting / cold fitting: ${loaded.refitSeconds && reloaded.fitSeconds !== undefined ? `${((100 * reloaded.fitSeconds) / loaded.refitSeconds).toFixed(1)} % (the rebuild's fitting pass, ${reloaded.fitSeconds.toFixed(3)} s, over the cold build's fitting from the first fit started to the last done, ${s(loaded.refitSeconds)}${loaded.fitSeconds ? `; over the cold build's fitting pass after reading, ${s(loaded.fitSeconds)}: ${((100 * reloaded.fitSeconds) / loaded.fitSeconds).toFixed(1)} %` : ''})` : 'n/a'}`,
    `  of which fitting what was not cached: ${reloaded.refitSeconds === undefined ? 'n/a' : `${reloaded.refitSeconds.toFixed(3)} s, ${loaded.refitSeconds ? `${((100 * reloaded.refitSeconds) / loaded.refitSeconds).toFixed(1)} %` : 'n/a'} of the cold build's fitting`} (the rest: cache keys and look-ups of the unchanged datasets, review trails, pruning)`,
    `bare Astro build of ${count} trivial pages: ${s(baseline.wallMs / 1000)} wall${cpu(baseline)}, peak memory ${gb(baseline.peakRss)}`,
    ...(cold.cpuMs !== undefined && baseline.cpuMs ? [`build/baseline CPU ratio: ${(cold.cpuMs / baseline.cpuMs).toFixed(2)} (CPU time of the cold build over the bare build's; the ratio below is of wall times)`] : []),
    'targets: N = 1000: ratio ≤ 3 (stretch 2), peak memory ≤ 1.5 GB; N = 5000: completes, ratio ≤ 3; rebuild after changing 1 of 1000 spends < 5 % of the cold fitting time fitting',
    `build/baseline ratio: ${ratio.toFixed(2)}`,
  ];
  console.log(lines.join('\n'));
} finally {
  if (keep) console.error(`kept ${root}`);
  else await rm(root, { recursive: true, force: true });
}
