/**
 * SVG path data of the chart's curves and bands (d3-shape generators with no context return a path string, so
 * the same call serves the server-side SVG and the browser). Rows with a null value break the line.
 * Coordinates are written with 2 decimals (a hundredth of a pixel). O(rows).
 */
import type { ScaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';

type Row = readonly (number | null)[];
type Scale = ScaleLinear<number, number>;

/**
 * The band between columns `low` and `high` of each row, against column 0.
 * @example bandPath(curve, x, y, 4, 5) // => "M72,200L…Z" (prediction band)
 */
export function bandPath(rows: readonly Row[], x: Scale, y: Scale, low: number, high: number): string {
  return (
    area<Row>()
      .digits(2)
      .defined((row) => row[low] != null && row[high] != null)
      .x((row) => x(row[0]!))
      .y0((row) => y(row[low]!))
      .y1((row) => y(row[high]!))(rows) ?? ''
  );
}

/**
 * The line through column `column` of each row, against column 0.
 * @example linePath(curve, x, y, 1) // => "M72,210L…" (fitted curve)
 */
export function linePath(rows: readonly Row[], x: Scale, y: Scale, column: number): string {
  return (
    line<Row>()
      .digits(2)
      .defined((row) => row[column] != null)
      .x((row) => x(row[0]!))
      .y((row) => y(row[column]!))(rows) ?? ''
  );
}
