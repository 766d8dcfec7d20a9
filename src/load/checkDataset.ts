/**
 * Checks that need both files: exclusions, point counts, transforms, repeated x, validity range and
 * pass-through points. Every message points at the line to change.
 *
 * They also run when the files have other errors, on what is valid (the fit block's valid fields, the data rows
 * whose cells are valid), so one run reports every problem. Checks whose verdict could change with a row that could
 * not be read (point counts, the fixed order, exclusions by x, the validity range) then wait for a complete table.
 */
import { fixedOrderProblem, transformDomainProblem } from '../core/index.ts';
import type { DataColumns, DataPoint, ExcludedPoint, FitSettings } from '../schema/index.ts';
import { error, warning, type Diagnostic, type Position } from './diagnostic.ts';
import { MINIMUM_POINTS } from './limits.ts';

export interface DatasetCheckInput {
  /** The fit and data blocks (of valid metadata, or as far as they are valid). */
  readonly meta: { readonly fit: FitSettings; readonly data: DataColumns };
  /** The points: every data row, or (with `complete: false`) the rows that could be read. */
  readonly points: readonly DataPoint[];
  /** False when some data rows could not be read and are missing from `points`. Defaults to true. */
  readonly complete?: boolean;
  /** Number of data rows in the file, readable or not. Defaults to the number of points. */
  readonly rowCount?: number;
  readonly dataPath: string;
  readonly metadataPath: string;
  readonly headerLine: number;
  /** Position of a key path's value in the metadata file. */
  readonly valueAt: (path: readonly (string | number)[]) => Position;
  /** 1-based column of the x and y cells of a data line, when known. */
  readonly cellColumn: (line: number, role: 'x' | 'y') => number | undefined;
}

export interface DatasetCheckResult {
  readonly used: DataPoint[];
  readonly excluded: ExcludedPoint[];
  readonly dataRange: { min: number; max: number };
  readonly range: { min: number; max: number };
  readonly diagnostics: Diagnostic[];
}

