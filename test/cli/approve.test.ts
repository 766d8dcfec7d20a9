/**
 * `correlary approve` and `correlary withdraw`: they write only the review block (every other byte of the file is
 * compared), refuse while check reports an error, and `check` / `check --strict` then report the approval's state.
 * Expected files are built here by plain string edits of the fixture (computed by hand from the command's
 * documented effect: the keys it sets, in that order, after the block's last entry).
 */
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.ts';

const FIXTURE = 'test/fixtures/content/review';
const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

async function copyFixture(): Promise<string> {
  const directory = await mkdtemp(path.join(tmpdir(), 'correlary-approve-'));
  temporary.push(directory);
  await cp(FIXTURE, directory, { recursive: true });
  return directory;
}

const metadata = (directory: string, slug = 'liquid-r') => path.join(directory, slug, 'correlation.yaml');
const FINGERPRINT = /fp1-[0-9a-f]{16}-[0-9a-f]{16}-[0-9a-f]{16}/;

describe('correlary approve', () => {
  it('correlary approve --help prints the usage and exits 0', async () => {
    const result = await runCli(['approve', '--help']);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/^usage: correlary approve <slug> --by NAME \[--date YYYY-MM-DD\] \[--content DIR\]/);
  });

  it('correlary approve writes status, reviewer, date and fingerprint and leaves every other byte unchanged', async () => {
    const directory = await copyFixture();
    const before = await readFile(metadata(directory), 'utf8');
    const dataBefore = await readFile(path.join(directory, 'liquid-r', 'data.csv'));
    const result = await runCli(['approve', 'liquid-r', '--by', 'A. Reviewer (invented)', '--date', '2026-01-20', '--content', directory]);
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    const fingerprint = FINGERPRINT.exec(result.stdout)![0];
    const after = await readFile(metadata(directory), 'utf8');
    const notes = '  notes: "Checked against the lab book, page 12."\n';
    const expected = before
      .replace('  status: in-review\n', '  status: approved\n')
      .replace(notes, `${notes}  reviewer: A. Reviewer (invented)\n  date: 2026-01-20\n  fingerprint: ${fingerprint}\n`);
    expect(after).toBe(expected);
    expect((await readFile(path.join(directory, 'liquid-r', 'data.csv'))).equals(dataBefore)).toBe(true);
    const check = await runCli(['check', directory, '--strict']);
    expect(check.code).toBe(0);
    expect(check.stdout).toContain('0 errors, 0 warnings');
  });

  it('correlary approve keeps a BOM, CRLF line ends, astral characters and the quoting of a replaced value', async () => {
    const directory = await copyFixture();
    const original = await readFile(metadata(directory), 'utf8');
    const crlf = '\uFEFF' + original.replace('title: Density', '# 𝜌 with a note 😀 before the title\ntitle: Density').replace("  status: in-review", "  status: 'in-review'").replace(/\n/g, '\r\n');
    await writeFile(metadata(directory), crlf);
    const result = await runCli(['approve', 'liquid-r', '--by=B. Reviewer', '--date=2026-02-01', '--content', directory]);
    expect(result.code).toBe(0);
    const fingerprint = FINGERPRINT.exec(result.stdout)![0];
    const notes = '  notes: "Checked against the lab book, page 12."\r\n';
    const expected = crlf
      .replace("  status: 'in-review'\r\n", "  status: 'approved'\r\n")
      .replace(notes, `${notes}  reviewer: B. Reviewer\r\n  date: 2026-02-01\r\n  fingerprint: ${fingerprint}\r\n`);
    const after = await readFile(metadata(directory));
    expect(after.equals(Buffer.from(expected, 'utf8'))).toBe(true);
    expect(after.subarray(0, 3).equals(Buffer.from([0xef, 0xbb, 0xbf]))).toBe(true);
  });

  it('correlary approve refuses, changing nothing, while check reports an error for the correlation', async () => {
    const directory = await copyFixture();
    const dataFile = path.join(directory, 'liquid-r', 'data.csv');
    await writeFile(dataFile, (await readFile(dataFile, 'utf8')).replace('982.80', '98x.80'));
    const before = await readFile(metadata(directory));
    const result = await runCli(['approve', 'liquid-r', '--by', 'A. Reviewer', '--content', directory]);
    expect(result.code).toBe(1);
    expect(result.stderr).toContain("data.csv:8:5: non-numeric value '98x.80' in column 'rho'");
    expect(result.stderr).toContain('approve refused for liquid-r: check reports 1 error for it (above)');
    expect((await readFile(metadata(directory))).equals(before)).toBe(true);
  });

  it('correlary approve refuses an unknown slug with a suggestion, and needs --by', async () => {
    const directory = await copyFixture();
    const unknown = await runCli(['approve', 'liquid-q', '--by', 'A', '--content', directory]);
    expect(unknown.code).toBe(1);
    expect(unknown.stderr).toContain("no correlation 'liquid-q' in");
    expect(unknown.stderr).toContain("did you mean 'liquid-r'?");
    const noName = await runCli(['approve', 'liquid-r', '--content', directory]);
    expect(noName.code).toBe(2);
    expect(noName.stderr).toContain('approve needs --by NAME');
    const badDate = await runCli(['approve', 'liquid-r', '--by', 'A', '--date', '20.1.2026', '--content', directory]);
    expect(badDate.code).toBe(2);
  });

  it('check warns when the data change after approval and check --strict fails naming the lapsed approval', async () => {
    const directory = await copyFixture();
    expect((await runCli(['approve', 'liquid-r', '--by', 'A. Reviewer', '--date', '2026-01-20', '--content', directory])).code).toBe(0);
    const dataFile = path.join(directory, 'liquid-r', 'data.csv');
    await writeFile(dataFile, (await readFile(dataFile, 'utf8')).replace('982.80', '982.90'));
    const check = await runCli(['check', directory]);
    expect(check.code).toBe(0);
    expect(check.stdout).toMatch(/liquid-r\/correlation\.yaml:35:16: warning: approval lapsed \(data changed, result changed\): A\. Reviewer approved fp1-\S+ on 2026-01-20, now fp1-\S+; review it, then run 'correlary approve liquid-r --by NAME'/);
    const strict = await runCli(['check', directory, '--strict']);
    expect(strict.code).toBe(1);
    expect(strict.stdout).toContain('approval lapsed (data changed, result changed)');
  });
});

