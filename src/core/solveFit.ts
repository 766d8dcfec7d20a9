/**
 * The floating-point solve shared by fitPolynomial and fitCurve: validation, transforms, weights, the mapped
 * design matrix and its QR solve, residuals and their summary, and the mapped coefficients with their unscaled
 * covariance. Internal to the core (not exported by its door).
 */
import { designMatrix } from './designMatrix.ts';
import { domainMapFor, toUnit } from './domain.ts';
import { FitError } from './fitError.ts';
import { solveLeastSquares } from './leastSquares.ts';
import { residualStatistics, totalSumOfSquares } from './stats/residualStatistics.ts';
import { fittedSpaceWeights, forwardX, forwardY, transformData } from './transforms.ts';
import { validateFitInput } from './validateFitInput.ts';
import type { FitData, FitOptions } from './types.ts';

/** @example solveFit({ x: [0, 1, 2], y: [1, 3, 5] }, { order: 1 }).mappedCoefficients.length // => 2 */
export function solveFit(data: FitData, options: FitOptions) {
  const { order, intercept, transformX, transformY, constraints, confidence, range } = validateFitInput(data, options);
  const n = data.x.length;
  const { u, v } = transformData(data.x, data.y, transformX, transformY);
  const weighted = data.uncertainty !== undefined;
  const uncertaintyScale: 'stated' | 'scatter' = weighted && options.uncertaintyScale === 'stated' ? 'stated' : 'scatter';
  const weights = data.uncertainty ? fittedSpaceWeights(data.y, data.uncertainty, transformY) : new Array<number>(n).fill(1);
  const rootWeights = weights.map(Math.sqrt);

  const powers: number[] = [];
  for (let k = intercept ? 0 : 1; k <= order; k++) powers.push(k);
  const distinct = new Set(intercept ? u : u.filter((value) => value !== 0)).size;
  if (powers.length - constraints.length > distinct) {
    throw new FitError(
      'too-few-distinct',
      `order ${order} needs at least ${powers.length - constraints.length} distinct x values${intercept ? '' : ' other than 0'}, the data have ${distinct}`,
    );
  }
  const cu = constraints.map((c) => forwardX(transformX, c.x));
  const cv = constraints.map((c) => forwardY(transformY, c.y));
  for (const c of constraints) {
    if (c.x < range.min || c.x > range.max) {
      throw new FitError('constraint-outside-range', `the constraint at x = ${c.x} is outside the validity range [${range.min}, ${range.max}]`);
    }
  }

  const map = domainMapFor(u, intercept);
  const t = u.map((value) => toUnit(map, value));
  const A = designMatrix(t, powers, rootWeights);
  const constraintMatrix = designMatrix(cu.map((value) => toUnit(map, value)), powers);
  const solution = solveLeastSquares(
    A,
    v.map((value, i) => value * rootWeights[i]!),
    constraints.length ? { C: constraintMatrix, d: cv } : undefined,
  );
  const parameters = solution.freeParameters;
  const fittedV = solution.fitted.map((value, i) => value / rootWeights[i]!);
  const residuals = v.map((value, i) => value - fittedV[i]!);
  const weightedResiduals = residuals.map((r, i) => r * rootWeights[i]!);
  const centred = intercept;
  const total = totalSumOfSquares(v, weights, centred);
  const summary = residualStatistics(weightedResiduals, solution.leverage, parameters, total, centred);
  const dof = n - parameters;

  // Full-length mapped coefficients and unscaled covariance (zero entries for a fixed a₀), from the QR.
  const size = order + 1;
  const mappedCoefficients = new Array<number>(size).fill(0);
  const unscaledMapped = Array.from({ length: size }, () => new Array<number>(size).fill(0));
  powers.forEach((k, j) => {
    mappedCoefficients[k] = solution.beta[j]!;
    powers.forEach((l, i) => {
      unscaledMapped[k]![l] = solution.unscaledCovariance[j]![i]!;
    });
  });
  return {
    order, intercept, transformX, transformY, constraints, confidence, range, n, u, v, weighted, uncertaintyScale, weights, rootWeights,
    powers, cu, cv, map, A, solution, parameters, fittedV, residuals, weightedResiduals, centred, total, summary, dof, size,
    mappedCoefficients, unscaledMapped,
  };
}