/** Run every cross-file check. The result's lists are meaningful only when no error was reported. */
export function checkDataset(input: DatasetCheckInput): DatasetCheckResult {
  const { meta, points, dataPath, metadataPath, valueAt } = input;
  const fit = meta.fit;
  const diagnostics: Diagnostic[] = [];
  const complete = input.complete ?? true;
  const rowCount = input.rowCount ?? points.length;

  // Exclusions: by data row or by exact x; each must match something.
  const reasons = new Map<number, string>();
  fit.exclude.forEach((exclusion, index) => {
    if (exclusion.row !== undefined) {
      if (exclusion.row > rowCount) {
        diagnostics.push(error(metadataPath, valueAt(['fit', 'exclude', index, 'row']), `fit.exclude[${index}].row is ${exclusion.row} but the data file has ${rowCount} rows`));
        return;
      }
      if (reasons.has(exclusion.row)) {
        diagnostics.push(warning(metadataPath, valueAt(['fit', 'exclude', index]), `row ${exclusion.row} is excluded twice`));
      }
      reasons.set(exclusion.row, exclusion.reason);
    } else {
      const matches = points.filter((point) => point.x === exclusion.x);
      if (matches.length === 0 && complete) {
        diagnostics.push(error(metadataPath, valueAt(['fit', 'exclude', index, 'x']), `no data row has x = ${exclusion.x}`, 'x must equal the value in the data file exactly; or exclude by row'));
      }
      for (const point of matches) reasons.set(point.row, exclusion.reason);
    }
  });
  const used = points.filter((point) => !reasons.has(point.row));
  const excluded = points
    .filter((point) => reasons.has(point.row))
    .map((point) => ({ ...point, reason: reasons.get(point.row) ?? '' }));

  // Enough points, and more than one x.
  const distinctX = new Set(used.map((point) => point.x)).size;
  if (!complete) {
    // Counts wait for a table whose every row could be read.
  } else if (used.length < MINIMUM_POINTS) {
    diagnostics.push(
      error(dataPath, { line: input.headerLine }, `only ${used.length} ${used.length === 1 ? 'point is' : 'points are'} left to fit; a correlation needs at least ${MINIMUM_POINTS}`),
    );
  } else if (distinctX < 2) {
    diagnostics.push(error(dataPath, { line: input.headerLine }, `every point has x = ${used[0]?.x}; a correlation needs at least two different x values`));
  }

  // A fixed order: the core's one rule (fixedOrderProblem), at the order's line.
  if (typeof fit.order === 'number' && used.length >= MINIMUM_POINTS && complete) {
    const problem = fixedOrderProblem({ order: fit.order, intercept: fit.intercept, constraints: fit.passThrough.length, n: used.length, distinct: distinctX });
    if (problem !== null) diagnostics.push(error(metadataPath, valueAt(['fit', 'order']), problem));
  }

  // Transforms: ln needs positive values, 1/x needs non-zero x.
  const transformHint = 'leave the row out with fit.exclude, or choose another transform';
  for (const point of used) {
    if (fit.transform.x === 'log' && !(point.x > 0)) {
      diagnostics.push(error(dataPath, { line: point.line, column: input.cellColumn(point.line, 'x') }, `x = ${point.x} is not positive, but fit.transform.x is 'log'`, transformHint));
    }
    if (fit.transform.x === 'reciprocal' && point.x === 0) {
      diagnostics.push(error(dataPath, { line: point.line, column: input.cellColumn(point.line, 'x') }, "x = 0 has no reciprocal, but fit.transform.x is 'reciprocal'", transformHint));
    }
    if (fit.transform.y === 'log' && !(point.y > 0)) {
      diagnostics.push(error(dataPath, { line: point.line, column: input.cellColumn(point.line, 'y') }, `y = ${point.y} is not positive, but fit.transform.y is 'log'`, transformHint));
    }
  }

  // A transform whose singular point lies inside the x range (no point on it, or the per-point check says so).
  if (used.length > 0 && !diagnostics.some((d) => d.severity === 'error' && d.file === dataPath && /reciprocal|not positive, but fit\.transform\.x/.test(d.message))) {
    const xs = used.map((point) => point.x);
    const problem = transformDomainProblem(fit.transform.x, Math.min(...xs), Math.max(...xs));
    if (problem !== null) {
      diagnostics.push(error(metadataPath, valueAt(['fit', 'transform', 'x']), `fit.transform.x is '${fit.transform.x}' but ${problem}`, 'fit x without a transform, or split the data at the singular point'));
    }
  }

  // Repeated x with different y and nothing to say how much y scatters.
  if (meta.data.uncertainty === undefined && !meta.data.replicates) {
    const firstAt = new Map<number, DataPoint>();
    const warned = new Set<number>();
    for (const point of used) {
      const first = firstAt.get(point.x);
      if (first === undefined) firstAt.set(point.x, point);
      else if (first.y !== point.y && !warned.has(point.x)) {
        warned.add(point.x);
        diagnostics.push(
          warning(dataPath, { line: point.line }, `x = ${point.x} repeats line ${first.line} with a different y, and there is no uncertainty column`, 'set data.replicates: true if these are replicate measurements, or add an uncertainty column'),
        );
      }
    }
  }

  // Validity range: the data's x range, narrowed but never widened.
  const xs = used.map((point) => point.x);
  const dataRange = { min: Math.min(...xs), max: Math.max(...xs) };
  const range = { min: fit.range?.min ?? dataRange.min, max: fit.range?.max ?? dataRange.max };
  if (used.length > 0 && complete) {
    if (fit.range?.min !== undefined && (fit.range.min < dataRange.min || fit.range.min >= dataRange.max)) {
      diagnostics.push(error(metadataPath, valueAt(['fit', 'range', 'min']), `fit.range.min ${fit.range.min} is outside the x range of the data (${dataRange.min} to ${dataRange.max})`, 'the validity range can be narrowed, never widened'));
    }
    if (fit.range?.max !== undefined && (fit.range.max > dataRange.max || fit.range.max <= dataRange.min)) {
      diagnostics.push(error(metadataPath, valueAt(['fit', 'range', 'max']), `fit.range.max ${fit.range.max} is outside the x range of the data (${dataRange.min} to ${dataRange.max})`, 'the validity range can be narrowed, never widened'));
    }
    fit.passThrough.forEach((point, index) => {
      if (point.x < range.min || point.x > range.max) {
        diagnostics.push(error(metadataPath, valueAt(['fit', 'passThrough', index, 'x']), `pass-through point x = ${point.x} is outside the validity range ${range.min} to ${range.max}`));
      }
      if (fit.transform.y === 'log' && !(point.y > 0)) {
        diagnostics.push(error(metadataPath, valueAt(['fit', 'passThrough', index, 'y']), `pass-through point y = ${point.y} is not positive, but fit.transform.y is 'log'`));
      }
    });
  }
  return { used, excluded, dataRange, range, diagnostics };
}
