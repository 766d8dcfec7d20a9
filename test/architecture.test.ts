/**
 * Layering rules (DEVELOPERS.md): the numerical core is pure (no Astro, no Node built-ins, no DOM, no file I/O)
 * and the schemas import only zod; the chart renderer (src/render) is pure too: d3-scale, d3-shape and the core's door
 * only, so that it runs in the CLI, at build time and in the browser alike. A file that breaks the rule fails here
 * with its import named. Browser code reaches the core only through src/core/browser.ts, a door to its
 * dependency-free evaluation (the full door would bundle the fitting code and the distributions).
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('..', import.meta.url));

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sourceFiles(path) : /\.(ts|mts|js)$/.test(name) ? [path] : [];
  });
}

function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(/(?:import|export)[^'"]*?from\s*['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g)].map((m) => (m[1] ?? m[2])!);
}

const DOM_GLOBALS = /\b(document|window|navigator|localStorage|HTMLElement)\s*[.[]/;

describe('architecture', () => {
  it('src/core imports only relative modules, ml-matrix and @stdlib, and touches no DOM global', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(join(root, 'src/core'))) {
      for (const spec of importsOf(file)) {
        if (!(spec.startsWith('.') || spec === 'ml-matrix' || spec.startsWith('@stdlib/'))) offenders.push(`${relative(root, file)} imports ${spec}`);
      }
      if (DOM_GLOBALS.test(readFileSync(file, 'utf8'))) offenders.push(`${relative(root, file)} uses a DOM global`);
    }
    expect(offenders).toEqual([]);
  });

  it('src/schema imports only zod and its own files', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(join(root, 'src/schema'))) {
      for (const spec of importsOf(file)) {
        if (!(spec.startsWith('.') || spec === 'zod')) offenders.push(`${relative(root, file)} imports ${spec}`);
      }
    }
    expect(offenders).toEqual([]);
  });

  it('src/render imports only d3-scale, d3-shape, the core through its door and its own files, and touches no DOM global', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(join(root, 'src/render'))) {
      for (const spec of importsOf(file)) {
        if (!(spec.startsWith('./') || spec === '../core/index.ts' || spec === 'd3-scale' || spec === 'd3-shape')) offenders.push(`${relative(root, file)} imports ${spec}`);
      }
      if (DOM_GLOBALS.test(readFileSync(file, 'utf8'))) offenders.push(`${relative(root, file)} uses a DOM global`);
    }
    expect(offenders).toEqual([]);
  });

  it('src/export is pure: it imports only src/core, src/schema and its own files (no node:*, no Astro, no I/O)', () => {
    const offenders: string[] = [];
    const allowed = ['src/core', 'src/schema', 'src/export'].map((folder) => join(root, folder));
    for (const file of sourceFiles(join(root, 'src/export'))) {
      for (const spec of importsOf(file)) {
        const target = spec.startsWith('.') ? resolve(dirname(file), spec) : undefined;
        if (target === undefined || !allowed.some((folder) => target.startsWith(folder))) offenders.push(`${relative(root, file)} imports ${spec}`);
      }
      if (DOM_GLOBALS.test(readFileSync(file, 'utf8'))) offenders.push(`${relative(root, file)} uses a DOM global`);
    }
    expect(offenders).toEqual([]);
  });

  it('src/client reaches src/core only through its browser door, src/core/browser.ts, whose every file imports no package', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(join(root, 'src/client'))) {
      for (const spec of importsOf(file)) {
        if (spec.includes('core/') && spec !== '../core/browser.ts') offenders.push(`${relative(root, file)} imports ${spec}`);
      }
    }
    // Every file the browser door reaches, followed through relative imports: no ml-matrix, no @stdlib.
    const seen = new Set<string>();
    const pending = [join(root, 'src/core/browser.ts')];
    while (pending.length > 0) {
      const file = pending.pop()!;
      if (seen.has(file)) continue;
      seen.add(file);
      for (const spec of importsOf(file)) {
        if (spec.startsWith('.')) pending.push(resolve(dirname(file), spec));
        else offenders.push(`${relative(root, file)} (reached from src/core/browser.ts) imports ${spec}`);
      }
    }
    expect(seen.size).toBeGreaterThan(3);
    expect(offenders).toEqual([]);
  });

  it('astro.config.mjs and src/content.config.ts reach src/ only through src/loaders/configModules.mjs, which imports no TypeScript file statically', () => {
    // Node imports astro.config.mjs itself only when no TypeScript file is on the way; otherwise Astro loads it
    // through Vite's module runner, which transforms every file behind the loaders (configModules.mjs says why).
    const offenders: string[] = [];
    const files = { 'astro.config.mjs': './src/loaders/configModules.mjs', 'src/content.config.ts': './loaders/configModules.mjs' };
    for (const [file, door] of Object.entries(files)) {
      for (const spec of importsOf(join(root, file))) {
        if (spec.startsWith('.') && spec !== door) offenders.push(`${file} imports ${spec}`);
      }
    }
    const text = readFileSync(join(root, 'src/loaders/configModules.mjs'), 'utf8');
    for (const match of text.matchAll(/^import[^'"]*['"]([^'"]+)['"]/gm)) {
      if (!match[1]!.startsWith('node:')) offenders.push(`src/loaders/configModules.mjs imports ${match[1]}`);
    }
    expect(offenders).toEqual([]);
  });

  it('src/client reaches src/render only through files that do not import the core', () => {
    const offenders: string[] = [];
    for (const file of sourceFiles(join(root, 'src/client'))) {
      for (const spec of importsOf(file)) {
        if (!spec.startsWith('../render/')) continue;
        const target = join(root, 'src/render', spec.slice('../render/'.length));
        if (spec.endsWith('/index.ts') || importsOf(target).some((inner) => inner.includes('core'))) offenders.push(`${relative(root, file)} imports ${spec}`);
      }
    }
    expect(offenders).toEqual([]);
  });

  it('no Astro file has a script Astro would bundle: page scripts are entries of src/client/entries/ (clientScript.ts)', () => {
    // A bare <script> makes Astro run a client build again (0.6–0.8 s of every build, clientScriptsIntegration.ts).
    const astroFiles = (dir: string): string[] =>
      readdirSync(dir).flatMap((name) => {
        const path = join(dir, name);
        return statSync(path).isDirectory() ? astroFiles(path) : name.endsWith('.astro') ? [path] : [];
      });
    const offenders: string[] = [];
    const withScripts = new Set<string>();
    for (const file of astroFiles(join(root, 'src'))) {
      for (const match of readFileSync(file, 'utf8').matchAll(/<script\b[^>]*>/g)) {
        withScripts.add(relative(root, file));
        if (!/\bis:inline\b/.test(match[0]) && !/type="application\/json"/.test(match[0])) offenders.push(`${relative(root, file)}: ${match[0]}`);
      }
    }
    // The scan sees the page scripts' one tag and the components' JSON data tags.
    expect([...withScripts].sort()).toEqual(expect.arrayContaining(['src/components/Equation.astro', 'src/components/FitChart.astro', 'src/components/OrderPreview.astro', 'src/components/PageScript.astro']));
    expect(offenders).toEqual([]);
  });
});
