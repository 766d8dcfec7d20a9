/**
 * ml-matrix's QR solve and matrix–vector product on plain arrays, with the same loops in the same order (so the same
 * numbers, bit for bit), for one right-hand side: no n×1 Matrix per vector (each of whose rows is its own typed
 * array), no copy of the right-hand side. Used by solveLeastSquares and fitCurves; test/core/fitCurves.test.ts and
 * bench:fitting's byte comparison of cache records check the equality.
 *
 * @example solveLeading(qr.QR.to2DArray(), qr.Rdiag, p, b) // => the first p entries of qr.solve(Matrix.columnVector(b))
 */
import { Matrix } from 'ml-matrix';

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

/**
 * The thin orthogonal factor Q (rows × columns) of ml-matrix's QR from its stored reflectors, as plain rows: the
 * loops of QrDecomposition's `orthogonalMatrix` in the same order (so the same numbers), without a Matrix whose every
 * row is its own typed array.
 * @example orthogonalRows(qr.QR.to2DArray(), qr.QR.columns) // => qr.orthogonalMatrix.to2DArray()
 */
export function orthogonalRows(qr: readonly ArrayLike<number>[], columns: number): number[][] {
  const rows = qr.length;
  const X = Array.from({ length: rows }, () => new Array<number>(columns).fill(0));
  for (let k = columns - 1; k >= 0; k--) {
    for (let i = 0; i < rows; i++) X[i]![k] = 0;
    X[k]![k] = 1;
    for (let j = k; j < columns; j++) {
      if (qr[k]![k] !== 0) {
        let s = 0;
        for (let i = k; i < rows; i++) s += qr[i]![k]! * X[i]![j]!;
        s = -s / qr[k]![k]!;
        for (let i = k; i < rows; i++) X[i]![j] = X[i]![j]! + s * qr[i]![k]!;
      }
    }
  }
  return X;
}

/**
 * A matrix made to be factored once and then dropped: its clone() is itself, so ml-matrix's QrDecomposition (which
 * begins by copying its input, entry by entry through an iterator, into a new matrix of typed-array rows) factors it in
 * place instead. The factorisation is the same code on the same numbers; only the copy is left out. Never let one
 * out of the function that made it (its contents are the factors afterwards).
 * @example new QrDecomposition(scratchMatrix(rows)) // same QR, Rdiag as new QrDecomposition(new Matrix(rows))
 */
export function scratchMatrix(rows: readonly (readonly number[])[], columns: number): Matrix {
  // Filled entry by entry (Matrix's constructor from arrays copies each row through an iterator, which costs more).
  const matrix = new Matrix(rows.length, columns);
  for (let i = 0; i < rows.length; i++) {
    const row = rows[i]!;
    for (let j = 0; j < columns; j++) matrix.set(i, j, row[j]!);
  }
  return Object.defineProperty(matrix, 'clone', { value: () => matrix });
}
