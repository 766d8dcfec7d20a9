/**
 * Nested least-squares fits of every candidate order from one Householder QR.
 *
 * Symbols: n points, u the fitted-space x, v the fitted-space y, w = 1/σ² the weights, t = (u − c)/h the
 * mapped variable on [−1, 1], V = [t⁰ … t^M] the mapped Vandermonde design, Q R = √W V its thin QR, and
 * z = Qᵀ √W v. Because the columns of V are nested, the order-m fit uses the leading columns of Q and R:
 *
 *   coefficients  R[:p, :p] b = z[:p]                          (back substitution, never normal equations)
 *   residuals     r(m) = r(M) + Σ_{j=p..P−1} Q[:, j] z_j        (adding back the dropped projections)
 *   S_r(m)        Σ r(m)_i²                                     (weighted when σ is given)
 *   1 − h_ii(m)   (1 − h_ii(M)) + Σ_{j=p..P−1} Q_ij²            (a sum of positive terms, no cancellation)
 *   PRESS(m)      Σ (r_i / (1 − h_ii))²                         (leave-one-out residuals without refitting)
 *
 * 1 − h_ii(M) itself is 1 − Σ_j Q_ij², which loses digits when h_ii → 1. When it falls below 1e-6 it is
 * recomputed from the deletion identity 1/(1 − h_ii) = 1 + v_iᵀ (V₍ᵢ₎ᵀ V₍ᵢ₎)⁻¹ v_i, using a QR of the design
 * without row i, which again sums positive terms.
 *
 * Floating-point floor: S_r and PRESS are clamped below at n·(1e-11·max|√w v|)². Exactly representable data
 * (a rounded table that is exactly linear, say) would otherwise give residuals of relative size 1e-16 whose
 * order-to-order differences are noise; with the floor they tie, and ties go to the lowest order.
 *
 * Without an intercept the constant column is dropped and the map is t = u / max|u| (no centring, which would
 * move the origin the curve must pass through).
 *
 * References: Golub & Van Loan, *Matrix Computations*, 4th ed., §5.3 (least squares by QR);
 * Allen (1974), "The relationship between variable selection and data augmentation and a method for
 * prediction", Technometrics 16(1) (PRESS); https://en.wikipedia.org/wiki/PRESS_statistic ;
 * https://en.wikipedia.org/wiki/Leverage_(statistics) (h_ii and the deletion identity).
 *
 * Cost: O(n P²) for the QR plus O(n P) per order, P = M + 1 columns.
 */
import { Matrix, QrDecomposition } from 'ml-matrix';
import { domainMapFor } from '../domain.ts';
import { orthogonalRows, scratchMatrix, type QrStorage } from '../qrSolve.ts';
import { FitError } from '../fitError.ts';
import type { DomainMap } from '../types.ts';

/** Relative size of the floating-point floor on S_r and PRESS (see the file header). */
export const RESIDUAL_FLOOR_RELATIVE = 1e-11;

/** The fit of one order inside a nested family. All sums are weighted when weights are given. */
export interface NestedOrderFit {
  readonly order: number;
  /** Number of coefficients p (m + 1 with an intercept, m without). */
  readonly parameters: number;
  /** n − p. */
  readonly degreesOfFreedom: number;
  /** S_r after the floating-point floor. */
  readonly residualSumOfSquares: number;
  /** PRESS after the floating-point floor. */
  readonly press: number;
  /** Leave-one-out residuals e_i = r_i / (1 − h_ii), in the weighted space. */
  readonly looResiduals: readonly number[];
  /** Residuals r_i = v_i − v̂_i in the fitted space (unweighted). */
  readonly residuals: readonly number[];
  /** Coefficients of ascending powers of t, from t⁰ (0 when there is no intercept) to t^m. */
  readonly mappedCoefficients: readonly number[];
}

