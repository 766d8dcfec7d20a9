/**
 * The fingerprint (src/load/review/fingerprint.ts): unchanged by reformatting a data file, changed by any change of
 * data, options or published result, with the component that changed named as the reason an approval lapsed.
 */
import { execFileSync } from 'node:child_process';
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { approvalState, canonicalTexts, fingerprint, fitHandbook, parseFingerprint, type FittedDataset } from '../../../src/load/index.ts';

const FIXTURE = 'test/fixtures/content/review';
const temporary: string[] = [];
afterAll(async () => {
  for (const directory of temporary) await rm(directory, { recursive: true, force: true });
});

/** A fresh copy of the review fixture handbook; returns the folder of its one correlation. */
async function copyFixture(): Promise<string> {
  const directory = await mkdtemp(path.join(tmpdir(), 'correlary-fingerprint-'));
  temporary.push(directory);
  await cp(FIXTURE, directory, { recursive: true });
  return directory;
}

async function fitted(directory: string): Promise<FittedDataset> {
  const handbook = await fitHandbook(directory);
  expect(handbook.diagnostics.filter((message) => message.severity === 'error')).toEqual([]);
  return handbook.datasets[0]!;
}

async function fingerprintOf(directory: string): Promise<string> {
  return (await fitted(directory)).review!.fingerprint!.text;
}

async function edit(directory: string, file: string, change: (text: string) => string): Promise<void> {
  const target = path.join(directory, 'liquid-r', file);
  await writeFile(target, change(await readFile(target, 'utf8')));
}

