/**
 * ml-matrix's QR solve and matrix–vector product on plain arrays, with the same loops in the same order (so the same
 * numbers, bit for bit), for one right-hand side: no n×1 Matrix per vector (each of whose rows is its own typed
 * array), no copy of the right-hand side. Used by solveLeastSquares and fitCurves; test/core/fitCurves.test.ts and
 * bench:fitting's byte comparison of cache records check the equality.
 *
 * @example solveLeading(qr.QR.to2DArray(), qr.Rdiag, p, b) // => the first p entries of qr.solve(Matrix.columnVector(b))
 */
import type { Matrix } from 'ml-matrix';

/** ml-matrix's QR keeps its Householder vectors and R above the diagonal in `QR`, the diagonal of R in `Rdiag`. */
export interface QrStorage {
  readonly QR: Matrix;
  readonly Rdiag: Float64Array;
}

/**
 * ml-matrix's QrDecomposition.solve for one right-hand side, using only the first p reflectors and the leading p×p
 * block of R: the solve of the design's first p columns (same loops, same order of operations).
 */
export function solveLeading(qr: readonly (ArrayLike<number>)[], rdiag: ArrayLike<number>, p: number, b: readonly number[]): number[] {
  const m = qr.length;
  const x = b.slice();
  for (let k = 0; k < p; k++) {
    let s = 0;
    for (let i = k; i < m; i++) s += qr[i]![k]! * x[i]!;
    s = -s / qr[k]![k]!;
    for (let i = k; i < m; i++) x[i] = x[i]! + s * qr[i]![k]!;
  }
  for (let k = p - 1; k >= 0; k--) {
    x[k] = x[k]! / rdiag[k]!;
    for (let i = 0; i < k; i++) x[i] = x[i]! - x[k]! * qr[i]![k]!;
  }
  return x.slice(0, p);
}

/**
 * Row i of a matrix (its first p columns) times `vector`, summed as ml-matrix's mmul sums.
 * @example rowTimes([1, 2, 3], [1, 1], 2) // => 3
 */
export function rowTimes(row: ArrayLike<number>, vector: readonly number[], p: number): number {
  let s = 0;
  for (let k = 0; k < p; k++) s += row[k]! * vector[k]!;
  return s;
}
