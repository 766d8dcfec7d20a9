/**
 * The review state of a correlation in words, as the exports and the pages print it: "Approved" only when the
 * approval holds; otherwise "Approval lapsed (data changed)", "Unbound approval", "Withdrawn (replaced by …)",
 * "In review" or "Draft".
 */
import type { Review, StoredReviewTrail } from '../schema/index.ts';

const REASON_TEXT: Readonly<Record<string, string>> = {
  data: 'data changed',
  options: 'options changed',
  result: 'result changed',
  recipe: 'fingerprint recipe changed',
  fit: 'no fit to compare',
};

/** The lapse reasons as words. @example lapseReasonsText(['data', 'result']) // => "data changed, result changed" */
export function lapseReasonsText(reasons: readonly string[]): string {
  return reasons.map((reason) => REASON_TEXT[reason] ?? reason).join(', ');
}

/**
 * @example approvalLabel({ status: 'approved', reviewer: 'A', date: '2026-01-01' }, { fingerprint: 'fp1-…', approval: 'unbound', lapseReasons: [] })
 * // => "Unbound approval"
 */
export function approvalLabel(review: Pick<Review, 'status' | 'replacedBy'>, trail: Pick<StoredReviewTrail, 'approval' | 'lapseReasons'>): string {
  switch (trail.approval) {
    case 'holds':
      return 'Approved';
    case 'lapsed':
      return `Approval lapsed (${lapseReasonsText(trail.lapseReasons)})`;
    case 'unbound':
      return 'Unbound approval';
    case 'withdrawn':
      return review.replacedBy ? `Withdrawn (replaced by ${review.replacedBy})` : 'Withdrawn';
    default:
      return review.status === 'in-review' ? 'In review' : 'Draft';
  }
}
