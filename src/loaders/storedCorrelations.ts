/**
 * What the content loader put into Astro's content store in this build, so that the bundling of the store
 * (dataStoreIntegration.ts) can check that the store file on disk holds it. Astro 5.18 saves its store with a
 * debounced write, and a save asked for while an earlier one is being written is later written with the earlier
 * one's data (astro/dist/content/mutable-data-store.js, #writeFileAtomic's pending re-write): when a save fires
 * while the loader is still working (it runs half a second after the last change to the store, e.g. the store
 * cleared because the Astro configuration changed) and the loader's final save overlaps it, the file keeps the
 * earlier store, and the site would be built from it: the previous build's correlations, or none. Observed once on
 * the N = 1000 bench project after a configuration change: a build of 3 pages instead of 1010, exit status 0.
 *
 * Astro loads the loader and the integration as separate module instances, so the record is kept on globalThis
 * under a registered symbol.
 */

const KEY = Symbol.for('correlary.storedCorrelations');

export interface StoredCorrelations {
  /** The digest of every entry the loader stored (Astro keeps each in the store file as a JSON string). */
  readonly digests: readonly string[];
  /** Make Astro save its store again (from memory, where it is right): resaveInOrder. */
  readonly resave: () => void;
}

/** The part of Astro's scoped store a resave uses (its `set` does nothing for an entry it holds with the same digest). */
export interface EntryStore<Entry> {
  delete(id: string): void;
  set(entry: Entry): unknown;
}

/**
 * Make Astro save the store again, keeping the entries' order: every entry is taken out, then all are put back in
 * the order they were stored. Astro saves only on a change (putting back an entry it holds unchanged is none), and
 * its collection keeps insertion order, which getCollection and so the lists follow: taking out and putting back
 * only one entry would move it to the end, and a build after a lost save would differ from one without.
 * @example resaveInOrder(context.store, inputs)
 */
export function resaveInOrder<Entry extends { readonly id: string }>(store: EntryStore<Entry>, entries: readonly Entry[]): void {
  for (const entry of entries) store.delete(entry.id);
  for (const entry of entries) store.set(entry);
}

type Holder = { [KEY]?: StoredCorrelations };

/** @example rememberStoredCorrelations({ digests, resave }) // in the loader, after storing */
export function rememberStoredCorrelations(stored: StoredCorrelations): void {
  (globalThis as Holder)[KEY] = stored;
}

/** What the loader of this build stored, if it ran in this process. */
export function storedCorrelations(): StoredCorrelations | undefined {
  return (globalThis as Holder)[KEY];
}

/**
 * How many of `digests` the store file's text does not hold. Astro's store file is devalue's flattened form: one
 * JSON array whose elements are every distinct value, each string (a digest among them) an element of its own; so
 * one parse and a set of those strings answer for every digest (a text search per digest cost 0.22 s of the
 * N = 1000 bench build). A text that does not parse as an array holds none of them.
 * @example missingDigests('[["Map",1],{"digest":2},"a1b2"]', ['a1b2', 'c3d4']) // => 1
 */
export function missingDigests(storeText: string, digests: readonly string[]): number {
  let values: unknown;
  try {
    values = JSON.parse(storeText);
  } catch {
    return digests.length;
  }
  if (!Array.isArray(values)) return digests.length;
  const strings = new Set<unknown>(values.filter((value) => typeof value === 'string'));
  let missing = 0;
  for (const digest of digests) if (!strings.has(digest)) missing++;
  return missing;
}
