/**
 * The readable report of `correlary fit`, written from the export record (src/export) and the fit. Formatting
 * only; no fitting here. Every statistic carries what it is measured in (y's unit, "in ln y" or "weighted, in
 * units of σ"), numbers print to meaningful digits (src/core/format/formatNumber.ts), the mapped form is printed,
 * and the reason for the order is stated once.
 */
import { formatInterval, formatNumber, formatP, formatRSquared, withStatisticUnit, type PolynomialFit } from '../core/index.ts';
import type { CorrelationRecord } from '../export/index.ts';

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

/** "Order 2, chosen by lowestJustified: Order 2: …" must not happen: drop a leading "Order m:" from the reason. */
function reasonOnce(reason: string, order: number): string {
  return reason.replace(new RegExp(`^Order ${order}(?:,|:)?\\s*(?:fixed by the author:\\s*)?`), '');
}

/** The polynomial in the other temperature scales (exact re-expression), where x is a temperature. */
function temperatureScaleLines(record: CorrelationRecord): string[] {
  const scales = record.temperatureScales;
  if (scales === null) return [];
  const lines = ['', `Other temperature scales (the same polynomial by exact substitution; fitted in ${scales.native}):`];
  for (const form of scales.scales) {
    if (form.native) continue;
    lines.push(`  in ${form.scale}, valid for ${form.range.min} ${form.scale} ≤ x ≤ ${form.range.max} ${form.scale}:`);
    if (!form.shown) {
      lines.push(`    not shown: ${form.reason}`);
      continue;
    }
    lines.push(`    ${form.equation}`);
    lines.push(`    digits: ${form.significantDigits.join(', ')}; full precision: [${form.coefficients.map((a) => String(a)).join(', ')}]`);
    lines.push(`    check values: ${form.printedCheckValues.map((check) => `x = ${check.x} → ${check.y} ± ${formatNumber(check.tolerance, 1)}`).join('; ')}`);
  }
  return lines;
}

