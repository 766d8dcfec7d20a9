/**
 * `npm ci` on the running Node (20 here and in CI, the README's Node) prints no EBADENGINE warning (issue 12).
 * npm itself is asked: `npm ci --dry-run --offline` in a folder holding only package.json and package-lock.json
 * resolves the locked tree, checks every package's `engines` against this Node exactly as a real install does,
 * and installs nothing (about two seconds, no network). A control run on a copy of the lock in which one package
 * asks for a newer Node than this one must print the warning, so the check is shown to be able to fail.
 */
import { spawnSync } from 'node:child_process';
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';

const projectRoot = fileURLToPath(new URL('../..', import.meta.url));
const folders: string[] = [];

/** npm ci --dry-run on the project's package.json and a lock (the project's, or changed by `edit`); its output. */
async function dryRunCi(edit?: (lock: { packages: Record<string, { engines?: Record<string, string> }> }) => void): Promise<{ status: number | null; output: string }> {
  const folder = await mkdtemp(path.join(tmpdir(), 'correlary-engines-'));
  folders.push(folder);
  await cp(path.join(projectRoot, 'package.json'), path.join(folder, 'package.json'));
  const lock = JSON.parse(await readFile(path.join(projectRoot, 'package-lock.json'), 'utf8'));
  edit?.(lock);
  await writeFile(path.join(folder, 'package-lock.json'), JSON.stringify(lock, null, 2));
  const run = spawnSync('npm', ['ci', '--dry-run', '--offline', '--ignore-scripts', '--no-audit', '--no-fund'], {
    cwd: folder,
    encoding: 'utf8',
    env: { ...process.env, NO_COLOR: '1', npm_config_loglevel: 'warn' },
  });
  return { status: run.status, output: `${run.stdout}\n${run.stderr}` };
}

afterAll(async () => {
  for (const folder of folders) await rm(folder, { recursive: true, force: true });
});

describe(`npm ci on Node ${process.versions.node}`, () => {
  it('npm ci --dry-run --offline on the lock file prints no EBADENGINE warning', async () => {
    const run = await dryRunCi();
    expect(run.status, run.output.slice(-3000)).toBe(0);
    expect(run.output).toMatch(/added \d+ packages/);
    expect(run.output.match(/EBADENGINE.*package: '[^']+'/g) ?? [], run.output.slice(-3000)).toEqual([]);
    expect(run.output).not.toContain('EBADENGINE');
  }, 120_000);

  it('the same check warns when one locked package asks for a newer Node (control)', async () => {
    const newer = `>=${Number(process.versions.node.split('.')[0]) + 1}`;
    const run = await dryRunCi((lock) => {
      lock.packages['node_modules/zod']!.engines = { node: newer };
    });
    expect(run.output).toContain('EBADENGINE');
    expect(run.output).toContain("package: 'zod@");
  }, 120_000);
});
