/**
 * Fraction-free Gauss–Jordan elimination (Bareiss' one-step method extended to the rows above the pivot).
 *
 * For an integer matrix K (p×p) and integer right-hand sides B (p×r) it returns the integer determinant d of K
 * (up to sign, which cancels) and the integer matrix X = d·K⁻¹B, so that K⁻¹B = X/d exactly. Every division in the
 * update (a_kk·a_ij − a_ik·a_kj)/pivot_prev is exact (Sylvester's identity); the code checks that it is.
 *
 * References: E. H. Bareiss, "Sylvester's identity and multistep integer-preserving Gaussian elimination",
 * Math. Comp. 22 (1968) 565–578; G. C. Nakos, P. R. Turner, R. M. Williams, "Fraction-free algorithms for linear
 * and polynomial equations", ACM SIGSAM Bulletin 31 (1997) 11–19.
 *
 * Cost: O(p²(p + r)) multiplications of integers whose size grows linearly with the step.
 */

export interface ExactSolution {
  /** Common denominator (the determinant of K, possibly negated). Zero when K is singular. */
  readonly denominator: bigint;
  /** Numerators: the solution of column j is numerators[i][j] / denominator. */
  readonly numerators: bigint[][];
}

/**
 * Solve K·X = B exactly. Returns denominator 0n when K is singular. Inputs are not modified.
 * @example solveExact([[2n, 1n], [1n, 3n]], [[3n], [5n]]) // => { denominator: 5n, numerators: [[4n], [7n]] } (x = 4/5, y = 7/5)
 */
export function solveExact(matrix: readonly (readonly bigint[])[], rhs: readonly (readonly bigint[])[]): ExactSolution {
  const size = matrix.length;
  const width = rhs[0]?.length ?? 0;
  const rows: bigint[][] = matrix.map((row, i) => [...row, ...(rhs[i] ?? [])]);
  let previousPivot = 1n;
  for (let k = 0; k < size; k++) {
    let pivotRow = k;
    while (pivotRow < size && rows[pivotRow]![k] === 0n) pivotRow++;
    if (pivotRow === size) return { denominator: 0n, numerators: [] };
    if (pivotRow !== k) [rows[k], rows[pivotRow]] = [rows[pivotRow]!, rows[k]!];
    const pivot = rows[k]!;
    const pivotValue = pivot[k]!;
    for (let i = 0; i < size; i++) {
      if (i === k) continue;
      const row = rows[i]!;
      const factor = row[k]!;
      for (let j = 0; j < size + width; j++) {
        if (j === k) continue;
        const product = pivotValue * row[j]! - factor * pivot[j]!;
        const quotient = product / previousPivot;
        if (quotient * previousPivot !== product) throw new Error('solveExact found an inexact division');
        row[j] = quotient;
      }
      row[k] = 0n;
    }
    previousPivot = pivotValue;
  }
  const denominator = previousPivot;
  const numerators = rows.map((row) => row.slice(size));
  return { denominator, numerators };
}
