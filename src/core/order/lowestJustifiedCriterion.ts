/**
 * The default rule, "the lowest order the data justify": choose the lowest order m, keeping at least two
 * residual degrees of freedom, that neither of the next two orders improves on significantly.
 *
 * For each higher order k = m + 1, m + 2 (only orders that themselves keep ≥ 2 residual dof), the
 * extra-sum-of-squares test
 *
 *   F = [(S_r(m) − S_r(k)) / (p_k − p_m)] / [S_r(k) / (n − p_k)]  ~  F(p_k − p_m, n − p_k)
 *
 * is run at α/K, K the number of orders compared (Bonferroni: familywise level α for "m is enough"), with
 * α = 5 %, raised to 10 % when the higher fit has fewer than 10 residual dof (such tests have little power).
 * The highest order keeping 2 residual dof is accepted when every lower order is improved on. With fewer than
 * 2 residual dof at every candidate, the lowest candidate is taken (forced) and selectOrder warns.
 *
 * Why these pieces (all measured by `npm run bench:order`, table in src/pages/how-orders-are-chosen.astro):
 * - Comparing with the next two orders, not only the next one, looks past one small intermediate coefficient,
 *   which smooth property curves do have (the forward sequential F test stops there: worst p90 ratio 14).
 * - Comparing with only two orders, not all higher ones, keeps the Bonferroni split mild (2.5 % per test) and
 *   stops chance improvements at far orders with few dof (the all-higher rule over-fits 15 % of polynomials).
 * - 10 % for tests with < 10 residual dof recovers power with 8–12 points (worst family × n p90 ratio 2.57
 *   instead of 3.29 at 5 % throughout), where over-fitting is rare anyway.
 * - At least 2 residual dof: no near-interpolating fit, and every F denominator has ≥ 2 dof.
 * An optional leave-one-out (PRESS) guard was measured too and is off by default: with the two-order window
 * it changed nothing material, and without confirmation by the F test it over-fits (benchmark --explore rows).
 *
 * References: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §6.1 (extra sum of squares);
 * NIST/SEMATECH e-Handbook §4.4.4 (https://www.itl.nist.gov/div898/handbook/pmd/section4/pmd44.htm);
 * Dunn, O. J. (1961), "Multiple comparisons among means", JASA 56, 52–64 (Bonferroni),
 * https://en.wikipedia.org/wiki/Bonferroni_correction ; Allen (1974), Technometrics 16(1) (PRESS).
 *
 * @example
 * lowestJustifiedCriterion.choose(table) // => 3 for cubic data with small noise
 */
import { fitOfOrder, reasonNumber, formatP, pText, type CandidateTable, type OrderCriterion } from './criterion.ts';
import { extraSumOfSquaresF, extraSumOfSquaresP, isSignificant } from './extraSumOfSquaresF.ts';

/** Tunable parameters of the default rule. */
export interface LowestJustifiedParameters {
  /** Familywise level of "order m is enough", split over the orders compared when multiplicity is 'bonferroni'. */
  readonly alpha: number;
  /** Level used instead of alpha when the higher fit has fewer than lowDofBelow residual dof; null: off. */
  readonly lowDofAlpha: number | null;
  readonly lowDofBelow: number;
  /** Compare m only with orders k ≤ m + lookAhead; null: every higher candidate. */
  readonly lookAhead: number | null;
  /** 'bonferroni': each of the K comparisons at level/K; 'none': each at level. */
  readonly multiplicity: 'bonferroni' | 'none';
  /** Optional PRESS guard: a higher order k also improves on m when LOO RMSE(m) > (1 + τ)·LOO RMSE(k); null: off. */
  readonly looTolerance: number | null;
  /** With the PRESS guard, also require k to be significant at this unadjusted level; null: no confirmation. */
  readonly looConfirmAlpha: number | null;
  /** Fewest residual dof n − p an accepted order, and every comparison order, must keep. */
  readonly minResidualDof: number;
}

/** The measured default: 5 % (10 % below 10 residual dof), Bonferroni over the next two orders, ≥ 2 residual dof. */
export const LOWEST_JUSTIFIED_DEFAULTS: LowestJustifiedParameters = {
  alpha: 0.05,
  lowDofAlpha: 0.1,
  lowDofBelow: 10,
  lookAhead: 2,
  multiplicity: 'bonferroni',
  looTolerance: null,
  looConfirmAlpha: null,
  minResidualDof: 2,
};

