/**
 * bench:nist — LRE table on the NIST StRD fixtures (test/fixtures/nist-strd), computed through the CLI exactly as
 * a user would run it (`correlary fit file.csv --x x --y y --order M [--no-intercept] --json`).
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main.ts';
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