/** Every candidate order's fit, from one factorisation. */
export interface NestedFits {
  readonly n: number;
  readonly intercept: boolean;
  readonly weighted: boolean;
  readonly map: DomainMap;
  /** Centred (intercept) or uncentred (no intercept) total sum of squares, weighted when weights are given. */
  readonly totalSumOfSquares: number;
  /** The floor applied to S_r and PRESS. */
  readonly residualFloor: number;
  /** Fits for orders minOrder..maxOrder, ascending; minOrder is 0 with an intercept and 1 without. */
  readonly fits: readonly NestedOrderFit[];
}

export interface NestedFitOptions {
  /** Highest order to fit (the caller caps it; see maxCandidateOrder). */
  readonly maxOrder: number;
  readonly intercept?: boolean;
  /** Weights w_i = 1/σ_i²; omitted for an unweighted fit. */
  readonly weights?: readonly number[] | undefined;
}

/**
 * Fit orders 0 (or 1 without intercept) to maxOrder to (u, v) from one Householder QR of the mapped design.
 *
 * @param u fitted-space x values (not modified)
 * @param v fitted-space y values (not modified)
 * @returns the nested fits, JSON-serialisable
 * @throws FitError 'order-too-high' when the design has fewer rows than columns or a zero column
 * @example
 * fitNestedOrders([0, 1, 2, 3], [1, 3, 5, 7], { maxOrder: 2 }).fits[1].mappedCoefficients
 * // => [4, 3] (to rounding): v = 1 + 2u = 4 + 3t with t = (u − 1.5)/1.5
 */
export function fitNestedOrders(u: readonly number[], v: readonly number[], options: NestedFitOptions): NestedFits {
  const n = u.length;
  const intercept = options.intercept ?? true;
  const firstPower = intercept ? 0 : 1;
  const maxOrder = options.maxOrder;
  const columns = maxOrder + 1 - firstPower;
  if (v.length !== n) throw new FitError('length-mismatch', 'fitNestedOrders requires x and y of equal length');
  if (columns < 1 || n < columns) {
    throw new FitError('order-too-high', `fitNestedOrders requires at least ${columns} points for order ${maxOrder}`);
  }
  const map = domainMapFor(u, intercept);
  const sqrtWeights = options.weights ? options.weights.map((weight) => Math.sqrt(weight)) : null;

  const design: number[][] = [];
  const weightedResponse: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = (u[i]! - map.center) / map.halfWidth;
    const rowScale = sqrtWeights ? sqrtWeights[i]! : 1;
    const row: number[] = [];
    let power = intercept ? 1 : t;
    for (let c = 0; c < columns; c++) {
      row.push(rowScale * power);
      power *= t;
    }
    design.push(row);
    weightedResponse.push(rowScale * v[i]!);
  }

  const qr = new QrDecomposition(scratchMatrix(design, columns));
  // Q as plain rows, by the loops of ml-matrix's orthogonalMatrix (src/core/qrSolve.ts): the same numbers.
  const q = orthogonalRows((qr as unknown as QrStorage).QR.to2DArray(), columns);
  const r = qr.upperTriangularMatrix.to2DArray();
  for (let c = 0; c < columns; c++) {
    if (r[c]![c] === 0) throw new FitError('order-too-high', `fitNestedOrders found a zero column at power ${c + firstPower}`);
  }

  // z = Qᵀ √W v and the full-order residual r(M) = √W v − Q z.
  const projections = new Array<number>(columns).fill(0);
  for (let i = 0; i < n; i++) {
    const qRow = q[i]!;
    const value = weightedResponse[i]!;
    for (let c = 0; c < columns; c++) projections[c]! += qRow[c]! * value;
  }
  const residual: number[] = weightedResponse.slice();
  const complement: number[] = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    const qRow = q[i]!;
    let fitted = 0;
    let leverage = 0;
    for (let c = 0; c < columns; c++) {
      fitted += qRow[c]! * projections[c]!;
      leverage += qRow[c]! * qRow[c]!;
    }
    residual[i] = weightedResponse[i]! - fitted;
    complement[i] = 1 - leverage;
  }
  for (let i = 0; i < n; i++) {
    if (complement[i]! < 1e-6) complement[i] = stableLeverageComplement(design, i);
  }

  let scale = 0;
  for (const value of weightedResponse) scale = Math.max(scale, Math.abs(value));
  const residualFloor = n * (RESIDUAL_FLOOR_RELATIVE * scale) ** 2;

  const fits: NestedOrderFit[] = [];
  for (let p = columns; p >= 1; p--) {
    const order = p - 1 + firstPower;
    let sumOfSquares = 0;
    let press = 0;
    const looResiduals = new Array<number>(n);
    const residuals = new Array<number>(n);
    for (let i = 0; i < n; i++) {
      const ri = residual[i]!;
      sumOfSquares += ri * ri;
      const loo = ri / complement[i]!;
      looResiduals[i] = loo;
      press += loo * loo;
      residuals[i] = sqrtWeights ? ri / sqrtWeights[i]! : ri;
    }
    fits.push({
      order,
      parameters: p,
      degreesOfFreedom: n - p,
      residualSumOfSquares: Math.max(sumOfSquares, residualFloor),
      press: Math.max(press, residualFloor),
      looResiduals,
      residuals,
      mappedCoefficients: backSubstitute(r, projections, p, firstPower),
    });
    // Step down one order: add back column p − 1's projection to the residual and to 1 − h_ii.
    const dropped = p - 1;
    const zDropped = projections[dropped]!;
    for (let i = 0; i < n; i++) {
      const qValue = q[i]![dropped]!;
      residual[i] = residual[i]! + qValue * zDropped;
      complement[i] = complement[i]! + qValue * qValue;
    }
  }
  fits.reverse();

  let totalSumOfSquares: number;
  if (intercept) {
    totalSumOfSquares = fits[0]!.residualSumOfSquares;
  } else {
    totalSumOfSquares = 0;
    for (const value of weightedResponse) totalSumOfSquares += value * value;
  }
  return { n, intercept, weighted: sqrtWeights !== null, map, totalSumOfSquares, residualFloor, fits };
}


