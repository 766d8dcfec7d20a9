/**
 * Which data file holds the points and which of its columns are x, y, uncertainty and note.
 */
import { z } from 'zod';

/** A column name as written in the CSV header row. */
const columnName = z.string().trim().min(1, 'must not be empty');

/**
 * The `data` block. Column names must match the CSV header exactly (after trimming spaces).
 */
export const dataColumnsSchema = z
  .object({
    /** Data file, relative to the correlation folder; must stay inside it. Defaults to `data.csv`. */
    file: z.string().trim().min(1, 'must not be empty').default('data.csv').describe('CSV file inside the folder'),
    /** Header name of the independent-variable column. Required. */
    x: columnName.describe('Header name of the x column'),
    /** Header name of the property column. Required. */
    y: columnName.describe('Header name of the y column'),
    /** Header name of the per-point standard uncertainty of y (same unit as y, k = 1). Optional. */
    uncertainty: columnName.optional().describe('Header name of the per-point standard uncertainty of y'),
    /** Header name of a free-text note column; notes are shown beside the point. Optional. */
    note: columnName.optional().describe('Header name of a free-text note column'),
    /**
     * Set true when repeated x values are deliberate replicate measurements. This silences the warning about
     * repeated x with different y and no uncertainty column. Defaults to false.
     */
    replicates: z.boolean().default(false).describe('Repeated x values are deliberate replicates'),
  })
  .strict();

export type DataColumns = z.output<typeof dataColumnsSchema>;
