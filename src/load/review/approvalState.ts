/**
 * Whether a correlation's approval still holds: the review record compared with the current fingerprint.
 *
 *   holds      status approved, the recorded fingerprint equals the current one
 *   lapsed     status approved, the recorded fingerprint differs (reasons: which components differ, or "recipe"
 *              when it was written by another recipe version, or "fit" when there is no fit to compare)
 *   unbound    status approved without a fingerprint (written by hand or before fingerprints existed): not valid
 *   withdrawn  status withdrawn (with its reason and replacement when given)
 *   none       draft or in review: nothing was approved
 */
import type { Review } from '../../schema/index.ts';
import { FINGERPRINT_COMPONENTS, parseFingerprint, type Fingerprint, type FingerprintComponent } from './fingerprint.ts';

export type LapseReason = FingerprintComponent | 'recipe' | 'fit';

export type Approval =
  | { readonly state: 'holds' }
  | { readonly state: 'lapsed'; readonly reasons: readonly LapseReason[] }
  | { readonly state: 'unbound' }
  | { readonly state: 'withdrawn' }
  | { readonly state: 'none' };

/** Words for each reason, as printed by `check`, the page and the exports. */
export const LAPSE_REASON_TEXT: Readonly<Record<LapseReason, string>> = {
  data: 'data changed',
  options: 'options changed',
  result: 'result changed',
  recipe: 'fingerprint recipe changed',
  fit: 'no fit to compare',
};

/**
 * @param current the correlation's fingerprint now, or undefined when it could not be fitted
 * @example approvalState({ status: 'approved', reviewer: 'A', date: '2026-01-01' }, current) // => { state: 'unbound' }
 */
export function approvalState(review: Review, current: Fingerprint | undefined): Approval {
  if (review.status === 'withdrawn') return { state: 'withdrawn' };
  if (review.status !== 'approved') return { state: 'none' };
  if (review.fingerprint === undefined) return { state: 'unbound' };
  if (current === undefined) return { state: 'lapsed', reasons: ['fit'] };
  if (review.fingerprint === current.text) return { state: 'holds' };
  const approved = parseFingerprint(review.fingerprint);
  if (approved === undefined || approved.recipe !== current.recipe) return { state: 'lapsed', reasons: ['recipe'] };
  const reasons = FINGERPRINT_COMPONENTS.filter((component) => approved.parts[component] !== current.parts[component]);
  return { state: 'lapsed', reasons };
}

/** "data changed, result changed". @example lapseText(['data', 'result']) // => "data changed, result changed" */
export function lapseText(reasons: readonly LapseReason[]): string {
  return reasons.map((reason) => LAPSE_REASON_TEXT[reason]).join(', ');
}
