/**
 * `correlary build [--content DIR] [--out DIR] [--base PATH]`: build a handbook folder into a static site.
 *
 * The check pass (the same read-validate-fit that `correlary check` runs) comes first; on any error the build
 * prints every problem and stops before Astro starts, so nothing is written. Then Astro builds the site from the
 * Correlary package's own pages, with the content folder handed to the loader through CORRELARY_CONTENT.
 * Exit status: 0 built, 1 errors in the content or a failed build, 2 bad usage.
 */
import { createHash } from 'node:crypto';
import { mkdir, mkdtemp, readdir, rm, stat } from 'node:fs/promises';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { fitHandbook, formatDiagnostic, handbookHistory } from '../load/index.ts';
import { fitCodeVersion, readingCodeVersion } from '../load/fitCodeVersion.ts';
import { offerCheckedHandbook } from '../loaders/checkedHandbook.ts';
import { CliError } from './cliError.ts';
import { createProgress } from './progress.ts';
import { packageRoot } from './packageRoot.ts';

export const BUILD_USAGE = `usage: correlary build [--content DIR] [--out DIR] [--base PATH]
  --content DIR   handbook folder to build (default: content)
  --out DIR       folder the static site is written to (default: dist)
  --base PATH     URL path the site is served under, e.g. /handbook/ (default: basePath in DIR/handbook.yaml, else /)`;

export interface BuildArguments {
  readonly content: string;
  readonly out: string;
  readonly base: string | undefined;
}

/** @example parseBuildArguments(['--out', 'site']) // => { content: 'content', out: 'site', base: undefined } */
export function parseBuildArguments(args: readonly string[]): BuildArguments {
  let parsed;
  try {
    parsed = parseArgs({
      args: [...args],
      allowPositionals: false,
      options: { content: { type: 'string' }, out: { type: 'string' }, base: { type: 'string' } },
    });
  } catch (error) {
    throw new CliError(`${(error as Error).message.split('\n')[0]}\n${BUILD_USAGE}`, 2);
  }
  const { values } = parsed;
  for (const name of ['content', 'out', 'base'] as const) {
    if (values[name] === '') throw new CliError(`--${name} needs a value\n${BUILD_USAGE}`, 2);
  }
  if (values.base !== undefined && !values.base.startsWith('/')) {
    throw new CliError(`--base must be a URL path starting with '/', got '${values.base}'`, 2);
  }
  return { content: values.content ?? 'content', out: values.out ?? 'dist', base: values.base };
}

