/**
 * dataStoreIntegration: in a build, Astro's data store module becomes `export default JSON.parse("…")` of the
 * store file. The check is independent of the rewrite: the module, evaluated by Node, must hold exactly what
 * JSON.parse gives for the file (the array Astro's own module spells out as a literal; see
 * astro/dist/content/vite-plugin-content-virtual-mod.js, which builds it from JSON.parse of the same file).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { completeStoreFile, dataStoreIntegration, dataStoreModule } from '../../src/loaders/dataStoreIntegration.ts';
import { missingDigests, rememberStoredCorrelations, resaveInOrder } from '../../src/loaders/storedCorrelations.ts';

const cacheDir = mkdtempSync(path.join(tmpdir(), 'correlary-data-store-'));
afterAll(() => rmSync(cacheDir, { recursive: true, force: true }));

/** A store file as Astro writes it (devalue's flattened form), with text that is awkward inside JavaScript. */
const store = JSON.stringify([
  ['Map', 1, 2],
  'correlations',
  ['Map', 3, 4],
  'water-cp',
  { id: 3, data: 5 },
  { title: 'Quotes " \' ` ${x} \\ </script> \u2028 \u2029 \u0000 é 𝜌', values: [0.1, -0, 1e-300, 12345678901234567890], nested: { empty: '', deeper: [null, true, false] } },
]);

async function evaluate(code: string): Promise<unknown> {
  const file = path.join(cacheDir, `module-${Math.random().toString(36).slice(2)}.mjs`);
  writeFileSync(file, code);
  return ((await import(pathToFileURL(file).href)) as { default: unknown }).default;
}

type Hooks = { 'astro:config:setup': (options: unknown) => void };
type Plugin = { name: string; transform: (code: string, id: string) => Promise<{ code: string } | null> };

describe('dataStoreIntegration()', () => {
  it('dataStoreModule evaluates to exactly what JSON.parse gives for the store file', async () => {
    expect(await evaluate(dataStoreModule(store))).toStrictEqual(JSON.parse(store));
  });

  it('dataStoreModule refuses a store file that is not JSON', () => {
    expect(() => dataStoreModule('[1, 2')).toThrow(SyntaxError);
  });

  it('in a build, rewrites only the data store module, from the store file in the cache folder; in dev, nothing', async () => {
    writeFileSync(path.join(cacheDir, 'data-store.json'), store);
    rememberStoredCorrelations({ digests: [], resave: () => undefined });
    const plugins: Plugin[] = [];
    const setup = (dataStoreIntegration().hooks as unknown as Hooks)['astro:config:setup'];
    const config = { cacheDir: pathToFileURL(`${cacheDir}/`) };
    setup({ command: 'dev', config, updateConfig: (update: { vite: { plugins: Plugin[] } }) => plugins.push(...update.vite.plugins) });
    expect(plugins).toHaveLength(0);
    setup({ command: 'build', config, updateConfig: (update: { vite: { plugins: Plugin[] } }) => plugins.push(...update.vite.plugins) });
    expect(plugins).toHaveLength(1);
    const plugin = plugins[0]!;
    expect(await plugin.transform('export default 1', '/src/pages/index.astro')).toBeNull();
    const rewritten = await plugin.transform('export default [/* Astro spells the store out here */]', '\0astro:data-layer-content');
    expect(await evaluate(rewritten!.code)).toStrictEqual(JSON.parse(store));
  });

  // Astro 5.18 can keep an earlier store in the file when two saves overlap (src/loaders/storedCorrelations.ts).
  it('missingDigests counts the stored entries whose digest the store file does not hold', () => {
    const text = JSON.stringify([['Map', 1], 'correlations', { digest: 3 }, '0f1e2d3c4b5a6978']);
    expect(missingDigests(text, ['0f1e2d3c4b5a6978'])).toBe(0);
    expect(missingDigests(text, ['0f1e2d3c4b5a6978', 'ffffffffffffffff', '0f1e2d3c'])).toBe(2);
    // A digest that occurs only inside another string, or a text that is not a store, does not count as held.
    expect(missingDigests(JSON.stringify([['Map', 1], 'x 0f1e2d3c4b5a6978 y']), ['0f1e2d3c4b5a6978'])).toBe(1);
    expect(missingDigests('[["Map",1],"0f1e2d3c4b5a6978"', ['0f1e2d3c4b5a6978'])).toBe(1);
  });

  it('resaveInOrder makes the store change (so Astro saves it) and keeps its entries in the order they were stored', () => {
    // A store with Astro 5.18's rules (mutable-data-store.js): insertion order; a set of an entry held with the same
    // digest changes nothing and asks for no save.
    const entries = new Map<string, { id: string; digest: string }>();
    let saves = 0;
    const store = {
      delete: (id: string) => {
        if (entries.delete(id)) saves++;
      },
      set: (entry: { id: string; digest: string }) => {
        if (entries.get(entry.id)?.digest === entry.digest) return false;
        entries.set(entry.id, entry);
        saves++;
        return true;
      },
    };
    const stored = ['b-two', 'a-one', 'c-three'].map((id, i) => ({ id, digest: `d${i}` }));
    for (const entry of stored) store.set(entry);
    saves = 0;
    store.set(stored[0]!); // putting back an unchanged entry is no change: Astro would not save
    expect(saves).toBe(0);
    resaveInOrder(store, stored);
    expect(saves).toBeGreaterThan(0);
    expect([...entries.keys()]).toEqual(['b-two', 'a-one', 'c-three']);
  });

  it('a store file that lacks entries the loader stored is saved again by Astro before it is bundled, or stops the build', async () => {
    const file = path.join(cacheDir, 'stale-store.json');
    const stale = JSON.stringify([['Map', 1], 'correlations', 'aaaaaaaaaaaaaaaa']);
    const complete = JSON.stringify([['Map', 1], 'correlations', 'aaaaaaaaaaaaaaaa', 'bbbbbbbbbbbbbbbb']);
    writeFileSync(file, stale);
    let resaved = 0;
    // Astro's second save writes what it holds in memory, half a second later.
    rememberStoredCorrelations({ digests: ['aaaaaaaaaaaaaaaa', 'bbbbbbbbbbbbbbbb'], resave: () => { resaved++; setTimeout(() => writeFileSync(file, complete), 200); } });
    expect(await completeStoreFile(file, stale)).toBe(complete);
    expect(resaved).toBe(1);
    // A file that holds them all is taken as it is.
    expect(await completeStoreFile(file, complete)).toBe(complete);
    expect(resaved).toBe(1);
    // A save that never comes: the build stops, naming the file and what it lacks.
    writeFileSync(file, stale);
    rememberStoredCorrelations({ digests: ['aaaaaaaaaaaaaaaa', 'bbbbbbbbbbbbbbbb'], resave: () => undefined });
    await expect(completeStoreFile(file, stale, 300)).rejects.toThrow(/lacks 1 of the 2 correlations read in this build/);
  });
});
