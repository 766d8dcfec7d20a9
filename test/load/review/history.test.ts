/**
 * handbookHistory (src/load/history/): in a temporary git repository with two commits, each correlation lists its
 * commits with whether the published coefficients changed, and a lapsed approval says what changed since the
 * approved version; outside a repository (or without git) the history says it is not available. The repository
 * is never modified.
 */
import { execFileSync } from 'node:child_process';
import { cp, mkdtemp, readFile, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { fitHandbook, handbookHistory } from '../../../src/load/index.ts';
import { runCli } from '../../helpers/runCli.ts';

const FIXTURE = 'test/fixtures/content/review';
const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

function git(directory: string, args: string[], date: string): string {
  const env = { ...process.env, GIT_AUTHOR_NAME: 'Test', GIT_AUTHOR_EMAIL: 't@example.invalid', GIT_COMMITTER_NAME: 'Test', GIT_COMMITTER_EMAIL: 't@example.invalid', GIT_AUTHOR_DATE: date, GIT_COMMITTER_DATE: date };
  return execFileSync('git', ['-c', 'init.defaultBranch=main', '-c', 'commit.gpgsign=false', ...args], { cwd: directory, env, encoding: 'utf8' });
}

/** Every file under .git with its size and modification time, to show that nothing there was written. */
async function gitState(directory: string): Promise<string> {
  const entries = await readdir(path.join(directory, '.git'), { recursive: true });
  const lines: string[] = [];
  for (const entry of entries.sort()) {
    const info = await stat(path.join(directory, '.git', entry));
    lines.push(`${entry} ${info.size} ${info.mtimeMs}`);
  }
  return lines.join('\n');
}

/** A repository holding the fixture: commit 1 approved, commit 2 with one y value changed. */
async function twoCommitRepository(): Promise<string> {
  const root = await mkdtemp(path.join(tmpdir(), 'correlary-history-'));
  temporary.push(root);
  const content = path.join(root, 'content');
  await cp(FIXTURE, content, { recursive: true });
  git(root, ['init', '-q'], '2026-01-10T09:00:00Z');
  expect((await runCli(['approve', 'liquid-r', '--by', 'A. Reviewer', '--date', '2026-01-10', '--content', content])).code).toBe(0);
  git(root, ['add', '-A'], '2026-01-10T09:00:00Z');
  git(root, ['commit', '-q', '-m', 'Density of test liquid R, approved'], '2026-01-10T09:00:00Z');
  const dataFile = path.join(content, 'liquid-r', 'data.csv');
  await writeFile(dataFile, (await readFile(dataFile, 'utf8')).replace('982.80', '982.90'));
  git(root, ['commit', '-q', '-a', '-m', 'Correct the 330 K reading'], '2026-02-03T15:30:00Z');
  return root;
}

describe('handbookHistory(directory, datasets)', () => {
  it('handbookHistory(two commits) lists both, newest first, with commit dates and whether the coefficients changed', async () => {
    const root = await twoCommitRepository();
    const content = path.join(root, 'content');
    const handbook = await fitHandbook(content);
    const before = await gitState(root);
    const history = (await handbookHistory(content, handbook.datasets)).get('liquid-r')!;
    expect(await gitState(root)).toBe(before);
    expect(history.available).toBe(true);
    if (!history.available) return;
    expect(history.rows.map((row) => [row.date, row.subject, row.coefficients])).toEqual([
      ['2026-02-03', 'Correct the 330 K reading', 'changed'],
      ['2026-01-10', 'Density of test liquid R, approved', 'added'],
    ]);
    expect(history.uncommitted).toBe(false);
    expect(history.rows[0]!.fingerprint).toBe(handbook.datasets[0]!.review!.fingerprint!.text);
  });

  it('handbookHistory(lapsed approval) shows the changed row and the largest change of the curve, checked by an exact refit in python3', async () => {
    const root = await twoCommitRepository();
    const content = path.join(root, 'content');
    const handbook = await fitHandbook(content);
    expect(handbook.datasets[0]!.review!.approval).toEqual({ state: 'lapsed', reasons: ['data', 'result'] });
    const history = (await handbookHistory(content, handbook.datasets)).get('liquid-r')!;
    if (!history.available) throw new Error('history unavailable');
    const since = history.sinceApproval;
    expect(since?.found).toBe(true);
    if (!since?.found) return;
    expect(since.date).toBe('2026-01-10');
    expect([since.changes.rowsAdded, since.changes.rowsRemoved, since.changes.rowsChanged]).toEqual([0, 0, 1]);
    expect(since.changes.rows).toEqual([{ x: 330, before: 982.8, after: 982.9, usedBefore: true, usedAfter: true }]);
    expect(since.changes.options).toEqual([]);
    expect(since.changes.resultChanged).toBe(true);
    // Independent computation: both versions fitted as quadratics (the order both choose) in exact rational
    // arithmetic with python3 fractions (normal equations, no rounding), then |Δy| on the same 401-point grid.
    const script = String.raw`
from fractions import Fraction as F
xs = [280,290,300,310,330,340,350,360,370]
base = ['1012.40','1006.93','1001.21','995.30','982.80','976.21','969.40','962.37','955.12']
def fit(ys):
    A = [[sum(F(x)**(i+j) for x in xs) for j in range(3)] for i in range(3)]
    b = [sum(F(x)**i * y for x, y in zip(xs, ys)) for i in range(3)]
    for c in range(3):
        for r in range(c+1, 3):
            f = A[r][c] / A[c][c]
            A[r] = [a - f*p for a, p in zip(A[r], A[c])]; b[r] -= f*b[c]
    a = [F(0)]*3
    for r in (2, 1, 0):
        a[r] = (b[r] - sum(A[r][k]*a[k] for k in range(r+1, 3))) / A[r][r]
    return a
old = fit([F(v) for v in base]); new = fit([F(v) for v in base[:4] + ['982.90'] + base[5:]])
best = max((abs(sum((n - o) * F(x)**k for k, (n, o) in enumerate(zip(new, old)))), x) for x in [F(280) + F(90*i, 400) for i in range(401)])
print(float(best[0]), float(best[1]))
`;
    const [deltaY, atX] = execFileSync('python3', ['-c', script], { encoding: 'utf8' }).trim().split(' ').map(Number);
    const change = since.changes.maxCurveChange!;
    expect(Math.abs(change.deltaY - deltaY!) / deltaY!).toBeLessThan(1e-6);
    expect(change.atX).toBeCloseTo(atX!, 9);
    expect([change.min, change.max]).toEqual([280, 370]);
    const s = handbook.datasets[0]!.fitted!.fit!.statistics.residualStdDev;
    expect(change.overS).toBeCloseTo(change.deltaY / s, 12);
  });

  it('handbookHistory(files changed on disk) marks the history as uncommitted', async () => {
    const root = await twoCommitRepository();
    const content = path.join(root, 'content');
    const dataFile = path.join(content, 'liquid-r', 'data.csv');
    await writeFile(dataFile, (await readFile(dataFile, 'utf8')).replace('955.12', '955.13'));
    const handbook = await fitHandbook(content);
    const history = (await handbookHistory(content, handbook.datasets)).get('liquid-r')!;
    expect(history.available && history.uncommitted).toBe(true);
  });

  it('handbookHistory(outside a repository) says history is not available, and without git installed too', async () => {
    const directory = await mkdtemp(path.join(tmpdir(), 'correlary-nogit-'));
    temporary.push(directory);
    await cp(FIXTURE, directory, { recursive: true });
    const handbook = await fitHandbook(directory);
    expect((await handbookHistory(directory, handbook.datasets)).get('liquid-r')).toEqual({ available: false, reason: 'the content folder is not in a git repository' });
    const savedPath = process.env['PATH'];
    process.env['PATH'] = '/nonexistent';
    try {
      expect((await handbookHistory(directory, handbook.datasets)).get('liquid-r')).toEqual({ available: false, reason: 'git is not installed' });
    } finally {
      process.env['PATH'] = savedPath;
    }
  });
});
