/**
 * What the loader hands to the CLI and the Astro adapter.
 */
import type { Position } from './diagnostic.ts';
import type { CorrelationMeta, DataPoint, Diagnostic, ExcludedPoint } from '../schema/index.ts';

/** A correlation whose files passed validation, ready to fit. */
export interface LoadedCorrelation {
  readonly slug: string;
  /** Folder path as given (e.g. `content/corvane-cp`). */
  readonly folder: string;
  readonly metadataPath: string;
  readonly dataPath: string;
  readonly meta: CorrelationMeta;
  /** Every data row, in file order. */
  readonly points: readonly DataPoint[];
  /** Rows used in the fit, in file order; a FitError's pointIndex indexes this list. */
  readonly used: readonly DataPoint[];
  readonly excluded: readonly ExcludedPoint[];
  /** x range of the used rows. */
  readonly dataRange: { readonly min: number; readonly max: number };
  /** Published validity range (the data range unless narrowed in fit.range). */
  readonly range: { readonly min: number; readonly max: number };
  /** Warnings kept for the page. */
  readonly warnings: readonly Diagnostic[];
  /** Where fit.order (or the fit block, or the file start) sits in the metadata, for fit messages. */
  readonly orderPosition: Position;
  /** Where review.fingerprint (or the review block, or the file start) sits in the metadata, for review messages. */
  readonly reviewPosition: Position;
}

/** Outcome of reading one folder: the correlation when there were no errors, and every message found. */
export interface DatasetResult {
  readonly slug: string;
  readonly folder: string;
  readonly metadataPath: string;
  /** Where the slug is set in the metadata (its `slug:` line), or line 1 when it comes from the folder name. */
  readonly slugLine: number;
  readonly correlation: LoadedCorrelation | undefined;
  /** Errors and warnings, in file and line order. */
  readonly diagnostics: readonly Diagnostic[];
}
