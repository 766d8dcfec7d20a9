/**
 * SVG path data of a curve and of a band between two curves, from rows [x, …columns] and two scales, with
 * coordinates rounded to 2 decimals. The same text as d3-shape's line() and area() with digits(2), the linear curve
 * and a defined() test of the columns (a row whose column is null breaks the path; a piece of one point is closed
 * with Z, as d3-path does), written out because the pages draw thousands of small paths and the generators cost
 * more than the arithmetic. test/render/chartPaths.test.ts compares both with d3-shape.
 */
import type { ScaleLinear } from 'd3-scale';

type Row = readonly (number | null)[];
/** Any scale from data to pixels (d3-scale linear or log scales). */
type Scale = ScaleLinear<number, number> | ((value: number) => number);

/** A coordinate as d3-path writes it with digits(2). */
function round(value: number): number {
  return Math.round(value * 100) / 100;
}

/**
 * Closed band between columns `low` and `high` (upper edge forward, lower edge back), split where either is null.
 * @example bandPath(rows, x, y, 4, 5).startsWith('M') // => true
 */
export function bandPath(rows: readonly Row[], x: Scale, y: Scale, low: number, high: number): string {
  let out = '';
  let start = -1;
  const xs: number[] = [];
  const lows: number[] = [];
  for (let i = 0; i <= rows.length; i++) {
    const row = rows[i];
    if (row !== undefined && row[low] != null && row[high] != null) {
      const px = +x(row[0]!);
      xs[i] = px;
      lows[i] = +y(row[low]!);
      out += `${start < 0 ? 'M' : 'L'}${round(px)},${round(+y(row[high]!))}`;
      if (start < 0) start = i;
    } else if (start >= 0) {
      for (let k = i - 1; k >= start; k--) out += `L${round(xs[k]!)},${round(lows[k]!)}`;
      out += 'Z';
      start = -1;
    }
  }
  return out;
}

/**
 * Polyline through column `column`, broken where it is null.
 * @example linePath([[0, 1], [1, 2]], x, y, 1) // => "M72,328L740,12" (with those scales)
 */
export function linePath(rows: readonly Row[], x: Scale, y: Scale, column: number): string {
  let out = '';
  let count = 0;
  for (const row of rows) {
    if (row[column] != null) {
      out += `${count === 0 ? 'M' : 'L'}${round(+x(row[0]!))},${round(+y(row[column]!))}`;
      count++;
    } else {
      if (count === 1) out += 'Z';
      count = 0;
    }
  }
  if (count === 1) out += 'Z';
  return out;
}
