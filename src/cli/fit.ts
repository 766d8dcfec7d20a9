/**
 * `correlary fit <file.csv | folder>`: fit one table (or one handbook folder) and print a readable report or,
 * with --json, the export record (src/export, the same serialiser as the downloads and handbook.json).
 *
 * One path: a CSV and its options become a correlation like a handbook folder's (the fit options are validated
 * by the content format's schema, the table by the loader's cross-file checks), and the fit goes through
 * src/load/fitDataset like `check` and the site, so pass-through points, exclusions and the validity range are
 * honoured the same way. Without --order the order is chosen automatically (see src/core/order).
 */
import { stat } from 'node:fs/promises';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { orderCriteria, ORDER_LIMIT, type CriterionName } from '../core/index.ts';
import { correlationRecord } from '../export/index.ts';
import { fitDataset, formatDiagnostic, hasErrors, readDataset, sortDiagnostics, type Diagnostic, type LoadedCorrelation } from '../load/index.ts';
import { checkDataset } from '../load/checkDataset.ts';
import { fitOptionsSchema, type CorrelationMeta } from '../schema/index.ts';
import { CliError } from './cliError.ts';
import { fitReport } from './fitReport.ts';
import { readFitTable } from './readFitTable.ts';

export const FIT_USAGE = `usage: correlary fit <file.csv | folder> [options]

Fits one CSV table (or one handbook folder, with its correlation.yaml) and reports the correlation.

options for a CSV file:
  --x COL, --y COL          columns of x and y (default: the first two columns)
  --uncertainty COL         column of the standard uncertainty of y; gives a weighted fit
  --x-unit U, --y-unit U    units of x and y, printed beside the statistics (default: none)
  --order M                 fixed order, 0 to ${ORDER_LIMIT} (default: chosen automatically)
  --max-order M             highest order considered, 1 to ${ORDER_LIMIT} (default 10)
  --criterion NAME          order-selection criterion (${Object.keys(orderCriteria).join(', ')})
  --no-intercept            fit without a constant term
  --transform-x T           identity, reciprocal or log
  --transform-y T           identity or log
  --range MIN:MAX           narrow the validity range (never wider than the data)
  --pass-through X,Y        the curve must pass through (X, Y); may be repeated
  --exclude-row N           leave data row N (1 = first row after the header) out; may be repeated
options for both:
  --json                    print the export record as JSON instead of the report
  --plot FILE.svg           also write a static picture of the fit (data, curve, bands, residuals)
  -h, --help                print this help`;

interface FitArguments {
  readonly target: string;
  readonly values: Record<string, string | boolean | string[] | undefined>;
  readonly json: boolean;
  readonly plot: string | undefined;
}

const OPTIONS = {
  x: { type: 'string' },
  y: { type: 'string' },
  uncertainty: { type: 'string' },
  'x-unit': { type: 'string' },
  'y-unit': { type: 'string' },
  order: { type: 'string' },
  'max-order': { type: 'string' },
  criterion: { type: 'string' },
  'no-intercept': { type: 'boolean' },
  'transform-x': { type: 'string' },
  'transform-y': { type: 'string' },
  range: { type: 'string' },
  'pass-through': { type: 'string', multiple: true },
  'exclude-row': { type: 'string', multiple: true },
  json: { type: 'boolean' },
  plot: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
} as const;

function wholeNumber(text: string | undefined, option: string, min: number, max: number): number | undefined {
  if (text === undefined) return undefined;
  if (!/^\d+$/.test(text) || Number(text) < min || Number(text) > max) {
    throw new CliError(`--${option} needs a whole number from ${min} to ${max}, got '${text}'`, 2);
  }
  return Number(text);
}

function decimal(text: string, option: string): number {
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text.trim())) throw new CliError(`--${option} needs numbers, got '${text}'`, 2);
  return Number(text.trim());
}

function oneOf<T extends string>(text: string | undefined, option: string, allowed: readonly T[], fallback: T): T {
  if (text === undefined) return fallback;
  if (!(allowed as readonly string[]).includes(text)) {
    throw new CliError(`--${option} must be one of ${allowed.join(', ')}, got '${text}'`, 2);
  }
  return text as T;
}

