/**
 * `/correlations/<slug>/<name>.py|.mjs|.d.mts|.h|.formula.txt`: the code snippets of one correlation
 * (src/export/snippets), each carrying the range guard, the check values and the cautions.
 */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { entrySnippets, type EntrySnippet } from '../../../components/lib/entrySnippets.ts';

export const getStaticPaths = (async () => {
  const paths = await correlationPaths({ fittedOnly: true });
  return paths.flatMap(({ params, props }) =>
    entrySnippets(props.entry).map((snippet) => ({ params: { slug: params.slug, file: snippet.file }, props: { snippet } })),
  );
}) satisfies GetStaticPaths;

export const GET: APIRoute<{ snippet: EntrySnippet }> = ({ props }) =>
  new Response(props.snippet.text, { headers: { 'Content-Type': `${props.snippet.contentType}; charset=utf-8` } });
