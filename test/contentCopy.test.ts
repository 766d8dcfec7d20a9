/**
 * Adding a correlation to content/ keeps the suite green (issue 12, "Done when"). The project is copied to a
 * temporary folder (its node_modules linked, not copied), one more correlation is added to the copy's content/ (the
 * valid loader fixture, under a new folder name, as a team would add its own), and there
 * - `correlary check content` reports no problem, and
 * - every test file outside test/site that reads the project's content/ is run by vitest and must pass.
 * The files are found by what they read (`fitHandbook('content')`, `path.join('content', …)` and the like), so a
 * test added later that reads content/ is covered too. test/site is not run here: site.test.ts builds its own copy
 * of content/ with one more correlation added (and a settings file), and twoBuilds.test.ts builds a copy.
 */
import { spawnSync } from 'node:child_process';
import { cp, mkdtemp, readdir, readFile, rm, symlink } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const projectRoot = fileURLToPath(new URL('..', import.meta.url));
/** Folder name of the added correlation (not a demo name, so the demo byte-compare leaves it alone). */
const ADDED = 'team-added-liquid';
/** How a test reads the project's own content/ folder (not a fixture or a copy). */
const READS_CONTENT = /(?:fitHandbook|readHandbook|publishedCorrelations)\(\s*'content'\s*\)|path\.join\(\s*'content'\s*,|join\(\s*projectRoot\s*,\s*'content'\s*\)/;
const SKIPPED = new Set(['node_modules', '.git', 'dist', '.astro', 'lib', 'bench-profiles']);

let copy = '';

async function testFiles(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { withFileTypes: true });
  const nested = await Promise.all(
    entries.map((entry) => {
      const full = path.join(dir, entry.name);
      return entry.isDirectory() ? testFiles(full) : Promise.resolve(entry.name.endsWith('.test.ts') ? [full] : []);
    }),
  );
  return nested.flat();
}

/** The test files (relative, '/'-separated) that read content/, test/site and this file left out. */
async function contentReadingTests(): Promise<string[]> {
  const found: string[] = [];
  for (const file of await testFiles(path.join(projectRoot, 'test'))) {
    const relative = path.relative(projectRoot, file).split(path.sep).join('/');
    if (relative.startsWith('test/site/') || relative === 'test/contentCopy.test.ts') continue;
    if (READS_CONTENT.test(await readFile(file, 'utf8'))) found.push(relative);
  }
  return found.sort();
}

/** Environment for a child run: vitest's own variables removed, so the child starts as `npm test` would. */
function childEnv(): NodeJS.ProcessEnv {
  const env: NodeJS.ProcessEnv = { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NO_COLOR: '1' };
  for (const name of Object.keys(env)) if (name.startsWith('VITEST') || ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR', 'TEST', 'NODE_ENV', 'FORCE_COLOR'].includes(name)) delete env[name];
  return env;
}

beforeAll(async () => {
  copy = await mkdtemp(path.join(tmpdir(), 'correlary-copy-'));
  await cp(projectRoot, copy, { recursive: true, filter: (source) => !SKIPPED.has(path.basename(source)) || path.dirname(source) !== projectRoot.replace(/\/$/, '') });
  await symlink(path.join(projectRoot, 'node_modules'), path.join(copy, 'node_modules'), 'dir');
  await cp(path.join(projectRoot, 'test/fixtures/content/valid/liquid-a'), path.join(copy, 'content', ADDED), { recursive: true });
}, 60_000);

afterAll(async () => {
  if (copy) await rm(copy, { recursive: true, force: true });
});

describe('a copy of the project with one more correlation in content/', () => {
  it('finds the tests that read content/ (at least the demo, snippet and evaluator tests)', async () => {
    const files = await contentReadingTests();
    expect(files).toEqual(expect.arrayContaining(['test/load/demo.test.ts', 'test/export/snippets.test.ts']));
  });

  it('correlary check content reports no problem, the added correlation included', () => {
    const run = spawnSync(process.execPath, ['bin/correlary.mjs', 'check', 'content'], { cwd: copy, env: childEnv(), encoding: 'utf8' });
    expect(run.status, `${run.stdout}\n${run.stderr}`).toBe(0);
    expect(`${run.stdout}${run.stderr}`).toContain(ADDED);
  }, 120_000);

  it('every test outside test/site that reads content/ passes there', async () => {
    const files = await contentReadingTests();
    const run = spawnSync(process.execPath, [path.join(projectRoot, 'node_modules/vitest/vitest.mjs'), 'run', ...files], { cwd: copy, env: childEnv(), encoding: 'utf8' });
    const output = `${run.stdout}\n${run.stderr}`;
    expect(run.status, output.slice(-6000)).toBe(0);
    // Every file ran (none skipped as "no test files found").
    expect(output).toMatch(new RegExp(`Test Files\\s+${files.length} passed`));
  }, 300_000);
});
