/**
 * Exports of a fitted correlation: the one JSON record (used by `correlary fit --json`, the downloads and
 * handbook.json) and the coefficients CSV written from it. Pure: no file I/O, no Astro.
 */
export { correlationRecord, RECORD_VERSION, type CorrelationRecord, type CorrelationSource, type HandbookIdentity } from './correlationRecord.ts';
export { coefficientsCsv } from './coefficientsCsv.ts';
export { spreadsheetSafeText } from './spreadsheetSafeText.ts';
export { INVENTED_NOTICE } from './inventedNotice.ts';
export { finiteOrNull, jsonNumbers, type Jsonified, type JsonValue } from './jsonNumbers.ts';
export { approvalLabel, lapseReasonsText } from './approvalLabel.ts';
export { handbookJson, HANDBOOK_FORMAT_VERSION, HANDBOOK_JSON_FILE, HANDBOOK_SCHEMA_FILE, type HandbookCorrelation, type HandbookJsonInput } from './handbookJson.ts';
export { HANDBOOK_SCHEMA } from './handbookSchema.ts';
export * from './snippets/index.ts';
