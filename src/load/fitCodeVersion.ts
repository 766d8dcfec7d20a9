/**
 * The version of the fitting code, for the fit cache's keys: SHA-256 of the package version and of every source
 * file of the numerical core, of the dataset fit and of the previews stored with it (src/core/**,
 * src/load/fitDataset.ts, src/load/cacheRecord.ts, src/render/**, and the fitting worker's
 * fitCache.ts, its JSON (cacheJson.ts, packedJson.ts, previewsJson.ts) and fitWorker.ts) under the package root,
 * so that a changed core never serves a stale fit, even without a new version number. Where the sources are not
 * present (a compiled install), the package version alone.
 */
import { createHash } from 'node:crypto';
import { readFileSync, readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';

function sourceFiles(folder: string): string[] {
  let names: import('node:fs').Dirent[];
  try {
    names = readdirSync(folder, { withFileTypes: true });
  } catch {
    return [];
  }
  return names
    .flatMap((item) => (item.isDirectory() ? sourceFiles(path.join(folder, item.name)) : /\.(ts|js|mjs)$/.test(item.name) ? [path.join(folder, item.name)] : []))
    .sort();
}

/** The `version` of `<folder>/package.json` as text ("undefined" without one), or "unknown" when it cannot be read. */
function packageVersion(folder: string): string {
  try {
    return String((JSON.parse(readFileSync(path.join(folder, 'package.json'), 'utf8')) as { version?: string }).version);
  } catch {
    return 'unknown';
  }
}

/**
 * @param packageRoot the folder holding package.json and src/
 * @example fitCodeVersion('.').length // => 64
 */
export function fitCodeVersion(packageRoot: string): string {
  const hash = createHash('sha256');
  hash.update(packageVersion(packageRoot));
  const files = [
    ...sourceFiles(path.join(packageRoot, 'src', 'core')),
    ...sourceFiles(path.join(packageRoot, 'src', 'render')),
    path.join(packageRoot, 'src', 'load', 'fitDataset.ts'),
    path.join(packageRoot, 'src', 'load', 'cacheRecord.ts'),
    // what the fitting worker's bundle (src/load/fitPool.ts), named by this version, is made of besides the above
    path.join(packageRoot, 'src', 'load', 'fitCache.ts'),
    path.join(packageRoot, 'src', 'load', 'cacheJson.ts'),
    path.join(packageRoot, 'src', 'load', 'packedJson.ts'),
    path.join(packageRoot, 'src', 'load', 'previewsJson.ts'),
    path.join(packageRoot, 'src', 'load', 'fitWorker.ts'),
  ];
  for (const file of files) {
    try {
      hash.update(path.relative(packageRoot, file)).update('\0').update(readFileSync(file)).update('\0');
    } catch {
      // not shipped: the package version stands for it
    }
  }
  return hash.digest('hex');
}

/**
 * A version of the code that turns cached fits into published files (src/components/lib, src/export, src/render,
 * src/loaders/correlationFolder.ts and what fitCodeVersion covers): SHA-256 of `fitVersion` and of those source files, so that files written by an
 * older code are rewritten. Where the sources are not present, `fitVersion` alone.
 * @example filesCodeVersion('.', fitCodeVersion('.')).length // => 64
 */
export function filesCodeVersion(packageRoot: string, fitVersion: string): string {
  const hash = createHash('sha256').update(fitVersion);
  const files = [
    ...['components/lib', 'export', 'render'].flatMap((folder) => sourceFiles(path.join(packageRoot, 'src', folder))),
    // what decides which files a folder holds and what goes into its page parts
    path.join(packageRoot, 'src', 'loaders', 'correlationFolder.ts'),
  ];
  for (const file of files) {
    try {
      hash.update(path.relative(packageRoot, file)).update('\0').update(readFileSync(file)).update('\0');
    } catch {
      // not shipped: the fitting code's version stands for it
    }
  }
  return hash.digest('hex');
}

/**
 * A version of every script source under `<packageRoot>/src` and of package.json: names a worker's bundle, which
 * may be made of any of them. Where the sources are not present, package.json alone.
 * @example sourcesVersion('.').length // => 64
 */
export function sourcesVersion(packageRoot: string): string {
  const hash = createHash('sha256');
  for (const file of [path.join(packageRoot, 'package.json'), ...sourceFiles(path.join(packageRoot, 'src'))]) {
    try {
      hash.update(path.relative(packageRoot, file)).update('\0').update(readFileSync(file)).update('\0');
    } catch {
      // not shipped
    }
  }
  return hash.digest('hex');
}

/** The version of an installed package as found from `packageRoot`, or "unknown". */
function installedVersion(packageRoot: string, name: string): string {
  try {
    // The package's entry point, then up to the folder named after it (its package.json need not be exported).
    let folder = path.dirname(createRequire(path.join(packageRoot, 'package.json')).resolve(name));
    while (path.basename(folder) !== name && path.dirname(folder) !== folder) folder = path.dirname(folder);
    return packageVersion(folder);
  } catch {
    return 'unknown';
  }
}

/**
 * The version of the code that reads and validates a correlation folder, for the folder records
 * (src/load/folderRecord.ts): SHA-256 of the package version, of every source file under src/load, src/schema and
 * src/core (what reading, validating and the review trail run), of the installed versions of the parsers and the
 * validator they use (yaml, csv-parse, zod) and of the JavaScript engine (records are written with node:v8's
 * serializer). A change to any of them makes every folder be read afresh.
 * @example readingCodeVersion('.').length // => 64
 */
export function readingCodeVersion(packageRoot: string): string {
  const hash = createHash('sha256');
  hash.update(packageVersion(packageRoot));
  hash.update('\0').update(`node ${process.version} v8 ${process.versions.v8}`);
  for (const name of ['yaml', 'csv-parse', 'zod']) hash.update('\0').update(`${name}@${installedVersion(packageRoot, name)}`);
  for (const file of ['load', 'schema', 'core'].flatMap((folder) => sourceFiles(path.join(packageRoot, 'src', folder)))) {
    try {
      hash.update(path.relative(packageRoot, file)).update('\0').update(readFileSync(file)).update('\0');
    } catch {
      // not shipped: the package version stands for it
    }
  }
  return hash.digest('hex');
}
