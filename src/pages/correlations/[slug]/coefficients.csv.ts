/** `/correlations/<slug>/coefficients.csv`: `#` comment lines (cautions, provenance), then the coefficient table. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { getCollection } from 'astro:content';
import { coefficientsCsv } from '../../../components/lib/coefficientsDownload.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (async () => {
  const entries = await getCollection('correlations');
  return entries.filter((entry) => entry.data.fit !== null).map((entry) => ({ params: { slug: entry.id }, props: { entry: entry.data } }));
}) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  return new Response(coefficientsCsv(entry), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
