/**
 * Check a parsed CSV table against the declared columns and turn its rows into numeric points.
 */
import type { DataColumns, DataPoint } from '../schema/index.ts';
import { error, warning, type Diagnostic } from './diagnostic.ts';
import type { CsvCell, CsvTable } from './readCsv.ts';
import { suggest } from './suggest.ts';

/** A plain decimal number: optional sign, digits with an optional '.' part, optional exponent. */
export const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NON_FINITE_PATTERN = /^[+-]?(nan|inf|infinity)$/i;
const DECIMAL_COMMA_PATTERN = /^[+-]?\d+,\d+([eE][+-]?\d+)?$/;

export interface PointsResult {
  /** Points, when every cell of the declared columns is valid. */
  readonly points: DataPoint[] | undefined;
  /**
   * The rows whose declared cells are valid, even when other rows are not (empty when the x or y column is not
   * known): checks that hold row by row (transforms, exclusions by row) still run on them, so one run reports
   * every problem.
   */
  readonly validPoints: DataPoint[];
  /** Number of data rows in the file (valid or not), for exclusions by row number. */
  readonly rowCount: number;
  readonly diagnostics: Diagnostic[];
}

export type Role = 'x' | 'y' | 'uncertainty' | 'note';

/** Parse one numeric cell, or describe why it is not a number. */
function numericCell(cell: CsvCell | undefined, columnName: string, file: string, line: number): number | Diagnostic {
  if (cell === undefined || cell.text === '') {
    return error(file, { line, column: cell?.column }, `empty cell in column '${columnName}'`, 'every row needs a value here; leave a row out with fit.exclude or a # comment line');
  }
  const position = { line: cell.line, column: cell.column };
  if (NON_FINITE_PATTERN.test(cell.text)) {
    return error(file, position, `'${cell.text}' in column '${columnName}' is not a finite number`, 'remove the row or turn it into a # comment line');
  }
  if (DECIMAL_COMMA_PATTERN.test(cell.text)) {
    return error(file, position, `decimal comma in '${cell.text}' (column '${columnName}')`, "use '.' as the decimal point");
  }
  if (!NUMBER_PATTERN.test(cell.text)) {
    return error(file, position, `non-numeric value '${cell.text}' in column '${columnName}'`);
  }
  return Number(cell.text);
}

/**
 * Check the header and every row, and build points when the declared columns are known and valid.
 * @param columns the metadata's data block, or undefined when it could not be read (then the first two columns
 *   are checked as numeric, so number problems are still reported)
 */
export function tableToPoints(
  table: CsvTable,
  columns: DataColumns | undefined,
  file: string,
  /** Where a column name came from, for messages; the CLI names its options instead of the metadata. */
  origin: (role: Role) => string = (role) => `data.${role} in the metadata`,
): PointsResult {
  const diagnostics: Diagnostic[] = [];
  const headerNames = table.header.map((cell) => cell.text);

  if (table.header.every((cell) => NUMBER_PATTERN.test(cell.text))) {
    const example = columns === undefined ? 'T,cp' : [columns.x, columns.y].join(',');
    diagnostics.push(error(file, { line: table.headerLine, column: 1 }, 'no header row: the first row holds numbers', `add a first line naming the columns, e.g. ${example}`));
    return { points: undefined, validPoints: [], rowCount: table.rows.length, diagnostics };
  }
  const seen = new Map<string, CsvCell>();
  table.header.forEach((cell) => {
    if (cell.text === '') diagnostics.push(error(file, cell, 'header has an empty column name'));
    else if (seen.has(cell.text)) diagnostics.push(error(file, cell, `column '${cell.text}' appears twice in the header`));
    else seen.set(cell.text, cell);
  });

  const roles = new Map<number, { role: Role; name: string }>();
  if (columns === undefined) {
    // The metadata could not say which columns hold what: check the first two, which are x and y by convention.
    headerNames.slice(0, 2).forEach((name, index) => roles.set(index, { role: 'y', name }));
  } else {
    const declared: [Role, string | undefined][] = [
      ['x', columns.x],
      ['y', columns.y],
      ['uncertainty', columns.uncertainty],
      ['note', columns.note],
    ];
    for (const [role, name] of declared) {
      if (name === undefined) continue;
      const index = headerNames.indexOf(name);
      if (index < 0) {
        const guess = suggest(name, headerNames);
        diagnostics.push(
          error(
            file,
            { line: table.headerLine, column: 1 },
            `header has no column '${name}' (named by ${origin(role)})`,
            guess === undefined ? `the header has: ${headerNames.join(', ')}` : `did you mean '${guess}'?`,
          ),
        );
      } else {
        roles.set(index, { role, name });
      }
    }
    table.header.forEach((cell, index) => {
      if (!roles.has(index) && cell.text !== '') {
        diagnostics.push(warning(file, cell, `column '${cell.text}' is not named in the metadata and is ignored`));
      }
    });
  }

  const points: DataPoint[] = [];
  for (const row of table.rows) {
    if (row.cells.length !== table.header.length) {
      const more = row.cells.length > table.header.length;
      diagnostics.push(
        error(
          file,
          { line: row.line },
          `row has ${row.cells.length} fields but the header has ${table.header.length}`,
          more ? "a decimal comma? write 1.5, not 1,5; text holding a comma must be quoted" : undefined,
        ),
      );
      continue;
    }
    const values: Partial<Record<Role, number | string>> = {};
    let rowValid = true;
    roles.forEach(({ role, name }, index) => {
      const cell = row.cells[index];
      if (role === 'note') {
        if (cell !== undefined && cell.text !== '') values.note = cell.text;
        return;
      }
      const value = numericCell(cell, name, file, row.line);
      if (typeof value !== 'number') {
        diagnostics.push(value);
        rowValid = false;
        return;
      }
      if (role === 'uncertainty' && !(value > 0)) {
        diagnostics.push(error(file, { line: row.line, column: cell?.column }, `uncertainty ${cell?.text ?? value} in column '${name}' must be positive`));
        rowValid = false;
        return;
      }
      values[role] = value;
    });
    if (rowValid && columns !== undefined && values.x !== undefined && values.y !== undefined) {
      const point: DataPoint = { row: row.row, line: row.line, x: values.x as number, y: values.y as number };
      if (typeof values.uncertainty === 'number') point.uncertainty = values.uncertainty;
      if (typeof values.note === 'string') point.note = values.note;
      points.push(point);
    }
  }
  const complete = columns !== undefined && !diagnostics.some((diagnostic) => diagnostic.severity === 'error');
  return { points: complete ? points : undefined, validPoints: points, rowCount: table.rows.length, diagnostics };
}
