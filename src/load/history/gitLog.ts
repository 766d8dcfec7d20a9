/**
 * Read the history of a content folder with git itself, read-only and in a fixed number of git processes for the
 * whole folder (never one per correlation): one `git log` lists every commit that touched the folder with the blob
 * ids of the files it changed, and one `git cat-file --batch` reads the file versions asked for. Nothing in the
 * repository is written (GIT_OPTIONAL_LOCKS=0; log and cat-file are read-only commands). Dates are commit dates,
 * never the clock, so a build of the same commit shows the same history.
 */
import { spawn } from 'node:child_process';

/** One file changed by a commit, its path relative to the content folder. `blob` is undefined when deleted. */
export interface GitFileChange {
  readonly path: string;
  readonly blob: string | undefined;
}

export interface GitCommit {
  readonly hash: string;
  /** Committer date, YYYY-MM-DD. */
  readonly date: string;
  readonly subject: string;
  readonly changes: readonly GitFileChange[];
}

export type GitLogResult = { readonly available: true; readonly commits: readonly GitCommit[] } | { readonly available: false; readonly reason: string };

/** git's environment: no optional locks (nothing written), no prompts, messages in English. */
const gitEnvironment = () => ({ ...process.env, GIT_OPTIONAL_LOCKS: '0', GIT_TERMINAL_PROMPT: '0', LC_ALL: 'C' });
const ZERO = /^0+$/;

function run(directory: string, args: readonly string[], input?: string): Promise<{ code: number; stdout: Buffer; stderr: string }> {
  return new Promise((resolve) => {
    const child = spawn('git', ['-c', 'log.showSignature=false', '-c', 'core.quotePath=off', ...args], { cwd: directory, env: gitEnvironment(), stdio: ['pipe', 'pipe', 'pipe'] });
    const out: Buffer[] = [];
    const err: Buffer[] = [];
    child.stdout.on('data', (chunk: Buffer) => out.push(chunk));
    child.stderr.on('data', (chunk: Buffer) => err.push(chunk));
    child.on('error', (caught) => resolve({ code: -1, stdout: Buffer.alloc(0), stderr: caught.message }));
    child.on('close', (code) => resolve({ code: code ?? -1, stdout: Buffer.concat(out), stderr: Buffer.concat(err).toString('utf8') }));
    child.stdin.on('error', () => undefined);
    child.stdin.end(input ?? '');
  });
}

/**
 * Every commit that touched `directory`, newest first, along the first-parent line (merges compared with their
 * first parent, so the file versions replay in order).
 * @example (await gitLog('content')).available // => true inside a repository, false elsewhere
 */
export async function gitLog(directory: string): Promise<GitLogResult> {
  const result = await run(directory, [
    'log',
    '--first-parent',
    '--diff-merges=first-parent',
    '--no-renames',
    '--raw',
    '--no-abbrev',
    '--relative',
    '-z',
    '--format=%x1e%H%x1f%cs%x1f%s',
    '--',
    '.',
  ]);
  if (result.code !== 0) {
    const first = result.stderr.split('\n')[0]?.trim() ?? '';
    const reason = result.code === -1 ? 'git is not installed' : /not a git repository/i.test(first) ? 'the content folder is not in a git repository' : `git could not read it (${first || `exit status ${result.code}`})`;
    return { available: false, reason };
  }
  const commits: GitCommit[] = [];
  for (const record of result.stdout.toString('utf8').split('\x1e')) {
    if (record.trim() === '') continue;
    const [header = '', ...rest] = record.split('\0');
    const [hash = '', date = '', subject = ''] = header.split('\x1f');
    const changes: GitFileChange[] = [];
    for (let i = 0; i + 1 < rest.length; i += 2) {
      const meta = rest[i]!.trim();
      const file = rest[i + 1]!;
      if (!meta.startsWith(':')) break;
      const newBlob = meta.split(' ')[3] ?? '';
      changes.push({ path: file, blob: ZERO.test(newBlob) ? undefined : newBlob });
    }
    commits.push({ hash, date, subject, changes });
  }
  return { available: true, commits };
}

/**
 * The contents of the given blobs, in one `git cat-file --batch`. Blobs git cannot find are left out.
 * @example (await readBlobs('content', ['e69de29bb2d1d6434b8b29ae775ad8c2e48c5391'])).get('e69d…') // => <Buffer >
 */
export async function readBlobs(directory: string, blobs: readonly string[]): Promise<Map<string, Buffer>> {
  const wanted = [...new Set(blobs)];
  const found = new Map<string, Buffer>();
  if (wanted.length === 0) return found;
  const result = await run(directory, ['cat-file', '--batch'], wanted.map((blob) => `${blob}\n`).join(''));
  if (result.code !== 0) return found;
  const out = result.stdout;
  let offset = 0;
  while (offset < out.length) {
    const lineEnd = out.indexOf(0x0a, offset);
    if (lineEnd < 0) break;
    const header = out.subarray(offset, lineEnd).toString('utf8').split(' ');
    offset = lineEnd + 1;
    if (header[1] === 'missing' || header.length < 3) continue;
    const size = Number(header[2]);
    found.set(header[0]!, out.subarray(offset, offset + size));
    offset += size + 1;
  }
  return found;
}
