/**
 * The data rows of one correlation with their per-point diagnostics, and which of them the page shows. A page
 * lists every row up to FULL_TABLE_LIMIT points; above that it lists the first FIRST_ROWS rows and every flagged
 * row (|studentized residual| > 3 or Cook's distance > 1), and links data.csv for the rest, so that a 2000-point
 * page stays small while every point a reviewer must look at is on it.
 */
import { pointsOf, usedPoints, type CorrelationEntry, type DataPoint, type PolynomialFit } from './entryView.ts';

export const FULL_TABLE_LIMIT = 100;
export const FIRST_ROWS = 50;

export interface DataRow {
  readonly point: DataPoint;
  readonly residual: number | undefined;
  readonly studentized: number | undefined;
  readonly leverage: number | undefined;
  readonly cook: number | undefined;
  readonly flagged: boolean;
}

/**
 * Every point used in the fit with its diagnostics, in file order.
 * @example dataRows(entry, fit)[0].point.row // => 1
 */
export function dataRows(entry: CorrelationEntry, fit: PolynomialFit): DataRow[] {
  const diagnostics = fit.points;
  return usedPoints(entry).map((point, i) => {
    const studentized = diagnostics.studentized[i];
    const cook = diagnostics.cooksDistance[i];
    const flagged = (studentized !== undefined && Math.abs(studentized) > 3) || (cook !== undefined && cook > 1);
    return { point, residual: diagnostics.residualsOriginal[i], studentized, leverage: diagnostics.leverage[i], cook, flagged };
  });
}

/**
 * The rows a page lists: all of them up to FULL_TABLE_LIMIT, else the first FIRST_ROWS and every flagged row.
 * @example shownRows(rows2000).length // => 50 + the number of flagged rows after row 50
 */
export function shownRows(rows: readonly DataRow[]): DataRow[] {
  if (rows.length <= FULL_TABLE_LIMIT) return [...rows];
  return rows.filter((row, i) => i < FIRST_ROWS || row.flagged);
}

/** What a page's data table shows (DataTable.astro): the rows it lists and the counts it states. */
export interface DataTableView {
  /** shownRows of dataRows. */
  readonly rows: readonly DataRow[];
  /** Points used in the fit. */
  readonly used: number;
  /** Of those, how many are flagged. */
  readonly flagged: number;
  /** Every data row of the file (data.csv lists them all). */
  readonly total: number;
  /** Whether a used point states an uncertainty, or carries a note (the table then has that column). */
  readonly hasUncertainty: boolean;
  readonly hasNote: boolean;
}

/**
 * The data table of a page, from the entry's full record (built with the downloads in a build: pageParts.ts).
 * @example dataTableView(entry, fit).rows.length <= dataTableView(entry, fit).used // => true
 */
export function dataTableView(entry: CorrelationEntry, fit: PolynomialFit): DataTableView {
  const all = dataRows(entry, fit);
  return {
    rows: shownRows(all),
    used: all.length,
    flagged: all.filter((row) => row.flagged).length,
    total: pointsOf(entry).length,
    hasUncertainty: all.some((row) => row.point.uncertainty !== undefined),
    hasNote: all.some((row) => row.point.note !== undefined),
  };
}
