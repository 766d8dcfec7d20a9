/**
 * The check pass of `correlary build` handed to the content loader. `correlary build` reads, validates and fits the
 * whole handbook before Astro starts (src/cli/build.ts), in the same process and with the same fit cache as the
 * loader, which would then read every folder again and look every fit up in the cache (about 1.8 s at 1000
 * correlations). The CLI offers its result here; the loader takes it instead when it would have made exactly the
 * same call: the same display directory (the content folder relative to the same working directory, so every path
 * in the result is the one the loader's own pass would hold), the same fit cache and code version. Anything else
 * (a staged build that changed the working directory, another content folder, `astro dev`) finds nothing and reads
 * the handbook itself. An offer is taken once.
 *
 * Astro loads the loader as a separate module instance from the CLI's, so the offer is kept on globalThis under a
 * registered symbol.
 */
import path from 'node:path';
import type { FittedHandbook } from '../load/fitHandbook.ts';

const KEY = Symbol.for('correlary.checkedHandbook');

/** Which call of fitHandbook produced the handbook. */
export interface CheckedCall {
  /** The directory as passed to fitHandbook (relative to `workingDirectory`). */
  readonly directory: string;
  readonly workingDirectory: string;
  readonly fitCache: { readonly directory: string; readonly version: string };
}

type Holder = { [KEY]?: { call: CheckedCall; handbook: FittedHandbook } };

/** @example offerCheckedHandbook({ directory: 'content', workingDirectory: process.cwd(), fitCache }, handbook) */
export function offerCheckedHandbook(call: CheckedCall, handbook: FittedHandbook): void {
  (globalThis as Holder)[KEY] = { call, handbook };
}

/**
 * The handbook offered for exactly this call, or undefined; removes any offer either way.
 * @example takeCheckedHandbook({ directory: 'content', workingDirectory: process.cwd(), fitCache }) ?? (await fitHandbook('content', …))
 */
export function takeCheckedHandbook(call: CheckedCall): FittedHandbook | undefined {
  const holder = globalThis as Holder;
  const offer = holder[KEY];
  delete holder[KEY];
  if (offer === undefined) return undefined;
  const same =
    offer.call.directory === call.directory &&
    offer.call.workingDirectory === call.workingDirectory &&
    path.resolve(offer.call.fitCache.directory) === path.resolve(call.fitCache.directory) &&
    offer.call.fitCache.version === call.fitCache.version;
  return same ? offer.handbook : undefined;
}
