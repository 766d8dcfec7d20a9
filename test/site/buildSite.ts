/**
 * Build a handbook as `correlary build --content <dir> --out <dir>` (the check pass, then Astro) in a child process
 * (a separate process keeps Astro's Vite out of vitest's own). By default the project's own content/ is built into
 * a new temporary directory. Returns the output directory.
 */
import { spawn } from 'node:child_process';
import { mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const projectRoot = fileURLToPath(new URL('../..', import.meta.url));

export interface BuildOptions {
  /** Content directory to build (absolute); defaults to the project's content/. */
  readonly content?: string;
  /** Output directory; defaults to a new temporary directory. */
  readonly outDir?: string;
  /** Further environment variables, e.g. CORRELARY_BASE. */
  readonly env?: Readonly<Record<string, string>>;
}

export async function buildSite(options: BuildOptions = {}): Promise<string> {
  const outDir = options.outDir ?? (await mkdtemp(path.join(tmpdir(), 'correlary-site-')));
  const correlary = path.join(projectRoot, 'bin', 'correlary.mjs');
  const output: string[] = [];
  const env: Record<string, string | undefined> = { ...process.env, ASTRO_TELEMETRY_DISABLED: '1', NODE_ENV: 'production', ...options.env };
  // vitest puts Vite's BASE_URL, MODE, DEV, PROD and SSR into process.env; the build must not inherit them.
  for (const name of ['BASE_URL', 'MODE', 'DEV', 'PROD', 'SSR']) delete env[name];
  const args = [correlary, 'build', '--out', outDir, ...(options.content === undefined ? [] : ['--content', options.content])];
  const code = await new Promise<number | null>((resolve, reject) => {
    const child = spawn(process.execPath, args, { cwd: projectRoot, env, stdio: ['ignore', 'pipe', 'pipe'] });
    child.stdout.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.stderr.on('data', (chunk: Buffer) => output.push(chunk.toString()));
    child.on('error', reject);
    child.on('close', resolve);
  });
  if (code !== 0) throw new Error(`correlary build failed with exit code ${code}:\n${output.join('').slice(-4000)}`);
  return outDir;
}
