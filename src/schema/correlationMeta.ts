/**
 * The metadata file of one correlation folder, `content/<slug>/correlation.yaml`.
 * Field list and meaning: every key below carries its documentation in JSDoc and `.describe()`.
 */
import { z } from 'zod';
import { dataColumnsSchema } from './dataColumns.ts';
import { fitOptionsSchema } from './fitOptions.ts';
import { materialSchema } from './material.ts';
import { quantitySchema } from './quantity.ts';
import { reviewSchema } from './review.ts';
import { sourceSchema } from './source.ts';

/** Name of the metadata file in every correlation folder. */
export const METADATA_FILE = 'correlation.yaml';

/** Slug rule: lower-case letters and digits in groups joined by single hyphens. */
export const SLUG_PATTERN = /^[a-z0-9]+(-[a-z0-9]+)*$/;

/** Stated uncertainty of the data as a whole, as the source gives it. */
export const statedUncertaintySchema = z
  .object({
    /** The statement as the source words it, e.g. "±0.5 % (k = 2)". Required. */
    statement: z.string().trim().min(1, 'must not be empty').describe('Uncertainty statement as the source words it'),
    /** Relative standard uncertainty as a fraction (0.005 for 0.5 %), when it can be stated as one. Optional. */
    relative: z.number().positive().max(1).optional().describe('Relative standard uncertainty as a fraction'),
  })
  .strict();

/** One correlation's metadata. */
export const correlationMetaSchema = z
  .object({
    /** Page title, e.g. "Specific heat of Corvane-12, liquid". Required. */
    title: z.string().trim().min(1, 'must not be empty').describe('Page title'),
    /** URL slug; defaults to the folder name. Must be unique across the handbook. */
    slug: z
      .string()
      .regex(SLUG_PATTERN, 'must be lower-case letters and digits joined by single hyphens')
      .optional()
      .describe('URL slug; defaults to the folder name'),
    /** True for invented demonstration data. Pages then say so prominently. Defaults to false. */
    invented: z.boolean().default(false).describe('Invented demonstration data, never real'),
    /** The correlated property (y). Required. */
    property: quantitySchema.describe('The correlated property (y)'),
    /** The independent variable (x). Required. */
    variable: quantitySchema.describe('The independent variable (x)'),
    /** Substance or material and conditions. Required. */
    material: materialSchema.describe('Substance or material and conditions'),
    /** Provenance. Required. */
    source: sourceSchema.describe('Provenance of the data'),
    /** Stated uncertainty of the data, if the source gives one. Optional. */
    uncertainty: statedUncertaintySchema.optional().describe('Stated uncertainty of the data'),
    /** Data file and columns. Required (at least the x and y column names). */
    data: dataColumnsSchema.describe('Data file and columns'),
    /** Fit options. Optional; every field has a default. */
    fit: fitOptionsSchema.default({}).describe('Fit options'),
    /** Free tags for the catalogue, e.g. ["coolant", "thermal"]. Defaults to none. */
    tags: z.array(z.string().trim().min(1, 'must not be empty')).default([]).describe('Catalogue tags'),
    /** Review record. Defaults to status `draft`. */
    review: reviewSchema.default({}).describe('Review record'),
  })
  .strict()
  .superRefine((meta, context) => {
    for (const problem of metaRules(meta)) context.addIssue({ code: z.ZodIssueCode.custom, path: problem.path, message: problem.message });
  });

/**
 * The rule across the `fit` and `data` blocks: weights from uncertainty need an uncertainty column. Kept apart from
 * the schema so it can run when another key of the file is wrong (zod then skips the file's refinement).
 * @example metaRules({ fit: { weights: 'uncertainty' }, data: {} }) // => [{ path: ['fit', 'weights'], message: "is 'uncertainty' but data.uncertainty names no column" }]
 */
export function metaRules(meta: { readonly fit: { readonly weights?: string | undefined }; readonly data: { readonly uncertainty?: string | undefined } }): { path: (string | number)[]; message: string }[] {
  if (meta.fit.weights === 'uncertainty' && meta.data.uncertainty === undefined) {
    return [{ path: ['fit', 'weights'], message: "is 'uncertainty' but data.uncertainty names no column" }];
  }
  return [];
}

export type CorrelationMetaInput = z.input<typeof correlationMetaSchema>;
export type CorrelationMeta = z.output<typeof correlationMetaSchema>;
