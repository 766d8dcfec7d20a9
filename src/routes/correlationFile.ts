/**
 * `astro dev` only: `/correlations/<slug>/<file>`, every file of a correlation besides its page
 * (src/components/lib/correlationFiles.ts). A build writes these files from the content loader instead
 * (src/loaders/correlationFilesIntegration.ts).
 */
import type { APIRoute, GetStaticPaths } from 'astro';
import { correlationFiles, type CorrelationFile } from '../components/lib/correlationFiles.ts';
import { correlationPaths } from '../components/lib/correlationPaths.ts';
import { handbookIdentity } from '../components/lib/handbookIdentity.ts';

export const getStaticPaths = (async () => {
  const paths = await correlationPaths({ fittedOnly: true });
  const identities = await Promise.all(paths.map((path) => handbookIdentity(path.params.slug)));
  return paths.flatMap(({ params, props }, i) => correlationFiles(props.entry, identities[i]!).map((file) => ({ params: { slug: params.slug, file: file.file }, props: { file } })));
}) satisfies GetStaticPaths;

export const GET: APIRoute<{ file: CorrelationFile }> = ({ props }) => new Response(props.file.text, { headers: { 'Content-Type': props.file.contentType } });
