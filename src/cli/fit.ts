/**
 * `correlary fit <file.csv>`: fit one table and print a readable report or, with --json, one JSON object.
 * Without --order the order is chosen automatically (see src/core/order); the report says how and why.
 */
import { parseArgs } from 'node:util';
import {
  cautionsFor,
  equationPlain,
  fitPolynomial,
  FitError,
  formatCoefficient,
  formatP,
  type PolynomialFit,
  type TransformX,
  type TransformY,
  orderCriteria,
  selectOrder,
  validateFitData,
  type CriterionName,
  type OrderSelection,
} from '../core/index.ts';
import { CliError } from './cliError.ts';
import { readFitTable, type FitTable } from './readFitTable.ts';

export const FIT_USAGE = `usage: correlary fit <file.csv> [--x COL] [--y COL] [--uncertainty COL] [--order M] [--max-order M]
       [--criterion NAME] [--no-intercept] [--transform-x identity|reciprocal|log] [--transform-y identity|log] [--json]`;

interface FitArguments {
  readonly file: string;
  readonly x: string | undefined;
  readonly y: string | undefined;
  readonly uncertainty: string | undefined;
  readonly order: number | undefined;
  readonly maxOrder: number | undefined;
  readonly criterion: CriterionName | undefined;
  readonly intercept: boolean;
  readonly transformX: TransformX;
  readonly transformY: TransformY;
  readonly json: boolean;
}

function wholeNumber(text: string | undefined, option: string): number | undefined {
  if (text === undefined) return undefined;
  if (!/^\d+$/.test(text)) throw new CliError(`--${option} needs a whole number ≥ 0, got '${text}'`, 2);
  return Number(text);
}

function oneOf<T extends string>(text: string | undefined, option: string, allowed: readonly T[], fallback: T): T {
  if (text === undefined) return fallback;
  if (!(allowed as readonly string[]).includes(text)) {
    throw new CliError(`--${option} must be one of ${allowed.join(', ')}, got '${text}'`, 2);
  }
  return text as T;
}

function parseFitArguments(args: readonly string[]): FitArguments {
  let parsed;
  try {
    parsed = parseArgs({
      args: [...args],
      allowPositionals: true,
      options: {
        x: { type: 'string' },
        y: { type: 'string' },
        uncertainty: { type: 'string' },
        order: { type: 'string' },
        'max-order': { type: 'string' },
        criterion: { type: 'string' },
        'no-intercept': { type: 'boolean' },
        'transform-x': { type: 'string' },
        'transform-y': { type: 'string' },
        json: { type: 'boolean' },
      },
    });
  } catch (error) {
    throw new CliError(`${(error as Error).message.split('\n')[0]}\n${FIT_USAGE}`, 2);
  }
  const { values, positionals } = parsed;
  if (positionals.length !== 1) throw new CliError(`correlary fit needs exactly one CSV file\n${FIT_USAGE}`, 2);
  const criterionNames = Object.keys(orderCriteria) as CriterionName[];
  if (values.order !== undefined && values.criterion !== undefined) {
    throw new CliError('--order and --criterion cannot be used together: a fixed order is not chosen by a criterion', 2);
  }
  return {
    file: positionals[0]!,
    x: values.x,
    y: values.y,
    uncertainty: values.uncertainty,
    order: wholeNumber(values.order, 'order'),
    maxOrder: wholeNumber(values['max-order'], 'max-order'),
    criterion: values.criterion === undefined ? undefined : oneOf(values.criterion, 'criterion', criterionNames, criterionNames[0]!),
    intercept: !values['no-intercept'],
    transformX: oneOf(values['transform-x'], 'transform-x', ['identity', 'reciprocal', 'log'] as const, 'identity'),
    transformY: oneOf(values['transform-y'], 'transform-y', ['identity', 'log'] as const, 'identity'),
    json: values.json ?? false,
  };
}

