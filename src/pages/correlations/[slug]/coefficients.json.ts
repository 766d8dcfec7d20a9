/** `/correlations/<slug>/coefficients.json`: coefficients, cautions and provenance of one correlation, built statically. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { coefficientsJson } from '../../../components/lib/coefficientsDownload.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  return new Response(`${JSON.stringify(coefficientsJson(entry), null, 2)}\n`, {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
