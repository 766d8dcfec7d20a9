/**
 * One stored entry of the `correlations` collection: validated metadata, the points with their file lines,
 * the validity range, the warnings kept for the page, and the fit (plain data produced by the core).
 */
import { z } from 'zod';
import { correlationMetaSchema } from './correlationMeta.ts';

/** One data row as read from the CSV. */
export const dataPointSchema = z
  .object({
    /** Data row number, 1 = first row after the header. */
    row: z.number().int().positive().describe('Data row number, 1 = first row after the header'),
    /** Line of the row in the data file, 1-based. */
    line: z.number().int().positive().describe('Line in the data file'),
    /** x as written in the data file. */
    x: z.number().finite().describe('x value'),
    /** y as written in the data file. */
    y: z.number().finite().describe('y value'),
    /** Standard uncertainty of y, when the file has an uncertainty column. */
    uncertainty: z.number().positive().optional().describe('Standard uncertainty of y'),
    /** Free-text note from the note column. */
    note: z.string().optional().describe('Note from the data file'),
  })
  .strict();

/** A point left out of the fit, with the reason from the metadata. */
export const excludedPointSchema = dataPointSchema.extend({
  /** The reason given in fit.exclude. */
  reason: z.string().describe('Why the point is left out'),
});

/** A message kept with a loaded correlation so that the page can show it. */
export const diagnosticSchema = z
  .object({
    /** `error` stops the check and the build; `warning` is shown on the page. */
    severity: z.enum(['error', 'warning']).describe('error stops the build; warning is shown on the page'),
    /** Path of the file, as given to the loader. */
    file: z.string().describe('Path of the file, as given to the loader'),
    /** 1-based line; 0 when no line applies (a missing file). */
    line: z.number().int().nonnegative().describe('1-based line; 0 when no line applies'),
    /** 1-based column, where it applies. */
    column: z.number().int().positive().optional().describe('1-based column, where it applies'),
    /** The problem, in one line. */
    message: z.string().describe('The problem'),
    /** How to fix it, when a hint helps. */
    hint: z.string().optional().describe('How to fix it'),
  })
  .strict();

/** Where the site's content store keeps a large part of an entry instead: a record of the fit cache. */
const storedReferenceSchema = z
  .object({
    fitCache: z.object({ directory: z.string(), key: z.string() }).strict(),
  })
  .strict();

/** A closed interval of x, in the variable's unit. */
const intervalSchema = z
  .object({
    /** Lowest x. */
    min: z.number().describe('Lowest x'),
    /** Highest x. */
    max: z.number().describe('Highest x'),
  })
  .strict();

/** The review trail as stored: fingerprint and whether the approval holds (src/load/review/). */
export const reviewTrailSchema = z
  .object({
    /** Current fingerprint (`fp1-…`), or null when the correlation could not be fitted. */
    fingerprint: z.string().nullable().describe('Current fingerprint, or null without a fit'),
    /** `holds`, `lapsed`, `unbound` (approved without a fingerprint), `withdrawn` or `none` (draft, in review). */
    approval: z.enum(['holds', 'lapsed', 'unbound', 'withdrawn', 'none']).describe('Whether the approval holds'),
    /** Why a lapsed approval lapsed: `data`, `options`, `result`, `recipe` or `fit`; empty otherwise. */
    lapseReasons: z.array(z.enum(['data', 'options', 'result', 'recipe', 'fit'])).describe('Why the approval lapsed'),
  })
  .strict();

/** One commit in a correlation's history (src/load/history/handbookHistory.ts). */
const historyRowSchema = z
  .object({
    commit: z.string().describe('Abbreviated commit hash'),
    date: z.string().describe('Commit date, YYYY-MM-DD'),
    subject: z.string().describe('Commit subject'),
    coefficients: z.enum(['added', 'changed', 'unchanged', 'removed', 'unknown']).describe('Whether the published coefficients changed'),
    fingerprint: z.string().nullable().describe('Fingerprint of this version, when it could be fitted'),
  })
  .strict();

/** What changed since the approved version (src/load/history/whatChanged.ts). */
const whatChangedSchema = z
  .object({
    rowsAdded: z.number(),
    rowsRemoved: z.number(),
    rowsChanged: z.number(),
    rows: z.array(
      z.object({ x: z.number(), before: z.number().optional(), after: z.number().optional(), usedBefore: z.boolean(), usedAfter: z.boolean() }).strict(),
    ),
    options: z.array(z.string()),
    resultChanged: z.boolean(),
    maxCurveChange: z
      .object({ deltaY: z.number(), atX: z.number(), overS: z.number().nullable(), min: z.number(), max: z.number() })
      .strict()
      .nullable(),
  })
  .strict();

/** The history section: git history of the correlation's folder, or why there is none. */
export const historySchema = z.union([
  z.object({ available: z.literal(false), reason: z.string() }).strict(),
  z
    .object({
      available: z.literal(true),
      rows: z.array(historyRowSchema),
      older: z.number().int().nonnegative(),
      uncommitted: z.boolean(),
      sinceApproval: z
        .union([
          z.object({ found: z.literal(true), commit: z.string(), date: z.string(), changes: whatChangedSchema }).strict(),
          z.object({ found: z.literal(false) }).strict(),
        ])
        .nullable(),
    })
    .strict(),
]);

/** The stored entry. */
export const correlationEntrySchema = z
  .object({
    /** URL slug, unique in the handbook. */
    slug: z.string().describe('URL slug'),
    /** The validated metadata, defaults filled in. */
    meta: correlationMetaSchema,
    /**
     * Every data row, in file order; or, in the site's content store, where they are kept instead (the fit cache
     * record of this entry, read by the pages through src/components/lib/entryView.ts pointsOf).
     */
    points: z
      .union([z.array(dataPointSchema), storedReferenceSchema])
      .describe('Every data row, in file order, or a reference to the fit cache record holding them'),
    /** Rows left out of the fit. */
    excluded: z.array(excludedPointSchema).describe('Rows left out of the fit'),
    /** x range of the points used in the fit. */
    dataRange: intervalSchema.describe('x range of the points used'),
    /** Published validity range: the data range, or narrower if the metadata says so. */
    range: intervalSchema.describe('Published validity range'),
    /** Warnings found while reading and fitting. */
    warnings: z.array(diagnosticSchema).describe('Warnings found while reading and fitting'),
    /** The fit as plain data from the numerical core, or null when fitting failed. */
    fit: z.record(z.unknown()).nullable().describe('PolynomialFit from the core, as plain data'),
    /** Order-selection summary when the order was chosen automatically, else null. */
    orderSelection: z.record(z.unknown()).nullable().describe('Order-selection result, as plain data'),
    /** Fingerprint and approval state. */
    reviewTrail: reviewTrailSchema.describe('Fingerprint and approval state'),
    /** History of the correlation's folder from git, or why it is not available. */
    history: historySchema.optional().describe('History from git, or why it is not available'),
  })
  .strict();

export type DataPoint = z.output<typeof dataPointSchema>;
export type ExcludedPoint = z.output<typeof excludedPointSchema>;
export type Diagnostic = z.output<typeof diagnosticSchema>;
export type StoredHistory = z.output<typeof historySchema>;
export type StoredReviewTrail = z.output<typeof reviewTrailSchema>;
export type CorrelationEntry = z.output<typeof correlationEntrySchema>;
