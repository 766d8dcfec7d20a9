/**
 * What a review-status badge says: its words, a mark, a tooltip and whether the correlation counts as approved.
 * Kept apart from the Astro component so lists that build rows in code (and tests) use the same words.
 */
import { REVIEW_LABELS } from './entryView.ts';
import { lapseReasonsText } from './reviewView.ts';

/** The part of an entry's review trail a badge needs (src/schema/correlationEntry.ts, reviewTrail). */
export interface BadgeApproval {
  readonly approval: string;
  readonly lapseReasons?: readonly string[];
}

/** The parts of one status badge. */
export interface StatusBadgeView {
  /** "approved", "withdrawn" or "unapproved" (every other status): picks the badge style. */
  kind: 'approved' | 'withdrawn' | 'unapproved';
  /** The status reduced to a CSS-safe name, e.g. "in-review". */
  slug: string;
  /** Text inside the badge, e.g. "In review · not approved". */
  text: string;
  /** A one-character mark shown before the text (decorative; the text says it all). */
  mark: string;
  /** Longer explanation for the title attribute. */
  title: string;
}

const TITLES: Record<string, string> = {
  approved: 'Reviewed and approved for the handbook',
  draft: 'Draft: not yet reviewed; do not rely on it',
  'in-review': 'Under review: not yet approved; do not rely on it',
  withdrawn: 'Withdrawn: must not be used',
};

/**
 * The badge for a review status, with an optional extra label.
 * @example statusBadgeView('draft').text // => "Draft · not approved"
 * @example statusBadgeView('approved', undefined, { approval: 'unbound' }).text // => "Unbound approval · not approved"
 */
export function statusBadgeView(status: string, extra?: string, approval?: BadgeApproval, replacedBy?: string): StatusBadgeView {
  if (status === 'approved' && approval !== undefined && approval.approval !== 'holds') {
    const lapsed = approval.approval === 'lapsed';
    const reasons = lapseReasonsText(approval.lapseReasons ?? []);
    const label = lapsed ? `Approval lapsed${reasons ? ` (${reasons})` : ''}` : 'Unbound approval';
    const title = lapsed
      ? `Approved for a different fingerprint (${reasons || 'changed'}): what is published is not what was approved`
      : 'Marked approved, but no fingerprint records what was approved: not a valid approval';
    const parts = [label, 'not approved', extra?.trim() ?? ''].filter((part) => part !== '');
    return { kind: 'unapproved', slug: lapsed ? 'approval-lapsed' : 'unbound-approval', text: parts.join(' · '), mark: '!', title };
  }
  if (status === 'withdrawn' && replacedBy !== undefined) extra = [`replaced by ${replacedBy}`, extra?.trim() ?? ''].filter(Boolean).join(' · ');
  const label = REVIEW_LABELS[status] ?? status.replace(/[-_]+/g, ' ').replace(/^./, (first) => first.toUpperCase());
  const slug = status.toLowerCase().replace(/[^a-z0-9]+/g, '-');
  const kind = status === 'approved' ? 'approved' : status === 'withdrawn' ? 'withdrawn' : 'unapproved';
  const qualifier = kind === 'approved' ? '' : kind === 'withdrawn' ? 'do not use' : 'not approved';
  const parts = [label, qualifier, extra?.trim() ?? ''].filter((part) => part !== '');
  const mark = kind === 'approved' ? '✓' : kind === 'withdrawn' ? '✕' : '!';
  return { kind, slug, text: parts.join(' · '), mark, title: TITLES[status] ?? `Review status: ${label}` };
}