/** Parse the command line; null when --help was asked for. */
function parseFitArguments(args: readonly string[]): FitArguments | null {
  let parsed;
  try {
    parsed = parseArgs({ args: [...args], allowPositionals: true, options: OPTIONS });
  } catch (error) {
    throw new CliError(`${(error as Error).message.split('\n')[0]}\n${FIT_USAGE}`, 2);
  }
  const { values, positionals } = parsed;
  if (values.help) return null;
  if (positionals.length !== 1) throw new CliError(`correlary fit needs exactly one CSV file or folder\n${FIT_USAGE}`, 2);
  if (values.order !== undefined && values.criterion !== undefined) {
    throw new CliError('--order and --criterion cannot be used together: a fixed order is not chosen by a criterion', 2);
  }
  if (values.plot === '') throw new CliError(`--plot needs a file name\n${FIT_USAGE}`, 2);
  const { plot, ...rest } = values;
  return { target: positionals[0]!, values: rest as FitArguments['values'], json: values.json ?? false, plot };
}

/** The content format's names in the loader's messages, as the command line's options. */
const OPTION_WORDS: readonly [RegExp, string][] = [
  [/fit\.transform\.x/g, '--transform-x'],
  [/fit\.transform\.y/g, '--transform-y'],
  [/fit\.exclude(?:\[\d+\]\.row)?/g, '--exclude-row'],
  [/fit\.range\.(min|max)/g, '--range $1'],
  [/pass-through point/g, '--pass-through point'],
];

function inOptionWords(diagnostic: Diagnostic): Diagnostic {
  const words = (text: string) => OPTION_WORDS.reduce((result, [pattern, replacement]) => result.replace(pattern, replacement), text);
  return { ...diagnostic, message: words(diagnostic.message), ...(diagnostic.hint === undefined ? {} : { hint: words(diagnostic.hint) }) };
}

/** Print every error (and then throw) or return; warnings go to stderr so that --json output stays clean. */
function report(diagnostics: readonly Diagnostic[], warn: (text: string) => void, optionWords = false): void {
  const sorted = sortDiagnostics(diagnostics).map((diagnostic) => (optionWords ? inOptionWords(diagnostic) : diagnostic));
  if (hasErrors(sorted)) {
    throw new CliError(sorted.filter((d) => d.severity === 'error').map(formatDiagnostic).join('\ncorrelary: '));
  }
  for (const diagnostic of sorted) warn(formatDiagnostic(diagnostic));
}

/** A CSV file and its options as a correlation, checked like a handbook folder. */
async function csvCorrelation(file: string, values: FitArguments['values'], warn: (text: string) => void): Promise<LoadedCorrelation> {
  const string = (name: string) => values[name] as string | undefined;
  const list = (name: string) => (values[name] as string[] | undefined) ?? [];
  const order = wholeNumber(string('order'), 'order', 0, ORDER_LIMIT);
  const maxOrder = wholeNumber(string('max-order'), 'max-order', 1, ORDER_LIMIT);
  const criterionNames = Object.keys(orderCriteria) as CriterionName[];
  const criterion = string('criterion') === undefined ? undefined : oneOf(string('criterion'), 'criterion', criterionNames, criterionNames[0]!);
  if (criterion === 'chiSquare' && string('uncertainty') === undefined) {
    throw new CliError('--criterion chiSquare needs per-point uncertainties: name their column with --uncertainty COL', 2);
  }
  const rangeText = string('range');
  let range: { min: number; max: number } | undefined;
  if (rangeText !== undefined) {
    const parts = rangeText.split(':');
    if (parts.length !== 2) throw new CliError(`--range needs MIN:MAX, got '${rangeText}'`, 2);
    range = { min: decimal(parts[0]!, 'range'), max: decimal(parts[1]!, 'range') };
  }
  const passThrough = list('pass-through').map((text) => {
    const parts = text.split(',');
    if (parts.length !== 2) throw new CliError(`--pass-through needs X,Y, got '${text}'`, 2);
    return { x: decimal(parts[0]!, 'pass-through'), y: decimal(parts[1]!, 'pass-through'), reason: 'given on the command line (--pass-through)' };
  });
  const exclude = list('exclude-row').map((text) => ({ row: wholeNumber(text, 'exclude-row', 1, Number.MAX_SAFE_INTEGER)!, reason: 'left out on the command line (--exclude-row)' }));
  const settings = fitOptionsSchema.safeParse({
    order: order ?? 'auto',
    ...(criterion === undefined ? {} : { criterion }),
    ...(order === undefined ? {} : { reason: 'order given on the command line (--order)' }),
    ...(maxOrder === undefined ? {} : { maxOrder }),
    intercept: !values['no-intercept'],
    transform: {
      x: oneOf(string('transform-x'), 'transform-x', ['identity', 'reciprocal', 'log'] as const, 'identity'),
      y: oneOf(string('transform-y'), 'transform-y', ['identity', 'log'] as const, 'identity'),
    },
    weights: string('uncertainty') === undefined ? 'none' : 'uncertainty',
    passThrough,
    exclude,
    ...(range === undefined ? {} : { range }),
  });
  if (!settings.success) {
    const issue = settings.error.issues[0]!;
    throw new CliError(`invalid options: ${issue.path.join('.')} ${issue.message}`, 2);
  }
  const table = await readFitTable(file, { x: string('x'), y: string('y'), uncertainty: string('uncertainty') });
  const { columns } = table;
  const meta: CorrelationMeta = {
    title: `${columns.y} against ${columns.x} from ${path.basename(file)}`,
    invented: false,
    property: { name: columns.y, symbol: 'y', unit: string('y-unit') ?? '' },
    variable: { name: columns.x, symbol: 'x', unit: string('x-unit') ?? '' },
    material: { name: 'not stated (fitted from a file on the command line)' },
    source: { citation: file, method: 'measured', date: '1970-01-01', preparedBy: 'correlary fit' } as CorrelationMeta['source'],
    data: { file: path.basename(file), x: columns.x, y: columns.y, replicates: true, ...(columns.uncertainty === undefined ? {} : { uncertainty: columns.uncertainty }) } as CorrelationMeta['data'],
    fit: settings.data,
    tags: [],
    review: { status: 'draft' },
  };
  const commandLine = 'command line';
  const checked = checkDataset({
    meta,
    points: table.points,
    dataPath: file,
    metadataPath: commandLine,
    headerLine: table.headerLine,
    valueAt: () => ({ line: 0 }),
    cellColumn: table.cellColumn,
  });
  report([...table.warnings, ...checked.diagnostics], warn, true);
  return {
    slug: path.basename(file).replace(/\.[^.]*$/, ''),
    folder: path.dirname(file),
    metadataPath: commandLine,
    dataPath: file,
    meta,
    points: table.points,
    used: checked.used,
    excluded: checked.excluded,
    dataRange: checked.dataRange,
    range: checked.range,
    warnings: [],
    orderPosition: { line: 0 },
    reviewPosition: { line: 0 },
  };
}

