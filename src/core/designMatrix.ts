/**
 * Polynomial design (Vandermonde) matrix: row i holds value_i^k for each power k, times an optional row scale
 * (√w_i for a weighted fit). Used with values of the mapped variable t, where the columns stay well conditioned.
 * @example designMatrix([2, 3], [0, 1, 2]).to2DArray() // => [[1, 2, 4], [1, 3, 9]]
 */
import { Matrix } from 'ml-matrix';

/**
 * @example designMatrix([-1, 0.5], [0, 1, 2]).to2DArray() // => [[1, -1, 1], [1, 0.5, 0.25]]
 */
export function designMatrix(values: readonly number[], powers: readonly number[], rowScale?: readonly number[]): Matrix {
  // Written straight into the matrix's rows (no intermediate arrays); an empty list is the 0×0 matrix, as before.
  if (values.length === 0) return new Matrix([]);
  const matrix = new Matrix(values.length, powers.length);
  for (let i = 0; i < values.length; i++) {
    const scale = rowScale ? rowScale[i]! : 1;
    const value = values[i]!;
    for (let j = 0; j < powers.length; j++) matrix.set(i, j, value ** powers[j]! * scale);
  }
  return matrix;
}

/**
 * One row of the design as a plain array: value^k · scale for each power k (the same expression as designMatrix's).
 * @example designRow(0.5, [0, 1, 2], 2) // => [2, 1, 0.5]
 */
export function designRow(value: number, powers: readonly number[], scale = 1): number[] {
  const row = new Array<number>(powers.length);
  for (let j = 0; j < powers.length; j++) row[j] = value ** powers[j]! * scale;
  return row;
}
