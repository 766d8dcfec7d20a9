/**
 * Parse a data file with csv-parse, keeping the line and column of every cell.
 *
 * Accepted: comma-separated values, '.' as the decimal point, a header row first, blank lines, whole-line
 * comments starting with '#', a UTF-8 BOM (removed before this step) and CRLF or LF line ends.
 * Semicolon- or tab-delimited files are detected and refused with a message rather than guessed at.
 */
import { CsvError, parse } from 'csv-parse/sync';
import { error, type Diagnostic } from './diagnostic.ts';

/** One cell: its trimmed text and where it starts. `column` is undefined for cells of a record spanning lines. */
export interface CsvCell {
  readonly text: string;
  readonly line: number;
  readonly column: number | undefined;
}

/** One record after the header. `row` counts data rows from 1. */
export interface CsvRow {
  readonly row: number;
  readonly line: number;
  readonly cells: readonly CsvCell[];
}

export interface CsvTable {
  readonly headerLine: number;
  readonly header: readonly CsvCell[];
  readonly rows: readonly CsvRow[];
}

export type CsvResult = { table: CsvTable; diagnostics: Diagnostic[] } | { table: undefined; diagnostics: Diagnostic[] };

/** Start offsets (0-based) of the fields of one physical line, found by tracking quotes only. */
function fieldStarts(lineText: string): number[] {
  const starts = [0];
  let quoted = false;
  for (let i = 0; i < lineText.length; i++) {
    const character = lineText[i];
    if (character === '"') quoted = !quoted;
    else if (character === ',' && !quoted) starts.push(i + 1);
  }
  return starts;
}

/** 1-based column of the first non-space character of field `index` on `lineText`. */
function cellColumn(lineText: string, starts: readonly number[], index: number): number | undefined {
  const start = starts[index];
  if (start === undefined) return undefined;
  let offset = start;
  while (lineText[offset] === ' ' || lineText[offset] === '\t') offset++;
  return offset + 1;
}

const CSV_MESSAGES: Record<string, string> = {
  CSV_QUOTE_NOT_CLOSED: 'malformed CSV: a quote opened on this line is never closed',
  INVALID_OPENING_QUOTE: 'malformed CSV: a quote appears inside an unquoted field',
  CSV_INVALID_CLOSING_QUOTE: 'malformed CSV: a quoted field goes on after its closing quote',
};

/** How csv-parse reads a data file (besides `info`). */
const PARSE_OPTIONS = { relax_column_count: true, skip_empty_lines: true, comment: '#', comment_no_infix: true, trim: true } as const;

type ParsedRecord = { record: string[]; info: { lines: number } };

/** Whether csv-parse's record holds exactly the trimmed comma-separated fields of one physical line. */
function isRecordOf(record: readonly string[], lineText: string): boolean {
  const fields = lineText.split(',');
  if (fields.length !== record.length) return false;
  for (let i = 0; i < fields.length; i++) if (fields[i]!.trim() !== record[i]) return false;
  return true;
}

/** A line csv-parse skips (blank, or a whole-line comment). */
function isSkipped(lineText: string): boolean {
  const start = lineText.trimStart();
  return start === '' || start.startsWith('#');
}

/**
 * The records of a file without quotes and with one kind of line end, each with the line it ends on, from
 * csv-parse without its per-record info objects (which make parsing about three times dearer). In such a file every
 * record is one physical line, found by walking past the lines csv-parse skipped (blank and comment lines); each
 * record is checked against its line's fields. Undefined whenever that does not hold exactly (a quote, mixed or lone
 * CR line ends, a field csv-parse trims otherwise than String.trim, any parse error): the caller then asks csv-parse
 * for the lines (test/load/readCsv.test.ts compares both ways on random files).
 */
function quoteFreeRecords(text: string, lines: readonly string[]): ParsedRecord[] | undefined {
  if (text.includes('"')) return undefined;
  if (text.includes('\r') && /\r(?!\n)|(?<!\r)\n/.test(text)) return undefined;
  let records: string[][];
  try {
    records = parse(text, PARSE_OPTIONS) as string[][];
  } catch {
    return undefined;
  }
  const parsed: ParsedRecord[] = [];
  let index = 0;
  for (const record of records) {
    // A record of one empty field could stand for a blank line: not told apart here.
    if (record.length === 1 && record[0] === '') return undefined;
    for (;;) {
      const lineText = lines[index++];
      if (lineText === undefined) return undefined;
      if (isRecordOf(record, lineText)) {
        parsed.push({ record, info: { lines: index } });
        break;
      }
      if (!isSkipped(lineText)) return undefined;
    }
  }
  for (; index < lines.length; index++) if (!isSkipped(lines[index]!)) return undefined;
  return parsed;
}