describe('fingerprint(correlation, fit)', () => {
  it('fingerprint(fixture) has the documented form fp1-<data>-<options>-<result>', async () => {
    const text = await fingerprintOf(await copyFixture());
    expect(text).toMatch(/^fp1-[0-9a-f]{16}-[0-9a-f]{16}-[0-9a-f]{16}$/);
    expect(parseFingerprint(text)?.recipe).toBe('fp1');
  });

  it('fingerprint(reformatted data) is unchanged: spaces, CRLF, BOM, column order, quoting, comments, trailing zeros, row order', async () => {
    const directory = await copyFixture();
    const before = await fingerprintOf(directory);
    const reformatted = [
      '\uFEFF# a new comment line at the top',
      '"remark" , u_rho,rho , T',
      '',
      ',5e-2,  1012.4 ,280.0',
      '# another comment between rows',
      ',0.050,1006.930,290',
      '"first run, cell A",0.05,1001.21,3.0e2',
      ',0.05,995.3,310',
      'outlier,0.05,999.99,320',
      ',0.05,982.8,330',
      ',0.05,976.21,340',
      ',0.05,969.4,350',
      ',0.05,955.12,370',
      ',0.05,962.37,360',
      '',
    ].join('\r\n');
    await edit(directory, 'data.csv', () => reformatted);
    // Row 9 and 10 swapped: row numbers stay meaningful for the exclusion (row 5 is still the outlier).
    expect(await fingerprintOf(directory)).toBe(before);
  });

  it('fingerprint(one y changed) lapses an approval with "data" and "result" as the reasons', async () => {
    const directory = await copyFixture();
    const before = (await fitted(directory)).review!.fingerprint!;
    await edit(directory, 'data.csv', (text) => text.replace('995.30', '995.40'));
    const after = (await fitted(directory)).review!.fingerprint!;
    expect(after.parts.data).not.toBe(before.parts.data);
    expect(after.parts.options).toBe(before.parts.options);
    const review = { status: 'approved' as const, reviewer: 'A. Reviewer', date: '2026-01-20', fingerprint: before.text };
    expect(approvalState(review, after)).toEqual({ state: 'lapsed', reasons: ['data', 'result'] });
  });

  it('fingerprint(an excluded point changed) lapses with "data" only: the fit does not see it', async () => {
    const directory = await copyFixture();
    const before = (await fitted(directory)).review!.fingerprint!;
    await edit(directory, 'data.csv', (text) => text.replace('999.99', '999.00'));
    const after = (await fitted(directory)).review!.fingerprint!;
    const review = { status: 'approved' as const, reviewer: 'A. Reviewer', date: '2026-01-20', fingerprint: before.text };
    expect(approvalState(review, after)).toEqual({ state: 'lapsed', reasons: ['data'] });
  });

  it('fingerprint(one option changed) lapses with "options" as the reason', async () => {
    const directory = await copyFixture();
    const before = (await fitted(directory)).review!.fingerprint!;
    // maxOrder 4 → 3: the chosen order (2) and so the result stay the same; only the options differ.
    await edit(directory, 'correlation.yaml', (text) => text.replace('maxOrder: 4', 'maxOrder: 3'));
    const after = (await fitted(directory)).review!.fingerprint!;
    const review = { status: 'approved' as const, reviewer: 'A. Reviewer', date: '2026-01-20', fingerprint: before.text };
    expect(approvalState(review, after)).toEqual({ state: 'lapsed', reasons: ['options'] });
  });

  it('fingerprint(a unit changed) lapses with "options": units change what the result means', async () => {
    const directory = await copyFixture();
    const before = (await fitted(directory)).review!.fingerprint!;
    await edit(directory, 'correlation.yaml', (text) => text.replace('unit: kg/m³', 'unit: g/L'));
    const after = (await fitted(directory)).review!.fingerprint!;
    expect(approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-20', fingerprint: before.text }, after)).toEqual({ state: 'lapsed', reasons: ['options'] });
  });

  it('fingerprint(the published result changed) lapses with "result" only', async () => {
    const dataset = await fitted(await copyFixture());
    const correlation = dataset.dataset.correlation!;
    const fit = dataset.fitted!.fit!;
    const before = fingerprint(correlation, fit);
    // Same data and options, a result printed differently (as a changed digits rule or solver would give).
    const changed = { ...fit, coefficients: fit.coefficients.map((value, k) => (k === 0 ? value * (1 + 1e-6) : value)) };
    const after = fingerprint(correlation, changed);
    expect(approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-20', fingerprint: before.text }, after)).toEqual({ state: 'lapsed', reasons: ['result'] });
    // Review notes, title and tags are not part of what is approved.
    const retitled = { ...correlation, meta: { ...correlation.meta, title: 'Another title', tags: ['other'] } };
    expect(fingerprint(retitled, fit).text).toBe(before.text);
  });

  it('approvalState(approved without fingerprint) is unbound, not valid; with the same fingerprint it holds', async () => {
    const dataset = await fitted(await copyFixture());
    const current = dataset.review!.fingerprint!;
    expect(approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-20' }, current)).toEqual({ state: 'unbound' });
    expect(approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-20', fingerprint: current.text }, current)).toEqual({ state: 'holds' });
    expect(approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-20', fingerprint: current.text.replace('fp1', 'fp2') }, current)).toEqual({ state: 'lapsed', reasons: ['recipe'] });
    expect(approvalState({ status: 'in-review' }, current)).toEqual({ state: 'none' });
  });

  it('canonicalTexts(fixture).data hashes to the data component, recomputed independently with python3 hashlib from the CSV', async () => {
    const dataset = await fitted(await copyFixture());
    const texts = canonicalTexts(dataset.dataset.correlation!, dataset.fitted!.fit!);
    // Independent computation: python3 reads the CSV with its own csv module and follows the recipe in
    // content/README.md ("Fingerprint"): repr() of a float is also the shortest round-trip decimal.
    const script = String.raw`
import csv, hashlib, json, sys
rows = [r for r in csv.DictReader(l for l in open(sys.argv[1], encoding='utf-8') if not l.startswith('#'))]
def d(v):
    f = float(v); s = repr(f)
    return s[:-2] if s.endswith('.0') else s
used = [r for i, r in enumerate(rows, 1) if i != 5]
lines = sorted('point x=%s y=%s u=%s' % (d(r['T']), d(r['rho']), d(r['u_rho'])) for r in used)
ex = rows[4]
lines += ['excluded x=%s y=%s u=%s reason=%s' % (d(ex['T']), d(ex['rho']), d(ex['u_rho']), json.dumps('bubble in the cell'))]
text = ''.join(l + '\n' for l in ['correlary fp1 data'] + lines)
print(hashlib.sha256(text.encode('utf-8')).hexdigest()[:16])
print(json.dumps(text))
`;
    const [hash, text] = execFileSync('python3', ['-c', script, path.join(FIXTURE, 'liquid-r', 'data.csv')], { encoding: 'utf8' }).trim().split('\n');
    expect(JSON.parse(text!)).toBe(texts.data);
    expect(dataset.review!.fingerprint!.parts.data).toBe(hash);
  });
});
