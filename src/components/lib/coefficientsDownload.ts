/**
 * The two coefficient downloads of a correlation page, built from the stored entry at build time.
 *
 * Both carry the same content: the cautions (with the validity range), the invented-data notice when the data are
 * invented, the transforms, the equation as plain text, the coefficients at full precision (shortest round-trip
 * text, which parses back to the same double) with the significant digits needed for printing, their standard
 * errors and intervals, the well-conditioned mapped form, the check values and the provenance.
 * JSON is the machine-readable form; CSV has `#` comment lines for everything except the coefficient table.
 */
import { cautionsFor, equationPlain, equationTex, formatCoefficient } from '../../core/index.ts';
import {
  INVENTED_NOTICE,
  fitOf,
  plainSymbol,
  selectionOf,
  transformXText,
  transformYText,
  type CorrelationEntry,
  type PolynomialFit,
} from './entryView.ts';

/** Finite numbers as they are; NaN and infinities become null (JSON has no NaN). */
function finiteOrNull(value: number | null | undefined): number | null {
  return typeof value === 'number' && Number.isFinite(value) ? value : null;
}

function requireFit(entry: CorrelationEntry): PolynomialFit {
  const fit = fitOf(entry);
  if (fit === null) throw new Error(`coefficients download requires a fit; ${entry.slug} has none`);
  return fit;
}

/** The JSON download as a plain object. */
export function coefficientsJson(entry: CorrelationEntry) {
  const fit = requireFit(entry);
  const { meta } = entry;
  const x = plainSymbol(meta.variable.symbol);
  const y = plainSymbol(meta.property.symbol);
  const selection = selectionOf(entry);
  return {
    ...(meta.invented ? { notice: INVENTED_NOTICE } : {}),
    invented: meta.invented,
    cautions: cautionsFor(entry.range, meta.variable.unit === '1' ? '' : meta.variable.unit, meta.variable.name),
    title: meta.title,
    slug: entry.slug,
    property: meta.property,
    variable: meta.variable,
    validityRange: { min: entry.range.min, max: entry.range.max, unit: meta.variable.unit },
    form: {
      description: 'v = sum over k of a_k * u^k, with u the transformed x and v the transformed y',
      u: transformXText(fit, x),
      v: transformYText(fit, y),
      transformX: fit.transformX,
      transformY: fit.transformY,
      intercept: fit.intercept,
      weighted: fit.weighted,
      order: fit.order,
    },
    equation: equationPlain(fit, { x, y }),
    equationTex: equationTex(fit, { x: meta.variable.symbol, y: meta.property.symbol }),
    coefficients: fit.coefficients.map((value, k) => ({
      k,
      value,
      significantDigits: fit.significantDigits[k]!,
      rounded: formatCoefficient(value, fit.significantDigits[k]!),
      standardError: finiteOrNull(fit.standardErrors[k]),
      confidenceInterval: (fit.confidenceIntervals[k] ?? []).map(finiteOrNull),
    })),
    confidence: fit.confidence,
    mapped: {
      description: 'v = sum over k of b_k * xi^k with xi = (u - center) / halfWidth, on [-1, 1] over the data; better conditioned for evaluation',
      center: fit.mapped.map.center,
      halfWidth: fit.mapped.map.halfWidth,
      coefficients: fit.mapped.coefficients,
    },
    constraints: fit.constraints,
    checkValues: fit.checkValues,
    statistics: {
      n: fit.statistics.n,
      degreesOfFreedom: fit.statistics.degreesOfFreedom,
      residualStdDev: finiteOrNull(fit.statistics.residualStdDev),
      rSquared: finiteOrNull(fit.statistics.rSquared),
      maxAbsResidual: finiteOrNull(fit.statistics.maxAbsResidualOriginal),
      looRmse: finiteOrNull(fit.statistics.looRmse),
    },
    orderSelection: selection === null ? null : { criterion: selection.criterion, reason: selection.reason, rule: selection.rule },
    provenance: {
      material: meta.material,
      source: meta.source,
      uncertainty: meta.uncertainty ?? null,
      review: meta.review,
      excluded: entry.excluded.map((point) => ({ row: point.row, x: point.x, y: point.y, reason: point.reason })),
    },
    method: fit.method,
  };
}

