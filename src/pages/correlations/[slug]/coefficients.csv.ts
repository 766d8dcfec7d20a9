/** `/correlations/<slug>/coefficients.csv`: `#` comment lines (cautions, provenance), then the coefficient table. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { coefficientsCsv } from '../../../components/lib/coefficientsDownload.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  return new Response(coefficientsCsv(entry), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
