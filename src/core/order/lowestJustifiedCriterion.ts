/**
 * The default rule, "the lowest order the data justify": choose the lowest order m, keeping at least two
 * residual degrees of freedom, such that
 *
 *   (1) no higher order k (m < k ≤ K_max, also with ≥ 2 residual dof) improves on it significantly: every
 *       extra-sum-of-squares test F = [(S_r(m) − S_r(k))/(p_k − p_m)] / [S_r(k)/(n − p_k)] has
 *       p ≥ α / (number of higher orders compared)   (Bonferroni: familywise level α for "m is enough"), and
 *   (2) its leave-one-out RMSE √(PRESS(m)/n) is within a factor (1 + τ) of the best leave-one-out RMSE among
 *       the same candidates (a guard against stopping early on smooth curves that are not polynomials).
 *
 * If no order satisfies both, the order with the smallest PRESS is taken. With fewer than two residual degrees
 * of freedom available at every order, the lowest candidate is taken (forced) and selectOrder warns.
 *
 * Why: the "all higher orders" F test looks past a small intermediate coefficient (unlike the forward
 * sequential test), the Bonferroni split removes its over-fitting from multiplicity, the 2-dof guard keeps
 * every F denominator and every published fit away from near-interpolation, and the PRESS guard restores
 * accuracy on non-polynomial property curves. The parameter values were chosen by measurement in
 * `npm run bench:order` (scripts/bench/order.ts); see src/pages/how-orders-are-chosen.astro for the table.
 *
 * References: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §6.1 (extra sum of squares);
 * Dunn, O. J. (1961), "Multiple comparisons among means", JASA 56, 52–64 (Bonferroni bound),
 * https://en.wikipedia.org/wiki/Bonferroni_correction ; Allen (1974), Technometrics 16(1) (PRESS),
 * https://en.wikipedia.org/wiki/PRESS_statistic
 *
 * @example
 * lowestJustifiedCriterion.choose(table) // => e.g. 3 for cubic data with noise
 */
import { fitOfOrder, formatNumber, formatP, type CandidateTable, type OrderCriterion } from './criterion.ts';
import { extraSumOfSquaresF, extraSumOfSquaresP, isSignificant } from './extraSumOfSquaresF.ts';

/** Tunable parameters of the default rule. */
export interface LowestJustifiedParameters {
  /** Familywise significance level of "order m is enough" (split over the higher orders compared). */
  readonly alpha: number;
  /** How α is shared over the K higher orders compared: 'bonferroni' tests each at α/K, 'none' each at α. */
  readonly multiplicity: 'bonferroni' | 'none';
  /** A higher order k also counts as an improvement when LOO RMSE(k)·(1 + τ) < LOO RMSE(m); null: off. */
  readonly looTolerance: number | null;
  /** When set, such a LOO improvement counts only if k is also significant at this unadjusted level. */
  readonly looConfirmAlpha: number | null;
  /** Fewest residual degrees of freedom n − p an accepted order (and every comparison order) must keep. */
  readonly minResidualDof: number;
}

/** The measured default (see the file header and the benchmark). */
export const LOWEST_JUSTIFIED_DEFAULTS: LowestJustifiedParameters = {
  alpha: 0.1,
  multiplicity: 'bonferroni',
  looTolerance: 0.15,
  looConfirmAlpha: 0.05,
  minResidualDof: 2,
};

/** Why a higher order k beats order m, or null when none does. */
export interface Improvement {
  readonly against: number;
  readonly statistic: number;
  /** Unadjusted p-value of the F test of m against k. */
  readonly p: number;
  /** The Bonferroni level m was tested at. */
  readonly level: number;
  readonly comparisons: number;
  /** 'significant': F significant at the (adjusted) level; 'prediction': LOO RMSE clearly lower and F confirmed. */
  readonly kind: 'significant' | 'prediction';
  /** LOO RMSE(m) / LOO RMSE(k). */
  readonly looRatio: number;
}

/** Highest order in the table keeping at least `minResidualDof` residual dof, or null. */
function guardedMaximum(table: CandidateTable, minResidualDof: number): number | null {
  for (let order = table.maxCandidate; order >= table.minCandidate; order--) {
    if (fitOfOrder(table, order).degreesOfFreedom >= minResidualDof) return order;
  }
  return null;
}

/** The first higher order (ascending) that beats `order` under the rule, or null. */
function firstImprovement(table: CandidateTable, parameters: LowestJustifiedParameters, order: number, highest: number): Improvement | null {
  const comparisons = highest - order;
  const level = parameters.multiplicity === 'bonferroni' && comparisons > 0 ? parameters.alpha / comparisons : parameters.alpha;
  const lower = fitOfOrder(table, order);
  for (let candidate = order + 1; candidate <= highest; candidate++) {
    const higher = fitOfOrder(table, candidate);
    const test = extraSumOfSquaresF(lower, higher);
    const looRatio = Math.sqrt(lower.press / higher.press);
    let kind: Improvement['kind'] | null = null;
    if (isSignificant(test, level)) {
      kind = 'significant';
    } else if (
      parameters.looTolerance !== null &&
      looRatio > 1 + parameters.looTolerance &&
      (parameters.looConfirmAlpha === null || isSignificant(test, parameters.looConfirmAlpha))
    ) {
      kind = 'prediction';
    }
    if (kind !== null) {
      return { against: candidate, statistic: test.statistic, p: extraSumOfSquaresP(test), level, comparisons, kind, looRatio };
    }
  }
  return null;
}

