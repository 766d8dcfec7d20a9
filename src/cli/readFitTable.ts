/**
 * Reads the CSV given to `correlary fit` with the handbook's own reader (src/load: readText → readCsv →
 * tableToPoints), so `fit` and `check` word their messages the same way. Columns are picked by name, or the
 * first two are x and y when none is named; with no column named, a file without a header row is read as data. The first error is reported as one `file:line:column: problem` line.
 * The file is only read, never written.
 */
import { resolve } from 'node:path';
import { formatDiagnostic, sortDiagnostics, type Diagnostic } from '../load/index.ts';
import { DATA_FILE_LIMIT_BYTES } from '../load/limits.ts';
import { readCsv, type CsvTable } from '../load/readCsv.ts';
import { readText } from '../load/readText.ts';
import { NUMBER_PATTERN, tableToPoints } from '../load/tableToPoints.ts';
import type { DataPoint } from '../schema/index.ts';
import { CliError } from './cliError.ts';

export interface FitTable {
  /** Every data row as a point (row, file line, x, y and, when a column is named, the uncertainty). */
  readonly points: DataPoint[];
  readonly headerLine: number;
  /** 1-based column of the x or y cell of a data line, for messages. */
  readonly cellColumn: (line: number, role: 'x' | 'y') => number | undefined;
  /** Warnings about the table, e.g. a column that no option names and that is ignored. */
  readonly warnings: Diagnostic[];
  readonly columns: { readonly x: string; readonly y: string; readonly uncertainty: string | undefined };
}

function firstError(diagnostics: readonly Diagnostic[]): CliError | undefined {
  const first = sortDiagnostics(diagnostics).find((diagnostic) => diagnostic.severity === 'error');
  return first ? new CliError(formatDiagnostic(first)) : undefined;
}

/**
 * A table whose first row is all numbers has no header: with no column named, `fit` reads it as data and calls
 * the columns 'column 1', 'column 2', … (x is the first, y the second). Any other table is returned unchanged.
 */
function withoutHeader(table: CsvTable): CsvTable {
  if (!table.header.every((cell) => NUMBER_PATTERN.test(cell.text))) return table;
  return {
    headerLine: table.headerLine,
    header: table.header.map((cell, index) => ({ ...cell, text: `column ${index + 1}` })),
    rows: [{ row: 1, line: table.headerLine, cells: table.header }, ...table.rows.map((row) => ({ ...row, row: row.row + 1 }))],
  };
}

export async function readFitTable(
  file: string,
  names: { readonly x?: string | undefined; readonly y?: string | undefined; readonly uncertainty?: string | undefined },
): Promise<FitTable> {
  let read;
  try {
    read = await readText(resolve(file), file, DATA_FILE_LIMIT_BYTES);
  } catch {
    throw new CliError(`${file}: cannot read the file (it does not exist or is not accessible)`);
  }
  if (!read.ok) throw new CliError(formatDiagnostic(read.diagnostic));
  const parsed = readCsv(read.text, file);
  const parsedTable = parsed.table;
  if (parsedTable === undefined) throw firstError(parsed.diagnostics) ?? new CliError(`${file}: cannot read the table`);
  const table = names.x === undefined && names.y === undefined ? withoutHeader(parsedTable) : parsedTable;
  const header = table.header.map((cell) => cell.text);
  const x = names.x ?? header[0] ?? '';
  const y = names.y ?? header.find((name) => name !== x) ?? '';
  const points = tableToPoints(table, { file, x, y, uncertainty: names.uncertainty, replicates: true }, file, (role) => `--${role}`);
  const failure = firstError([...parsed.diagnostics, ...points.diagnostics]);
  if (failure || points.points === undefined) throw failure ?? new CliError(`${file}: cannot read the table`);
  const roleIndex = { x: header.indexOf(x), y: header.indexOf(y) };
  const rowsByLine = new Map(table.rows.map((row) => [row.line, row]));
  const warnings = [...parsed.diagnostics, ...points.diagnostics]
    .filter((diagnostic) => diagnostic.severity === 'warning')
    .map((diagnostic) => ({ ...diagnostic, message: diagnostic.message.replace('is not named in the metadata and is ignored', 'is not named by --x, --y or --uncertainty and is ignored') }));
  return {
    points: points.points,
    headerLine: table.headerLine,
    cellColumn: (line, role) => rowsByLine.get(line)?.cells[roleIndex[role]]?.column,
    warnings,
    columns: { x, y, uncertainty: names.uncertainty },
  };
}
