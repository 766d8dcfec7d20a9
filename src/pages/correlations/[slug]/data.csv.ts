/** `/correlations/<slug>/data.csv`: every data row with its diagnostics, after the cautions (see dataDownload.ts). */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { dataCsv } from '../../../components/lib/dataDownload.ts';
import { handbookIdentity } from '../../../components/lib/handbookIdentity.ts';
import { fitOf, type CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = async ({ props }) => {
  const { entry } = props;
  return new Response(dataCsv(entry, fitOf(entry)!, await handbookIdentity(entry.slug)), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
