/**
 * How a correlation is fitted: order choice, transforms, weights, pass-through points, exclusions and range.
 */
import { z } from 'zod';

/** Highest polynomial order the handbook accepts at all. */
export const ORDER_LIMIT = 12;

const reasonText = z.string().trim().min(1, 'must not be empty');

/** A point the fitted curve must pass through exactly, with the reason it must. */
export const passThroughSchema = z
  .object({
    /** x of the point, in the variable's unit. Required. */
    x: z.number().finite().describe('x of the point'),
    /** y of the point, in the property's unit. Required. */
    y: z.number().finite().describe('y of the point'),
    /** Why the curve must pass here, e.g. "thermal strain is zero at the reference temperature". Required. */
    reason: reasonText.describe('Why the curve must pass through this point'),
  })
  .strict();

/**
 * A point left out of the fit, chosen by data row (1 = first row after the header, not counting comment or blank
 * lines) or by x (every row with that exact x). The data file itself is never edited.
 */
export const exclusionSchema = z
  .object({
    /** Data row number, 1 = first data row. Give either `row` or `x`. */
    row: z.number().int().positive().optional().describe('Data row number, 1 = first row after the header'),
    /** Exact x value of the rows to leave out. Give either `row` or `x`. */
    x: z.number().finite().optional().describe('Exact x of the rows to leave out'),
    /** Why the point is left out. Required; it is printed on the page. */
    reason: reasonText.describe('Why the point is left out; shown on the page'),
  })
  .strict()
  .superRefine((exclusion, context) => {
    if ((exclusion.row === undefined) === (exclusion.x === undefined)) {
      context.addIssue({ code: z.ZodIssueCode.custom, path: [], message: "needs exactly one of 'row' or 'x'" });
    }
  });

/** Narrowed validity range; either end may be omitted. The range can only shrink the data's x range. */
export const rangeSchema = z
  .object({
    /** Lowest x the correlation is published for. Defaults to the lowest x in the data. */
    min: z.number().finite().optional().describe('Lowest x the correlation is valid for'),
    /** Highest x the correlation is published for. Defaults to the highest x in the data. */
    max: z.number().finite().optional().describe('Highest x the correlation is valid for'),
  })
  .strict();

/**
 * Names of the order-selection criteria (src/core/order/orderCriteria.ts; a test keeps the two lists equal).
 */
export const CRITERIA = [
  'lowestJustified',
  'residualVariance',
  'adjustedRSquared',
  'aicc',
  'bic',
  'press',
  'sequentialF',
  'allHigherF',
  'chiSquare',
] as const;

/**
 * Each criterion's name in words, for readers of the pages (the content format's `criterion:` keeps the short name).
 * @example CRITERION_TITLES.lowestJustified // => "lowest justified order"
 */
export const CRITERION_TITLES: Readonly<Record<(typeof CRITERIA)[number], string>> = {
  lowestJustified: 'lowest justified order',
  residualVariance: 'smallest residual variance',
  adjustedRSquared: 'largest adjusted R²',
  aicc: 'smallest AICc',
  bic: 'smallest BIC',
  press: 'smallest leave-one-out error (PRESS)',
  sequentialF: 'sequential F test',
  allHigherF: 'lowest order that no higher order improves on',
  chiSquare: 'χ² consistency with the stated uncertainties',
};

/** One of {@link CRITERIA}. */
export const criterionSchema = z.enum(CRITERIA).describe('Order-selection criterion');

/** Variable transforms before fitting. */
export const transformSchema = z
  .object({
    /** Transform of x: `identity`, `reciprocal` (1/x) or `log` (ln x). Defaults to `identity`. */
    x: z.enum(['identity', 'reciprocal', 'log']).default('identity').describe('Transform of x before fitting'),
    /** Transform of y: `identity` or `log` (ln y). Defaults to `identity`. */
    y: z.enum(['identity', 'log']).default('identity').describe('Transform of y before fitting'),
  })
  .strict();

/**
 * The fields of the `fit` block, each checked on its own (no rule across fields yet). Exported so a loader can
 * read the fields that are valid when others are not, and still check the data against them.
 */
