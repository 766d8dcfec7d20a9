/**
 * The page parts (pageParts.ts) the content loader wrote for this entry in this build, or undefined: under
 * `astro dev` (which writes no downloads, so a record left by an earlier build could be stale), for an entry that
 * holds its fit itself (tests), when the record is missing or unreadable, or when it was typeset by another KaTeX.
 * The page then builds each part itself.
 */
import { isStoredFitReference } from '../../load/storedFit.ts';
import { writtenPageParts } from '../../loaders/writtenDownload.ts';
import { KATEX_VERSION, PAGE_PARTS_FILE, type PageParts } from './pageParts.ts';
import type { CorrelationEntry } from './entryView.ts';

/** @example builtPageParts(entry)?.equation.html // => KaTeX markup, in a build */
export function builtPageParts(entry: CorrelationEntry): PageParts | undefined {
  if (!import.meta.env.PROD || !isStoredFitReference(entry.fit)) return undefined;
  const parts = writtenPageParts(entry.fit, entry.slug, PAGE_PARTS_FILE) as PageParts | undefined;
  return parts?.katex === KATEX_VERSION ? parts : undefined;
}
