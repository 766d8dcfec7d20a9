/**
 * `correlary check [DIR]`: validate and fit every correlation folder in DIR (default `content`), print every
 * problem one per line as `path:line:column: problem`, then one summary line per correlation.
 * Exit status: 0 when there are no errors (warnings allowed), 1 otherwise, 2 on bad usage.
 */
import { stat } from 'node:fs/promises';
import { fitHandbook, formatDiagnostic } from '../load/index.ts';
import type { PolynomialFit } from '../core/index.ts';
import { CliError } from './cliError.ts';
import { createProgress } from './progress.ts';

const USAGE = `usage: correlary check [DIR] [--strict]   (DIR defaults to content)
  --strict   warnings fail the check too (exit 1), e.g. a lapsed or unbound approval`;

/** Four significant digits, without a trailing exponent for ordinary magnitudes. */
function short(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))) : String(value);
}

/** One summary line: slug, points used, chosen order, residual standard deviation and R². */
function summaryLine(slug: string, fit: PolynomialFit, criterion: string, unit: string): string {
  const residual = short(fit.statistics.residualStdDev);
  // Weighted residuals are divided by each point's uncertainty, so s is a pure number (1 = scatter as stated).
  // A dimensionless property (unit "1") gets no unit after s: "s = 0.0884", not "s = 0.0884 1".
  const s = fit.weighted ? `${residual} (weighted, 1 = scatter as stated)` : fit.transformY === 'log' ? `${residual} (in ln y)` : unit === '1' ? residual : `${residual} ${unit}`;
  const r2 = fit.statistics.rSquared;
  return `${slug}: n = ${fit.statistics.n}, order ${fit.order} (${criterion}), s = ${s}, R² = ${Number.isFinite(r2) ? r2.toFixed(6) : String(r2)}`;
}

export async function runCheck(args: string[]): Promise<number> {
  const positional = args.filter((arg) => !arg.startsWith('-'));
  const options = args.filter((arg) => arg.startsWith('-'));
  if (options.includes('-h') || options.includes('--help')) {
    console.log(USAGE);
    return 0;
  }
  const strict = options.includes('--strict');
  const unknown = options.filter((option) => option !== '--strict');
  if (unknown.length > 0) throw new CliError(`check does not take option '${unknown[0]}'\n${USAGE}`, 2);
  if (positional.length > 1) throw new CliError(`check takes one directory, got ${positional.length}\n${USAGE}`, 2);
  const directory = positional[0] ?? 'content';
  const info = await stat(directory).catch(() => undefined);
  if (info === undefined || !info.isDirectory()) throw new CliError(`check requires a directory; '${directory}' is not one`, 2);

  const progress = createProgress();
  progress.update(`reading ${directory}`);
  const handbook = await fitHandbook(directory, { onFitted: (done, total) => progress.update(`read and fitted ${done} of ${total} correlations`) });
  progress.done();
  const summaries: string[] = [];
  for (const { dataset, fitted } of handbook.datasets) {
    if (dataset.correlation === undefined || fitted === undefined) {
      const count = dataset.diagnostics.filter((diagnostic) => diagnostic.severity === 'error').length;
      summaries.push(`${dataset.slug}: not fitted, ${count} error${count === 1 ? '' : 's'}`);
      continue;
    }
    if (fitted.fit === undefined || fitted.selection === undefined) {
      summaries.push(`${dataset.slug}: not fitted, the fit failed`);
      continue;
    }
    summaries.push(summaryLine(dataset.slug, fitted.fit, fitted.selection.criterion, dataset.correlation.meta.property.unit));
  }

  const sorted = handbook.diagnostics;
  for (const message of sorted) console.log(formatDiagnostic(message));
  for (const summary of summaries) console.log(summary);
  const errors = sorted.filter((message) => message.severity === 'error').length;
  const warnings = sorted.length - errors;
  const count = handbook.datasets.length;
  console.log(`checked ${count} correlation${count === 1 ? '' : 's'} in ${directory}: ${errors} error${errors === 1 ? '' : 's'}, ${warnings} warning${warnings === 1 ? '' : 's'}`);
  if (strict && errors === 0 && warnings > 0) {
    console.log(`--strict: the ${warnings} warning${warnings === 1 ? '' : 's'} above fail${warnings === 1 ? 's' : ''} the check`);
    return 1;
  }
  return errors === 0 ? 0 : 1;
}
