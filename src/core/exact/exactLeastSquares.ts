/**
 * Exact rational least squares for a polynomial model, used to certify the floating-point solution.
 *
 * The inputs are read as the decimals they print as (see decimal.ts) and scaled to integers:
 * u_i = U_i·10^eu, v_i = V_i·10^ev, w_i = W_i·10^ew. With β_k = a_k·10^(k·eu − ev) the weighted normal equations
 * Σ_i w_i u_i^j u_i^k a_k = Σ_i w_i u_i^j v_i become the integer system G·β = g with G_jk = Σ W_i U_i^(j+k) and
 * g_j = Σ W_i U_i^j V_i. Equality constraints Σ_k a_k c^k = d border the system (Lagrange multipliers):
 * [G Cᵀ; C 0]·[β; λ] = [g; D]. The bordered system is solved by fraction-free elimination, so the answer is the
 * exact least-squares solution of the decimal data: forming the normal equations loses nothing here, because no
 * rounding happens anywhere (the usual objection to them is the squared condition number under rounding).
 *
 * The covariance of the estimates is s²·P, where P is the leading block of the inverse of the (bordered) matrix
 * (for an unconstrained fit, P = (XᵀWX)⁻¹); s² = S_r/(n − p + q).
 *
 * Reference for the bordered form and its covariance: Å. Björck, Numerical Methods for Least Squares Problems,
 * SIAM 1996, §5.1 (linear equality constraints).
 *
 * Cost: O(n·m) big-integer products to form G, then O((p+q)³) for the elimination; sizes grow with the digits of
 * the data and with m, so this is meant for the one chosen fit, not inner loops.
 */
import { solveExact } from './bareiss.ts';
import { decimalParts, minPartsExponent, scalePartsToIntegers, scaleToIntegers } from './decimal.ts';
import { rational, timesPowerOfTen, toNumber, type Rational } from './rational.ts';

export interface ExactProblem {
  readonly u: readonly number[];
  readonly v: readonly number[];
  readonly weights?: readonly number[] | undefined;
  readonly order: number;
  readonly intercept: boolean;
  readonly constraints: readonly { readonly u: number; readonly v: number }[];
  /**
   * 'scatter' (default): covariance s²·P, scaled by the residual variance; 'stated': P alone, for weights 1/σ²
   * with σ taken as known (χ² mode).
   */
  readonly covarianceScale?: 'scatter' | 'stated';
}

export interface ExactResult {
  /** Power-basis coefficients a_0..a_m in u (a_0 = 0 without intercept), nearest doubles to the exact values. */
  readonly coefficients: number[];
  /** The same coefficients exactly, as rationals over one common denominator: every published form comes from these. */
  readonly exactCoefficients: Rational[];
  /** Covariance s²·P of a_0..a_m (zero row/column for a fixed a_0). */
  readonly covariance: number[][];
  readonly standardErrors: number[];
  readonly residualSumOfSquares: number;
  readonly residualVariance: number;
  readonly residualStdDev: number;
  readonly rSquared: number;
  readonly degreesOfFreedom: number;
}

/**
 * Exact polynomial least squares; returns null when the (bordered) normal matrix is singular.
 * @example exactLeastSquares({ u: [0, 1, 2], v: [1, 3, 5], order: 1, intercept: true, constraints: [] })?.coefficients // => [1, 2]
 */
