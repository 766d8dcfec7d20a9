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
  values.forEach((value, i) => {
    const scale = rowScale ? rowScale[i]! : 1;
    powers.forEach((k, j) => matrix.set(i, j, value ** k * scale));
  });
  return matrix;
}
