/**
 * Reading and validating handbook folders (Node only: file I/O). Used by the CLI and the Astro loader.
 */

// reading
export { readHandbook, type HandbookResult } from './readHandbook.ts';
export { readDataset } from './readDataset.ts';
export { readHandbookSettings, type HandbookSettingsResult } from './readHandbookSettings.ts';
export { contentDirectory, CONTENT_DIRECTORY_VARIABLE } from './contentDirectory.ts';
export type { DatasetResult, LoadedCorrelation } from './types.ts';

// fitting a loaded correlation
export { fitDataset, type DatasetFit } from './fitDataset.ts';
export { fitHandbook, type FittedDataset, type FittedHandbook } from './fitHandbook.ts';

// review trail: fingerprint, approval state
export { fingerprint, canonicalTexts, parseFingerprint, FINGERPRINT_RECIPE, type Fingerprint, type FingerprintComponent } from './review/fingerprint.ts';
export { approvalState, lapseText, LAPSE_REASON_TEXT, type Approval, type LapseReason } from './review/approvalState.ts';
export { reviewTrail, reviewDiagnostics, type ReviewTrail } from './review/reviewTrail.ts';

// history from git: commits per correlation, what changed since the approved version
export { handbookHistory, HISTORY_VERSIONS, type CorrelationHistory, type HistoryRow, type SinceApproval } from './history/handbookHistory.ts';
export { whatChanged, type WhatChanged, type RowChange } from './history/whatChanged.ts';
export { gitLog, readBlobs, type GitCommit, type GitLogResult } from './history/gitLog.ts';

// messages
export { formatDiagnostic, sortDiagnostics, hasErrors, error, warning, type Diagnostic, type Position } from './diagnostic.ts';

// limits
export { DATA_FILE_LIMIT_BYTES, METADATA_FILE_LIMIT_BYTES, MESSAGES_PER_FILE, MINIMUM_POINTS } from './limits.ts';