describe('correlary withdraw', () => {
  it('correlary withdraw --help prints the usage and exits 0', async () => {
    const result = await runCli(['withdraw', '--help']);
    expect(result.code).toBe(0);
    expect(result.stdout).toMatch(/^usage: correlary withdraw <slug> --reason TEXT \[--replaced-by SLUG\]/);
  });

  it('correlary withdraw --replaced-by writes the withdrawal, keeps every other byte, and check accepts it', async () => {
    const directory = await copyFixture();
    await cp(path.join(directory, 'liquid-r'), path.join(directory, 'liquid-s'), { recursive: true });
    const before = await readFile(metadata(directory), 'utf8');
    const result = await runCli(['withdraw', 'liquid-r', '--reason', 'Cell calibration error; see liquid-s', '--replaced-by', 'liquid-s', '--date', '2026-03-01', '--content', directory]);
    expect(result.stderr).toBe('');
    expect(result.code).toBe(0);
    const notes = '  notes: "Checked against the lab book, page 12."\n';
    const expected = before
      .replace('  status: in-review\n', '  status: withdrawn\n')
      .replace(notes, `${notes}  withdrawnReason: Cell calibration error; see liquid-s\n  withdrawnDate: 2026-03-01\n  replacedBy: liquid-s\n`);
    expect(await readFile(metadata(directory), 'utf8')).toBe(expected);
    const check = await runCli(['check', directory, '--strict']);
    expect(check.code).toBe(0);
  });

  it('correlary withdraw refuses a replacement that does not exist or is the correlation itself', async () => {
    const directory = await copyFixture();
    const before = await readFile(metadata(directory));
    const missing = await runCli(['withdraw', 'liquid-r', '--reason', 'x', '--replaced-by', 'liquid-z', '--content', directory]);
    expect(missing.code).toBe(1);
    expect(missing.stderr).toContain("--replaced-by 'liquid-z' is not a correlation in");
    const itself = await runCli(['withdraw', 'liquid-r', '--reason', 'x', '--replaced-by', 'liquid-r', '--content', directory]);
    expect(itself.code).toBe(1);
    expect((await readFile(metadata(directory))).equals(before)).toBe(true);
  });
});
