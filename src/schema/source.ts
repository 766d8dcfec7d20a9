/**
 * Where the data came from: citation, method, date and who prepared the folder.
 */
import { z } from 'zod';

/** Calendar date written as YYYY-MM-DD (kept as text so YAML never turns it into a timestamp). */
export const isoDateSchema = z
  .string()
  .regex(/^\d{4}-(0[1-9]|1[0-2])-(0[1-9]|[12]\d|3[01])$/, 'must be a date written as YYYY-MM-DD')
  .describe('Calendar date, YYYY-MM-DD');

/** How the points were obtained. */
export const sourceMethodSchema = z
  .enum(['measured', 'table', 'derived'])
  .describe('measured = own or reported measurements; table = values read from a printed table; derived = computed from another correlation');

/** Provenance of the data. `derivedFrom` is required when `method` is `derived`. */
export const sourceSchema = z
  .object({
    /** Full citation or internal reference (report number, notebook page). Required. */
    citation: z.string().trim().min(1, 'must not be empty').describe('Citation or internal reference'),
    /** How the points were obtained. Required. */
    method: sourceMethodSchema,
    /** What the points were computed from, when `method` is `derived` (a slug or a citation). */
    derivedFrom: z.string().trim().min(1, 'must not be empty').optional().describe('Origin of derived points'),
    /** When the data were measured, tabulated or computed. Required. */
    date: isoDateSchema,
    /** Who prepared this folder. Required. */
    preparedBy: z.string().trim().min(1, 'must not be empty').describe('Who prepared this folder'),
    /** Free notes on provenance. Optional. */
    notes: z.string().trim().min(1, 'must not be empty').optional().describe('Notes on provenance'),
  })
  .strict()
  .superRefine((source, context) => {
    if (source.method === 'derived' && source.derivedFrom === undefined) {
      context.addIssue({
        code: z.ZodIssueCode.custom,
        path: ['derivedFrom'],
        message: "is required when method is 'derived'",
      });
    }
  });

export type Source = z.output<typeof sourceSchema>;
