/** `/correlations/<slug>/coefficients.json`: the export record of one correlation (src/export), built statically. */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { entryRecord } from '../../../components/lib/entryRecord.ts';
import { handbookIdentity } from '../../../components/lib/handbookIdentity.ts';
import type { CorrelationEntry } from '../../../components/lib/entryView.ts';

export const getStaticPaths = (() => correlationPaths({ fittedOnly: true })) satisfies GetStaticPaths;

export const GET: APIRoute<{ entry: CorrelationEntry }> = async ({ props }) => {
  return new Response(`${JSON.stringify(entryRecord(props.entry, await handbookIdentity(props.entry.slug)), null, 2)}\n`, {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