/** Solve the leading p×p block of R for the mapped coefficients; pad t⁰ with 0 when there is no intercept. */
function backSubstitute(r: number[][], projections: readonly number[], p: number, firstPower: number): number[] {
  const solution = new Array<number>(p).fill(0);
  for (let row = p - 1; row >= 0; row--) {
    let sum = projections[row]!;
    const rRow = r[row]!;
    for (let c = row + 1; c < p; c++) sum -= rRow[c]! * solution[c]!;
    solution[row] = sum / rRow[row]!;
  }
  return firstPower === 0 ? solution : [0, ...solution];
}

/**
 * 1 − h_ii for the full design by the deletion identity 1/(1 − h_ii) = 1 + ‖R₍ᵢ₎⁻ᵀ x_i‖², where R₍ᵢ₎ is the
 * triangular factor of the design without row i. Returns 0 when the design without row i is rank deficient
 * (the point is then interpolated by every fit: h_ii = 1).
 */
function stableLeverageComplement(design: readonly (readonly number[])[], index: number): number {
  const reduced = design.filter((_, i) => i !== index).map((row) => row.slice());
  const columns = design[0]!.length;
  if (reduced.length < columns) return 0;
  const r = new QrDecomposition(new Matrix(reduced)).upperTriangularMatrix.to2DArray();
  const row = design[index]!;
  const solution = new Array<number>(columns).fill(0);
  let norm = 0;
  for (let c = 0; c < columns; c++) {
    let sum = row[c]!;
    for (let k = 0; k < c; k++) sum -= r[k]![c]! * solution[k]!;
    const diagonal = r[c]![c]!;
    if (diagonal === 0) return 0;
    solution[c] = sum / diagonal;
    norm += solution[c]! * solution[c]!;
  }
  return 1 / (1 + norm);
}