/** Turn a core FitError into a one-line message naming the file and, where known, the line. */
function describeFitError(error: FitError, file: string, table: FitTable): CliError {
  const line = error.pointIndex !== undefined ? table.lines[error.pointIndex] : undefined;
  return new CliError(`${file}${line !== undefined ? `:${line}` : ''}: ${error.message}`);
}

/** Run the command; returns the exit status. */
export async function runFit(args: readonly string[], out: (text: string) => void = console.log): Promise<number> {
  const options = parseFitArguments(args);
  if (options.criterion === 'chiSquare' && options.uncertainty === undefined) {
    throw new CliError('--criterion chiSquare needs per-point uncertainties: name their column with --uncertainty COL', 2);
  }
  const table = await readFitTable(options.file, options);
  const data = { x: table.x, y: table.y, uncertainty: table.uncertainty };
  let selection: OrderSelection;
  let fit: PolynomialFit;
  try {
    validateFitData(data);
    selection = selectOrder(data, {
      criterion: options.criterion,
      maxOrder: options.maxOrder,
      intercept: options.intercept,
      transformX: options.transformX,
      transformY: options.transformY,
      fixedOrder: options.order,
      reason: options.order !== undefined ? 'order given on the command line (--order)' : undefined,
    });
    fit = fitPolynomial(data, {
      order: selection.order,
      intercept: options.intercept,
      transformX: options.transformX,
      transformY: options.transformY,
    });
  } catch (error) {
    if (error instanceof FitError) throw describeFitError(error, options.file, table);
    throw error;
  }
  const cautions = cautionsFor(fit.range, '', table.columns.x);
  if (options.json) {
    out(JSON.stringify(fitJson(fit, selection, options.file, table, cautions), null, 2));
  } else {
    out(fitReport(fit, selection, options.file, table, cautions));
  }
  return 0;
}

function fitJson(fit: PolynomialFit, selection: OrderSelection, file: string, table: FitTable, cautions: readonly string[]) {
  return {
    file,
    columns: table.columns,
    order: fit.order,
    criterion: selection.criterion,
    reason: selection.reason,
    rule: selection.rule,
    coefficients: fit.coefficients,
    standardErrors: fit.standardErrors,
    significantDigits: fit.significantDigits,
    residualStdDev: fit.statistics.residualStdDev,
    rSquared: fit.statistics.rSquared,
    n: fit.statistics.n,
    range: fit.range,
    transformX: fit.transformX,
    transformY: fit.transformY,
    intercept: fit.intercept,
    statistics: fit.statistics,
    confidenceIntervals: fit.confidenceIntervals,
    mapped: fit.mapped,
    checkValues: fit.checkValues,
    lackOfFit: fit.lackOfFit,
    runsTest: fit.runsTest,
    method: fit.method,
    orders: selection.orders,
    warnings: [...selection.warnings, ...fit.warnings],
    cautions,
  };
}

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

function number(value: number | null, digits = 6): string {
  return value === null || !Number.isFinite(value) ? '—' : formatCoefficient(value, digits);
}