/** Say which delimiter the header line uses when it is not a comma, or undefined for a comma file. */
function foreignDelimiter(headerText: string): 'semicolon' | 'tab' | undefined {
  if (headerText.includes(',')) return undefined;
  if (headerText.includes(';')) return 'semicolon';
  if (headerText.includes('\t')) return 'tab';
  return undefined;
}

/**
 * Parse CSV text into a header and rows of text cells with positions. Numbers are not interpreted here.
 * @param text file contents with any BOM removed
 * @param displayPath path printed in messages
 * @param options `lineInfo: true` always takes each record's line from csv-parse's info objects (what the quote-free
 *   path must agree with; for tests)
 */
export function readCsv(text: string, displayPath: string, options: { readonly lineInfo?: boolean } = {}): CsvResult {
  const lines = text.split(/\r\n|\n|\r/);
  const headerIndex = lines.findIndex((line) => line.trim() !== '' && !line.trimStart().startsWith('#'));
  if (headerIndex < 0) {
    return { table: undefined, diagnostics: [error(displayPath, { line: 1 }, 'data file has no header row and no data')] };
  }
  const headerText = lines[headerIndex] ?? '';
  const delimiter = foreignDelimiter(headerText);
  if (delimiter !== undefined) {
    const decimalComma = lines.some((line) => /\d,\d/.test(line));
    const what = delimiter === 'semicolon' ? 'semicolons' : 'tabs';
    return {
      table: undefined,
      diagnostics: [
        error(
          displayPath,
          { line: headerIndex + 1, column: 1 },
          `fields are separated by ${what}${decimalComma ? ' and numbers use decimal commas' : ''}, but Correlary reads only comma-separated files with '.' decimals`,
          "export the file as CSV with ',' between fields and '.' as the decimal point",
        ),
      ],
    };
  }

  let records: ParsedRecord[];
  try {
    records = (options.lineInfo ? undefined : quoteFreeRecords(text, lines)) ?? (parse(text, { ...PARSE_OPTIONS, info: true }) as unknown as ParsedRecord[]);
  } catch (caught) {
    if (!(caught instanceof CsvError)) throw caught;
    let line = typeof caught['lines'] === 'number' ? caught['lines'] : 1;
    if (caught.code === 'CSV_QUOTE_NOT_CLOSED') {
      // csv-parse reports the end of the file; the quote was opened on the first line with an odd quote count.
      const opened = lines.findIndex((text) => !text.trimStart().startsWith('#') && (text.match(/"/g)?.length ?? 0) % 2 === 1);
      if (opened >= 0) line = opened + 1;
    }
    const message = CSV_MESSAGES[caught.code] ?? `malformed CSV: ${caught.message.replace(/\.$/, '')}`;
    return {
      table: undefined,
      diagnostics: [error(displayPath, { line }, message, 'a field holding a quote or comma must be quoted, with inner quotes doubled ("")')],
    };
  }

  const toCells = (record: readonly string[], endLine: number): { line: number; cells: CsvCell[] } => {
    const spannedLines = record.reduce((count, field) => count + (field.match(/\r\n|\n|\r/g)?.length ?? 0), 0);
    const line = endLine - spannedLines;
    const lineText = lines[line - 1] ?? '';
    const starts = spannedLines === 0 ? fieldStarts(lineText) : [];
    const cells = record.map((text, index) => ({
      text,
      line,
      column: spannedLines === 0 ? cellColumn(lineText, starts, index) : undefined,
    }));
    return { line, cells };
  };

  const [first, ...rest] = records;
  if (first === undefined) {
    return { table: undefined, diagnostics: [error(displayPath, { line: 1 }, 'data file has no header row and no data')] };
  }
  const header = toCells(first.record, first.info.lines);
  const rows = rest.map((entry, index) => {
    const { line, cells } = toCells(entry.record, entry.info.lines);
    return { row: index + 1, line, cells };
  });
  return { table: { headerLine: header.line, header: header.cells, rows }, diagnostics: [] };
}
