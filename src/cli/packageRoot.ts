/**
 * The folder Correlary is installed in (the one holding its package.json and the Astro site sources), found by
 * walking up from this module. It works the same from the TypeScript sources (src/cli/) and from the compiled
 * bundle (lib/), whose depths differ.
 */
import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** @example packageRoot() // => '/home/me/handbook/node_modules/correlary' */
export function packageRoot(): string {
  let directory = path.dirname(fileURLToPath(import.meta.url));
  for (;;) {
    const manifest = path.join(directory, 'package.json');
    if (existsSync(manifest) && (JSON.parse(readFileSync(manifest, 'utf8')) as { name?: string }).name === 'correlary') return directory;
    const parent = path.dirname(directory);
    if (parent === directory) throw new Error(`packageRoot requires a correlary package.json above ${fileURLToPath(import.meta.url)}`);
    directory = parent;
  }
}
