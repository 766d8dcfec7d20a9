/**
 * The bands of the curve drawn about the curve itself, for the residual plot, where their width can be seen:
 * [x, conf. low − fit, conf. high − fit, pred. low − fit, pred. high − fit]. Derived from the curve rows so that the
 * page need not carry them twice.
 * @example residualBandRows([[1, 10, 9, 11, 8, 12]]) // => [[1, -1, 1, -2, 2]]
 */
import type { CurveRow, ResidualBandRow } from './chartTypes.ts';

function difference(value: number | null, fit: number | null): number | null {
  return value === null || fit === null ? null : value - fit;
}

export function residualBandRows(curve: readonly CurveRow[]): ResidualBandRow[] {
  return curve.map((row) => [row[0], difference(row[2], row[1]), difference(row[3], row[1]), difference(row[4], row[1]), difference(row[5], row[1])]);
}
