/**
 * The review block: a correlation is published with its review status, never silently as approved.
 */
import { z } from 'zod';
import { isoDateSchema } from './source.ts';

/** Review states, in the order a correlation normally moves through them. */
export const reviewStatusSchema = z
  .enum(['draft', 'in-review', 'approved', 'withdrawn'])
  .describe('draft → in-review → approved; withdrawn keeps a page but marks it unusable');

/** Review record. `reviewer` and `date` are required once the status is `approved`. */
export const reviewSchema = z
  .object({
    /** Review state; defaults to `draft`. */
    status: reviewStatusSchema.default('draft'),
    /** Who reviewed the correlation. Required when approved. */
    reviewer: z.string().trim().min(1, 'must not be empty').optional().describe('Who reviewed it'),
    /** When the review was completed, YYYY-MM-DD. Required when approved. */
    date: isoDateSchema.optional(),
    /** Reviewer's remarks. Optional. */
    notes: z.string().trim().min(1, 'must not be empty').optional().describe("Reviewer's remarks"),
  })
  .strict()
  .superRefine((review, context) => {
    if (review.status !== 'approved') return;
    if (review.reviewer === undefined) {
      context.addIssue({ code: z.ZodIssueCode.custom, path: ['reviewer'], message: "is required when status is 'approved'" });
    }
    if (review.date === undefined) {
      context.addIssue({ code: z.ZodIssueCode.custom, path: ['date'], message: "is required when status is 'approved'" });
    }
  });

export type Review = z.output<typeof reviewSchema>;