/** Why a higher order k beats order m. */
export interface Improvement {
  readonly against: number;
  readonly statistic: number;
  /** Unadjusted p-value of the F test of m against k. */
  readonly p: number;
  /** The level this comparison was tested at (after the Bonferroni split). */
  readonly level: number;
  /** 'significant': F test significant; 'prediction': PRESS guard (LOO RMSE clearly lower). */
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

/** The orders m is compared with: m + 1 … min(guarded maximum, m + lookAhead). */
function comparisonRange(parameters: LowestJustifiedParameters, order: number, guardHighest: number): number {
  return parameters.lookAhead === null ? guardHighest : Math.min(guardHighest, order + parameters.lookAhead);
}

/** Level of one comparison: α (or the low-dof α), divided by the number of comparisons under Bonferroni. */
function comparisonLevel(parameters: LowestJustifiedParameters, higherDof: number, comparisons: number): number {
  const base = parameters.lowDofAlpha !== null && higherDof < parameters.lowDofBelow ? parameters.lowDofAlpha : parameters.alpha;
  return parameters.multiplicity === 'bonferroni' && comparisons > 1 ? base / comparisons : base;
}

/** The first higher order (ascending) that improves on `order` under the rule, or null. */
function firstImprovement(table: CandidateTable, parameters: LowestJustifiedParameters, order: number, guardHighest: number): Improvement | null {
  const highest = comparisonRange(parameters, order, guardHighest);
  const comparisons = highest - order;
  const lower = fitOfOrder(table, order);
  for (let candidate = order + 1; candidate <= highest; candidate++) {
    const higher = fitOfOrder(table, candidate);
    const test = extraSumOfSquaresF(lower, higher);
    const level = comparisonLevel(parameters, higher.degreesOfFreedom, comparisons);
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
    if (kind !== null) return { against: candidate, statistic: test.statistic, p: extraSumOfSquaresP(test), level, kind, looRatio };
  }
  return null;
}

/** Every comparison of `order` with its higher orders, for the reason sentence. */
function comparisonsOf(table: CandidateTable, parameters: LowestJustifiedParameters, order: number, guardHighest: number): string[] {
  const highest = comparisonRange(parameters, order, guardHighest);
  const comparisons = highest - order;
  const lower = fitOfOrder(table, order);
  const parts: string[] = [];
  for (let candidate = order + 1; candidate <= highest; candidate++) {
    const higher = fitOfOrder(table, candidate);
    const test = extraSumOfSquaresF(lower, higher);
    const level = comparisonLevel(parameters, higher.degreesOfFreedom, comparisons);
    const reduction = 1 - higher.residualSumOfSquares / lower.residualSumOfSquares;
    parts.push(`order ${candidate} lowers S_r by ${reasonNumber(100 * reduction)} % (F = ${reasonNumber(test.statistic)}, ${pText(extraSumOfSquaresP(test))} ≥ ${formatP(level)})`);
  }
  return parts;
}

function describeImprovement(order: number, improvement: Improvement): string {
  if (improvement.kind === 'significant') {
    return `order ${order} is improved on by order ${improvement.against} (F = ${reasonNumber(improvement.statistic)}, ${pText(improvement.p)}, significant at ${formatP(improvement.level)})`;
  }
  return `order ${order} is improved on by order ${improvement.against}, which predicts left-out points ${reasonNumber(100 * (improvement.looRatio - 1))} % better (F = ${reasonNumber(improvement.statistic)}, ${pText(improvement.p)})`;
}

/**
 * Build the rule with given parameters (the benchmark explores variants; selectOrder uses the defaults).
 * @example
 * createLowestJustifiedCriterion({ ...LOWEST_JUSTIFIED_DEFAULTS, lookAhead: null }).choose(table)
 */
export function createLowestJustifiedCriterion(parameters: LowestJustifiedParameters): OrderCriterion {
  const window = parameters.lookAhead === null ? 'any higher order' : parameters.lookAhead === 1 ? 'the next order' : `none of the next ${parameters.lookAhead} orders`;
  const split = parameters.multiplicity === 'bonferroni' ? ' split over the orders compared (Bonferroni)' : ' per comparison';
  const lowDof = parameters.lowDofAlpha === null ? '' : `, ${100 * parameters.lowDofAlpha} % when the higher fit has fewer than ${parameters.lowDofBelow} residual degrees of freedom`;
  const loo = parameters.looTolerance === null ? '' : `, or predicts left-out points more than ${Math.round(100 * parameters.looTolerance)} % better`;
  const label = `lowest justified (W=${parameters.lookAhead ?? 'all'}, α=${parameters.alpha}${parameters.lowDofAlpha === null ? '' : `/${parameters.lowDofAlpha} if dof<${parameters.lowDofBelow}`}${parameters.looTolerance === null ? '' : `, τ=${parameters.looTolerance}`})`;
  return {
    name: 'lowestJustified',
    label,
    rule: `Choose the lowest order, keeping at least ${parameters.minResidualDof} residual degrees of freedom, that ${parameters.lookAhead === null ? 'no higher order' : window} improves on significantly: extra-sum-of-squares F test at ${100 * parameters.alpha} %${split}${lowDof}${loo}.`,
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
      const why =
        order >= highest
          ? `it is the highest order that keeps ${parameters.minResidualDof} residual degrees of freedom, and every lower order is improved on`
          : `going higher is not significant: ${comparisonsOf(table, parameters, order, highest).join('; ')}`;
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
