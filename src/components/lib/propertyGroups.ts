/**
 * Correlations grouped for the property pages: by canonical property key (propertyKey), then, within a property,
 * by the units of x and y (only curves in the same units share a plot), with each correlation's curve and
 * prediction band sampled at build time and the pairwise comparison of sources of the same material where their
 * ranges overlap.
 */
import { overlapComparison, type CurveRow, type OverlapComparison } from '../../render/index.ts';
import { builtPropertyCurve } from './builtPropertyCurve.ts';
import { fitSummaryOf, type CorrelationEntry } from './entryView.ts';
import { propertyKey } from './propertyKey.ts';
import { propertyCurve } from './propertyCurve.ts';

export interface PropertyGroup {
  readonly key: string;
  /** The most common name among its correlations. */
  readonly name: string;
  readonly entries: readonly CorrelationEntry[];
}

export interface PlotSeries {
  readonly label: string;
  readonly entry: CorrelationEntry;
  readonly curve: readonly CurveRow[];
}

export interface PairComparison {
  readonly a: PlotSeries;
  readonly b: PlotSeries;
  readonly comparison: OverlapComparison;
}

export interface UnitGroup {
  readonly propertyUnit: string;
  readonly variableUnit: string;
  readonly variableName: string;
  readonly series: readonly PlotSeries[];
  /** Same-material pairs whose ranges overlap. */
  readonly pairs: readonly PairComparison[];
  /** Same-material pairs whose ranges do not overlap, for the record. */
  readonly disjoint: readonly (readonly [PlotSeries, PlotSeries])[];
}

function mostCommon(values: readonly string[]): string {
  const counts = new Map<string, number>();
  for (const value of values) counts.set(value, (counts.get(value) ?? 0) + 1);
  return [...counts.entries()].sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))[0]![0];
}

/**
 * Every property with its correlations, sorted by name.
 * @example propertyGroups(entries).map((group) => group.key) // => ["density", "dynamic-viscosity", …]
 */
export function propertyGroups(entries: readonly CorrelationEntry[]): PropertyGroup[] {
  const byKey = new Map<string, CorrelationEntry[]>();
  for (const entry of entries) {
    const key = propertyKey(entry.meta.property);
    byKey.set(key, [...(byKey.get(key) ?? []), entry]);
  }
  return [...byKey.entries()]
    .map(([key, members]) => ({
      key,
      name: mostCommon(members.map((entry) => entry.meta.property.name)),
      entries: [...members].sort((a, b) => a.meta.title.localeCompare(b.meta.title)),
    }))
    .sort((a, b) => a.name.localeCompare(b.name));
}

/**
 * The plots of one property: one per pair of units, numbering the series 1, 2, … across the page. Each curve comes
 * from the files written in a build (builtPropertyCurve.ts: the caller waits for them), else is computed here.
 * @example unitGroups(group)[0].series.length // => 2
 */
export function unitGroups(group: PropertyGroup): UnitGroup[] {
  const byUnits = new Map<string, CorrelationEntry[]>();
  for (const entry of group.entries) {
    if (entry.fit === null) continue;
    const units = `${entry.meta.property.unit}\u0000${entry.meta.variable.unit}`;
    byUnits.set(units, [...(byUnits.get(units) ?? []), entry]);
  }
  let label = 0;
  return [...byUnits.values()].map((members) => {
    const series = members.map((entry) => ({ label: String(++label), entry, curve: builtPropertyCurve(entry) ?? propertyCurve(fitSummaryOf(entry)!, entry.range) }));
    const pairs: PairComparison[] = [];
    const disjoint: [PlotSeries, PlotSeries][] = [];
    for (let i = 0; i < series.length; i++) {
      for (let j = i + 1; j < series.length; j++) {
        const a = series[i]!;
        const b = series[j]!;
        if (a.entry.meta.material.name !== b.entry.meta.material.name) continue;
        const comparison = overlapComparison(a.curve, b.curve);
        if (comparison === null) disjoint.push([a, b]);
        else pairs.push({ a, b, comparison });
      }
    }
    const first = members[0]!;
    return { propertyUnit: first.meta.property.unit, variableUnit: first.meta.variable.unit, variableName: first.meta.variable.name, series, pairs, disjoint };
  });
}
