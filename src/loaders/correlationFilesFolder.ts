/**
 * Where the content loader writes each correlation's files (src/loaders/correlationFiles.ts): `correlary-files/`
 * inside Astro's cache folder. A file of its own, so that the pages, which read the parts written there
 * (writtenDownload.ts), do not pull the integration and the writers into the server build.
 */
import { fileURLToPath } from 'node:url';

/** @example correlationFilesFolder(new URL('file:///site/node_modules/.astro/')) // => '/site/node_modules/.astro/correlary-files/' */
export function correlationFilesFolder(cacheDir: URL): string {
  return fileURLToPath(new URL('correlary-files/', cacheDir));
}
