/**
 * Build the handbook once into a temporary directory, as `correlary build --out <tmp>` (the check pass, then
 * Astro) in a child process (a separate process keeps Astro's Vite out of vitest's own). Returns the output
 * directory.
 */
import { spawn } from 'node:child_process';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = fileURLToPath(new URL('../..', import.meta.url));

export async function buildSite(): Promise<string> {
  const outDir = await mkdtemp(path.join(tmpdir(), 'correlary-site-'));
  const correlary = path.join(projectRoot, 'bin', 'correlary.mjs');
  const output: string[] = [];
  const code = await new Promise<number | null>((resolve, reject) => {
    const child = spawn(process.execPath, [correlary, 'build', '--out', outDir], {
      cwd: projectRoot,
      env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NODE_ENV: 'production' },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    child.stdout.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.on('error', reject);
    child.on('close', resolve);
  });
  if (code !== 0) throw new Error(`correlary build failed with exit code ${code}:\n${output.join('').slice(-4000)}`);
  return outDir;
}
