/**
 * What the residual statistics of a fit (s, RMSE, leave-one-out RMSE, the band half-widths in the fitted space) are
 * measured in, as words to print beside them:
 *   - a weighted fit: residuals are divided by each point's stated uncertainty, so they are pure numbers,
 *     "weighted, in units of σ" (1 = scatter as stated);
 *   - a fit of ln y: "in ln y" (about a relative deviation);
 *   - otherwise y's unit, or nothing for a dimensionless y (unit "1") or an unknown one ("").
 * @example statisticUnit({ weighted: false, transformY: 'log' }, 'kPa') // => "in ln y"
 * @example statisticUnit({ weighted: false, transformY: 'identity' }, 'kg/m³') // => "kg/m³"
 */
import type { TransformY } from '../types.ts';

export function statisticUnit(fit: { readonly weighted: boolean; readonly transformY: TransformY }, yUnit: string): string {
  if (fit.weighted) return 'weighted, in units of σ';
  if (fit.transformY === 'log') return 'in ln y';
  return yUnit === '1' ? '' : yUnit;
}

/**
 * A statistic's value with its unit words: "0.0047 (in ln y)", "1.2 kPa", "0.75 (weighted, in units of σ)".
 * @example withStatisticUnit('0.0047', 'in ln y') // => "0.0047 (in ln y)"
 */
export function withStatisticUnit(text: string, unit: string): string {
  if (unit === '') return text;
  return unit.startsWith('in ') || unit.startsWith('weighted') ? `${text} (${unit})` : `${text} ${unit}`;
}
