/**
 * The spreadsheet formula of a correlation: one cell, x in a cell named `x_value`, Horner's rule on the mapped
 * coefficients at full precision; outside the validity range it returns the error value #N/A (NA()). The natural
 * logarithm is LN (LOG is base 10 in spreadsheets). The download is a text file: `#` comment lines (what every
 * snippet carries, plus how to set up the named cell), then the formula on its own line. Where x is a temperature the
 * comment lines also give the formula for x in each other scale (the same mapped sum with that scale's range, centre
 * and half-width); the last line stays the formula for the scale of the fit.
 *
 * @example spreadsheetFormula(record).startsWith('=IF(OR(') // => true
 */
import type { CorrelationRecord } from '../correlationRecord.ts';
import { scaleHeaderLines, snippetScales } from './snippetScales.ts';
import { headerLines, literal } from './snippetText.ts';
import type { SnippetSource } from './snippetSource.ts';

/** Name of the cell that holds x. */
export const SPREADSHEET_X_NAME = 'x_value';

/**
 * A number as a formula constant: the shortest round-trip digits written out as a plain decimal (no exponent, which
 * not every formula parser reads), negative numbers in parentheses.
 * @example constant(-1.5e-3) // => '(-0.0015)'
 */
export function constant(value: number | null): string {
  const [mantissa, exponentText] = literal(value).replace(/^-/, '').split('e');
  const exponent = Number(exponentText ?? 0);
  const [whole, fraction = ''] = mantissa!.split('.');
  const digits = `${whole}${fraction}`;
  const point = whole!.length + exponent;
  let text: string;
  if (point <= 0) text = `0.${'0'.repeat(-point)}${digits}`;
  else if (point >= digits.length) text = `${digits}${'0'.repeat(point - digits.length)}`;
  else text = `${digits.slice(0, point)}.${digits.slice(point)}`;
  text = text.replace(/^0+(?=\d)/, '');
  if (text.includes('.')) text = text.replace(/0+$/, '').replace(/\.$/, '');
  return value! < 0 ? `(-${text})` : text;
}

/**
 * The one-cell formula; with a temperature scale ('K', '°C', '°F'), x in that scale (the record must have
 * temperatureScales).
 * @throws Error when a scale is asked for and x is not a temperature
 */
export function spreadsheetFormula(record: CorrelationRecord, name = SPREADSHEET_X_NAME, scale?: 'K' | '°C' | '°F'): string {
  const m = record.mapped;
  const entry = scale === undefined ? undefined : snippetScales(record)?.find((item) => item.scale === scale);
  if (scale !== undefined && entry === undefined) throw new Error(`spreadsheetFormula requires a temperature correlation for scale ${scale}`);
  const center = entry?.center ?? m.center!;
  const halfWidth = entry?.halfWidth ?? m.halfWidth!;
  const range = entry ?? { min: record.range.min!, max: record.range.max! };
  const u = record.transforms.x === 'identity' ? name : record.transforms.x === 'reciprocal' ? `(1/${name})` : `LN(${name})`;
  const t = `((${u}-${constant(center)})/${constant(halfWidth)})`;
  const b = m.coefficients.map((value) => constant(value ?? 0));
  let horner = b[b.length - 1]!;
  for (let k = b.length - 2; k >= 0; k--) horner = `${b[k]}+${t}*(${horner})`;
  const v = record.transforms.y === 'log' ? `EXP(${horner})` : horner;
  return `=IF(OR(${name}<${constant(range.min)},${name}>${constant(range.max)}),NA(),${v})`;
}

/** The download: comment lines, then the formula. */
export function spreadsheetSnippet(source: SnippetSource): string {
  const comments = [
    ...headerLines(source, 'Spreadsheet formula'),
    `Set-up: give the cell that holds x (in ${source.record.variable.unit === '1' ? 'its own units' : source.record.variable.unit}) the name ${SPREADSHEET_X_NAME}, then paste the line below into one cell.`,
    'Outside the validity range the formula returns #N/A. Some spreadsheets keep 15 significant digits of a typed constant.',
    ...scaleHeaderLines(source.record, 'the formula per scale is below; the last line is for the default'),
    ...(snippetScales(source.record) ?? [])
      .filter((entry) => !entry.native)
      .map((entry) => `x_value in ${entry.scale}: ${spreadsheetFormula(source.record, SPREADSHEET_X_NAME, entry.scale)}`),
  ];
  return `${comments.map((line) => `# ${line}`.trimEnd()).join('\n')}\n${spreadsheetFormula(source.record)}\n`;
}
