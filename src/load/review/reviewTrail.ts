/**
 * The review trail of one fitted correlation: its fingerprint, whether its approval holds, and the messages that
 * `correlary check` and the build print about it (a lapsed or unbound approval is a warning; a replacement that
 * does not exist is an error).
 */
import type { PolynomialFit } from '../../core/index.ts';
import { error, warning, type Diagnostic } from '../diagnostic.ts';
import type { LoadedCorrelation } from '../types.ts';
import { approvalState, lapseText, type Approval } from './approvalState.ts';
import { fingerprint, type Fingerprint } from './fingerprint.ts';

export interface ReviewTrail {
  /** The current fingerprint, or undefined when the correlation could not be fitted. */
  readonly fingerprint: Fingerprint | undefined;
  readonly approval: Approval;
}

/** @example reviewTrail(correlation, fit).approval.state // => "holds" */
export function reviewTrail(correlation: Pick<LoadedCorrelation, 'meta' | 'used' | 'excluded'>, fit: PolynomialFit | undefined): ReviewTrail {
  const current = fit === undefined ? undefined : fingerprint(correlation, fit);
  return { fingerprint: current, approval: approvalState(correlation.meta.review, current) };
}

/**
 * Messages about the review trail of one correlation.
 * @param slugs every slug in the handbook, to check a withdrawn correlation's replacement
 */
export function reviewDiagnostics(correlation: LoadedCorrelation, trail: ReviewTrail, slugs: ReadonlySet<string>): Diagnostic[] {
  const review = correlation.meta.review;
  const where = correlation.reviewPosition;
  const file = correlation.metadataPath;
  const approveHint = `review it, then run 'correlary approve ${correlation.slug} --by NAME' to record what was approved`;
  const diagnostics: Diagnostic[] = [];
  const approval = trail.approval;
  if (approval.state === 'lapsed') {
    const now = trail.fingerprint === undefined ? 'no fingerprint now (no fit)' : `now ${trail.fingerprint.text}`;
    diagnostics.push(
      warning(file, where, `approval lapsed (${lapseText(approval.reasons)}): ${review.reviewer ?? 'the reviewer'} approved ${review.fingerprint ?? ''} on ${review.date ?? '?'}, ${now}`, approveHint),
    );
  } else if (approval.state === 'unbound') {
    diagnostics.push(warning(file, where, 'unbound approval: it records no fingerprint of what was approved, so it is not valid', approveHint));
  }
  if (review.status === 'withdrawn' && review.replacedBy !== undefined) {
    if (review.replacedBy === correlation.slug) diagnostics.push(error(file, where, 'review.replacedBy names this correlation itself'));
    else if (!slugs.has(review.replacedBy)) diagnostics.push(error(file, where, `review.replacedBy names '${review.replacedBy}', which is not a correlation in this handbook`));
  }
  return diagnostics;
}
