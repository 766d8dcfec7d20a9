/**
 * Accumulate and summarise benchmark outcomes: exact/over/under rates against the true degree (A, C1) or the
 * oracle order (B, C2), RMSE ratios (chosen OOS RMSE over the true-degree fit's, or over the best order's),
 * medians and 90th percentiles pooled over fits, and the near-interpolation share n − (m + 1) ≤ 1.
 */

export interface Outcome {
  readonly order: number;
  readonly target: number;
  readonly ratio: number;
  readonly residualDof: number;
}

export interface Summary {
  readonly count: number;
  readonly exact: number;
  readonly over: number;
  readonly under: number;
  readonly medianRatio: number;
  readonly p90Ratio: number;
  readonly nearInterpolation: number;
}

/** Linear-interpolation quantile of a sorted array (the common "type 7" definition). */
export function quantile(sorted: Float64Array, probability: number): number {
  if (sorted.length === 0) return Number.NaN;
  const position = (sorted.length - 1) * probability;
  const below = Math.floor(position);
  const above = Math.min(below + 1, sorted.length - 1);
  return sorted[below]! + (sorted[above]! - sorted[below]!) * (position - below);
}

export function summarise(outcomes: readonly Outcome[]): Summary {
  const count = outcomes.length;
  let exact = 0;
  let over = 0;
  let under = 0;
  let near = 0;
  const ratios = new Float64Array(count);
  outcomes.forEach((outcome, i) => {
    if (outcome.order === outcome.target) exact++;
    else if (outcome.order > outcome.target) over++;
    else under++;
    if (outcome.residualDof <= 1) near++;
    ratios[i] = outcome.ratio;
  });
  ratios.sort();
  const percent = (value: number): number => (count > 0 ? (100 * value) / count : Number.NaN);
  return {
    count,
    exact: percent(exact),
    over: percent(over),
    under: percent(under),
    medianRatio: quantile(ratios, 0.5),
    p90Ratio: quantile(ratios, 0.9),
    nearInterpolation: percent(near),
  };
}

/** Format a percentage with one decimal. */
export function pct(value: number): string {
  return Number.isNaN(value) ? '–' : value.toFixed(1);
}

/** Format a ratio: 3 decimals below 10 (targets such as 1.10 need the third), 3 significant digits above. */
export function ratio(value: number): string {
  if (Number.isNaN(value)) return '–';
  return value < 10 ? value.toFixed(3) : String(Number(value.toPrecision(3)));
}

/** A markdown table. */
export function markdownTable(header: readonly string[], rows: readonly (readonly string[])[], alignRight = true): string {
  const separator = header.map((_, i) => (i === 0 || !alignRight ? '---' : '---:'));
  return [header, separator, ...rows].map((cells) => `| ${cells.join(' | ')} |`).join('\n');
}
