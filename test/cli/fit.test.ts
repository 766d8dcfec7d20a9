/**
 * `correlary fit`: JSON output on the NIST StRD problems (certified values from NIST, test/fixtures/nist-strd),
 * the human report, and one-line errors for bad input.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { lre } from '../helpers/lre.ts';
import { nistDatToCsv, nistDatasets, powerOf } from '../helpers/nist.ts';
import { runCli } from '../helpers/runCli.ts';

const dir = mkdtempSync(join(tmpdir(), 'correlary-fit-'));
function csvFile(name: string, text: string): string {
  const file = join(dir, name);
  writeFileSync(file, text);
  return file;
}

describe('correlary fit --json on NIST StRD', () => {
  for (const [name, dataset] of Object.entries(nistDatasets)) {
    it(`correlary fit ${name}.csv --order ${dataset.model.degree} --json reaches LRE ≥ 12`, async () => {
      const file = csvFile(`${name}.csv`, nistDatToCsv(name));
      const args = ['fit', file, '--x', 'x', '--y', 'y', '--order', String(dataset.model.degree), '--json'];
      if (!dataset.model.intercept) args.push('--no-intercept');
      const { code, stdout } = await runCli(args);
      expect(code).toBe(0);
      const result = JSON.parse(stdout);
      expect(result.n).toBe(dataset.observations);
      expect(result.order).toBe(dataset.model.degree);
      if (!dataset.model.intercept) expect(result.coefficients[0]).toBe(0);
      const scores: number[] = [];
      for (const parameter of dataset.certified.parameters) {
        const k = powerOf(parameter.name);
        scores.push(lre(result.coefficients[k], parameter.estimate.value!));
        scores.push(lre(result.standardErrors[k], parameter.standardDeviation.value!));
      }
      scores.push(lre(result.residualStdDev, dataset.certified.residualStandardDeviation.value!));
      scores.push(lre(result.rSquared, dataset.certified.rSquared.value!));
      expect(Math.min(...scores)).toBeGreaterThanOrEqual(12);
      expect(result.range).toMatchObject({ min: Math.min(...dataset.data.x), max: Math.max(...dataset.data.x) });
      expect(result.cautions.join(' ')).toMatch(/qualified engineer/);
    });
  }
});

describe('correlary fit report', () => {
  it('correlary fit prints the equation, the chosen order with its reason, check values and the cautions', async () => {
    // y = 2 + 3x − 0.5x² exactly (a value computed by hand), with x far from zero.
    const rows = Array.from({ length: 12 }, (_, i) => {
      const x = 300 + 25 * i;
      return `${x},${2 + 3 * x - 0.5 * x * x}`;
    });
    const file = csvFile('quadratic.csv', `T,cp\n${rows.join('\n')}\n`);
    const { code, stdout } = await runCli(['fit', file, '--order', '2']);
    expect(code).toBe(0);
    expect(stdout).toContain('y = 2 + 3*x - 0.5*x^2');
    expect(stdout).toMatch(/Order 2/);
    expect(stdout).toMatch(/Check values/);
    expect(stdout).toMatch(/x = 575\s+y = -163585\.5/); // 2 + 3·575 − 0.5·575² = −163585.5
    expect(stdout).toMatch(/not for design use/i);
  });
});

describe('correlary fit bad input', () => {
  const cases: [string, string, string[], RegExp][] = [
    ['non-numeric cell', 'x,y\n1,2\n2,abc\n3,4\n', [], /bad\.csv:3:3: non-numeric value 'abc' in column 'y'$/],
    ['NaN', 'x,y\n1,2\n2,NaN\n3,4\n', [], /bad\.csv:3:3: 'NaN' in column 'y' is not a finite number; remove the row or turn it into a # comment line$/],
    ['Infinity', 'x,y\n1,2\n2,3\nInfinity,4\n', [], /bad\.csv:4:1: 'Infinity' in column 'x' is not a finite number; remove the row or turn it into a # comment line$/],
    ['empty cell', 'x,y\n1,2\n2,\n3,4\n', [], /bad\.csv:3:3: empty cell in column 'y'; every row needs a value here/],
    ['decimal comma', 'x;y\n1,5;2\n', [], /bad\.csv:1:1: fields are separated by semicolons and numbers use decimal commas, but Correlary reads only comma-separated files with '\.' decimals/],
    ['unknown column', 'x,y\n1,2\n2,3\n3,4\n', ['--y', 'cp'], /bad\.csv:1:1: header has no column 'cp' \(named by --y\); the header has: x, y$/],
    ['constant x', 'x,y\n1,2\n1,3\n1,4\n', [], /bad\.csv:1: every point has x = 1; a correlation needs at least two different x values$/],
    ['too few points', 'x,y\n1,2\n2,3\n', [], /bad\.csv:1: only 2 points are left to fit; a correlation needs at least 3$/],
    ['log of a negative value', 'x,y\n1,2\n2,-3\n3,4\n4,5\n', ['--transform-y', 'log'], /bad\.csv:3:3: y = -3 is not positive, but --transform-y is 'log'; leave the row out with --exclude-row, or choose another transform$/],
    ['ragged row', 'x,y\n1,2\n2,3,4\n', [], /bad\.csv:3: row has 3 fields but the header has 2; a decimal comma\? write 1\.5, not 1,5/],
    ['order too high', 'x,y\n1,2\n2,3\n3,5\n4,4\n', ['--order', '4'], /^correlary: command line: order 4 needs at least 6 points, but 4 are used$/],
  ];
  for (const [label, text, extra, expected] of cases) {
    it(`correlary fit reports ${label} in one line with file and line`, async () => {
      const file = csvFile('bad.csv', text);
      const { code, stderr, stdout } = await runCli(['fit', file, ...extra]);
      expect(code).toBe(1);
      expect(stdout).toBe('');
      expect(stderr.split('\n')).toHaveLength(1);
      expect(stderr).toMatch(expected);
    });
  }

  it('correlary fit --criterion chiSquare without --uncertainty says which option is missing', async () => {
    const file = csvFile('chi.csv', 'x,y\n1,2\n2,3\n3,5\n4,4\n');
    const { code, stderr } = await runCli(['fit', file, '--criterion', 'chiSquare']);
    expect(code).toBe(2);
    expect(stderr).toBe('correlary: --criterion chiSquare needs per-point uncertainties: name their column with --uncertainty COL');
  });

  it('correlary fit reads a two-column file without a header row as x then y when no column is named', async () => {
    const file = csvFile('noheader.csv', '1,1\n2,4\n3,9\n4,16\n5,25\n');
    const { code, stdout } = await runCli(['fit', file, '--order', '2', '--json']);
    expect(code).toBe(0);
    const result = JSON.parse(stdout);
    expect(result.n).toBe(5);
    expect(result.coefficients).toEqual([0, 0, 1]); // y = x², exact
    expect(result.input.columns).toEqual({ x: 'column 1', y: 'column 2', uncertainty: null });
    // Naming a column means the file must have a header naming it.
    const named = await runCli(['fit', file, '--x', 'T', '--y', 'cp']);
    expect(named.code).toBe(1);
    expect(named.stderr).toMatch(/noheader\.csv:1:1: no header row: the first row holds numbers/);
  });

  it('correlary fit --x-unit °C reports the other temperature scales, and --json carries them', async () => {
    // y = 2 + 0.5·t exactly in °C; computed by hand: y = 2 + 0.5·(T − 273.15) = 0.5·T − 134.575 in K and
    // y = 2 + 0.5·5/9·(F − 32) = 5/18·F − 62/9 in °F, so at 212 °F (100 °C) y = 52.
    const file = csvFile('celsius.csv', 't,y\n0,2\n20,12\n40,22\n60,32\n80,42\n100,52\n');
    const report = await runCli(['fit', file, '--order', '1', '--x-unit', '°C']);
    expect(report.code, report.stderr).toBe(0);
    expect(report.stdout).toMatch(/Other temperature scales \(the same polynomial by exact substitution; fitted in °C\)/);
    expect(report.stdout).toMatch(/in K, valid for 273\.15 K ≤ x ≤ 373\.15 K:\n {4}y = -134\.575 \+ 0\.5\*x/);
    const { stdout } = await runCli(['fit', file, '--order', '1', '--x-unit', '°C', '--json']);
    const record = JSON.parse(stdout);
    expect(record.temperatureScales.native).toBe('°C');
    const fahrenheit = record.temperatureScales.scales.find((form: { scale: string }) => form.scale === '°F');
    expect(fahrenheit.range).toEqual({ min: 32, max: 212, unit: '°F' });
    expect(fahrenheit.checkValues.at(-1)).toMatchObject({ x: 212, y: 52 });
    // Not a temperature: no scales.
    const plain = JSON.parse((await runCli(['fit', file, '--order', '1', '--x-unit', 'm', '--json'])).stdout);
    expect(plain.temperatureScales).toBeNull();
  });

  it('correlary fit reports a missing file in one line', async () => {
    const { code, stderr } = await runCli(['fit', join(dir, 'nope.csv')]);
    expect(code).toBe(1);
    expect(stderr).toMatch(/nope\.csv: cannot read the file/);
  });

  it('bin/correlary.mjs runs as a program: exit status 1, one line on stderr, no stack trace', () => {
    const bin = fileURLToPath(new URL('../../bin/correlary.mjs', import.meta.url));
    const file = csvFile('bin.csv', 'x,y\n1,2\n2,oops\n');
    const result = spawnSync(process.execPath, [bin, 'fit', file], { encoding: 'utf8' });
    expect(result.status).toBe(1);
    expect(result.stderr.trim().split('\n')).toHaveLength(1);
    expect(result.stderr).toMatch(/bin\.csv:3:3: non-numeric value 'oops' in column 'y'/);
    const ok = execFileSync(process.execPath, [bin, 'fit', csvFile('ok.csv', 'x,y\n1,1\n2,4\n3,9\n4,16\n5,25\n'), '--order', '2', '--json'], { encoding: 'utf8' });
    expect(JSON.parse(ok).coefficients).toEqual([0, 0, 1]);
  });
});

describe('correlary command line: help, limits, warnings', () => {
  for (const command of ['fit', 'check', 'new']) {
    it(`correlary ${command} --help prints its usage and exits 0`, async () => {
      const { code, stdout } = await runCli([command, '--help']);
      expect(code).toBe(0);
      expect(stdout).toMatch(new RegExp(`^usage: correlary ${command}`));
    });
  }

  it('correlary fit --order accepts 0 to 12 like the content format and refuses 13', async () => {
    const file = csvFile('limits.csv', 'x,y\n1,2\n2,3\n3,5\n4,4\n');
    const { code, stderr } = await runCli(['fit', file, '--order', '13']);
    expect(code).toBe(2);
    expect(stderr).toBe("correlary: --order needs a whole number from 0 to 12, got '13'");
    expect((await runCli(['fit', file, '--max-order', '13'])).code).toBe(2);
  });

  it('correlary fit warns about a column that no option names, as check does', async () => {
    const file = csvFile('extra.csv', 'T,cp,comment\n1,2,a\n2,3,b\n3,5,c\n4,4,d\n5,6,e\n');
    const { code, stderr } = await runCli(['fit', file, '--x', 'T', '--y', 'cp', '--json']);
    expect(code).toBe(0);
    expect(stderr).toMatch(/extra\.csv:1:\d+: warning: column 'comment' is not named by --x, --y or --uncertainty and is ignored/);
  });

  it('correlary fit honours --range, --pass-through and --exclude-row through the same checks as a folder', async () => {
    // y = x² at x = 1..6 with row 3 spoilt (computed by hand); excluding it leaves an exact quadratic.
    const file = csvFile('options.csv', 'x,y\n1,1\n2,4\n3,100\n4,16\n5,25\n6,36\n');
    const { code, stdout } = await runCli(['fit', file, '--order', '2', '--exclude-row', '3', '--range', '1:5', '--pass-through', '0,0', '--json']);
    expect(code).toBe(1); // the pass-through x = 0 is outside the validity range 1 to 5
    expect(stdout).toBe('');
    const ok = await runCli(['fit', file, '--order', '2', '--exclude-row', '3', '--range', '1:5', '--pass-through', '2,4', '--json']);
    expect(ok.code).toBe(0);
    const record = JSON.parse(ok.stdout);
    expect(record.n).toBe(5);
    expect(record.range).toMatchObject({ min: 1, max: 5 });
    expect(record.passThrough).toEqual([{ x: 2, y: 4 }]);
    expect(record.provenance.excluded.map((point: { row: number }) => point.row)).toEqual([3]);
    record.coefficients.forEach((a: number, k: number) => expect(a).toBeCloseTo([0, 0, 1][k]!, 12));
  });

  it('correlary fit prints the mapped form and the unit words of the statistics', async () => {
    const file = csvFile('logy.csv', 'T,p\n250,1.5\n260,2.4\n270,3.9\n280,6.1\n290,9.2\n300,13.9\n310,20.1\n');
    const { code, stdout } = await runCli(['fit', file, '--transform-y', 'log', '--transform-x', 'reciprocal', '--order', '2']);
    expect(code).toBe(0);
    expect(stdout).toMatch(/mapped form .*ln\(y\) = sum of b_k \* t\^k, t = \(1\/x - [0-9.e-]+\) \/ [0-9.e-]+/);
    expect(stdout).toMatch(/residual std\. dev\. s = \S+ \(in ln y\)/);
    expect(stdout).not.toMatch(/Order 2, fixed: Order 2/);
  });
});