/** The smallest unadjusted p of `order` against the higher orders, for the reason sentence. */
function strongestComparison(table: CandidateTable, order: number, highest: number): { against: number; statistic: number; p: number } {
  let best = { against: order, statistic: 0, p: Infinity };
  for (let candidate = order + 1; candidate <= highest; candidate++) {
    const test = extraSumOfSquaresF(fitOfOrder(table, order), fitOfOrder(table, candidate));
    const p = extraSumOfSquaresP(test);
    if (p < best.p) best = { against: candidate, statistic: test.statistic, p };
  }
  return best;
}

function describeImprovement(order: number, improvement: Improvement): string {
  if (improvement.kind === 'significant') {
    return `order ${order} is improved on by order ${improvement.against} (F = ${formatNumber(improvement.statistic)}, p = ${formatP(improvement.p)} < ${formatP(improvement.level)})`;
  }
  return `order ${order} is improved on by order ${improvement.against}, which predicts left-out points ${formatNumber(100 * (improvement.looRatio - 1))} % better and is significant at 5 % (F = ${formatNumber(improvement.statistic)}, p = ${formatP(improvement.p)})`;
}

/**
 * Build the rule with given parameters (the benchmark explores variants; selectOrder uses the defaults).
 * @example
 * createLowestJustifiedCriterion({ ...LOWEST_JUSTIFIED_DEFAULTS, looTolerance: null }).choose(table)
 */
export function createLowestJustifiedCriterion(parameters: LowestJustifiedParameters): OrderCriterion {
  const levelText = parameters.multiplicity === 'bonferroni' ? `${parameters.alpha} split over the orders compared (Bonferroni)` : `${parameters.alpha} each`;
  const looText =
    parameters.looTolerance === null
      ? ''
      : `, or predicts left-out points more than ${Math.round(100 * parameters.looTolerance)} % better (leave-one-out RMSE)${parameters.looConfirmAlpha === null ? '' : ` while being significant at ${parameters.looConfirmAlpha}`}`;
  return {
    name: 'lowestJustified',
    label: `lowest justified (α=${parameters.alpha}${parameters.multiplicity === 'bonferroni' ? ' Bonf.' : ''}, τ=${parameters.looTolerance ?? 'off'}${parameters.looConfirmAlpha === null ? '' : `, confirm ${parameters.looConfirmAlpha}`})`,
    rule: `Choose the lowest order, keeping at least ${parameters.minResidualDof} residual degrees of freedom, that no higher order improves on: a higher order improves on it if its extra-sum-of-squares F test is significant at ${levelText}${looText}.`,
    requiresUncertainty: false,
    choose(table: CandidateTable): number {
      const highest = guardedMaximum(table, parameters.minResidualDof);
      if (highest === null) return table.minCandidate;
      for (let order = table.minCandidate; order < highest; order++) {
        if (firstImprovement(table, parameters, order, highest) === null) return order;
      }
      return highest;
    },
    explain(table: CandidateTable, order: number): string {
      const highest = guardedMaximum(table, parameters.minResidualDof);
      if (highest === null) {
        return `Order ${order}: forced, because no candidate order leaves ${parameters.minResidualDof} residual degrees of freedom with ${table.n} points.`;
      }
      let why: string;
      if (order >= highest) {
        why = `it is the highest order that keeps ${parameters.minResidualDof} residual degrees of freedom, and every lower order is improved on`;
      } else {
        const strongest = strongestComparison(table, order, highest);
        const comparisons = highest - order;
        const level = parameters.multiplicity === 'bonferroni' ? parameters.alpha / comparisons : parameters.alpha;
        why = `no higher order up to ${highest} improves on it (smallest p = ${formatP(strongest.p)} against order ${strongest.against}, F = ${formatNumber(strongest.statistic)}, above the level ${formatP(level)} = ${parameters.alpha}/${comparisons}${parameters.looTolerance === null ? '' : `, and no higher order predicts left-out points more than ${Math.round(100 * parameters.looTolerance)} % better with significance`})`;
      }
      let lowerNote = '';
      if (order > table.minCandidate) {
        const improvement = firstImprovement(table, parameters, order - 1, highest);
        if (improvement) lowerNote = `; ${describeImprovement(order - 1, improvement)}`;
      }
      return `Order ${order}: ${why}${lowerNote}.`;
    },
  };
}

/** The default criterion with the measured parameters LOWEST_JUSTIFIED_DEFAULTS. */
export const lowestJustifiedCriterion: OrderCriterion = createLowestJustifiedCriterion(LOWEST_JUSTIFIED_DEFAULTS);
