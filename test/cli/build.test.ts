/**
 * `correlary build`: argument handling and the check pass that runs before Astro. The full build of the demo
 * handbook through this command is exercised by test/site (buildSite.ts) and, from an installed tarball, by
 * test/package.
 */
import { existsSync } from 'node:fs';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { parseBuildArguments } from '../../src/cli/build.ts';
import { runCli } from '../helpers/runCli.ts';

const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

describe('parseBuildArguments(args)', () => {
  it('parseBuildArguments defaults to content → dist at the site root', () => {
    expect(parseBuildArguments([])).toEqual({ content: 'content', out: 'dist', base: undefined });
  });

  it('parseBuildArguments reads --content, --out and --base in both spellings', () => {
    expect(parseBuildArguments(['--content', 'handbook', '--out=site', '--base', '/team/handbook/'])).toEqual({
      content: 'handbook',
      out: 'site',
      base: '/team/handbook/',
    });
  });
});

describe('correlary build', () => {
  it('correlary build refuses a base that is not a URL path, an unknown option and a missing folder with status 2', async () => {
    const base = await runCli(['build', '--base', 'handbook']);
    expect(base.code).toBe(2);
    expect(base.stderr).toBe("correlary: --base must be a URL path starting with '/', got 'handbook'");
    const unknown = await runCli(['build', '--watch']);
    expect(unknown.code).toBe(2);
    expect(unknown.stderr).toMatch(/^correlary: Unknown option '--watch'/);
    const missing = await runCli(['build', '--content', 'no-such-folder']);
    expect(missing.code).toBe(2);
    expect(missing.stderr).toBe("correlary: build requires a handbook folder; 'no-such-folder' is not a directory");
  });

  it('correlary build refuses an output folder that holds the content', async () => {
    const result = await runCli(['build', '--content', 'test/fixtures/content/valid', '--out', 'test/fixtures/content']);
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/would overwrite the content folder/);
  });

  it('correlary build stops before writing anything when check reports an error, and prints every problem', async () => {
    const scratch = await mkdtemp(path.join(tmpdir(), 'correlary-build-'));
    temporary.push(scratch);
    const out = path.join(scratch, 'site');
    const check = await runCli(['check', 'test/fixtures/content/bad-values']);
    const result = await runCli(['build', '--content', 'test/fixtures/content/bad-values', '--out', out]);
    expect(check.code).toBe(1);
    expect(result.code).toBe(1);
    // The same problems `check` prints, then one line saying nothing was written.
    const problems = check.stdout.split('\n').filter((line) => line.startsWith('test/fixtures/'));
    expect(problems.length).toBeGreaterThan(0);
    expect(result.stderr.split('\n').slice(0, -1)).toEqual(problems);
    expect(result.stderr.split('\n').at(-1)).toMatch(/^correlary: build stopped before writing anything: \d+ errors? in test\/fixtures\/content\/bad-values/);
    expect(existsSync(out)).toBe(false);
  });
});

describe('correlary fit --plot', () => {
  it('correlary fit <folder> --plot FILE.svg writes the static picture with the cautions, and refuses a name without .svg', async () => {
    const scratch = await mkdtemp(path.join(tmpdir(), 'correlary-plot-'));
    temporary.push(scratch);
    const file = path.join(scratch, 'fit.svg');
    const result = await runCli(['fit', 'test/fixtures/content/valid/liquid-a', '--plot', file]);
    expect(result.code, result.stderr).toBe(0);
    const svg = await readFile(file, 'utf8');
    expect(svg.startsWith('<svg')).toBe(true);
    expect(svg).toContain('<title id="fit-svg-title">Specific heat of test liquid A: data, fitted curve and bands; residuals below</title>');
    expect(svg).toMatch(/<desc>Cautions: Valid only for 280 K ≤ temperature ≤ 350 K .*qualified engineer\.<\/desc>/);
    // Curve, bands and points are paths drawn by the shared renderer (src/render, also behind the pages' plot.svg).
    expect(svg.match(/<path/g)?.length ?? 0).toBeGreaterThan(3);
    const wrong = await runCli(['fit', 'test/fixtures/content/valid/liquid-a', '--plot', path.join(scratch, 'fit.png')]);
    expect(wrong.code).toBe(2);
    expect(wrong.stderr).toMatch(/--plot needs a file name ending in \.svg/);
  });
});