export function exactLeastSquares(problem: ExactProblem): ExactResult | null {
  const { order, intercept, constraints } = problem;
  const n = problem.u.length;
  const powers = [];
  for (let k = intercept ? 0 : 1; k <= order; k++) powers.push(k);
  const p = powers.length;
  const q = constraints.length;

  // Each value is read as a decimal once (decimalParts), then brought to the common exponent.
  const partsU = problem.u.map(decimalParts);
  const partsV = problem.v.map(decimalParts);
  const partsCU = constraints.map((c) => decimalParts(c.u));
  const partsCV = constraints.map((c) => decimalParts(c.v));
  const eu = Math.min(minPartsExponent(partsU), minPartsExponent(partsCU));
  const ev = Math.min(minPartsExponent(partsV), minPartsExponent(partsCV));
  const U = scalePartsToIntegers(partsU, [eu]).ints;
  const V = scalePartsToIntegers(partsV, [ev]).ints;
  const scaledW = problem.weights ? scaleToIntegers(problem.weights) : { ints: U.map(() => 1n), exponent: 0 };
  const W = scaledW.ints;
  const CU = scalePartsToIntegers(partsCU, [eu]).ints;
  const CV = scalePartsToIntegers(partsCV, [ev]).ints;

  // Power sums Σ W U^k for k = 0..2m and Σ W U^k V for k = 0..m.
  const maxPower = 2 * order;
  const momentU: bigint[] = new Array(maxPower + 1).fill(0n);
  const momentUV: bigint[] = new Array(order + 1).fill(0n);
  let sumWVV = 0n;
  let sumWV = 0n;
  let sumW = 0n;
  for (let i = 0; i < n; i++) {
    const wi = W[i]!;
    const ui = U[i]!;
    const vi = V[i]!;
    let power = wi;
    for (let k = 0; k <= maxPower; k++) {
      momentU[k]! += power;
      if (k <= order) momentUV[k]! += power * vi;
      power *= ui;
    }
    sumWVV += wi * vi * vi;
    sumWV += wi * vi;
    sumW += wi;
  }

  const size = p + q;
  const matrix: bigint[][] = [];
  const rhs: bigint[][] = [];
  for (let j = 0; j < size; j++) {
    const row: bigint[] = new Array(size).fill(0n);
    const rhsRow: bigint[] = new Array(1 + p).fill(0n);
    if (j < p) {
      for (let k = 0; k < p; k++) row[k] = momentU[powers[j]! + powers[k]!]!;
      for (let c = 0; c < q; c++) row[p + c] = CU[c]! ** BigInt(powers[j]!);
      rhsRow[0] = momentUV[powers[j]!]!;
      rhsRow[1 + j] = 1n;
    } else {
      const c = j - p;
      for (let k = 0; k < p; k++) row[k] = CU[c]! ** BigInt(powers[k]!);
      rhsRow[0] = CV[c]!;
    }
    matrix.push(row);
    rhs.push(rhsRow);
  }
  const solution = solveExact(matrix, rhs);
  const det = solution.denominator;
  if (det === 0n) return null;
  const beta = solution.numerators.slice(0, p).map((row) => row[0]!);

  // S_r·(scale) = VᵀWV − 2βᵀg + βᵀGβ, all over det²; exact for constrained and unconstrained fits alike.
  let betaG = 0n;
  let betaGBeta = 0n;
  for (let j = 0; j < p; j++) {
    betaG += beta[j]! * momentUV[powers[j]!]!;
    let rowSum = 0n;
    for (let k = 0; k < p; k++) rowSum += momentU[powers[j]! + powers[k]!]! * beta[k]!;
    betaGBeta += beta[j]! * rowSum;
  }
  // Integer-scaled S_r: S_r = srNum / det² · 10^(2·ev + ew)
  const detSquared = det * det;
  const srNum = sumWVV * detSquared - 2n * det * betaG + betaGBeta;
  const dof = n - p + q;
  const residualScale = 2 * ev + scaledW.exponent;
  const residualSumOfSquares = timesPowerOfTen(rational(srNum, detSquared), residualScale);
  const variance: Rational | null = dof > 0 ? rational(residualSumOfSquares.num, residualSumOfSquares.den * BigInt(dof)) : null;

  // Total sum of squares: centred Σ W (V − V̄)² = ΣWV² − (ΣWV)²/ΣW, or uncentred ΣWV² without intercept.
  const totalNum = intercept ? sumWVV * sumW - sumWV * sumWV : sumWVV;
  const totalDen = intercept ? sumW : 1n;
  // R² = 1 − S_r/S_t, both at the same integer scale (S_r·det² vs S_t·det²).
  const rSquared =
    totalNum === 0n ? NaN : toNumber(rational(totalNum * detSquared - srNum * totalDen, totalNum * detSquared));

  // a_k = β_k · 10^(ev − k·eu); Cov(a_j, a_k) = s²·P_jk · 10^(−(j+k)·eu) · 10^(−ew) (P is in the W-scaled system).
  const coefficients = new Array(order + 1).fill(0);
  // a_k = β_k·10^(ev − k·eu)/det, all over one common denominator det·10^(−lowest exponent), so that evaluation and
  // change of basis can work on integers (see evaluateExact and convertBasis).
  const lowestExponent = Math.min(0, ...powers.map((k) => ev - k * eu));
  const commonDenominator = det * 10n ** BigInt(-lowestExponent);
  const exactCoefficients: Rational[] = Array.from({ length: order + 1 }, () => rational(0n, commonDenominator));
  const covarianceFactor: Rational | null = problem.covarianceScale === 'stated' ? rational(1n) : variance;
  const covariance: number[][] = Array.from({ length: order + 1 }, () => new Array(order + 1).fill(0));
  const standardErrors = new Array(order + 1).fill(0);
  // The denominator every covariance entry shares before its power of ten: formed once.
  const covarianceDenominator = covarianceFactor ? covarianceFactor.den * det : 1n;
  for (let j = 0; j < p; j++) {
    exactCoefficients[powers[j]!] = rational(beta[j]! * 10n ** BigInt(ev - powers[j]! * eu - lowestExponent), commonDenominator);
    coefficients[powers[j]!] = toNumber(exactCoefficients[powers[j]!]!);
    // P is the leading block of the inverse of a symmetric matrix, so it is symmetric exactly (the same integers
    // above and below the diagonal): each entry is converted once and mirrored.
    for (let k = 0; k <= j; k++) {
      const entry = covarianceFactor
        ? timesPowerOfTen(
            rational(covarianceFactor.num * solution.numerators[j]![1 + k]!, covarianceDenominator),
            -(powers[j]! + powers[k]!) * eu - scaledW.exponent,
          )
        : null;
      const value = entry ? toNumber(entry) : NaN;
      covariance[powers[j]!]![powers[k]!] = value;
      covariance[powers[k]!]![powers[j]!] = value;
      if (j === k) standardErrors[powers[j]!] = Math.sqrt(value);
    }
  }
  return {
    coefficients,
    exactCoefficients,
    covariance,
    standardErrors,
    residualSumOfSquares: toNumber(residualSumOfSquares),
    residualVariance: variance ? toNumber(variance) : NaN,
    residualStdDev: variance ? Math.sqrt(toNumber(variance)) : NaN,
    rSquared,
    degreesOfFreedom: dof,
  };
}
