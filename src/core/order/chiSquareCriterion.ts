/**
 * χ² consistency test, for data with stated standard uncertainties σ_i: choose the lowest order whose
 * weighted residual sum of squares is consistent with those uncertainties,
 *
 *   χ²(m) = Σ_i (r_i / σ_i)² ≤ χ²_{0.95}(n − p).
 *
 * Only orders keeping at least two residual degrees of freedom are candidates (as in the default rule; a
 * near-interpolating fit passes a χ² test too easily). If no order passes (the stated uncertainties are too
 * small for any candidate), the order with the smallest reduced χ² = χ²/(n − p) is taken and selectOrder warns. By design it returns the lowest order
 * *consistent* with σ, so on smooth non-polynomial data it stops short of the most accurate order.
 *
 * Reference: Bevington & Robinson, *Data Reduction and Error Analysis for the Physical Sciences*, 3rd ed.,
 * ch. 11 (χ² test of a fit); JCGM 100:2008 (GUM) for standard uncertainty
 * (https://www.bipm.org/en/committees/jc/jcgm/publications); https://en.wikipedia.org/wiki/Goodness_of_fit
 *
 * @example
 * chiSquareCriterion.choose(table) // => lowest m with χ²(m) ≤ χ²_0.95(n − p)
 */
import { chiSquareQuantile, chiSquareUpperP } from '../distributions.ts';
import { argminOrder } from './argminOrder.ts';
import { fitOfOrder, reasonNumber, formatP, pText, type CandidateTable, type OrderCriterion } from './criterion.ts';

/** Confidence level of the χ² acceptance bound. */
export const CHI_SQUARE_LEVEL = 0.95;

const quantileCache = new Map<number, number>();

/**
 * χ²_{0.95}(dof), cached.
 * @example chiSquareBound(10) // => 18.307038053275143 (χ²₀.₉₅ with 10 dof)
 */
export function chiSquareBound(dof: number): number {
  let value = quantileCache.get(dof);
  if (value === undefined) {
    value = chiSquareQuantile(CHI_SQUARE_LEVEL, dof);
    quantileCache.set(dof, value);
  }
  return value;
}

/** The highest candidate order keeping at least `minResidualDof` residual dof (minCandidate when none does). */
function guardedMaximum(table: CandidateTable, minResidualDof: number): number {
  for (let order = table.maxCandidate; order > table.minCandidate; order--) {
    if (fitOfOrder(table, order).degreesOfFreedom >= minResidualDof) return order;
  }
  return table.minCandidate;
}

/**
 * The lowest candidate order (keeping `minResidualDof` residual dof) passing the χ² test, or null when none does.
 * @example lowestConsistentOrder(table) // => 2 when order 2 is the lowest whose χ² is within the bound
 */
export function lowestConsistentOrder(table: CandidateTable, minResidualDof = 2): number | null {
  const highest = guardedMaximum(table, minResidualDof);
  for (let order = table.minCandidate; order <= highest; order++) {
    const fit = fitOfOrder(table, order);
    if (fit.degreesOfFreedom > 0 && fit.residualSumOfSquares <= chiSquareBound(fit.degreesOfFreedom)) return order;
  }
  return null;
}

/**
 * Build the χ² rule; `minResidualDof` = 2 is the product default, 1 reproduces the unguarded textbook rule.
 * @example
 * createChiSquareCriterion(1).choose(table) // => lowest m with χ²(m) ≤ χ²_0.95(n − p), any m ≤ n − 2
 */
export function createChiSquareCriterion(minResidualDof: number): OrderCriterion {
  return {
    name: 'chiSquare',
    label: `χ² consistency (95 %, ≥${minResidualDof} dof)`,
    rule: `Choose the lowest order, keeping at least ${minResidualDof} residual degree${minResidualDof === 1 ? '' : 's'} of freedom, whose weighted residual sum of squares is within the 95 % point of χ²(n − p), given the stated uncertainties.`,
    requiresUncertainty: true,
    choose(table: CandidateTable): number {
      const consistent = lowestConsistentOrder(table, minResidualDof);
      if (consistent !== null) return consistent;
      const highest = guardedMaximum(table, minResidualDof);
      return argminOrder({ ...table, maxCandidate: highest }, (order) => {
        const fit = fitOfOrder(table, order);
        return fit.degreesOfFreedom > 0 ? fit.residualSumOfSquares / fit.degreesOfFreedom : Number.NaN;
      });
    },
    explain(table: CandidateTable, order: number): string {
      const fit = fitOfOrder(table, order);
      const chiSquare = fit.residualSumOfSquares;
      const bound = chiSquareBound(fit.degreesOfFreedom);
      const p = chiSquareUpperP(chiSquare, fit.degreesOfFreedom);
      if (chiSquare <= bound) {
        const lowerNote = order > table.minCandidate ? `, and order ${order - 1} is not (χ² = ${reasonNumber(fitOfOrder(table, order - 1).residualSumOfSquares)})` : '';
        return `Order ${order} is the lowest consistent with the stated uncertainties: χ² = ${reasonNumber(chiSquare)} ≤ χ²₀.₉₅(${fit.degreesOfFreedom}) = ${reasonNumber(bound)} (${pText(p)})${lowerNote}.`;
      }
      return `No order is consistent with the stated uncertainties; order ${order} has the smallest reduced χ² = ${reasonNumber(chiSquare / fit.degreesOfFreedom)} (${pText(p)}).`;
    },
  };
}

/** The χ² consistency criterion with the 2-residual-dof guard. */
export const chiSquareCriterion: OrderCriterion = createChiSquareCriterion(2);
