/**
 * `/correlations/<slug>/<name>.py|.mjs|.d.mts|.h|.formula.txt`: the code snippets of one correlation
 * (src/export/snippets), each carrying the range guard, the check values, the cautions and the handbook's identity.
 */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationPaths } from '../../../components/lib/correlationPaths.ts';
import { entrySnippets, type EntrySnippet } from '../../../components/lib/entrySnippets.ts';
import { handbookIdentity } from '../../../components/lib/handbookIdentity.ts';

export const getStaticPaths = (async () => {
  const paths = await correlationPaths({ fittedOnly: true });
  const withIdentity = await Promise.all(paths.map(async (path) => ({ path, handbook: await handbookIdentity(path.params.slug) })));
  return withIdentity.flatMap(({ path: { params, props }, handbook }) =>
    entrySnippets(props.entry, handbook).map((snippet) => ({ params: { slug: params.slug, file: snippet.file }, props: { snippet } })),
  );
}) satisfies GetStaticPaths;

export const GET: APIRoute<{ snippet: EntrySnippet }> = ({ props }) =>
  new Response(props.snippet.text, { headers: { 'Content-Type': `${props.snippet.contentType}; charset=utf-8` } });
