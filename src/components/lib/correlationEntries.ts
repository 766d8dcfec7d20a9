/**
 * The `correlations` collection for the routes that list or page through it. In a build, the collection is read
 * once and shared: every getCollection call walks every entry's data looking for image references (Astro 5.18,
 * astro/dist/content/runtime.js updateImageReferencesInData), and seven routes ask (N = 1000 cold build, CPU
 * profile: 0.33 s of the rendering thread in that walk). Under `astro dev`, where content changes while the server
 * runs, each call reads the collection afresh. Callers must not change the entries they get.
 */
import { getCollection, type CollectionEntry } from 'astro:content';

let shared: Promise<CollectionEntry<'correlations'>[]> | undefined;

/** @example (await correlationEntries()).map((entry) => entry.data.slug) */
export function correlationEntries(): Promise<CollectionEntry<'correlations'>[]> {
  if (!import.meta.env.PROD) return getCollection('correlations');
  shared ??= getCollection('correlations');
  return shared;
}
