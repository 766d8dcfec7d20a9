/**
 * A package-lock.json for a fresh folder that installs the packed Correlary tarball, built from the repository's
 * own lock (its non-development entries, at the same versions). With it, `npm i ./correlary-<v>.tgz --offline`
 * needs nothing beyond the tarballs that `npm ci` of the repository already put in npm's cache: without a lock,
 * npm must fetch each dependency's registry metadata, which `npm ci` does not cache.
 */
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import path from 'node:path';

interface LockEntry {
  readonly dev?: boolean;
  readonly devOptional?: boolean;
  readonly [key: string]: unknown;
}

/** @example await offlineLock('/repo', 'my-handbook', '/tmp/x/correlary-0.1.0.tgz') // => { lockfileVersion: 3, … } */
export async function offlineLock(projectRoot: string, folderName: string, tarball: string): Promise<object> {
  const manifest = JSON.parse(await readFile(path.join(projectRoot, 'package.json'), 'utf8'));
  const lock = JSON.parse(await readFile(path.join(projectRoot, 'package-lock.json'), 'utf8')) as { packages: Record<string, LockEntry> };
  const integrity = `sha512-${createHash('sha512').update(await readFile(tarball)).digest('base64')}`;
  const file = `file:${path.basename(tarball)}`;
  const packages: Record<string, object> = {
    '': { name: folderName, version: '1.0.0', license: 'ISC', dependencies: { correlary: file } },
    'node_modules/correlary': {
      version: manifest.version,
      resolved: file,
      integrity,
      dependencies: manifest.dependencies,
      bin: manifest.bin,
      engines: manifest.engines,
    },
  };
  for (const [key, entry] of Object.entries(lock.packages)) {
    if (key === '' || entry.dev === true || entry.devOptional === true) continue;
    packages[key] = entry;
  }
  return { name: folderName, version: '1.0.0', lockfileVersion: 3, requires: true, packages };
}
