/**
 * The review block: a correlation is published with its review status, never silently as approved. An approval
 * is bound to the fingerprint of what the reviewer saw (data, options, result; recipe in content/README.md), so that
 * any later change lets it lapse visibly. A withdrawn correlation stays published with its reason and replacement.
 */
import { z } from 'zod';
import { isoDateSchema } from './source.ts';

/** Review states, in the order a correlation normally moves through them. */
export const reviewStatusSchema = z
  .enum(['draft', 'in-review', 'approved', 'withdrawn'])
  .describe('draft → in-review → approved; withdrawn keeps a page but marks it unusable');

/**
 * A fingerprint as written by `correlary approve`: the recipe version, then three 16-hex-digit component hashes
 * (data, options, result). @example "fp1-0f3a…-9b21…-77c0…"
 */
export const FINGERPRINT_PATTERN = /^fp[1-9]\d*-[0-9a-f]{16}-[0-9a-f]{16}-[0-9a-f]{16}$/;

/** Review record. `reviewer` and `date` are required once the status is `approved`. */
export const reviewSchema = z
  .object({
    /** Review state; defaults to `draft`. */
    status: reviewStatusSchema.default('draft'),
    /** Who reviewed the correlation. Required when approved. */
    reviewer: z.string().trim().min(1, 'must not be empty').optional().describe('Who reviewed it'),
    /** When the review was completed, YYYY-MM-DD. Required when approved. */
    date: isoDateSchema.optional(),
    /**
     * Fingerprint of what was approved, written by `correlary approve`. An approval without one is reported as
     * unbound; one that differs from the current fingerprint has lapsed.
     */
    fingerprint: z
      .string()
      .regex(FINGERPRINT_PATTERN, "must be a fingerprint as written by 'correlary approve' (fp1-…-…-…)")
      .optional()
      .describe('Fingerprint of the approved data, options and result'),
    /** Reviewer's remarks. Optional. */
    notes: z.string().trim().min(1, 'must not be empty').optional().describe("Reviewer's remarks"),
    /** Why the correlation was withdrawn (written by `correlary withdraw`). */
    withdrawnReason: z.string().trim().min(1, 'must not be empty').optional().describe('Why it was withdrawn'),
    /** When it was withdrawn, YYYY-MM-DD. */
    withdrawnDate: isoDateSchema.optional(),
    /** Slug of the correlation that replaces this one; it must exist in the handbook. */
    replacedBy: z
      .string()
      .regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, 'must be the slug of another correlation')
      .optional()
      .describe('Slug of the correlation that replaces this one'),
  })
  .strict()
  .superRefine((review, context) => {
    if (review.status !== 'withdrawn') {
      for (const key of ['withdrawnReason', 'withdrawnDate', 'replacedBy'] as const) {
        if (review[key] !== undefined) context.addIssue({ code: z.ZodIssueCode.custom, path: [key], message: "is set but status is not 'withdrawn'" });
      }
    }
    if (review.status !== 'approved') return;
    if (review.reviewer === undefined) {
      context.addIssue({ code: z.ZodIssueCode.custom, path: ['reviewer'], message: "is required when status is 'approved'" });
    }
    if (review.date === undefined) {
      context.addIssue({ code: z.ZodIssueCode.custom, path: ['date'], message: "is required when status is 'approved'" });
    }
  });

export type Review = z.output<typeof reviewSchema>;