/** Quote a CSV field when it needs it (RFC 4180). */
function csvField(text: string): string {
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** Comment text on one line. */
function comment(text: string): string {
  return `# ${text.replace(/\s*[\r\n]+\s*/g, ' ')}`;
}

/** The CSV download: `#` comment lines, then one header row and one row per coefficient. */
export function coefficientsCsv(entry: CorrelationEntry): string {
  const data = coefficientsJson(entry);
  const { meta } = entry;
  const xUnit = meta.variable.unit;
  const yUnit = meta.property.unit;
  const lines: string[] = [];
  if (data.notice) lines.push(comment(data.notice.replace(/^Invented data:/, 'INVENTED DATA:')));
  for (const caution of data.cautions) lines.push(comment(`CAUTION: ${caution}`));
  lines.push(comment(`Title: ${meta.title}`));
  lines.push(comment(`Property: ${meta.property.name}, ${data.form.v.replace(/^ln\((.*)\)$/, '$1')} [${yUnit}]`));
  lines.push(comment(`Variable: ${meta.variable.name}, x = ${plainSymbol(meta.variable.symbol)} [${xUnit}]`));
  lines.push(comment(`Validity range: ${data.validityRange.min} to ${data.validityRange.max} ${xUnit}`));
  lines.push(comment(`Form: ${data.form.v} = sum of a_k * u^k, u = ${data.form.u}, order ${data.form.order}, transformX ${data.form.transformX}, transformY ${data.form.transformY}, intercept ${data.form.intercept}, weighted ${data.form.weighted}`));
  lines.push(comment(`Equation (rounded to the digits needed): ${data.equation}`));
  lines.push(comment(`Mapped form: ${data.form.v} = sum of b_k * xi^k, xi = (u - ${String(data.mapped.center)}) / ${String(data.mapped.halfWidth)}, b = [${data.mapped.coefficients.map(String).join(', ')}]`));
  for (const check of data.checkValues) lines.push(comment(`Check value: x = ${String(check.x)} ${xUnit} gives y = ${String(check.y)} ${yUnit}`));
  lines.push(comment(`Material: ${[meta.material.name, meta.material.phase, meta.material.pressure, meta.material.grade, meta.material.conditions].filter(Boolean).join('; ')}`));
  lines.push(comment(`Source: ${meta.source.citation} (${meta.source.method}${meta.source.derivedFrom ? `, derived from ${meta.source.derivedFrom}` : ''}), ${meta.source.date}, prepared by ${meta.source.preparedBy}`));
  if (meta.source.notes) lines.push(comment(`Source notes: ${meta.source.notes}`));
  if (meta.uncertainty) lines.push(comment(`Stated uncertainty of the data: ${meta.uncertainty.statement}`));
  const review = meta.review;
  lines.push(comment(`Review: ${review.status}${review.reviewer ? `, ${review.reviewer}` : ''}${review.date ? `, ${review.date}` : ''}${review.notes ? `; ${review.notes}` : ''}`));
  lines.push(comment(`n = ${data.statistics.n}, dof = ${data.statistics.degreesOfFreedom}; coefficient value at full precision (shortest round-trip); rounded = printed with significant_digits`));
  lines.push(['k', 'coefficient', 'significant_digits', 'rounded', 'standard_error', `ci${Math.round(data.confidence * 100)}_low`, `ci${Math.round(data.confidence * 100)}_high`].join(','));
  for (const row of data.coefficients) {
    lines.push(
      [
        String(row.k),
        String(row.value),
        String(row.significantDigits),
        row.rounded,
        row.standardError === null ? '' : String(row.standardError),
        row.confidenceInterval[0] == null ? '' : String(row.confidenceInterval[0]),
        row.confidenceInterval[1] == null ? '' : String(row.confidenceInterval[1]),
      ]
        .map(csvField)
        .join(','),
    );
  }
  return `${lines.join('\n')}\n`;
}
