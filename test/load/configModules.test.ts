/**
 * configModules (src/loaders/configModules.mjs): plain Node, with no TypeScript loader and no Vite, imports
 * astro.config.mjs, whose Correlary modules come from one bundle of src/loaders/configDoor.ts. Were any TypeScript
 * file imported on the way, Node would refuse it (Astro would then fall back to Vite's module runner, which
 * transforms every file behind the loaders: the cost this avoids), and this test would fail.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import * as door from '../../src/loaders/configDoor.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));

/** Run an ES module script in plain Node from the project root; its stdout parsed as JSON. */
function inPlainNode(script: string, env: Record<string, string> = {}): unknown {
  const environment: Record<string, string | undefined> = { ...process.env, ...env };
  // vitest puts Vite's BASE_URL, MODE, DEV, PROD and SSR into process.env; Astro's configuration must not see them.
  for (const name of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'NODE_OPTIONS']) delete environment[name];
  return JSON.parse(execFileSync(process.execPath, ['--input-type=module', '-e', script], { cwd: root, env: environment, encoding: 'utf8' }));
}

describe('configModules()', () => {
  it('plain Node imports astro.config.mjs: the site and base path of the content folder\'s settings, its integrations', () => {
    const content = mkdtempSync(path.join(tmpdir(), 'correlary-config-'));
    try {
      writeFileSync(path.join(content, 'handbook.yaml'), 'title: Test handbook\nurl: https://handbook.example.org\nbasePath: /thermal/\n');
      const config = inPlainNode(
        "const config = (await import('./astro.config.mjs')).default; console.log(JSON.stringify({ site: config.site, base: config.base, integrations: config.integrations.map((integration) => integration.name) }));",
        { CORRELARY_CONTENT: content },
      );
      // The settings file written above, as astro.config.mjs passes it on (computed by hand).
      expect(config).toEqual({ site: 'https://handbook.example.org', base: '/thermal/', integrations: ['correlary-correlation-files', 'correlary-data-store-module', 'correlary-core-bundle', 'correlary-client-scripts', 'correlary-attribute-escaping'] });
    } finally {
      rmSync(content, { recursive: true, force: true });
    }
  });

  it('gives every module of configDoor.ts, from a bundle named by the sources, and the same instance twice', () => {
    const answer = inPlainNode(
      [
        "const { configModules } = await import('./src/loaders/configModules.mjs');",
        'const [first, second] = await Promise.all([configModules(), configModules()]);',
        "const { readdirSync } = await import('node:fs');",
        "console.log(JSON.stringify({ names: Object.keys(first).sort(), same: first === second, bundles: readdirSync('node_modules/.cache/correlary/config').filter((name) => name.endsWith('.mjs')) }));",
      ].join('\n'),
    ) as { names: string[]; same: boolean; bundles: string[] };
    expect(answer.names).toEqual(Object.keys(door).sort());
    expect(answer.same).toBe(true);
    // One bundle per version of the sources (older ones are deleted when a new one is made), no temporary file left.
    expect(answer.bundles.length).toBeGreaterThan(0);
    for (const name of answer.bundles) expect(name).toMatch(/^config-[0-9a-f]{16}\.mjs$/);
  });
});
