/**
 * The coefficients CSV of one correlation, written from its record (correlationRecord): `#` comment lines for the
 * notice, the cautions, the form, the equation, the mapped form, the check values and the provenance, then one
 * header row and one row per coefficient. Null numbers (see jsonNumbers.ts) print as empty fields.
 *
 * Columns: k, coefficient (full precision, shortest round-trip text), significant_digits, rounded (as printed),
 * standard_error, ci95_low, ci95_high (the level follows the record's confidence).
 * @example coefficientsCsv(record).split('\n').at(-2) // => "2,-145306.4927312025,6,-145306,4202.19…,…"
 */
import type { CorrelationRecord } from './correlationRecord.ts';
import { spreadsheetSafeText } from './spreadsheetSafeText.ts';

/** Quote a CSV field when it needs it (RFC 4180), after making it safe to open in a spreadsheet. */
function csvField(text: string): string {
  const safe = spreadsheetSafeText(text);
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/**
 * Comment text on one line. A spreadsheet still splits the line at its commas, so every piece between commas is
 * made spreadsheet-safe too.
 */
function comment(text: string): string {
  return `# ${text.replace(/\s*[\r\n]+\s*/g, ' ').split(',').map(spreadsheetSafeText).join(',')}`;
}

function numberField(value: number | null | undefined): string {
  return value === null || value === undefined ? '' : String(value);
}

export function coefficientsCsv(record: CorrelationRecord): string {
  const xUnit = record.variable.unit;
  const yUnit = record.property.unit;
  const lines: string[] = [];
  if (record.notice) lines.push(comment(record.notice.replace(/^Invented data:/, 'INVENTED DATA:')));
  for (const caution of record.cautions) lines.push(comment(`CAUTION: ${caution}`));
  lines.push(comment(`Title: ${record.title}`));
  if (record.handbook !== null) {
    const handbook = record.handbook;
    lines.push(comment(`Handbook: ${handbook.title}${handbook.organisation ? `, published by ${handbook.organisation}` : ''}; page: ${handbook.url}`));
    if (handbook.notice) lines.push(comment(`Handbook notice: ${handbook.notice}`));
  }
  lines.push(comment(`Status: ${record.status}`));
  if (record.approval !== null) lines.push(comment(`Approval: ${record.approval.label}; holds: ${record.approval.holds ? 'yes' : 'no'}`));
  if (record.fingerprint !== null) lines.push(comment(`Fingerprint: ${record.fingerprint}`));
  lines.push(comment(`Property: ${record.property.name}, y = ${record.symbols.y} [${yUnit}]`));
  lines.push(comment(`Variable: ${record.variable.name}, x = ${record.symbols.x} [${xUnit}]`));
  lines.push(comment(`Validity range: ${record.range.min} to ${record.range.max} ${xUnit}`));
  lines.push(comment(`Form: ${record.transforms.v} = sum of a_k * u^k, u = ${record.transforms.u}, order ${record.order}, transformX ${record.transforms.x}, transformY ${record.transforms.y}, intercept ${record.intercept}, weighted ${record.weighted}`));
  lines.push(comment(`Equation (rounded to the digits needed): ${record.equation}`));
  lines.push(comment(`Mapped form: ${record.transforms.v} = sum of b_k * t^k, t = (u - ${numberField(record.mapped.center)}) / ${numberField(record.mapped.halfWidth)}, b = [${record.mapped.coefficients.map(numberField).join(', ')}]`));
  for (const check of record.printedCheckValues) lines.push(comment(`Check value (printed equation): x = ${numberField(check.x)} ${xUnit} gives y = ${check.y} ${yUnit} within ${numberField(check.tolerance)}`));
  for (const check of record.checkValues) lines.push(comment(`Check value (full-precision coefficients): x = ${numberField(check.x)} ${xUnit} gives y = ${numberField(check.y)} ${yUnit}${check.tolerance === null || check.tolerance === undefined ? '' : ` within ${numberField(check.tolerance)}`}`));
  lines.push(comment(`Coefficient uncertainties: ${record.uncertaintyScale === 'stated' ? 'from the stated uncertainties, taken as known (not rescaled)' : 'scaled by the residual scatter'}`));
  const material = record.material;
  lines.push(comment(`Material: ${[material.name, material.phase, material.pressure, material.grade, material.conditions].filter(Boolean).join('; ')}`));
  const source = record.provenance.source;
  lines.push(comment(`Source: ${source.citation} (${source.method}${source.derivedFrom ? `, derived from ${source.derivedFrom}` : ''}), ${source.date}, prepared by ${source.preparedBy}`));
  if (source.notes) lines.push(comment(`Source notes: ${source.notes}`));
  if (record.provenance.uncertainty) lines.push(comment(`Stated uncertainty of the data: ${record.provenance.uncertainty.statement}`));
  const review = record.provenance.review;
  lines.push(comment(`Review: ${review.status}${review.reviewer ? `, ${review.reviewer}` : ''}${review.date ? `, ${review.date}` : ''}${review.notes ? `; ${review.notes}` : ''}`));
  lines.push(comment(`n = ${record.n}, dof = ${numberField(record.degreesOfFreedom)}; coefficient value at full precision (shortest round-trip); rounded = printed with significant_digits; empty = not defined for this fit`));
  const level = Math.round((record.confidence ?? 0.95) * 100);
  lines.push(['k', 'coefficient', 'significant_digits', 'rounded', 'standard_error', `ci${level}_low`, `ci${level}_high`].join(','));
  record.coefficients.forEach((value, k) => {
    const interval = record.confidenceIntervals[k] ?? [];
    lines.push(
      [String(k), numberField(value), numberField(record.significantDigits[k]), record.printedCoefficients[k] ?? '', numberField(record.standardErrors[k]), numberField(interval[0]), numberField(interval[1])]
        .map(csvField)
        .join(','),
    );
  });
  return `${lines.join('\n')}\n`;
}
