/**
 * The check pass of `correlary build` handed to the content loader. `correlary build` reads, validates and fits the
 * whole handbook before Astro starts (src/cli/build.ts), in the same process and with the same fit cache as the
 * loader, which would then read every folder again and look every fit up in the cache (about 1.8 s at 1000
 * correlations). The CLI offers its result here; the loader takes it instead when it would have read the same
 * content folder with the same fit cache and code version. Every path in the result (the messages, the folders) is
 * relative to the working directory of the check pass, which is the one the user ran the command in; a build whose
 * output lies outside it runs Astro from a staging folder (src/cli/build.ts), and the loader's own pass, naming its
 * files from there, would have got other fit cache keys and fitted every dataset a second time. So the offer also
 * carries the histories from git, computed in the check pass's working directory, and the loader takes the offer
 * from another working directory only with them. Anything else (another content folder, cache or code version,
 * `astro dev`) finds nothing and reads the handbook itself. An offer is taken once.
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

/** What the loader takes: the handbook, the call that made it, and its histories when the check pass made them. */
export interface CheckedPass {
  readonly call: CheckedCall;
  readonly handbook: FittedHandbook;
  /** handbookHistory of the handbook, by slug, made in the call's working directory. */
  readonly histories?: ReadonlyMap<string, unknown>;
}

type Holder = { [KEY]?: CheckedPass };

/** @example offerCheckedHandbook({ call: { directory: 'content', workingDirectory: process.cwd(), fitCache }, handbook, histories }) */
export function offerCheckedHandbook(pass: CheckedPass): void {
  (globalThis as Holder)[KEY] = pass;
}

/**
 * The pass offered for the same content folder, fit cache and code version, or undefined; removes any offer either
 * way. From another working directory, only an offer with its histories is taken (paths in it are relative to
 * its own working directory, which the caller must resolve them against).
 * @example takeCheckedHandbook({ directory: 'content', workingDirectory: process.cwd(), fitCache })?.handbook ?? (await fitHandbook('content', …))
 */
export function takeCheckedHandbook(call: CheckedCall): CheckedPass | undefined {
  const holder = globalThis as Holder;
  const offer = holder[KEY];
  delete holder[KEY];
  if (offer === undefined) return undefined;
  const sameFolder = path.resolve(offer.call.workingDirectory, offer.call.directory) === path.resolve(call.workingDirectory, call.directory);
  const sameFrame = offer.call.workingDirectory === call.workingDirectory && offer.call.directory === call.directory;
  const same =
    sameFolder &&
    (sameFrame || offer.histories !== undefined) &&
    path.resolve(offer.call.workingDirectory, offer.call.fitCache.directory) === path.resolve(call.workingDirectory, call.fitCache.directory) &&
    offer.call.fitCache.version === call.fitCache.version;
  return same ? offer : undefined;
}
