/**
 * The property-page curve (propertyCurve.ts) the files workers wrote for this entry in this build, or undefined:
 * under `astro dev` (which writes no files, so a file left by an earlier build could be stale), for an entry that
 * holds its fit itself (tests), or when the file is missing or unreadable. The caller must have waited for the
 * files of this build (src/loaders/pendingFiles.ts filesWritten): a folder written again replaces its file.
 */
import { isStoredFitReference } from '../../load/storedFit.ts';
import { writtenBytes } from '../../loaders/writtenBytes.ts';
import type { CurveRow } from '../../render/index.ts';
import type { CorrelationEntry } from './entryView.ts';
import { PROPERTY_CURVE_FILE, readPropertyCurve } from './propertyCurve.ts';

/** @example builtPropertyCurve(entry)?.length // => 60, in a build */
export function builtPropertyCurve(entry: CorrelationEntry): CurveRow[] | undefined {
  if (!import.meta.env.PROD || !isStoredFitReference(entry.fit)) return undefined;
  const bytes = writtenBytes(entry.fit, entry.slug, PROPERTY_CURVE_FILE);
  return bytes === undefined ? undefined : readPropertyCurve(bytes.toString('utf8'));
}
