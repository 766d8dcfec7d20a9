/**
 * The error the core throws when data cannot support the requested fit. `code` is stable for callers that
 * map it to their own wording; `pointIndex`, when set, is the zero-based index of the offending point in the
 * input arrays, so a loader can turn it into a file line.
 */
export class FitError extends Error {
  readonly code: string;
  readonly pointIndex: number | undefined;

  constructor(code: string, message: string, pointIndex?: number) {
    super(message);
    this.name = 'FitError';
    this.code = code;
    this.pointIndex = pointIndex;
  }
}
