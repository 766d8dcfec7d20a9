/**
 * The registry of built-in order criteria, by name. `lowestJustified` is the default.
 *
 * @example
 * orderCriteria.aicc.choose(table) // => the AICc-minimising order
 */
import { adjustedRSquaredCriterion } from './adjustedRSquaredCriterion.ts';
import { aiccCriterion } from './aiccCriterion.ts';
import { allHigherFCriterion } from './allHigherFCriterion.ts';
import { bicCriterion } from './bicCriterion.ts';
import { chiSquareCriterion } from './chiSquareCriterion.ts';
import type { CriterionName, OrderCriterion } from './criterion.ts';
import { lowestJustifiedCriterion } from './lowestJustifiedCriterion.ts';
import { pressCriterion } from './pressCriterion.ts';
import { residualVarianceCriterion } from './residualVarianceCriterion.ts';
import { sequentialFCriterion } from './sequentialFCriterion.ts';

/** The criterion selectOrder uses when none is named. */
export const DEFAULT_CRITERION: CriterionName = 'lowestJustified';

export const orderCriteria: Readonly<Record<CriterionName, OrderCriterion>> = {
  lowestJustified: lowestJustifiedCriterion,
  residualVariance: residualVarianceCriterion,
  adjustedRSquared: adjustedRSquaredCriterion,
  aicc: aiccCriterion,
  bic: bicCriterion,
  press: pressCriterion,
  sequentialF: sequentialFCriterion,
  allHigherF: allHigherFCriterion,
  chiSquare: chiSquareCriterion,
};