function fitReport(fit: PolynomialFit, selection: OrderSelection, file: string, table: FitTable, cautions: readonly string[]): string {
  const s = fit.statistics;
  const lines: string[] = [];
  lines.push(`Correlation fitted to ${file} (x = '${table.columns.x}', y = '${table.columns.y}'${table.columns.uncertainty ? `, σ = '${table.columns.uncertainty}'` : ''})`);
  lines.push('');
  lines.push(`  ${equationPlain(fit, { x: 'x', y: 'y' })}`);
  lines.push(`  valid for ${fit.range.min} ≤ x ≤ ${fit.range.max}`);
  lines.push('');
  lines.push(`Order ${fit.order}, chosen by ${selection.criterion}: ${selection.reason}`);
  lines.push('');
  lines.push('Coefficients (ascending powers; print at least the digits shown):');
  lines.push(`  ${pad('k', 4)}${pad('a_k', 26)}${pad('std. error', 14)}${pad(`${Math.round(fit.confidence * 100)} % interval`, 30)}`);
  fit.coefficients.forEach((a, k) => {
    if (k === 0 && !fit.intercept) return;
    const ci = fit.confidenceIntervals[k]!;
    lines.push(`  ${pad(String(k), 4)}${pad(formatCoefficient(a, fit.significantDigits[k]!), 26)}${pad(number(fit.standardErrors[k]!, 3), 14)}[${number(ci[0], 4)}, ${number(ci[1], 4)}]`);
  });
  lines.push('');
  lines.push('Statistics:');
  lines.push(`  n = ${s.n}, free parameters = ${s.parameters}, residual dof = ${s.degreesOfFreedom}`);
  lines.push(`  residual std. dev. s = ${number(s.residualStdDev)}, RMSE = ${number(s.rmse)}, S_r = ${number(s.residualSumOfSquares)}`);
  lines.push(`  R² = ${number(s.rSquared, 10)}${s.rSquaredCentred ? '' : ' (uncentred)'}, adjusted R² = ${number(s.adjustedRSquared, 10)}`);
  lines.push(`  max |residual| = ${number(s.maxAbsResidualOriginal)} (${number(s.maxRelResidualOriginal * 100, 3)} % of y)`);
  lines.push(`  PRESS = ${number(s.press)}, leave-one-out RMSE = ${number(s.looRmse)}, AICc = ${number(s.aicc)}, BIC = ${number(s.bic)}`);
  lines.push(`  condition number: raw basis ${number(s.conditionRaw, 3)}, mapped basis ${number(s.conditionMapped, 3)}`);
  if (s.reducedChiSquare !== null) lines.push(`  reduced χ² = ${number(s.reducedChiSquare, 4)} (p = ${number(s.chiSquareP, 3)})`);
  if (fit.lackOfFit) lines.push(`  lack-of-fit F = ${number(fit.lackOfFit.f, 4)} (p = ${number(fit.lackOfFit.p, 3)})`);
  if (fit.runsTest) lines.push(`  residual sign runs: ${fit.runsTest.runs} (expected ${number(fit.runsTest.expectedRuns, 3)}, p = ${number(fit.runsTest.p, 3)})`);
  lines.push(`  solver: ${fit.method.solver}${fit.method.refinement === 'exact-rational' ? ', coefficients certified in exact rational arithmetic' : ''}`);
  lines.push('');
  lines.push('Order table:');
  lines.push(`  ${pad('m', 4)}${pad('s²', 14)}${pad('adj. R²', 14)}${pad('AICc', 12)}${pad('BIC', 12)}${pad('LOO RMSE', 14)}p (to m+1)`);
  for (const row of selection.orders) {
    const mark = row.order === fit.order ? '*' : ' ';
    lines.push(`${mark} ${pad(String(row.order), 4)}${pad(number(row.residualVariance, 4), 14)}${pad(number(row.adjustedRSquared, 6), 14)}${pad(number(row.aicc, 5), 12)}${pad(number(row.bic, 5), 12)}${pad(number(row.looRmse, 4), 14)}${row.pToNext === null ? '—' : formatP(row.pToNext)}`);
  }
  lines.push('');
  lines.push('Check values (evaluate your copy of the equation here):');
  for (const check of fit.checkValues) lines.push(`  x = ${pad(String(check.x), 22)} y = ${check.y.toPrecision(12)}`);
  const warnings = [...selection.warnings, ...fit.warnings];
  if (warnings.length) {
    lines.push('');
    lines.push('Warnings:');
    for (const warning of warnings) lines.push(`  - ${warning}`);
  }
  lines.push('');
  lines.push('Cautions:');
  for (const caution of cautions) lines.push(`  - ${caution}`);
  return lines.join('\n');
}
