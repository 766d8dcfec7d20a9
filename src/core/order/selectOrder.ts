/**
 * Automatic polynomial order selection: fit every candidate order from one QR, apply a criterion, and return
 * the chosen order with a one-sentence reason and the full order table, as plain JSON-serialisable data.
 *
 * Steps: transform the data (u = x, 1/x or ln x; v = y or ln y); weight by w = 1/σ_v² when uncertainties are
 * given (σ_v = σ_y/|y| under ln y, first-order propagation); fit orders 0…M by nested QR (fitNestedOrders);
 * candidates are 1…M with M = min(maxOrder, n − 2, distinct x − 1); order 0 is chosen only for flat data
 * (isFlat); otherwise the criterion (default: lowestJustified) chooses. A fixed order skips the criterion but
 * must come with the author's reason, and the table is reported anyway.
 *
 * Reference for the criteria: see each criterion file; overview in src/pages/how-orders-are-chosen.astro.
 * Cost: O(n M²) plus O(M²) F tests.
 *
 * @example
 * selectOrder({ x: [250, 300, …], y: [...] })
 * // => { criterion: 'lowestJustified', order: 3, reason: 'Order 3: no higher order up to 6 improves …', orders: [...], … }
 */
import { FitError } from '../fitError.ts';
import { validateFitData } from '../validateFitInput.ts';
import { fittedSpaceWeights, forwardX, forwardY, transformData } from '../transforms.ts';
import type { DomainMap, FitData, PointConstraint, TransformX, TransformY } from '../types.ts';
import { candidateTable } from './candidateTable.ts';
import { fitOfOrder, reasonNumber, type CriterionName } from './criterion.ts';
import { fixedOrderProblem } from './fixedOrderProblem.ts';
import { isFlat } from './isFlat.ts';
import { DEFAULT_MAX_ORDER, maxCandidateOrder } from './maxCandidateOrder.ts';
import { fitConstrainedOrders } from './constrainedFits.ts';
import { fitNestedOrders } from './nestedFits.ts';
import { lowestJustifiedCriterion } from './lowestJustifiedCriterion.ts';
import { DEFAULT_CRITERION, orderCriteria } from './orderCriteria.ts';
import { orderRows, type OrderRow } from './orderRow.ts';

export interface SelectOrderOptions {
  /** Criterion to apply (default 'lowestJustified'). 'chiSquare' needs data.uncertainty. */
  readonly criterion?: CriterionName;
  /** Cap on candidate orders (default 10). */
  readonly maxOrder?: number;
  /** Fit an intercept (default true). */
  readonly intercept?: boolean;
  readonly transformX?: TransformX;
  readonly transformY?: TransformY;
  /** Use this order instead of a criterion; requires `reason`. */
  readonly fixedOrder?: number;
  /** The author's reason for a fixed order, published with it. */
  readonly reason?: string;
  /** Points (in the user's x and y) the curve must pass through; candidate orders are fitted under them. */
  readonly constraints?: readonly PointConstraint[];
}

export interface OrderSelection {
  readonly criterion: CriterionName | 'fixed';
  readonly order: number;
  /** One plain sentence with the numbers behind the choice. */
  readonly reason: string;
  /** The criterion's rule in one sentence. */
  readonly rule: string;
  readonly n: number;
  readonly intercept: boolean;
  readonly transformX: TransformX;
  readonly transformY: TransformY;
  readonly weighted: boolean;
  /** The map t = (u − center)/halfWidth used for the table's coefficients. */
  readonly map: DomainMap;
  /** Highest order an automatic criterion could choose. */
  readonly maxCandidate: number;
  readonly orders: readonly OrderRow[];
  readonly warnings: readonly string[];
}

/**
 * Select the polynomial order for one data set.
 * @throws FitError 'fixed-order-needs-reason', 'chi-square-needs-uncertainty', 'too-few-points',
 *   'order-too-high', 'length-mismatch', 'bad-uncertainty', 'not-finite', or a transform-domain error
 */
