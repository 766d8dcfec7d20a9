/**
 * `correlary fit <file.csv>`: fit one table and print a readable report or, with --json, one JSON object.
 * Without --order the order is chosen automatically (see src/core/order); the report says how and why.
 */
import { parseArgs } from 'node:util';
import {
  cautionsFor,
  fitPolynomial,
  FitError,
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
import { fitJson, fitReport } from './fitReport.ts';
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
