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
  /** Split α over the comparisons (Bonferroni) or use α for each comparison. */
  readonly multiplicity: 'bonferroni' | 'none';
  /** Accept m only if LOO RMSE(m) ≤ (1 + τ)·min LOO RMSE; null switches the guard off. */
  readonly looTolerance: number | null;
  /** Fewest residual degrees of freedom n − p an accepted order (and every comparison order) must keep. */
  readonly minResidualDof: number;
}

/** The measured default: α = 0.05 Bonferroni-split, τ = 0.10, at least 2 residual dof. */
export const LOWEST_JUSTIFIED_DEFAULTS: LowestJustifiedParameters = {
  alpha: 0.05,
  multiplicity: 'bonferroni',
  looTolerance: 0.1,
  minResidualDof: 2,
};

/** How one order fares under the rule; used by choose and explain. */
interface OrderVerdict {
  readonly order: number;
  readonly comparisons: number;
  readonly level: number;
  /** Smallest raw p over the higher orders compared, the order it was against and its F. */
  readonly smallestP: number;
  readonly against: number;
  readonly statistic: number;
  readonly significant: boolean;
  readonly looRatio: number;
  readonly looPasses: boolean;
}

/** Highest order in the table keeping at least `minResidualDof` residual dof, or null. */
function guardedMaximum(table: CandidateTable, minResidualDof: number): number | null {
  for (let order = table.maxCandidate; order >= table.minCandidate; order--) {
    if (fitOfOrder(table, order).degreesOfFreedom >= minResidualDof) return order;
  }
  return null;
}

function bestPress(table: CandidateTable, highest: number): { order: number; press: number } {
  let best = { order: table.minCandidate, press: Infinity };
  for (let order = table.minCandidate; order <= highest; order++) {
    const press = fitOfOrder(table, order).press;
    if (press < best.press * (1 - 1e-12)) best = { order, press };
  }
  return best;
}

function verdict(table: CandidateTable, parameters: LowestJustifiedParameters, order: number, highest: number, withP: boolean): OrderVerdict {
  const comparisons = highest - order;
  const level = parameters.multiplicity === 'bonferroni' && comparisons > 0 ? parameters.alpha / comparisons : parameters.alpha;
  const lower = fitOfOrder(table, order);
  let significant = false;
  let smallestP = Infinity;
  let against = order;
  let statistic = 0;
  for (let higher = order + 1; higher <= highest; higher++) {
    const test = extraSumOfSquaresF(lower, fitOfOrder(table, higher));
    if (isSignificant(test, level)) significant = true;
    if (withP) {
      const p = extraSumOfSquaresP(test);
      if (p < smallestP) {
        smallestP = p;
        against = higher;
        statistic = test.statistic;
      }
    } else if (significant) {
      break;
    }
  }
  const best = bestPress(table, highest);
  const looRatio = Math.sqrt(lower.press / best.press);
  const looPasses = parameters.looTolerance === null || looRatio <= 1 + parameters.looTolerance;
  return { order, comparisons, level, smallestP, against, statistic, significant, looRatio, looPasses };
}

/**
 * Build the rule with given parameters (the benchmark explores variants; selectOrder uses the defaults).
 * @example
 * createLowestJustifiedCriterion({ ...LOWEST_JUSTIFIED_DEFAULTS, looTolerance: null }).choose(table)
 */
export function createLowestJustifiedCriterion(parameters: LowestJustifiedParameters): OrderCriterion {
  const looText = parameters.looTolerance === null ? '' : `, and whose leave-one-out RMSE is within ${Math.round(100 * parameters.looTolerance)} % of the best`;
  const levelText = parameters.multiplicity === 'bonferroni' ? `${parameters.alpha} split over the comparisons (Bonferroni)` : `${parameters.alpha} each`;
  return {
    name: 'lowestJustified',
    label: `lowest justified (α=${parameters.alpha}${parameters.multiplicity === 'bonferroni' ? ' Bonf.' : ''}, τ=${parameters.looTolerance ?? 'off'})`,
    rule: `Choose the lowest order, keeping at least ${parameters.minResidualDof} residual degrees of freedom, that no higher order improves on significantly (extra-sum-of-squares F test at ${levelText})${looText}.`,
    requiresUncertainty: false,
    choose(table: CandidateTable): number {
      const highest = guardedMaximum(table, parameters.minResidualDof);
      if (highest === null) return table.minCandidate;
      const best = bestPress(table, highest);
      const pressLimit = parameters.looTolerance === null ? Infinity : best.press * (1 + parameters.looTolerance) ** 2;
      for (let order = table.minCandidate; order <= highest; order++) {
        if (fitOfOrder(table, order).press > pressLimit) continue;
        if (!verdict(table, { ...parameters, looTolerance: null }, order, highest, false).significant) return order;
      }
      return best.order;
    },
    explain(table: CandidateTable, order: number): string {
      const highest = guardedMaximum(table, parameters.minResidualDof);
      if (highest === null) {
        return `Order ${order}: forced, because no candidate order leaves ${parameters.minResidualDof} residual degrees of freedom with ${table.n} points.`;
      }
      const chosen = verdict(table, parameters, order, highest, true);
      let why: string;
      if (chosen.significant || !chosen.looPasses) {
        why = `no order passes both tests, so the order with the smallest leave-one-out RMSE is taken`;
      } else if (chosen.comparisons === 0) {
        why = `it is the highest order that keeps ${parameters.minResidualDof} residual degrees of freedom`;
      } else {
        why = `no higher order up to ${highest} improves on it significantly (smallest p = ${formatP(chosen.smallestP)} against order ${chosen.against}, F = ${formatNumber(chosen.statistic)}; Bonferroni level ${formatP(chosen.level)} over ${chosen.comparisons} comparison${chosen.comparisons === 1 ? '' : 's'})`;
      }
      const looNote = parameters.looTolerance === null ? '' : `; its leave-one-out RMSE is ${formatNumber(100 * (chosen.looRatio - 1))} % above the best`;
      let lowerNote = '';
      if (order > table.minCandidate && !(chosen.significant || !chosen.looPasses)) {
        const previous = verdict(table, parameters, order - 1, highest, true);
        lowerNote = !previous.looPasses
          ? `; order ${order - 1}'s leave-one-out RMSE is ${formatNumber(100 * (previous.looRatio - 1))} % above the best (limit ${formatNumber(100 * (parameters.looTolerance ?? 0))} %)`
          : `; order ${order - 1} is improved on by order ${previous.against} (F = ${formatNumber(previous.statistic)}, p = ${formatP(previous.smallestP)} < ${formatP(previous.level)})`;
      }
      return `Order ${order}: ${why}${looNote}${lowerNote}.`;
    },
  };
}

/** The default criterion with the measured parameters LOWEST_JUSTIFIED_DEFAULTS. */
export const lowestJustifiedCriterion: OrderCriterion = createLowestJustifiedCriterion(LOWEST_JUSTIFIED_DEFAULTS);
