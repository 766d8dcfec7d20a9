/**
 * The review trail of a stored entry for its page and the catalogue: which badge kind, the label (shared with the
 * exports, src/export/approvalLabel.ts) and whether the approval holds.
 */
import { approvalLabel, lapseReasonsText } from '../../export/index.ts';
import type { CorrelationEntry } from '../../schema/index.ts';

export { lapseReasonsText };

/** Badge kind: the CSS class suffix and what it means. */
export type ReviewKind = 'approved' | 'lapsed' | 'unbound' | 'withdrawn' | 'in-review' | 'draft';

/** Which kind of review state a correlation is in. @example reviewKind(entry) // => "lapsed" */
export function reviewKind(entry: Pick<CorrelationEntry, 'meta' | 'reviewTrail'>): ReviewKind {
  const approval = entry.reviewTrail.approval;
  if (approval === 'holds') return 'approved';
  if (approval === 'lapsed' || approval === 'unbound' || approval === 'withdrawn') return approval;
  return entry.meta.review.status === 'in-review' ? 'in-review' : 'draft';
}

/** @example reviewLabel(entry) // => "Approval lapsed (data changed)" */
export function reviewLabel(entry: Pick<CorrelationEntry, 'meta' | 'reviewTrail'>): string {
  return approvalLabel(entry.meta.review, entry.reviewTrail);
}

/** True when the approval holds: the only state in which the coefficients count as approved. */
export function approvalHolds(entry: Pick<CorrelationEntry, 'reviewTrail'>): boolean {
  return entry.reviewTrail.approval === 'holds';
}
