/**
 * Every file of one fitted correlation besides its page: coefficients.json and .csv, data.csv, plot.svg,
 * chart-data.json (large data sets only) and the code snippets. The build writes them once per correlation from
 * the content loader (src/loaders/correlationFiles.ts), not as thousands of Astro routes; `astro dev` serves them
 * through one route (src/routes/correlationFile.ts). Both take them from here, so they are the same bytes.
 */
import { cautionsFor } from '../../core/index.ts';
import { coefficientsCsv, type HandbookIdentity } from '../../export/index.ts';
import { renderFitSvg } from '../../render/index.ts';
import { EMBED_POINT_LIMIT, chartData } from './chartData.ts';
import { dataCsv } from './dataDownload.ts';
import { entryRecord } from './entryRecord.ts';
import { entrySnippets } from './entrySnippets.ts';
import { fitOf, INVENTED_NOTICE, usedPoints, type CorrelationEntry } from './entryView.ts';

export interface CorrelationFile {
  /** File name inside /correlations/<slug>/. */
  readonly file: string;
  readonly contentType: string;
  readonly text: string;
}

/** The plot's description (its <desc>): the invented-data notice where it applies, the cautions, the handbook. */
function plotDescription(entry: CorrelationEntry, handbook: HandbookIdentity): string {
  const { meta } = entry;
  const unit = meta.variable.unit === '1' ? '' : meta.variable.unit;
  return [
    ...(meta.invented ? [INVENTED_NOTICE] : []),
    `Cautions: ${cautionsFor(entry.range, unit, meta.variable.name).join(' ')}`,
    `Handbook: ${handbook.title}${handbook.organisation ? `, published by ${handbook.organisation}` : ''}; page: ${handbook.url}`,
    ...(handbook.notice ? [`Handbook notice: ${handbook.notice}`] : []),
  ].join(' ');
}

/**
 * @param handbook the handbook identity every file names (handbookIdentity.ts)
 * @throws Error when the entry has no fit (such an entry has no files)
 * @example correlationFiles(entry).map((f) => f.file) // => ['coefficients.json', 'coefficients.csv', 'data.csv', 'plot.svg', 'x.py', …]
 */
export function correlationFiles(entry: CorrelationEntry, handbook: HandbookIdentity): CorrelationFile[] {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`correlationFiles requires a fit; ${entry.slug} has none`);
  const record = entryRecord(entry, handbook);
  const chart = chartData(entry, fit);
  return [
    { file: 'coefficients.json', contentType: 'application/json; charset=utf-8', text: `${JSON.stringify(record, null, 2)}\n` },
    { file: 'coefficients.csv', contentType: 'text/csv; charset=utf-8', text: coefficientsCsv(record) },
    { file: 'data.csv', contentType: 'text/csv; charset=utf-8', text: dataCsv(entry, fit, handbook) },
    { file: 'plot.svg', contentType: 'image/svg+xml; charset=utf-8', text: renderFitSvg(chart, { title: `${entry.meta.title}: data, fitted curve and bands; residuals below`, description: plotDescription(entry, handbook) }) },
    // Small data sets embed their chart data in the page and get no file.
    ...(usedPoints(entry).length > EMBED_POINT_LIMIT ? [{ file: 'chart-data.json', contentType: 'application/json', text: JSON.stringify(chart) }] : []),
    ...entrySnippets(entry, handbook, record).map((snippet) => ({ file: snippet.file, contentType: `${snippet.contentType}; charset=utf-8`, text: snippet.text })),
  ];
}
