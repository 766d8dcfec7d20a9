/**
 * Print the benchmark tables as markdown: headline, A by n, p90 ratio per family × n, the SNR = 1 supplement,
 * the χ² mode, and a compact README table at the end.
 */
import type { NamedCriterion } from './criteriaUnderTest.ts';
import { markdownTable, pct, ratio, summarise, type Outcome, type Summary } from './metrics.ts';

type Outcomes = readonly Map<string, Outcome[]>[];

function pooled(bucket: Map<string, Outcome[]>, family: string, sizes: readonly number[]): Outcome[] {
  return sizes.flatMap((n) => bucket.get(`${family}|${n}`) ?? []);
}

interface Headline {
  readonly a: Summary;
  readonly a8: Summary;
  readonly b: Summary;
  readonly c1: Summary;
  readonly c2: Summary;
  readonly worstP90: number;
  readonly worstRow: string;
  readonly nearMax: number;
}

function headline(bucket: Map<string, Outcome[]>, sizes: readonly number[], families: readonly string[]): Headline {
  let worstP90 = 0;
  let worstRow = '';
  let nearMax = 0;
  for (const family of families) {
    for (const n of sizes) {
      const summary = summarise(bucket.get(`${family}|${n}`) ?? []);
      if (summary.count === 0) continue;
      if (summary.p90Ratio > worstP90) {
        worstP90 = summary.p90Ratio;
        worstRow = `${family} n=${n}`;
      }
      if (n <= 12) nearMax = Math.max(nearMax, summary.nearInterpolation);
    }
  }
  return {
    a: summarise(pooled(bucket, 'A', sizes)),
    a8: summarise(bucket.get('A|8') ?? []),
    b: summarise(pooled(bucket, 'B', sizes)),
    c1: summarise(pooled(bucket, 'C1', sizes)),
    c2: summarise(pooled(bucket, 'C2', sizes)),
    worstP90,
    worstRow,
    nearMax,
  };
}

export function report(criteria: readonly NamedCriterion[], outcomes: Outcomes, sizes: readonly number[], families: readonly string[]): void {
  const heads = criteria.map((_, index) => headline(outcomes[index]!, sizes, families));

  console.log('## Headline (all scenarios pooled)\n');
  console.log(
    markdownTable(
      ['criterion', 'A exact %', 'A over %', 'A under %', 'A med', 'A p90', 'B med', 'B p90', 'C1 exact %', 'C1 over %', 'C2 med', 'C2 p90', 'worst p90 (row)', 'near-interp max %'],
      criteria.map((named, index) => {
        const h = heads[index]!;
        return [named.label, pct(h.a.exact), pct(h.a.over), pct(h.a.under), ratio(h.a.medianRatio), ratio(h.a.p90Ratio), ratio(h.b.medianRatio), ratio(h.b.p90Ratio), pct(h.c1.exact), pct(h.c1.over), ratio(h.c2.medianRatio), ratio(h.c2.p90Ratio), `${ratio(h.worstP90)} (${h.worstRow})`, pct(h.nearMax)];
      }),
    ),
  );

  console.log('\n## A: exact-order recovery by n (%)\n');
  console.log(markdownTable(['criterion', ...sizes.map((n) => `n=${n}`), 'over % all', 'under % all'], criteria.map((named, index) => [named.label, ...sizes.map((n) => pct(summarise(outcomes[index]!.get(`A|${n}`) ?? []).exact)), pct(heads[index]!.a.over), pct(heads[index]!.a.under)])));

  for (const family of families) {
    console.log(`\n## ${family}: median / p90 RMSE ratio by n\n`);
    console.log(
      markdownTable(
        ['criterion', ...sizes.map((n) => `n=${n}`)],
        criteria.map((named, index) => [named.label, ...sizes.map((n) => {
          const s = summarise(outcomes[index]!.get(`${family}|${n}`) ?? []);
          return `${ratio(s.medianRatio)} / ${ratio(s.p90Ratio)}`;
        })]),
      ),
    );
  }

  console.log('\n## Near-interpolation picks, n − (m+1) ≤ 1 (% of fits)\n');
  const nearColumns = families.flatMap((family) => [8, 12].map((n) => `${family}|${n}`));
  console.log(markdownTable(['criterion', ...nearColumns.map((key) => key.replace('|', ' n='))], criteria.map((named, index) => [named.label, ...nearColumns.map((key) => pct(summarise(outcomes[index]!.get(key) ?? []).nearInterpolation))])));

  console.log('\n## Supplement A′ (SNR = 1): exact / under % by n\n');
  console.log(markdownTable(['criterion', ...sizes.map((n) => `n=${n}`), 'all'], criteria.map((named, index) => [named.label, ...sizes.map((n) => {
    const s = summarise(outcomes[index]!.get(`A1|${n}`) ?? []);
    return `${pct(s.exact)} / ${pct(s.under)}`;
  }), (() => { const s = summarise(pooled(outcomes[index]!, 'A1', sizes)); return `${pct(s.exact)} / ${pct(s.under)}`; })()])));

  const chiIndices = criteria.flatMap((named, index) => (named.criterion?.requiresUncertainty ? [index] : []));
  if (chiIndices.length > 0) {
    console.log('\n## χ² mode (σ stated: true σ for A and B, RMS rounding σ for C1 and C2)\n');
    console.log(markdownTable(['criterion', 'family', 'exact %', 'over %', 'under %', 'med ratio', 'p90 ratio', ...sizes.map((n) => `exact n=${n}`)], chiIndices.flatMap((index) => families.map((family) => {
      const bucket = outcomes[index]!;
      const s = summarise(pooled(bucket, family, sizes));
      return [criteria[index]!.label, family, pct(s.exact), pct(s.over), pct(s.under), ratio(s.medianRatio), ratio(s.p90Ratio), ...sizes.map((n) => pct(summarise(bucket.get(`${family}|${n}`) ?? []).exact))];
    }))));
  }

  console.log('\n## README table\n');
  console.log(
    markdownTable(
      ['criterion', 'A exact %', 'A exact n=8', 'A over %', 'B median / p90 ratio', 'C1 exact %', 'C2 median / p90', 'worst p90 (family × n)', 'near-interp max %'],
      criteria.map((named, index) => {
        const h = heads[index]!;
        return [named.isDefault ? `**${named.label}**` : named.label, pct(h.a.exact), pct(h.a8.exact), pct(h.a.over), `${ratio(h.b.medianRatio)} / ${ratio(h.b.p90Ratio)}`, pct(h.c1.exact), `${ratio(h.c2.medianRatio)} / ${ratio(h.c2.p90Ratio)}`, `${ratio(h.worstP90)} (${h.worstRow})`, pct(h.nearMax)];
      }),
    ),
  );
}
