/**
 * The rows of a page's statistics table (StatisticsTable.astro) as HTML: the statistic's name, its value and p
 * where it has one, written as the component's one-line row template would (no whitespace between tags), every
 * text escaped as Astro escapes an expression (htmlText.ts). Missing values (null, NaN) print as "—". Built with the
 * downloads (pageHtml.ts) or, without them, by the component.
 */
import { formatNumber, formatP, formatRSquared } from './formatNumber.ts';
import { htmlText } from './htmlText.ts';
import type { PolynomialFit } from './entryView.ts';

/**
 * @param unit the unit of y, for the statistics measured in the user's units
 * @example statisticsRowsHtml(fit, 'K').startsWith('<tr><td>n (points used)</td>') // => true
 */
export function statisticsRowsHtml(fit: Pick<PolynomialFit, 'statistics' | 'transformY' | 'weighted' | 'lackOfFit' | 'runsTest'>, unit: string): string {
  const s = fit.statistics;
  const space = fit.transformY === 'log' ? ' (in ln y)' : fit.weighted ? ' (weighted)' : '';
  const rows: [string, string, string?][] = [
    ['n (points used)', String(s.n)],
    ['free coefficients', String(s.parameters)],
    ['degrees of freedom', String(s.degreesOfFreedom)],
    [`residual standard deviation s${space}`, formatNumber(s.residualStdDev)],
    [s.rSquaredCentred ? 'R²' : 'R² (uncentred, no intercept)', formatRSquared(s.rSquared)],
    ['adjusted R²', formatRSquared(s.adjustedRSquared)],
    [`RMSE${space}`, formatNumber(s.rmse)],
    [`largest |residual| (${unit})`, formatNumber(s.maxAbsResidualOriginal)],
    ['largest |relative residual|', formatNumber(s.maxRelResidualOriginal, 3)],
    [`PRESS${space}`, formatNumber(s.press)],
    [`leave-one-out RMSE${space}`, formatNumber(s.looRmse)],
    ['AICc', formatNumber(s.aicc, 5)],
    ['BIC', formatNumber(s.bic, 5)],
    ['condition number, power basis of u', formatNumber(s.conditionRaw, 3)],
    ['condition number, mapped basis of ξ', formatNumber(s.conditionMapped, 3)],
  ];
  if (s.reducedChiSquare !== null) {
    rows.push(['reduced χ² (stated uncertainties)', formatNumber(s.reducedChiSquare)]);
    rows.push(['p of χ²', formatP(s.chiSquareP)]);
  }
  if (fit.lackOfFit) {
    const test = fit.lackOfFit;
    rows.push(['lack-of-fit F (pure error from repeated x)', `${formatNumber(test.f)} on (${test.lackOfFitDof}, ${test.pureErrorDof}) dof`, formatP(test.p)]);
  }
  if (fit.runsTest) {
    const test = fit.runsTest;
    rows.push(['runs test on residual signs', `${test.runs} runs (${formatNumber(test.expectedRuns, 3)} expected), z = ${formatNumber(test.z, 3)}`, formatP(test.p)]);
  }
  let html = '';
  for (const [name, value, p] of rows) html += `<tr><td>${htmlText(name)}</td><td class="num mono">${htmlText(value)}</td><td class="num mono">${htmlText(p ?? '')}</td></tr>`;
  return html;
}
