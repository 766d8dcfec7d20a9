/**
 * "All higher orders" extra-sum-of-squares F test: choose the lowest order m that no higher candidate order k
 * improves on significantly,
 *
 *   F = [(S_r(m) − S_r(k)) / (k − m)] / [S_r(k) / (n − p_k)]  ~  F(k − m, n − p_k),   p ≥ α (0.05) for every k > m.
 *
 * The highest candidate is accepted vacuously. Unlike the forward sequential test it looks past a small
 * intermediate coefficient; its weakness is multiplicity (m is tested against several k at 5 % each, so it
 * over-fits), and with few points its F denominators can have a single degree of freedom. The default rule
 * (lowestJustifiedCriterion) is this test with both problems guarded.
 *
 * Reference: Draper & Smith, *Applied Regression Analysis*, 3rd ed., §6.1 (extra sum of squares for a group of
 * terms); https://en.wikipedia.org/wiki/F-test#Regression_problems
 *
 * @example
 * allHigherFCriterion.choose(table) // => lowest m with p ≥ 0.05 against every k in (m, maxCandidate]
 */
import { fitOfOrder, reasonNumber, formatP, pText, type CandidateTable, type OrderCriterion } from './criterion.ts';
import { extraSumOfSquaresF, extraSumOfSquaresP, isSignificant } from './extraSumOfSquaresF.ts';

/** Significance level of each comparison. */
export const ALL_HIGHER_F_ALPHA = 0.05;

export const allHigherFCriterion: OrderCriterion = {
  name: 'allHigherF',
  label: 'lowest ≡ all higher (α=.05)',
  rule: 'Choose the lowest order that no higher order improves on significantly (extra-sum-of-squares F test at 5 %).',
  requiresUncertainty: false,
  choose(table: CandidateTable): number {
    for (let order = table.minCandidate; order < table.maxCandidate; order++) {
      const lower = fitOfOrder(table, order);
      let improved = false;
      for (let higher = order + 1; higher <= table.maxCandidate && !improved; higher++) {
        improved = isSignificant(extraSumOfSquaresF(lower, fitOfOrder(table, higher)), ALL_HIGHER_F_ALPHA);
      }
      if (!improved) return order;
    }
    return table.maxCandidate;
  },
  explain(table: CandidateTable, order: number): string {
    if (order >= table.maxCandidate) {
      return `Order ${order}: every lower order is improved on significantly by some higher order, so the highest candidate is taken.`;
    }
    let smallestP = Infinity;
    let against = order + 1;
    let statistic = 0;
    for (let higher = order + 1; higher <= table.maxCandidate; higher++) {
      const test = extraSumOfSquaresF(fitOfOrder(table, order), fitOfOrder(table, higher));
      const p = extraSumOfSquaresP(test);
      if (p < smallestP) {
        smallestP = p;
        against = higher;
        statistic = test.statistic;
      }
    }
    return `Order ${order}: no higher order up to ${table.maxCandidate} improves on it significantly (smallest ${pText(smallestP)} ≥ 0.05, against order ${against}, F = ${reasonNumber(statistic)}).`;
  },
};
