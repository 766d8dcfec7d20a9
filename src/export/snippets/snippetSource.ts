/**
 * What every code snippet of a correlation is generated from: its export record (coefficients of the mapped form,
 * covariance, range, transforms, texts) plus the two numbers the prediction interval needs that the record does not
 * carry: the quantile of the interval (Student's t with the fit's degrees of freedom, or the normal quantile in χ²
 * mode) and the standard deviation of a new observation as a profile over x (constant s for an unweighted fit; for
 * a weighted fit the stated σ interpolated linearly between distinct x, as stats/localUncertainty.ts does).
 *
 * @example snippetSource(fit, record).quantile // => 2.2281388519649385 for 10 residual degrees of freedom
 */
import { localUncertainty, normalQuantile, tQuantile, type PolynomialFit } from '../../core/index.ts';
import type { CorrelationRecord } from '../correlationRecord.ts';

export interface SnippetSource {
  readonly record: CorrelationRecord;
  /** Name of the generator and its version, printed in each snippet's header. */
  readonly generator: string;
  /** Two-sided quantile for the fit's confidence level; NaN without residual degrees of freedom. */
  readonly quantile: number;
  /** Standard deviation of a new observation in the fitted space: at profileX (linear between, constant beyond). */
  readonly profileX: readonly number[];
  readonly profileSd: readonly number[];
}

export function snippetSource(fit: PolynomialFit, record: CorrelationRecord, generator = 'Correlary'): SnippetSource {
  const dof = fit.statistics.degreesOfFreedom;
  const level = (1 + fit.confidence) / 2;
  const quantile = fit.uncertaintyScale === 'stated' ? normalQuantile(level) : dof > 0 ? tQuantile(level, dof) : NaN;
  const profile = fit.uncertaintyProfile ?? null;
  const profileX = profile === null ? [fit.range.min] : [...profile.x];
  return { record, generator, quantile, profileX, profileSd: profileX.map((x) => localUncertainty(fit, x)) };
}
