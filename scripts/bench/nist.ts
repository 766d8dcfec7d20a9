/**
 * bench:nist — LRE table on the NIST StRD fixtures (test/fixtures/nist-strd), computed through the CLI exactly as
 * a user would run it (`correlary fit file.csv --x x --y y --order M [--no-intercept] --json`), then the same
 * problems through the core with the exact certification switched off, to show what the floating-point QR alone
 * delivers (the measurement behind using the exact step).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main.ts';
import { fitPolynomial } from '../../src/core/index.ts';
import { lre } from '../../test/helpers/lre.ts';
import { nistDatToCsv, nistDatasets, powerOf } from '../../test/helpers/nist.ts';

const dir = mkdtempSync(join(tmpdir(), 'correlary-nist-'));
const rows = ['| dataset | degree | coefficients | their std. deviations | residual s | R² |', '|---|---:|---:|---:|---:|---:|'];
const log = console.log;
for (const [name, dataset] of Object.entries(nistDatasets)) {
  const file = join(dir, `${name}.csv`);
  writeFileSync(file, nistDatToCsv(name));
  let output = '';
  console.log = (text: string) => void (output += text);
  const args = ['fit', file, '--x', 'x', '--y', 'y', '--order', String(dataset.model.degree), '--json'];
  if (!dataset.model.intercept) args.push('--no-intercept');
  const code = await main(args);
  console.log = log;
  if (code !== 0) throw new Error(`correlary fit failed on ${name}`);
  const result = JSON.parse(output);
  const coefficient = Math.min(...dataset.certified.parameters.map((p) => lre(result.coefficients[powerOf(p.name)], p.estimate.value!)));
  const deviation = Math.min(...dataset.certified.parameters.map((p) => lre(result.standardErrors[powerOf(p.name)], p.standardDeviation.value!)));
  const s = lre(result.residualStdDev, dataset.certified.residualStandardDeviation.value!);
  const r2 = lre(result.rSquared, dataset.certified.rSquared.value!);
  rows.push(`| ${name} | ${dataset.model.degree}${dataset.model.intercept ? '' : ' (no intercept)'} | ${coefficient.toFixed(1)} | ${deviation.toFixed(1)} | ${s.toFixed(1)} | ${r2.toFixed(1)} |`);
}
console.log(rows.join('\n'));

const floating = ['| dataset (floating point only) | coefficients | their std. deviations | residual s | R² |', '|---|---:|---:|---:|---:|'];
for (const [name, dataset] of Object.entries(nistDatasets)) {
  const fit = fitPolynomial({ x: dataset.data.x, y: dataset.data.y }, { order: dataset.model.degree, intercept: dataset.model.intercept, exact: 'off' });
  const coefficient = Math.min(...dataset.certified.parameters.map((p) => lre(fit.coefficients[powerOf(p.name)]!, p.estimate.value!)));
  const deviation = Math.min(...dataset.certified.parameters.map((p) => lre(fit.standardErrors[powerOf(p.name)]!, p.standardDeviation.value!)));
  const s = lre(fit.statistics.residualStdDev, dataset.certified.residualStandardDeviation.value!);
  const r2 = lre(fit.statistics.rSquared, dataset.certified.rSquared.value!);
  floating.push(`| ${name} | ${coefficient.toFixed(1)} | ${deviation.toFixed(1)} | ${s.toFixed(1)} | ${r2.toFixed(1)} |`);
}
console.log('');
console.log(floating.join('\n'));