export function fitReport(record: CorrelationRecord, fit: PolynomialFit, file: string): string {
  const s = fit.statistics;
  const unit = record.statisticUnit;
  const stat = (value: number | null, digits = 4) => withStatisticUnit(formatNumber(value, digits), unit);
  const yUnit = record.property.unit ? ` ${record.property.unit}` : '';
  const xUnit = record.variable.unit ? ` ${record.variable.unit}` : '';
  const lines: string[] = [];
  lines.push(`Correlation fitted to ${file} (x = '${record.variable.name}', y = '${record.property.name}'${record.weighted ? ', weighted by the stated uncertainties' : ''})`);
  lines.push('');
  lines.push(`  ${record.equation}`);
  lines.push(`  valid for ${record.range.min}${xUnit} ≤ x ≤ ${record.range.max}${xUnit}`);
  lines.push('');
  lines.push(`  mapped form (better conditioned; the same curve): ${record.transforms.v} = sum of b_k * t^k, t = (${record.transforms.u} - ${record.mapped.center}) / ${record.mapped.halfWidth}`);
  lines.push(`  b = [${record.mapped.coefficients.map((b) => String(b)).join(', ')}]`);
  lines.push('');
  const selection = record.orderSelection;
  if (selection) {
    const how = selection.criterion === 'fixed' ? 'fixed' : `chosen by ${selection.criterion}`;
    lines.push(`Order ${record.order}, ${how}: ${reasonOnce(selection.reason, fit.order)}`);
    lines.push('');
  }
  lines.push(`Coefficients of ascending powers of u = ${record.transforms.u} (print at least the digits shown):`);
  lines.push(`  (standard errors ${fit.uncertaintyScale === 'stated' ? 'from the stated uncertainties, taken as known (χ² mode): not rescaled by the scatter' : fit.weighted ? 'from the stated uncertainties, scaled by the residual scatter (reduced χ²)' : 'scaled by the residual scatter'})`);
  lines.push(`  ${pad('k', 4)}${pad('a_k', 26)}${pad('std. error', 14)}${Math.round(fit.confidence * 100)} % interval`);
  fit.coefficients.forEach((a, k) => {
    if (k === 0 && !fit.intercept) return;
    const digits = fit.significantDigits[k]!;
    lines.push(`  ${pad(String(k), 4)}${pad(record.printedCoefficients[k]!, 26)}${pad(formatNumber(fit.standardErrors[k], 2), 14)}${formatInterval(fit.confidenceIntervals[k], a, digits)}`);
  });
  lines.push('');
  lines.push(`Statistics (residuals ${unit === '' ? 'in y' : unit.startsWith('in ') || unit.startsWith('weighted') ? unit : `in ${unit}`}):`);
  lines.push(`  n = ${s.n}, free parameters = ${s.parameters}, residual dof = ${s.degreesOfFreedom}`);
  lines.push(`  residual std. dev. s = ${stat(s.residualStdDev)}, RMSE = ${stat(s.rmse)}, leave-one-out RMSE = ${stat(s.looRmse)}`);
  lines.push(`  R² = ${formatRSquared(s.rSquared)}${s.rSquaredCentred ? '' : ' (uncentred)'}, adjusted R² = ${formatRSquared(s.adjustedRSquared)}`);
  lines.push(`  max |residual| = ${formatNumber(s.maxAbsResidualOriginal, 3)}${yUnit} (${formatNumber(s.maxRelResidualOriginal * 100, 2)} % of y)`);
  lines.push(`  AICc = ${formatNumber(s.aicc, 5)}, BIC = ${formatNumber(s.bic, 5)} (compare between orders only)`);
  lines.push(`  condition number: raw basis ${formatNumber(s.conditionRaw, 2)}, mapped basis ${formatNumber(s.conditionMapped, 2)}`);
  if (s.reducedChiSquare !== null) lines.push(`  reduced χ² = ${formatNumber(s.reducedChiSquare, 3)} (p = ${formatP(s.chiSquareP)})`);
  if (fit.lackOfFit) lines.push(`  lack-of-fit F = ${formatNumber(fit.lackOfFit.f, 3)} (p = ${formatP(fit.lackOfFit.p)})`);
  if (fit.runsTest) lines.push(`  residual sign runs: ${fit.runsTest.runs} (expected ${formatNumber(fit.runsTest.expectedRuns, 3)}, p = ${formatP(fit.runsTest.p)})`);
  lines.push(`  solver: ${fit.method.solver}${fit.method.refinement === 'exact-rational' ? ', coefficients certified in exact rational arithmetic' : ''}`);
  if (selection) {
    lines.push('');
    lines.push(`Order table (s² ${unit === '' ? 'in y²' : unit.startsWith('weighted') ? 'weighted, in units of σ²' : unit === 'in ln y' ? 'in (ln y)²' : `in (${unit})²`}):`);
    lines.push(`  ${pad('m', 4)}${pad('s²', 14)}${pad('adj. R²', 14)}${pad('AICc', 12)}${pad('BIC', 12)}${pad('LOO RMSE', 14)}p (to m+1)`);
    for (const row of selection.orders) {
      const mark = row.order === record.order ? '*' : ' ';
      lines.push(`${mark} ${pad(String(row.order), 4)}${pad(formatNumber(row.residualVariance, 4), 14)}${pad(formatRSquared(row.adjustedRSquared), 14)}${pad(formatNumber(row.aicc, 5), 12)}${pad(formatNumber(row.bic, 5), 12)}${pad(formatNumber(row.looRmse, 4), 14)}${formatP(row.pToNext)}`);
    }
  }
  lines.push('');
  lines.push('Check values (evaluate your copy of the equation here): the printed equation must agree within the');
  lines.push('tolerance (a one-digit copy error in any coefficient misses at least one); full-precision coefficients give the last column:');
  record.checkValues.forEach((check, i) => {
    const printed = record.printedCheckValues[i];
    lines.push(`  x = ${pad(`${check.x}${xUnit}`, 18)} y = ${pad(`${printed ? `${printed.y} ± ${formatNumber(printed.tolerance, 1)}` : '—'}${yUnit}`, 40)} full precision: ${check.y}${yUnit}`);
  });
  lines.push(...temperatureScaleLines(record));
  if (record.warnings.length) {
    lines.push('');
    lines.push('Warnings:');
    for (const warning of record.warnings) lines.push(`  - ${warning}`);
  }
  lines.push('');
  lines.push('Cautions:');
  for (const caution of record.cautions) lines.push(`  - ${caution}`);
  return lines.join('\n');
}
