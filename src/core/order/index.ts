/**
 * Public entry of automatic polynomial order selection (re-exported by src/core/index.ts).
 */

// selection
export { selectOrder, type OrderSelection, type SelectOrderOptions } from './selectOrder.ts';
export { orderRows, type OrderRow } from './orderRow.ts';
export { DEFAULT_MAX_ORDER, maxCandidateOrder } from './maxCandidateOrder.ts';
export { isFlat } from './isFlat.ts';
export { fixedOrderProblem, ORDER_LIMIT, type FixedOrderCase } from './fixedOrderProblem.ts';

// nested fits (one QR for every order)
export { fitNestedOrders, RESIDUAL_FLOOR_RELATIVE, type NestedFits, type NestedOrderFit, type NestedFitOptions } from './nestedFits.ts';
export { candidateTable, type CandidateRange } from './candidateTable.ts';

// criteria: interface, registry, default
export {
  fitOfOrder,
  pText,
  residualVarianceOf,
  type CandidateTable,
  type CriterionName,
  type OrderCriterion,
  type OrderSummary,
} from './criterion.ts';
export { DEFAULT_CRITERION, orderCriteria } from './orderCriteria.ts';
export {
  createLowestJustifiedCriterion,
  lowestJustifiedCriterion,
  LOWEST_JUSTIFIED_DEFAULTS,
  type LowestJustifiedParameters,
} from './lowestJustifiedCriterion.ts';
export { residualVarianceCriterion } from './residualVarianceCriterion.ts';
export { adjustedRSquaredCriterion, adjustedRSquaredOf } from './adjustedRSquaredCriterion.ts';
export { aiccCriterion, aiccOf } from './aiccCriterion.ts';
export { bicCriterion, bicOf } from './bicCriterion.ts';
export { pressCriterion, looRmseOf } from './pressCriterion.ts';
export { sequentialFCriterion, SEQUENTIAL_F_ALPHA } from './sequentialFCriterion.ts';
export { allHigherFCriterion, ALL_HIGHER_F_ALPHA } from './allHigherFCriterion.ts';
export { chiSquareCriterion, chiSquareBound, createChiSquareCriterion, lowestConsistentOrder, CHI_SQUARE_LEVEL } from './chiSquareCriterion.ts';
export { argminOrder } from './argminOrder.ts';

// F tests
export {
  extraSumOfSquaresF,
  extraSumOfSquaresP,
  fCriticalValue,
  isSignificant,
  type ExtraSumOfSquaresTest,
} from './extraSumOfSquaresF.ts';
