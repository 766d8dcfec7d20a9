/**
 * The two projects bench:build builds, each in its own temporary folder with the repository's node_modules
 * linked in: the handbook site (a copy of src/, public/ and the Astro configuration, with a synthetic content/)
 * and a bare Astro site of N trivial pages, the baseline. Both keep Astro's cache inside the temporary folder.
 */
import { cp, mkdir, symlink, writeFile } from 'node:fs/promises';
import path from 'node:path';

/** The handbook project; content/ is left for the caller to fill. */
export async function makeSiteProject(repository: string, folder: string): Promise<void> {
  await mkdir(folder, { recursive: true });
  for (const item of ['src', 'public']) await cp(path.join(repository, item), path.join(folder, item), { recursive: true });
  for (const item of ['package.json', 'tsconfig.json']) await cp(path.join(repository, item), path.join(folder, item));
  await cp(path.join(repository, 'astro.config.mjs'), path.join(folder, 'astro.base.mjs'));
  await writeFile(
    path.join(folder, 'astro.config.mjs'),
    "import base from './astro.base.mjs';\nexport default { ...base, cacheDir: './.bench-cache' };\n",
  );
  await symlink(path.join(repository, 'node_modules'), path.join(folder, 'node_modules'), 'dir');
  await mkdir(path.join(folder, 'content'), { recursive: true });
}

/** A bare Astro site with `count` trivial pages from one dynamic route. */
export async function makeBareProject(repository: string, folder: string, count: number): Promise<void> {
  await mkdir(path.join(folder, 'src', 'pages'), { recursive: true });
  await writeFile(path.join(folder, 'package.json'), '{ "name": "bare-bench", "private": true, "type": "module" }\n');
  await writeFile(path.join(folder, 'astro.config.mjs'), "export default { cacheDir: './.bench-cache' };\n");
  await writeFile(
    path.join(folder, 'src', 'pages', '[n].astro'),
    [
      '---',
      `export function getStaticPaths() { return Array.from({ length: ${count} }, (_, i) => ({ params: { n: String(i) } })); }`,
      'const { n } = Astro.params;',
      '---',
      '<html lang="en"><head><meta charset="utf-8"><title>Page {n}</title></head><body><h1>Page {n}</h1><p>A trivial page.</p></body></html>',
      '',
    ].join('\n'),
  );
  await symlink(path.join(repository, 'node_modules'), path.join(folder, 'node_modules'), 'dir');
}
