/**
 * The installable package, end to end as a team would use it: `npm pack` (whose prepack compiles the command line
 * to JavaScript), then in an empty folder `npm init -y && npm i ./correlary-<v>.tgz`, then `npx correlary
 * new|check|fit|build` against a content/ folder there. The install runs with --offline from npm's warm cache
 * (see offlineLock.ts), so the test needs no network; it takes about half a minute, most of it npm installing
 * Astro.
 */
import { execFile } from 'node:child_process';
import { existsSync } from 'node:fs';
import { cp, mkdtemp, readFile, readdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { projectRoot } from '../site/buildSite.ts';
import { offlineLock } from './offlineLock.ts';

const run = promisify(execFile);
let folder = '';
let tarball = '';

/** Run a command in the install folder, with the environment a user's shell would have (no npm_* of this run). */
async function inFolder(command: string, args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  const env = Object.fromEntries(Object.entries(process.env).filter(([key]) => !key.toLowerCase().startsWith('npm_')));
  try {
    const { stdout, stderr } = await run(command, args, { cwd: folder, env: { ...env, ASTRO_TELEMETRY_DISABLED: '1' }, maxBuffer: 16 << 20 });
    return { code: 0, stdout, stderr };
  } catch (error) {
    const failed = error as { code?: number; stdout?: string; stderr?: string };
    return { code: typeof failed.code === 'number' ? failed.code : 1, stdout: failed.stdout ?? '', stderr: failed.stderr ?? '' };
  }
}

beforeAll(async () => {
  folder = await mkdtemp(path.join(tmpdir(), 'correlary-package-'));
  const env = Object.fromEntries(Object.entries(process.env).filter(([key]) => !key.toLowerCase().startsWith('npm_')));
  const packed = await run('npm', ['pack', '--json', '--pack-destination', folder], { cwd: projectRoot, env, maxBuffer: 16 << 20 });
  const [report] = JSON.parse(packed.stdout.slice(packed.stdout.indexOf('['))) as { filename: string }[];
  tarball = path.join(folder, report!.filename);
  expect((await inFolder('npm', ['init', '-y'])).code).toBe(0);
  await writeFile(path.join(folder, 'package-lock.json'), JSON.stringify(await offlineLock(projectRoot, path.basename(folder), tarball), null, 2));
  const install = await inFolder('npm', ['i', '--offline', '--no-audit', '--no-fund', `./${path.basename(tarball)}`]);
  if (install.code !== 0) throw new Error(`npm i of the tarball failed:\n${install.stderr.slice(-3000)}`);
  await cp(path.join(projectRoot, 'test', 'fixtures', 'content', 'valid'), path.join(folder, 'content'), { recursive: true });
}, 240_000);

afterAll(async () => {
  if (folder) await rm(folder, { recursive: true, force: true });
});

describe('npm pack → npm i ./correlary-<v>.tgz in an empty folder', () => {
  it('the installed package runs compiled JavaScript: no TypeScript command sources, no tsx', async () => {
    const installed = path.join(folder, 'node_modules', 'correlary');
    expect(existsSync(path.join(installed, 'lib', 'cli', 'main.js'))).toBe(true);
    expect(existsSync(path.join(installed, 'src', 'cli'))).toBe(false);
    expect(existsSync(path.join(folder, 'node_modules', 'tsx'))).toBe(false);
    const manifest = JSON.parse(await readFile(path.join(installed, 'package.json'), 'utf8'));
    expect(manifest.private).toBeUndefined();
    expect(manifest.bin).toEqual({ correlary: 'bin/correlary.mjs' });
  });

  it('npx correlary new scaffolds a correlation folder', async () => {
    const result = await inFolder('npx', ['--no', 'correlary', 'new', 'liquid-b', '--dir', 'drafts']);
    expect(result.code, result.stderr).toBe(0);
    expect((await readdir(path.join(folder, 'drafts', 'liquid-b'))).sort()).toEqual(['correlation.yaml', 'data.csv']);
  });

  it('npx correlary check and fit --json work on the content folder', async () => {
    const check = await inFolder('npx', ['--no', 'correlary', 'check']);
    expect(check.code, check.stderr).toBe(0);
    expect(check.stdout).toMatch(/checked 1 correlation in content: 0 errors/);
    const fit = await inFolder('npx', ['--no', 'correlary', 'fit', 'content/liquid-a/data.csv', '--json']);
    expect(fit.code, fit.stderr).toBe(0);
    expect(JSON.parse(fit.stdout).n).toBe(8);
  });

  it('npx correlary build --base /handbook/ writes the static site into dist with links under the base', async () => {
    const build = await inFolder('npx', ['--no', 'correlary', 'build', '--base', '/handbook/']);
    expect(build.code, build.stderr).toBe(0);
    const index = await readFile(path.join(folder, 'dist', 'index.html'), 'utf8');
    expect(index).toContain('href="/handbook/correlations/liquid-a/"');
    expect(existsSync(path.join(folder, 'dist', 'correlations', 'liquid-a', 'index.html'))).toBe(true);
    expect(existsSync(path.join(folder, 'dist', 'correlations', 'liquid-a', 'coefficients.json'))).toBe(true);
    // handbook.json carries the coefficients exactly as `correlary fit data.csv --json` prints them for the same data
    // and options (the fixture's metadata names the columns and leaves the order to the default criterion).
    const handbook = JSON.parse(await readFile(path.join(folder, 'dist', 'handbook.json'), 'utf8'));
    const fit = await inFolder('npx', ['--no', 'correlary', 'fit', 'content/liquid-a/data.csv', '--x', 'T', '--y', 'cp', '--json']);
    expect(handbook.correlations[0].url).toBe('/handbook/correlations/liquid-a/');
    expect(handbook.correlations[0].coefficients).toEqual(JSON.parse(fit.stdout).coefficients);
    expect(existsSync(path.join(folder, 'dist', 'handbook.schema.json'))).toBe(true);
    // Nothing of Astro's own bookkeeping leaks into the published folder.
    expect((await readdir(path.join(folder, 'dist'))).filter((name) => name.endsWith('.mjs'))).toEqual([]);
  });
});