export const fitOptionsFieldsSchema = z
  .object({
    /**
     * `auto` (default) chooses the order with `criterion` up to `maxOrder`; a whole number fixes the order and then
     * `reason` is required.
     */
    order: z
      .union([z.literal('auto'), z.number().int().min(0).max(ORDER_LIMIT)], {
        errorMap: () => ({ message: `must be 'auto' or a whole number from 0 to ${ORDER_LIMIT}` }),
      })
      .default('auto')
      .describe("'auto' or a fixed polynomial order"),
    /**
     * Order-selection criterion used by `auto`; omit to use the order selector's default (`lowestJustified`).
     * `chiSquare` needs `weights: uncertainty`.
     */
    criterion: criterionSchema.optional().describe('Order-selection criterion used by auto'),
    /** Why the order is fixed (required when `order` is a number), or any note on the choice. */
    reason: reasonText.optional().describe('Why the order is fixed'),
    /** Highest order considered by `auto`. Defaults to 10 (fewer when the data cannot support it). */
    maxOrder: z.number().int().min(1).max(ORDER_LIMIT).default(10).describe('Highest order considered by auto'),
    /** Fit a constant term. Defaults to true. */
    intercept: z.boolean().default(true).describe('Fit a constant term'),
    /** Transforms of x and y. Defaults to identity for both. */
    transform: transformSchema.default({}).describe('Transforms of x and y before fitting'),
    /** `none` (default) or `uncertainty`: weights w = 1/σ² from the data's uncertainty column. */
    weights: z.enum(['none', 'uncertainty']).default('none').describe('Where weights come from'),
    /** Points the curve must pass through. Defaults to none. */
    passThrough: z.array(passThroughSchema).default([]).describe('Points the curve must pass through'),
    /** Points left out of the fit, with reasons. Defaults to none. */
    exclude: z.array(exclusionSchema).default([]).describe('Points left out of the fit'),
    /** Narrowed validity range. Defaults to the x range of the points used. */
    range: rangeSchema.optional().describe('Narrowed validity range'),
  })
  .strict();

/** One problem found by a rule across fields of the `fit` block: the key it is reported at, and the message. */
export interface FitOptionRuleProblem {
  readonly path: (string | number)[];
  readonly message: string;
}

/**
 * The rules across fields of the `fit` block (fixed order needs a reason; chiSquare needs weights; no criterion
 * with a fixed order; range.max above range.min). Kept apart from the schema so they can run on the fields that
 * are valid even when another field is not: zod runs a block's refinement only when every field parses.
 * @example fitOptionRules({ order: 3 }) // => [{ path: ['order'], message: "is a fixed order but 'fit.reason' does not say why" }]
 */
export function fitOptionRules(fit: {
  readonly order?: number | 'auto' | undefined;
  readonly reason?: string | undefined;
  readonly criterion?: string | undefined;
  readonly weights?: string | undefined;
  readonly range?: { readonly min?: number | undefined; readonly max?: number | undefined } | undefined;
}): FitOptionRuleProblem[] {
  const problems: FitOptionRuleProblem[] = [];
  if (typeof fit.order === 'number' && fit.reason === undefined) {
    problems.push({ path: ['order'], message: "is a fixed order but 'fit.reason' does not say why" });
  }
  if (fit.criterion === 'chiSquare' && fit.weights !== 'uncertainty') {
    problems.push({ path: ['criterion'], message: "is 'chiSquare', which needs weights: uncertainty" });
  }
  if (typeof fit.order === 'number' && fit.criterion !== undefined) {
    problems.push({ path: ['criterion'], message: 'has no effect when the order is fixed' });
  }
  if (fit.range?.min !== undefined && fit.range.max !== undefined && !(fit.range.min < fit.range.max)) {
    problems.push({ path: ['range', 'max'], message: 'must be greater than range.min' });
  }
  return problems;
}

/** The `fit` block. Every field has a default, so the block itself may be left out. */
export const fitOptionsSchema = fitOptionsFieldsSchema.superRefine((fit, context) => {
  for (const problem of fitOptionRules(fit)) context.addIssue({ code: z.ZodIssueCode.custom, path: problem.path, message: problem.message });
});

export type FitOptionsInput = z.input<typeof fitOptionsSchema>;
export type FitSettings = z.output<typeof fitOptionsSchema>;
export type PassThrough = z.output<typeof passThroughSchema>;
export type Exclusion = z.output<typeof exclusionSchema>;
