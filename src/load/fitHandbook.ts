/**
 * Read, validate and fit every correlation folder of a handbook: the one pass that both `correlary check` and the
 * Astro loader make. Every message from reading and fitting is collected; a folder that could not be read or
 * fitted is kept with `fitted` undefined so callers can say so.
 */
import { fitDataset, type DatasetFit } from './fitDataset.ts';
import { readHandbook } from './readHandbook.ts';
import { sortDiagnostics, type Diagnostic } from './diagnostic.ts';
import type { DatasetResult } from './types.ts';
import { reviewDiagnostics, reviewTrail, type ReviewTrail } from './review/reviewTrail.ts';

export interface FittedDataset {
  readonly dataset: DatasetResult;
  /** The fit, when the folder was read without errors (the fit itself may still have failed). */
  readonly fitted: DatasetFit | undefined;
  /** Fingerprint and approval state, when the folder was read without errors. */
  readonly review: ReviewTrail | undefined;
}

export interface FittedHandbook {
  readonly datasets: readonly FittedDataset[];
  /** Every error and warning, in file and line order. */
  readonly diagnostics: readonly Diagnostic[];
  /** Milliseconds spent reading and validating, and fitting (for progress summaries and bench:build). */
  readonly timing: { readonly readingMs: number; readonly fittingMs: number };
}

/** @example (await fitHandbook('content')).datasets.length // => 13 for the demo handbook */
export async function fitHandbook(directory: string): Promise<FittedHandbook> {
  const started = performance.now();
  const handbook = await readHandbook(directory);
  const readingMs = performance.now() - started;
  const diagnostics: Diagnostic[] = [...handbook.diagnostics];
  const datasets: FittedDataset[] = [];
  const slugs = new Set(handbook.datasets.map((read) => read.slug));
  for (const read of handbook.datasets) {
    diagnostics.push(...read.diagnostics);
    // Errors about the folder as a whole (an invalid or duplicate slug) belong to it too: such a folder is not fitted.
    const folderErrors = handbook.diagnostics.filter(
      (diagnostic) => diagnostic.severity === 'error' && (diagnostic.file === read.folder || diagnostic.file === read.metadataPath),
    );
    const dataset = folderErrors.length ? { ...read, diagnostics: [...read.diagnostics, ...folderErrors] } : read;
    const fitted = dataset.correlation === undefined || folderErrors.length ? undefined : fitDataset(dataset.correlation);
    if (fitted) diagnostics.push(...fitted.diagnostics);
    const review = fitted === undefined || dataset.correlation === undefined ? undefined : reviewTrail(dataset.correlation, fitted.fit);
    if (review !== undefined && dataset.correlation !== undefined) diagnostics.push(...reviewDiagnostics(dataset.correlation, review, slugs));
    datasets.push({ dataset, fitted, review });
  }
  const fittingMs = performance.now() - started - readingMs;
  return { datasets, diagnostics: sortDiagnostics(diagnostics), timing: { readingMs, fittingMs } };
}
