/** `/correlations/<slug>/coefficients.json`: coefficients, cautions and provenance of one correlation, built statically. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { getCollection } from 'astro:content';
import { coefficientsJson } from '../../../components/lib/coefficientsDownload.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (async () => {
  const entries = await getCollection('correlations');
  return entries.filter((entry) => entry.data.fit !== null).map((entry) => ({ params: { slug: entry.id }, props: { entry: entry.data } }));
}) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = ({ props }) => {
  const { entry } = props;
  return new Response(`${JSON.stringify(coefficientsJson(entry), null, 2)}\n`, {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
