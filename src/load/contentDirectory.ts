/**
 * Which content directory a build reads: `content` unless the environment variable CORRELARY_CONTENT names another
 * (a path relative to the project root, or absolute). The Astro config, the content collections and build commands
 * all ask here, so one variable moves the whole site to another handbook.
 */

/** The environment variable that names the content directory. */
export const CONTENT_DIRECTORY_VARIABLE = 'CORRELARY_CONTENT';

/**
 * The content directory named by the environment, or `content`.
 * @example contentDirectory({}) // => "content"; contentDirectory({ CORRELARY_CONTENT: '/srv/hb' }) // => "/srv/hb"
 */
export function contentDirectory(environment: Readonly<Record<string, string | undefined>> = process.env): string {
  const named = environment[CONTENT_DIRECTORY_VARIABLE]?.trim();
  return named === undefined || named === '' ? 'content' : named;
}
