/**
 * The path data of chartPaths (bandPath, linePath) for the SVG documents written at build time (the fit chart, the
 * order statistics, the overlays): the same text, with each coordinate written by hundredthsText instead of
 * converting the rounded double to text, which is most of the cost when thousands of charts are drawn. chartPaths
 * itself stays as it is: the browser chart is bundled from it, and the published script must keep its bytes.
 * test/render/chartPaths.test.ts compares both with d3-shape and with each other.
 */
import type { ScaleLinear } from 'd3-scale';
import { hundredthsText as text } from './hundredthsText.ts';

type Row = readonly (number | null)[];
/** Any scale from data to pixels (d3-scale linear or log scales). */
type Scale = ScaleLinear<number, number> | ((value: number) => number);

/**
 * bandPath's text: the closed band between columns `low` and `high` (upper edge forward, lower edge back), split
 * where either is null.
 * @example svgBandPath(rows, x, y, 4, 5) === bandPath(rows, x, y, 4, 5) // => true
 */
export function svgBandPath(rows: readonly Row[], x: Scale, y: Scale, low: number, high: number): string {
  let out = '';
  let start = -1;
  const lows: string[] = [];
  for (let i = 0; i <= rows.length; i++) {
    const row = rows[i];
    if (row !== undefined && row[low] != null && row[high] != null) {
      const px = text(+x(row[0]!));
      // The lower edge is written backwards when the piece ends: keep its text, not its numbers.
      lows[i] = `L${px},${text(+y(row[low]!))}`;
      out += `${start < 0 ? 'M' : 'L'}${px},${text(+y(row[high]!))}`;
      if (start < 0) start = i;
    } else if (start >= 0) {
      for (let k = i - 1; k >= start; k--) out += lows[k]!;
      out += 'Z';
      start = -1;
    }
  }
  return out;
}

/**
 * linePath's text: the polyline through column `column`, broken where it is null.
 * @example svgLinePath([[0, 1], [1, 2]], x, y, 1) // => "M72,328L740,12" (with those scales)
 */
export function svgLinePath(rows: readonly Row[], x: Scale, y: Scale, column: number): string {
  let out = '';
  let count = 0;
  for (const row of rows) {
    if (row[column] != null) {
      out += `${count === 0 ? 'M' : 'L'}${text(+x(row[0]!))},${text(+y(row[column]!))}`;
      count++;
    } else {
      if (count === 1) out += 'Z';
      count = 0;
    }
  }
  if (count === 1) out += 'Z';
  return out;
}