export async function runBuild(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    console.log(BUILD_USAGE);
    return 0;
  }
  const options = parseBuildArguments(args);
  const info = await stat(options.content).catch(() => undefined);
  if (info === undefined || !info.isDirectory()) throw new CliError(`build requires a handbook folder; '${options.content}' is not a directory`, 2);
  const content = path.resolve(options.content);
  const out = path.resolve(options.out);
  if (out === content || content.startsWith(`${out}${path.sep}`)) {
    throw new CliError(`--out '${options.out}' would overwrite the content folder '${options.content}'; choose another folder`, 2);
  }

  // The check pass: report every problem and stop before anything is written.
  // The check pass fills the fit cache that Astro's loader then reads, so each dataset is fitted once per build.
  // One cache folder per content folder: Astro keeps its data store there, so two builds of different handbooks
  // (or of a test's copy beside the real one) running at the same time must not share it.
  const contentKey = createHash('sha256').update(content).digest('hex').slice(0, 16);
  const cacheDir = path.resolve('node_modules', '.cache', 'correlary', `content-${contentKey}`);
  const fitCache = { directory: path.join(cacheDir, 'correlary-fits'), version: fitCodeVersion(packageRoot()) };
  const progress = createProgress();
  progress.update(`reading ${options.content}`);
  // Read as the content loader names it (relative to the working directory), so that the loader can take this pass
  // instead of making it again (src/loaders/checkedHandbook.ts).
  const directory = path.relative(process.cwd(), content) || '.';
  const folderRecords = { directory: path.join(cacheDir, 'correlary-folders'), version: readingCodeVersion(packageRoot()) };
  const handbook = await fitHandbook(directory, { fitCache, folderRecords, workers: { root: packageRoot() }, prune: true, onFitted: (done, total) => progress.update(`read and fitted ${done} of ${total} correlations`) });
  progress.done();
  const errors = handbook.diagnostics.filter((diagnostic) => diagnostic.severity === 'error');
  if (errors.length > 0) {
    for (const diagnostic of handbook.diagnostics) console.error(formatDiagnostic(diagnostic));
    console.error(`correlary: build stopped before writing anything: ${errors.length} error${errors.length === 1 ? '' : 's'} in ${options.content} (the same as 'correlary check ${options.content}' reports)`);
    return 1;
  }

  const root = packageRoot();
  process.env['ASTRO_TELEMETRY_DISABLED'] = '1';
  process.env['CORRELARY_CONTENT'] = content;
  // Vite lets environment variables named like its import.meta.env keys override them; a BASE_URL left in a shell
  // or CI environment would silently replace --base in every link.
  for (const key of ['BASE_URL', 'SITE', 'ASSETS_PREFIX', 'MODE', 'DEV', 'PROD', 'SSR']) delete process.env[key];
  // With the histories from git made here, where the handbook's paths are relative to, the loader takes this pass even
  // when Astro runs from the staging folder below (src/loaders/checkedHandbook.ts).
  const histories = await handbookHistory(directory, handbook.datasets);
  offerCheckedHandbook({ call: { directory, workingDirectory: process.cwd(), fitCache }, handbook, histories });
  const { build } = await import('astro');
  // Astro 5 stages a build whose output folder lies outside the working directory in <cwd>/.astro, imports the
  // staged pages from there (so Correlary's dependencies must resolve from it) and then copies that whole folder
  // into the output. <cwd>/.astro must therefore not be the package's own .astro folder, which holds Astro's
  // bookkeeping files: such builds run from a staging folder inside the package's node_modules.
  const workingDirectory = process.cwd();
  const outside = !out.startsWith(`${workingDirectory}${path.sep}`);
  let staging: string | undefined;
  if (outside) {
    // A fresh staging folder per build: concurrent builds must not stage into (and copy out of) the same one.
    const stagingParent = path.join(root, 'node_modules', '.cache');
    await mkdir(stagingParent, { recursive: true });
    staging = await mkdtemp(path.join(stagingParent, 'correlary-staging-'));
    process.chdir(staging);
  }
  // On a terminal, count the pages written so far while Astro builds (Astro itself is kept quiet above warnings).
  const pagesTimer = process.stderr.isTTY
    ? setInterval(() => {
        readdir(out, { recursive: true })
          .then((names) => progress.update(`building the site: ${names.filter((name) => name.endsWith('.html')).length} pages written`))
          .catch(() => progress.update('building the site'));
      }, 1000)
    : undefined;
  try {
    await build({
      root,
      outDir: out,
      ...(options.base === undefined ? {} : { base: options.base }),
      logLevel: 'warn',
      // Astro's own cache goes beside the handbook, not into the (possibly shared) package folder.
      cacheDir,
    });
  } finally {
    if (pagesTimer !== undefined) clearInterval(pagesTimer);
    progress.done();
    if (outside) process.chdir(workingDirectory);
    if (staging !== undefined) await rm(staging, { recursive: true, force: true });
  }
  const count = handbook.datasets.filter((dataset) => dataset.fitted?.outcome?.fit ?? dataset.fitted?.fit !== undefined).length;
  const pages = (await readdir(out, { recursive: true })).filter((name) => name.endsWith('.html')).length;
  console.log(`built ${count} correlation${count === 1 ? '' : 's'} from ${options.content} into ${options.out}: ${pages} pages in ${progress.elapsed()} s`);
  return 0;
}
