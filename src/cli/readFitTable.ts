/**
 * Reads the CSV given to `correlary fit`: a header row of column names, then numeric rows. Picks the x, y and
 * optional uncertainty columns (by name, or the first two columns when none is named) and reports the first
 * problem as `file:line: problem`. The file is only read, never written.
 */
import { readFileSync, statSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { CliError } from './cliError.ts';

export interface FitTable {
  readonly x: number[];
  readonly y: number[];
  readonly uncertainty: number[] | undefined;
  /** 1-based file line of each point, for error messages. */
  readonly lines: number[];
  readonly columns: { readonly x: string; readonly y: string; readonly uncertainty: string | undefined };
}

const MAX_BYTES = 50 * 1024 * 1024;

function readText(file: string): string {
  let size: number;
  try {
    size = statSync(file).size;
  } catch {
    throw new CliError(`${file}: cannot read the file (it does not exist or is not accessible)`);
  }
  if (size > MAX_BYTES) throw new CliError(`${file}: the file is larger than the 50 MB limit`);
  return readFileSync(file, 'utf8');
}

function parseNumber(file: string, line: number, column: string, cell: string): number {
  const text = cell.trim();
  if (text === '') throw new CliError(`${file}:${line}: empty cell in column '${column}'`);
  if (/^[+-]?(nan|inf|infinity)$/i.test(text)) throw new CliError(`${file}:${line}: '${text}' in column '${column}' is not a finite number`);
  if (/^[+-]?\d+,\d+$/.test(text)) {
    throw new CliError(`${file}:${line}: '${text}' in column '${column}' uses a decimal comma; write numbers with a decimal point`);
  }
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text)) {
    throw new CliError(`${file}:${line}: '${text}' in column '${column}' is not a number`);
  }
  const value = Number(text);
  if (!Number.isFinite(value)) throw new CliError(`${file}:${line}: '${text}' in column '${column}' is out of the double-precision range`);
  return value;
}

export function readFitTable(
  file: string,
  names: { readonly x?: string | undefined; readonly y?: string | undefined; readonly uncertainty?: string | undefined },
): FitTable {
  const text = readText(file);
  const firstLine = text.replace(/^\uFEFF/, '').split(/\r?\n/, 1)[0] ?? '';
  if (firstLine.includes(';') && !firstLine.includes(',')) {
    throw new CliError(`${file}:1: the columns are separated by semicolons; use commas between columns and decimal points in numbers`);
  }
  let records: { info: { lines: number }; record: string[] }[];
  try {
    records = parse(text, { bom: true, info: true, skip_empty_lines: true, trim: true, comment: '#', relax_column_count: false }) as unknown as typeof records;
  } catch (error) {
    const line = (error as { lines?: number }).lines;
    const reason = (error as Error).message.replace(/^Invalid Record Length: /, '').replace(/\s+/g, ' ');
    throw new CliError(`${file}:${line ?? 1}: malformed CSV: ${reason}`);
  }
  const header = records[0];
  if (!header) throw new CliError(`${file}:1: the file is empty; expected a header row of column names`);
  const headerCells = header.record;
  if (headerCells.every((cell) => /^[+-]?[\d.]/.test(cell))) {
    throw new CliError(`${file}:${header.info.lines}: the first row looks like data; add a header row of column names`);
  }
  const pick = (name: string | undefined, fallback: number, role: string): number => {
    if (name === undefined) return fallback;
    const index = headerCells.indexOf(name);
    if (index < 0) {
      throw new CliError(`${file}:${header.info.lines}: no column named '${name}' for ${role} (columns: ${headerCells.join(', ')})`);
    }
    return index;
  };
  if ((names.x === undefined || names.y === undefined) && headerCells.length < 2) {
    throw new CliError(`${file}:${header.info.lines}: need at least two columns (x and y)`);
  }
  const xIndex = pick(names.x, 0, 'x');
  const yIndex = pick(names.y, names.x === undefined ? 1 : headerCells.findIndex((_, i) => i !== xIndex), 'y');
  const uIndex = names.uncertainty === undefined ? -1 : pick(names.uncertainty, -1, 'the uncertainty');
  const x: number[] = [];
  const y: number[] = [];
  const uncertainty: number[] = [];
  const lines: number[] = [];
  for (const { info, record } of records.slice(1)) {
    const line = info.lines;
    x.push(parseNumber(file, line, headerCells[xIndex]!, record[xIndex] ?? ''));
    y.push(parseNumber(file, line, headerCells[yIndex]!, record[yIndex] ?? ''));
    if (uIndex >= 0) {
      const sigma = parseNumber(file, line, headerCells[uIndex]!, record[uIndex] ?? '');
      if (!(sigma > 0)) throw new CliError(`${file}:${line}: uncertainty ${sigma} must be positive`);
      uncertainty.push(sigma);
    }
    lines.push(line);
  }
  return {
    x,
    y,
    uncertainty: uIndex >= 0 ? uncertainty : undefined,
    lines,
    columns: { x: headerCells[xIndex]!, y: headerCells[yIndex]!, uncertainty: uIndex >= 0 ? headerCells[uIndex] : undefined },
  };
}
