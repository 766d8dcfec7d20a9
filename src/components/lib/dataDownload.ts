/**
 * The data download `data.csv` of one correlation: the cautions and provenance as `#` comment lines, then every
 * data row as read (x and y as written, shortest round-trip text) with its diagnostics from the fit and, for rows
 * left out, the reason. Text fields that a spreadsheet would run as a formula (leading =, +, -, @, tab or carriage
 * return) are quoted and prefixed with an apostrophe, common practice for CSV exports.
 */
import { cautionsFor } from '../../core/index.ts';
import { spreadsheetSafeText, type HandbookIdentity } from '../../export/index.ts';
import { INVENTED_NOTICE, pointsOf, unitSuffix, type CorrelationEntry, type PolynomialFit } from './entryView.ts';

/** Quote a CSV field when it needs it (RFC 4180); neutralise a leading formula character in text. */
function textField(text: string): string {
  if (text === '') return ''; // most rows have no reason and no note
  const safe = spreadsheetSafeText(text);
  return /[",\r\n']/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

function numberField(value: number | undefined): string {
  return value === undefined || !Number.isFinite(value) ? '' : String(value);
}

/** A `#` comment line; a spreadsheet still splits it at commas, so each piece is made spreadsheet-safe. */
function comment(text: string): string {
  return `# ${text.replace(/\s*[\r\n]+\s*/g, ' ').split(',').map(spreadsheetSafeText).join(',')}`;
}

/**
 * @param handbook the handbook identity the file names in its comment lines (handbookIdentity.ts)
 * @example dataCsv(entry, fit).split('\n').find((line) => !line.startsWith('#')) // => "row,line,x,y,uncertainty,used,…"
 */
export function dataCsv(entry: CorrelationEntry, fit: PolynomialFit, handbook?: HandbookIdentity): string {
  const { meta } = entry;
  const lines: string[] = [];
  if (meta.invented) lines.push(comment(INVENTED_NOTICE.replace(/^Invented data:/, 'INVENTED DATA:')));
  const unit = unitSuffix(meta.variable.unit).trim();
  for (const caution of cautionsFor(entry.range, unit, meta.variable.name)) lines.push(comment(`CAUTION: ${caution}`));
  lines.push(comment(`Title: ${meta.title}`));
  if (handbook !== undefined) {
    lines.push(comment(`Handbook: ${handbook.title}${handbook.organisation ? `, published by ${handbook.organisation}` : ''}; page: ${handbook.url}`));
    if (handbook.notice) lines.push(comment(`Handbook notice: ${handbook.notice}`));
  }
  lines.push(comment(`x: ${meta.variable.name} [${meta.variable.unit}]; y: ${meta.property.name} [${meta.property.unit}]; values as written in the data file`));
  lines.push(comment(`Source: ${meta.source.citation}`));
  lines.push(comment(`Diagnostics of the order-${fit.order} fit: residual = y - fitted y [${meta.property.unit}]; empty for rows left out`));
  lines.push('row,line,x,y,uncertainty,used,residual,studentized,leverage,cooks_distance,excluded_reason,note');
  // The rows of dataRows (the points used, in file order, the i-th with the fit's i-th diagnostics), written as the
  // points are walked rather than looked up by row number.
  const excluded = new Map(entry.excluded.map((point) => [point.row, point.reason]));
  const { residualsOriginal, studentized, leverage, cooksDistance } = fit.points;
  let used = 0;
  let text = `${lines.join('\n')}\n`;
  for (const point of pointsOf(entry)) {
    const reason = excluded.get(point.row);
    const start = `${point.row},${point.line},${point.x},${point.y},${numberField(point.uncertainty)},`;
    const diagnostics =
      reason === undefined
        ? `yes,${numberField(residualsOriginal[used])},${numberField(studentized[used])},${numberField(leverage[used])},${numberField(cooksDistance[used++])}`
        : 'no,,,,';
    text += `${start}${diagnostics},${textField(reason ?? '')},${textField(point.note ?? '')}\n`;
  }
  return text;
}
