/**
 * The published model (core's PublishedModel) that a correlation's snippets carry: the numbers of snippetSource,
 * as the Python and JavaScript snippets write them. The page's evaluator reads the same numbers back from the
 * JavaScript snippet on the page (src/client/evaluatorModel.ts); the tests check that both sides hold them bit
 * for bit.
 *
 * @example snippetModel(source).coefficients === source.record.mapped.coefficients // => false (a copy; same values)
 */
import type { PublishedModel } from '../../core/index.ts';
import type { SnippetSource } from './snippetSource.ts';

/** @throws Error when a number the snippets need is not finite (the snippets refuse to print it too) */
export function snippetModel(source: SnippetSource): PublishedModel {
  const r = source.record;
  const finite = (value: number | null, name: string): number => {
    if (value === null || !Number.isFinite(value)) throw new Error(`snippetModel requires a finite ${name}; got ${value}`);
    return value;
  };
  return {
    transformX: r.transforms.x,
    transformY: r.transforms.y,
    min: finite(r.range.min, 'range minimum'),
    max: finite(r.range.max, 'range maximum'),
    center: finite(r.mapped.center, 'centre'),
    halfWidth: finite(r.mapped.halfWidth, 'half-width'),
    // The snippets write a coefficient or covariance the record holds as null (not finite) as 0.
    coefficients: r.mapped.coefficients.map((value) => value ?? 0),
    covariance: r.mapped.covariance.map((row) => row.map((value) => value ?? 0)),
    quantile: source.quantile,
    noiseX: [...source.profileX],
    noiseSd: [...source.profileSd],
  };
}
