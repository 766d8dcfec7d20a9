/** `/correlations/<slug>/coefficients.csv`: `#` comment lines (cautions, provenance), then the coefficient table. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { entryRecord } from '../../../components/lib/entryRecord.ts';
import { handbookIdentity } from '../../../components/lib/handbookIdentity.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';
import { coefficientsCsv } from '../../../export/index.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = async ({ props }) => {
  return new Response(coefficientsCsv(entryRecord(props.entry, await handbookIdentity(props.entry.slug))), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
