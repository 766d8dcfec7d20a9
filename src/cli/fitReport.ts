/**
 * What `correlary fit` prints: the readable report and the --json object. Formatting only; no fitting here.
 */
import { equationPlain, formatCoefficient, formatP, type OrderSelection, type PolynomialFit } from '../core/index.ts';
import type { FitTable } from './readFitTable.ts';

export function fitJson(fit: PolynomialFit, selection: OrderSelection, file: string, table: FitTable, cautions: readonly string[]) {
  return {
    file,
    columns: table.columns,
    order: fit.order,
    criterion: selection.criterion,
    reason: selection.reason,
    rule: selection.rule,
    coefficients: fit.coefficients,
    standardErrors: fit.standardErrors,
    significantDigits: fit.significantDigits,
    residualStdDev: fit.statistics.residualStdDev,
    rSquared: fit.statistics.rSquared,
    n: fit.statistics.n,
    range: fit.range,
    transformX: fit.transformX,
    transformY: fit.transformY,
    intercept: fit.intercept,
    statistics: fit.statistics,
    confidenceIntervals: fit.confidenceIntervals,
    mapped: fit.mapped,
    checkValues: fit.checkValues,
    lackOfFit: fit.lackOfFit,
    runsTest: fit.runsTest,
    method: fit.method,
    orders: selection.orders,
    warnings: [...selection.warnings, ...fit.warnings],
    cautions,
  };
}

function pad(text: string, width: number): string {
  return text.length >= width ? text : text + ' '.repeat(width - text.length);
}

function number(value: number | null, digits = 6): string {
  return value === null || !Number.isFinite(value) ? '—' : formatCoefficient(value, digits);
}

export function fitReport(fit: PolynomialFit, selection: OrderSelection, file: string, table: FitTable, cautions: readonly string[]): string {
  const s = fit.statistics;
  const lines: string[] = [];
  lines.push(`Correlation fitted to ${file} (x = '${table.columns.x}', y = '${table.columns.y}'${table.columns.uncertainty ? `, σ = '${table.columns.uncertainty}'` : ''})`);
  lines.push('');
  lines.push(`  ${equationPlain(fit, { x: 'x', y: 'y' })}`);
  lines.push(`  valid for ${fit.range.min} ≤ x ≤ ${fit.range.max}`);
  lines.push('');
  lines.push(`Order ${fit.order}, chosen by ${selection.criterion}: ${selection.reason}`);
  lines.push('');
  lines.push('Coefficients (ascending powers; print at least the digits shown):');
  lines.push(`  ${pad('k', 4)}${pad('a_k', 26)}${pad('std. error', 14)}${pad(`${Math.round(fit.confidence * 100)} % interval`, 30)}`);
  fit.coefficients.forEach((a, k) => {
    if (k === 0 && !fit.intercept) return;
    const ci = fit.confidenceIntervals[k]!;
    lines.push(`  ${pad(String(k), 4)}${pad(formatCoefficient(a, fit.significantDigits[k]!), 26)}${pad(number(fit.standardErrors[k]!, 3), 14)}[${number(ci[0], 4)}, ${number(ci[1], 4)}]`);
  });
  lines.push('');
  lines.push('Statistics:');
  lines.push(`  n = ${s.n}, free parameters = ${s.parameters}, residual dof = ${s.degreesOfFreedom}`);
  lines.push(`  residual std. dev. s = ${number(s.residualStdDev)}, RMSE = ${number(s.rmse)}, S_r = ${number(s.residualSumOfSquares)}`);
  lines.push(`  R² = ${number(s.rSquared, 10)}${s.rSquaredCentred ? '' : ' (uncentred)'}, adjusted R² = ${number(s.adjustedRSquared, 10)}`);
  lines.push(`  max |residual| = ${number(s.maxAbsResidualOriginal)} (${number(s.maxRelResidualOriginal * 100, 3)} % of y)`);
  lines.push(`  PRESS = ${number(s.press)}, leave-one-out RMSE = ${number(s.looRmse)}, AICc = ${number(s.aicc)}, BIC = ${number(s.bic)}`);
  lines.push(`  condition number: raw basis ${number(s.conditionRaw, 3)}, mapped basis ${number(s.conditionMapped, 3)}`);
  if (s.reducedChiSquare !== null) lines.push(`  reduced χ² = ${number(s.reducedChiSquare, 4)} (p = ${number(s.chiSquareP, 3)})`);
  if (fit.lackOfFit) lines.push(`  lack-of-fit F = ${number(fit.lackOfFit.f, 4)} (p = ${number(fit.lackOfFit.p, 3)})`);
  if (fit.runsTest) lines.push(`  residual sign runs: ${fit.runsTest.runs} (expected ${number(fit.runsTest.expectedRuns, 3)}, p = ${number(fit.runsTest.p, 3)})`);
  lines.push(`  solver: ${fit.method.solver}${fit.method.refinement === 'exact-rational' ? ', coefficients certified in exact rational arithmetic' : ''}`);
  lines.push('');
  lines.push('Order table:');
  lines.push(`  ${pad('m', 4)}${pad('s²', 14)}${pad('adj. R²', 14)}${pad('AICc', 12)}${pad('BIC', 12)}${pad('LOO RMSE', 14)}p (to m+1)`);
  for (const row of selection.orders) {
    const mark = row.order === fit.order ? '*' : ' ';
    lines.push(`${mark} ${pad(String(row.order), 4)}${pad(number(row.residualVariance, 4), 14)}${pad(number(row.adjustedRSquared, 6), 14)}${pad(number(row.aicc, 5), 12)}${pad(number(row.bic, 5), 12)}${pad(number(row.looRmse, 4), 14)}${row.pToNext === null ? '—' : formatP(row.pToNext)}`);
  }
  lines.push('');
  lines.push('Check values (evaluate your copy of the equation here):');
  for (const check of fit.checkValues) lines.push(`  x = ${pad(String(check.x), 22)} y = ${check.y.toPrecision(12)}`);
  const warnings = [...selection.warnings, ...fit.warnings];
  if (warnings.length) {
    lines.push('');
    lines.push('Warnings:');
    for (const warning of warnings) lines.push(`  - ${warning}`);
  }
  lines.push('');
  lines.push('Cautions:');
  for (const caution of cautions) lines.push(`  - ${caution}`);
  return lines.join('\n');
}