export function selectOrder(data: FitData, options: SelectOrderOptions = {}): OrderSelection {
  const intercept = options.intercept ?? true;
  const transformX = options.transformX ?? 'identity';
  const transformY = options.transformY ?? 'identity';
  const criterionName = options.criterion ?? DEFAULT_CRITERION;
  const criterion = orderCriteria[criterionName];
  if (!criterion) throw new FitError('unknown-criterion', `selectOrder does not know criterion ${String(criterionName)}`);
  if (options.fixedOrder !== undefined && !(options.reason && options.reason.trim().length > 0)) {
    throw new FitError('fixed-order-needs-reason', 'selectOrder requires a reason for a fixed order');
  }
  validateFitData(data);
  const { u, v } = transformData(data.x, data.y, transformX, transformY);
  const weights = data.uncertainty ? fittedSpaceWeights(data.y, data.uncertainty, transformY) : undefined;
  const uncertaintyGiven = weights !== undefined;
  if (criterion.requiresUncertainty && !uncertaintyGiven) {
    throw new FitError('chi-square-needs-uncertainty', 'selectOrder requires per-point uncertainties for the chiSquare criterion');
  }

  if (options.maxOrder !== undefined && !(Number.isInteger(options.maxOrder) && options.maxOrder >= 1)) {
    throw new FitError('invalid-max-order', `selectOrder requires maxOrder to be an integer ≥ 1, got ${options.maxOrder}`);
  }
  const n = u.length;
  const distinct = new Set(u).size;
  const maxCandidate = maxCandidateOrder(n, distinct, options.maxOrder ?? DEFAULT_MAX_ORDER);
  if (maxCandidate < 1) {
    throw new FitError('too-few-points', `choosing an order needs at least 3 points with 2 different x values; the data have ${n} points and ${distinct} different x values`);
  }
  let fitMax = maxCandidate;
  if (options.fixedOrder !== undefined) {
    const fixed = options.fixedOrder;
    const problem = fixedOrderProblem({ order: fixed, intercept, constraints: options.constraints?.length ?? 0, n, distinct });
    if (problem !== null) throw new FitError('order-too-high', `${problem}`);
    fitMax = Math.max(fitMax, fixed);
  }

  const constraints = (options.constraints ?? []).map((c) => ({ u: forwardX(transformX, c.x), v: forwardY(transformY, c.y) }));
  const nested = constraints.length
    ? fitConstrainedOrders(u, v, { maxOrder: fitMax, intercept, weights, constraints })
    : fitNestedOrders(u, v, { maxOrder: fitMax, intercept, weights });
  const firstOrder = nested.fits[0]!.order;
  if (options.fixedOrder !== undefined && options.fixedOrder < firstOrder) {
    throw new FitError('constraints-fix-all', `the pass-through points fix every coefficient of an order-${options.fixedOrder} curve; nothing is left to fit`);
  }
  const table = candidateTable(nested, { maxCandidate, uncertaintyGiven, minCandidate: Math.max(1, firstOrder) });
  const warnings: string[] = [];

  let chosenOrder: number;
  let reason: string;
  const flat = isFlat(table);
  if (flat) {
    chosenOrder = 0;
    reason = `Order 0: the data are flat, neither order 1 nor order 2 improves significantly on the mean (${lowestJustifiedCriterion.explain({ ...table, minCandidate: 0 }, 0).replace(/^Order 0: going higher is not significant: /, '').replace(/\.$/, '')}).`;
  } else {
    chosenOrder = criterion.choose(table);
    reason = criterion.explain(table, chosenOrder);
  }
  const automaticOrder = chosenOrder;

  if (options.fixedOrder !== undefined) {
    chosenOrder = options.fixedOrder;
    reason = `Order ${chosenOrder} fixed by the author: ${options.reason!.trim()}`;
    if (automaticOrder !== chosenOrder) {
      warnings.push(`The ${criterion.name} criterion would choose order ${automaticOrder}.`);
    }
  }

  const chosenFit = fitOfOrder(table, chosenOrder);
  if (chosenFit.degreesOfFreedom < 2) {
    warnings.push(`Order ${chosenOrder} leaves ${chosenFit.degreesOfFreedom} residual degree${chosenFit.degreesOfFreedom === 1 ? '' : 's'} of freedom; the fit is close to interpolation.`);
  }
  if (options.fixedOrder === undefined && !flat && chosenOrder === maxCandidate && maxCandidate < n - 3) {
    warnings.push(`Order ${chosenOrder} is the highest candidate; the data may need a higher order or a transform.`);
  }
  if (criterionName === 'chiSquare' && options.fixedOrder === undefined && !flat) {
    const dof = chosenFit.degreesOfFreedom;
    const reduced = chosenFit.residualSumOfSquares / dof;
    if (reason.startsWith('No order')) {
      warnings.push(`No candidate order is consistent with the stated uncertainties (smallest reduced χ² = ${reasonNumber(reduced)}).`);
    }
  }

  const rows = orderRows(nested, (order) => order >= Math.max(1, firstOrder) && order <= maxCandidate);
  return {
    criterion: options.fixedOrder !== undefined ? 'fixed' : criterionName,
    order: chosenOrder,
    reason,
    rule: options.fixedOrder !== undefined ? 'Order fixed by the author, with the reason given.' : criterion.rule,
    n,
    intercept,
    transformX,
    transformY,
    weighted: uncertaintyGiven,
    map: nested.map,
    maxCandidate,
    orders: rows,
    warnings,
  };
}
