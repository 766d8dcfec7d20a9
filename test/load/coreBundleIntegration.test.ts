/**
 * coreBundleIntegration: in a build's server environment the core's door (src/core/index.ts) resolves to one
 * esbuild bundle of the core, which exports every function of the door; the browser build and other files are left
 * to Rollup, and `astro dev` gets no plugin at all.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import * as core from '../../src/core/index.ts';
import { coreBundleIntegration } from '../../src/loaders/coreBundleIntegration.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));
const cache = mkdtempSync(path.join(tmpdir(), 'correlary-core-bundle-'));
afterAll(() => rmSync(cache, { recursive: true, force: true }));

type Resolve = (this: { environment?: { name: string } }, source: string, importer: string | undefined) => Promise<{ id: string; external: boolean } | null>;
type Setup = (options: { command: string; config: { root: URL; cacheDir: URL }; updateConfig: (update: { vite: { plugins: { resolveId: Resolve }[] } }) => void }) => void;

/** The plugin the integration adds for `command`, or undefined when it adds none. */
function pluginFor(command: string): { resolveId: Resolve } | undefined {
  let plugin: { resolveId: Resolve } | undefined;
  const setup = (coreBundleIntegration().hooks as unknown as { 'astro:config:setup': Setup })['astro:config:setup'];
  setup({ command, config: { root: pathToFileURL(`${root}/`), cacheDir: pathToFileURL(`${cache}/`) }, updateConfig: (update) => (plugin = update.vite.plugins[0]) });
  return plugin;
}

describe('coreBundleIntegration()', () => {
  it("resolves the core's door in the server build to a bundle that exports every function of the door", async () => {
    const plugin = pluginFor('build')!;
    const importer = path.join(root, 'src', 'components', 'lib', 'entryView.ts');
    const resolved = await plugin.resolveId.call({ environment: { name: 'ssr' } }, '../../core/index.ts', importer);
    expect(resolved?.external).toBe(true);
    const bundled = (await import(resolved!.id)) as Record<string, unknown>;
    expect(Object.keys(bundled).sort()).toEqual(Object.keys(core).sort());
    // And it runs: 0.991113 to four significant digits is 0.9911 (computed by hand).
    expect((bundled['formatNumber'] as typeof core.formatNumber)(0.991113, 4)).toBe('0.9911');
  });

  it('leaves the browser build, other modules and astro dev alone', async () => {
    const plugin = pluginFor('build')!;
    const importer = path.join(root, 'src', 'client', 'fitChart.ts');
    expect(await plugin.resolveId.call({ environment: { name: 'client' } }, '../core/index.ts', path.join(root, 'src', 'render', 'x.ts'))).toBeNull();
    expect(await plugin.resolveId.call({ environment: { name: 'ssr' } }, '../core/browser.ts', importer)).toBeNull();
    expect(await plugin.resolveId.call({ environment: { name: 'ssr' } }, './index.ts', path.join(root, 'src', 'export', 'x.ts'))).toBeNull();
    expect(pluginFor('dev')).toBeUndefined();
  });
});
