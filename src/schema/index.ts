/**
 * Handbook source format: zod schemas only. Imports nothing but zod, so both the CLI and the Astro loader use it.
 */

// metadata file
export { correlationMetaSchema, statedUncertaintySchema, metaRules, METADATA_FILE, SLUG_PATTERN } from './correlationMeta.ts';
export type { CorrelationMeta, CorrelationMetaInput } from './correlationMeta.ts';

// handbook settings file
export {
  handbookSettingsSchema,
  basePathSchema,
  siteUrlSchema,
  HANDBOOK_SETTINGS_FILE,
  DEFAULT_HANDBOOK_TITLE,
  DEFAULT_SITE_URL,
} from './handbookSettings.ts';
export type { HandbookSettings } from './handbookSettings.ts';

// building blocks
export { quantitySchema } from './quantity.ts';
export type { Quantity } from './quantity.ts';
export { materialSchema } from './material.ts';
export type { Material } from './material.ts';
export { sourceSchema, sourceMethodSchema, isoDateSchema } from './source.ts';
export type { Source } from './source.ts';
export { reviewSchema, reviewStatusSchema, FINGERPRINT_PATTERN } from './review.ts';
export type { Review } from './review.ts';
export { dataColumnsSchema } from './dataColumns.ts';
export type { DataColumns } from './dataColumns.ts';
export {
  fitOptionsSchema,
  fitOptionsFieldsSchema,
  fitOptionRules,
  passThroughSchema,
  exclusionSchema,
  rangeSchema,
  transformSchema,
  criterionSchema,
  CRITERIA,
  CRITERION_TITLES,
  ORDER_LIMIT,
} from './fitOptions.ts';
export type { FitSettings, FitOptionsInput, PassThrough, Exclusion, FitOptionRuleProblem } from './fitOptions.ts';

// loaded entry
export {
  correlationEntrySchema,
  dataPointSchema,
  excludedPointSchema,
  diagnosticSchema,
  reviewTrailSchema,
  historySchema,
} from './correlationEntry.ts';
export type { StoredHistory, StoredReviewTrail, CorrelationEntry, DataPoint, ExcludedPoint, Diagnostic } from './correlationEntry.ts';
