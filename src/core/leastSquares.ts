/**
 * Linear least squares min ‖A·β − b‖₂, optionally subject to C·β = d, by Householder QR (ml-matrix), with column
 * equilibration and an SVD rank and condition guard.
 *
 * - Equality constraints are removed by the null-space method: an SVD of C (padded to square) gives an orthonormal
 *   basis Z of its null space and a particular solution β₀; the free problem is min ‖(A·Z)·z − (b − A·β₀)‖.
 * - Columns are scaled to unit 2-norm before factoring (equilibration), and unscaled afterwards.
 * - ml-matrix's `isFullRank` is an exact-zero test, so rank is judged from the singular values of the scaled
 *   matrix with the tolerance max(n, p)·ε·σ₁ (the usual numerical-rank rule). A = Q·R with Q orthonormal, so the
 *   singular values of A are those of the small p×p factor R: the SVD is taken of R (cheap for long tables), and
 *   its right singular vectors V give (AᵀA)⁻¹ = V·Σ⁻²·Vᵀ for the covariance.
 * - One step of iterative refinement in double precision polishes the QR solution.
 *
 * References: Å. Björck, Numerical Methods for Least Squares Problems, SIAM 1996 (§2.4 QR, §5.1 null-space method);
 * G. H. Golub and C. F. Van Loan, Matrix Computations, 4th ed., §5.3 and §5.5 (numerical rank).
 *
 * Cost: O(n·p²).
 */
import { Matrix, QrDecomposition, SingularValueDecomposition } from 'ml-matrix';
import { FitError } from './fitError.ts';
import { orthogonalRows, rowTimes, scratchMatrix, solveLeading, type QrStorage } from './qrSolve.ts';

export interface LinearSolution {
  /** Solution β (length p). */
  readonly beta: number[];
  /** (AᵀA)⁻¹ restricted to the constraint null space: Z·(ZᵀAᵀAZ)⁻¹·Zᵀ (multiply by s² for the covariance). */
  readonly unscaledCovariance: number[][];
  /** Diagonal of the hat matrix of the free problem. */
  readonly leverage: number[];
  /** A·β. */
  readonly fitted: number[];
  /** Number of free parameters, p − q. */
  readonly freeParameters: number;
  /** 2-norm condition number of the equilibrated free design matrix. */
  readonly condition: number;
}

function columnNorms(matrix: Matrix): number[] {
  const norms: number[] = [];
  for (let j = 0; j < matrix.columns; j++) {
    let sum = 0;
    for (let i = 0; i < matrix.rows; i++) sum += matrix.get(i, j) ** 2;
    norms.push(Math.sqrt(sum) || 1);
  }
  return norms;
}

/** Null-space basis Z (p×(p−q)) and particular solution of C·β = d. */
function constraintBasis(C: Matrix, d: readonly number[]): { Z: Matrix; particular: number[] } {
  const p = C.columns;
  const q = C.rows;
  const padded = Matrix.zeros(p, p);
  padded.setSubMatrix(C, 0, 0);
  const svd = new SingularValueDecomposition(padded, { autoTranspose: false });
  if (svd.rank < q) {
    throw new FitError('constraints-dependent', 'the constraints are not independent (two constraints at the same x?)');
  }
  const V = svd.rightSingularVectors;
  const Z = V.subMatrix(0, p - 1, q, p - 1);
  const rhs = Matrix.zeros(p, 1);
  d.forEach((value, i) => rhs.set(i, 0, value));
  const particular = svd.solve(rhs).to1DArray();
  return { Z, particular };
}

/**
 * 2-norm condition number of a tall matrix, from the singular values of its R factor.
 * @example conditionNumber(designMatrix([-1, 0, 1], [0, 1])) // => 1.2247448713915892 (√1.5)
 */
export function conditionNumber(matrix: Matrix): number {
  if (matrix.columns === 0) return 1;
  const R = new QrDecomposition(matrix).upperTriangularMatrix;
  return new SingularValueDecomposition(R, { computeLeftSingularVectors: false, computeRightSingularVectors: false }).condition;
}

/**
 * Solve the (constrained) least-squares problem. Inputs are not modified.
 * @example solveLeastSquares(designMatrix([-1, 0, 1], [0, 1]), [1, 2, 3]).beta // => [2, 1] (to rounding)
 */