/** A handbook folder, read and checked as `check` does. */
async function folderCorrelation(folder: string, values: FitArguments['values'], warn: (text: string) => void): Promise<LoadedCorrelation> {
  const extra = Object.keys(values).filter((name) => values[name] !== undefined && name !== 'json');
  if (extra.length > 0) throw new CliError(`--${extra[0]} applies to a CSV file; a folder's options are in its correlation.yaml`, 2);
  const read = await readDataset(folder);
  report(read.diagnostics, warn);
  if (read.correlation === undefined) throw new CliError(`${folder}: cannot be fitted`);
  return read.correlation;
}

/** Run the command; returns the exit status. */
export async function runFit(
  args: readonly string[],
  out: (text: string) => void = console.log,
  warn: (text: string) => void = (text) => console.error(`correlary: ${text}`),
): Promise<number> {
  const options = parseFitArguments(args);
  if (options === null) {
    out(FIT_USAGE);
    return 0;
  }
  const isFolder = (await stat(options.target).catch(() => undefined))?.isDirectory() ?? false;
  const correlation = isFolder ? await folderCorrelation(options.target, options.values, warn) : await csvCorrelation(options.target, options.values, warn);
  const fitted = fitDataset(correlation);
  report(fitted.diagnostics, warn, !isFolder);
  if (fitted.fit === undefined) throw new CliError(`${options.target}: the fit failed`);
  const record = correlationRecord({
    slug: correlation.slug,
    meta: correlation.meta,
    range: correlation.range,
    excluded: correlation.excluded,
    fit: fitted.fit,
    selection: fitted.selection ?? null,
  });
  if (options.plot !== undefined) {
    const { writeFitPlot } = await import('./fitPlot.ts');
    await writeFitPlot(options.plot, [options.target, correlation.dataPath, correlation.metadataPath], correlation, fitted.fit);
  }
  if (options.json) {
    out(JSON.stringify({ ...record, input: { file: options.target, columns: isFolder ? null : { x: correlation.meta.data.x, y: correlation.meta.data.y, uncertainty: correlation.meta.data.uncertainty ?? null } } }, null, 2));
  } else {
    out(fitReport(record, fitted.fit, options.target));
  }
  return 0;
}
