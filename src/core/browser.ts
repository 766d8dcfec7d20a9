/**
 * The core's door for browser code (src/client): only the dependency-free evaluation of a published model and the
 * number formatting the pages use. The full door, src/core/index.ts, re-exports the same functions; it cannot be
 * the browser's door because bundling it pulls in the fitting code and the distribution functions (about 0.5 MB
 * minified, measured with Vite), which tree-shaking does not remove. test/architecture.test.ts keeps every file
 * this door reaches free of ml-matrix and @stdlib.
 */
export { publishedEstimate, intervalHalfWidths, type PublishedEstimate, type PublishedModel } from './stats/publishedEstimate.ts';
export { formatInterval, formatNumber, formatToPlace, lastDigitPlace } from './format/formatNumber.ts';