export function solveLeastSquares(
  A: Matrix,
  b: readonly number[],
  constraint?: { readonly C: Matrix; readonly d: readonly number[] },
): LinearSolution {
  const n = A.rows;
  const p = A.columns;
  let free = A;
  let Z: Matrix | null = null;
  let particular: number[] = new Array(p).fill(0);
  let target = b.slice();
  if (constraint && constraint.C.rows > 0) {
    ({ Z, particular } = constraintBasis(constraint.C, constraint.d));
    free = A.mmul(Z);
    const offset = A.mmul(Matrix.columnVector(particular)).to1DArray();
    target = target.map((value, i) => value - offset[i]!);
  }
  const k = free.columns;
  if (n < k) throw new FitError('too-few-points', `${n} points cannot determine ${k} free coefficients`);

  const norms = columnNorms(free);
  // free with each column divided by its norm (divRowVector's arithmetic), as plain rows and as the matrix factored.
  const scaledRows: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row = new Array<number>(k);
    for (let j = 0; j < k; j++) row[j] = free.get(i, j) / norms[j]!;
    scaledRows.push(row);
  }
  const qr = new QrDecomposition(scratchMatrix(scaledRows, k));
  const svd = new SingularValueDecomposition(qr.upperTriangularMatrix, { computeLeftSingularVectors: false });
  const singular = svd.diagonal;
  const largest = singular[0] ?? 0;
  const tolerance = Math.max(n, k) * Number.EPSILON * largest;
  const smallest = singular[singular.length - 1] ?? 0;
  if (k > 0 && !(smallest > tolerance)) {
    throw new FitError('rank-deficient', `the design matrix is rank deficient (condition number ${(largest / smallest).toPrecision(3)})`);
  }

  let z: number[] = [];
  let leverage: number[] = new Array(n).fill(0);
  let unscaledZ: number[][] = [];
  if (k > 0) {
    // ml-matrix's solve and products with the same loops on plain arrays (qrSolve.ts): the same numbers.
    const { QR, Rdiag } = qr as unknown as QrStorage;
    if (!qr.isFullRank()) throw new Error('Matrix is rank deficient'); // as ml-matrix's solve
    const factors = QR.to2DArray();
    let solution = solveLeading(factors, Rdiag, k, target);
    // One step of iterative refinement: r = b − A·z, z ← z + QR⁻¹·r.
    const residual = target.map((value, i) => value - rowTimes(scaledRows[i]!, solution, k));
    const correction = solveLeading(factors, Rdiag, k, residual);
    solution = solution.map((value, j) => value + correction[j]!);
    z = solution.map((value, j) => value / norms[j]!);
    const Q = orthogonalRows(factors, k);
    leverage = Q.map((row) => {
      let sum = 0;
      for (let j = 0; j < k; j++) sum += row[j]! ** 2;
      return sum;
    });
    // (AᵀA)⁻¹ of the scaled matrix from its SVD: V·Σ⁻²·Vᵀ, then unscale by the column norms.
    const V = svd.rightSingularVectors;
    unscaledZ = Array.from({ length: k }, (_, r) =>
      Array.from({ length: k }, (_, c) => {
        let sum = 0;
        for (let l = 0; l < k; l++) sum += (V.get(r, l) * V.get(c, l)) / singular[l]! ** 2;
        return sum / (norms[r]! * norms[c]!);
      }),
    );
  }

  let beta = z;
  let unscaledCovariance = unscaledZ;
  if (Z) {
    const zMatrix = Z;
    beta = particular.map((value, i) => value + z.reduce((sum, zj, j) => sum + zMatrix.get(i, j) * zj, 0));
    const covZ = new Matrix(unscaledZ.length ? unscaledZ : [[]]);
    unscaledCovariance = k > 0 ? zMatrix.mmul(covZ).mmul(zMatrix.transpose()).to2DArray() : Array.from({ length: p }, () => new Array(p).fill(0));
  }
  const fitted = Array.from({ length: n }, (_, i) => {
    let sum = 0;
    for (let j = 0; j < p; j++) sum += A.get(i, j) * beta[j]!; // A·β, summed as ml-matrix's mmul sums
    return sum;
  });
  return {
    beta,
    unscaledCovariance,
    leverage,
    fitted,
    freeParameters: k,
    condition: smallest > 0 ? largest / smallest : Infinity,
  };
}
