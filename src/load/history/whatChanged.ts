/**
 * What changed between two versions of a correlation (the approved one and today's): data rows added, removed or
 * changed, options changed, and the largest change of the curve over the validity range, in units of y and
 * relative to the residual standard deviation s of today's fit.
 *
 * Rows are matched by x (as the decimal it prints as); repeated x values are paired in file order. The curves are
 * compared on 401 evenly spaced x over the part of today's validity range that both versions cover, each evaluated
 * from its full-precision mapped form.
 */
import { evaluateFit, type PolynomialFit } from '../../core/index.ts';
import type { DataPoint } from '../../schema/index.ts';
import { canonicalTexts } from '../review/fingerprint.ts';
import type { LoadedCorrelation } from '../types.ts';

export interface RowChange {
  readonly x: number;
  /** y before and after; undefined for a row that was added (before) or removed (after). */
  readonly before: number | undefined;
  readonly after: number | undefined;
  /** Whether the row is used in the fit, before and after (false when excluded or absent). */
  readonly usedBefore: boolean;
  readonly usedAfter: boolean;
}

export interface WhatChanged {
  readonly rowsAdded: number;
  readonly rowsRemoved: number;
  readonly rowsChanged: number;
  /** The changed rows (added, removed, changed in y or uncertainty, or newly excluded or included), at most 50. */
  readonly rows: readonly RowChange[];
  /** Option lines that differ, e.g. "maxOrder: 4 → 3". */
  readonly options: readonly string[];
  /** Whether the printed coefficients (or the order) differ. */
  readonly resultChanged: boolean;
  /** Largest |y_now − y_approved| over the compared range, in y's unit, and where; null when no overlap. */
  readonly maxCurveChange: { readonly deltaY: number; readonly atX: number; readonly overS: number | null; readonly min: number; readonly max: number } | null;
}

type Side = { readonly correlation: Pick<LoadedCorrelation, 'meta' | 'used' | 'excluded' | 'points'>; readonly fit: PolynomialFit };

const key = (value: number) => String(value);

function rowsByX(side: Side): Map<string, { point: DataPoint; used: boolean }[]> {
  const excluded = new Set(side.correlation.excluded.map((point) => point.row));
  const map = new Map<string, { point: DataPoint; used: boolean }[]>();
  for (const point of side.correlation.points) {
    const list = map.get(key(point.x)) ?? [];
    list.push({ point, used: !excluded.has(point.row) });
    map.set(key(point.x), list);
  }
  return map;
}

function optionMap(side: Side): Map<string, string> {
  const lines = canonicalTexts(side.correlation, side.fit).options.split('\n').slice(1).filter(Boolean);
  const map = new Map<string, string>();
  for (const line of lines) {
    const [name, ...rest] = line.split('=');
    const value = rest.join('=');
    const previous = map.get(name!);
    map.set(name!, previous === undefined ? value : `${previous}; ${value}`);
  }
  return map;
}

/**
 * @example whatChanged(approved, current).rowsChanged // => 1 after one y was edited
 */
export function whatChanged(before: Side, after: Side): WhatChanged {
  const rows: RowChange[] = [];
  let rowsAdded = 0;
  let rowsRemoved = 0;
  let rowsChanged = 0;
  const beforeRows = rowsByX(before);
  const afterRows = rowsByX(after);
  const xs = [...new Set([...beforeRows.keys(), ...afterRows.keys()])].sort((a, b) => Number(a) - Number(b));
  for (const x of xs) {
    const was = beforeRows.get(x) ?? [];
    const now = afterRows.get(x) ?? [];
    for (let i = 0; i < Math.max(was.length, now.length); i++) {
      const old = was[i];
      const cur = now[i];
      const change = { x: Number(x), before: old?.point.y, after: cur?.point.y, usedBefore: old?.used ?? false, usedAfter: cur?.used ?? false };
      if (old === undefined) rowsAdded++;
      else if (cur === undefined) rowsRemoved++;
      else if (old.point.y !== cur.point.y || old.point.uncertainty !== cur.point.uncertainty || old.used !== cur.used) rowsChanged++;
      else continue;
      rows.push(change);
    }
  }
  const optionsBefore = optionMap(before);
  const optionsAfter = optionMap(after);
  const options: string[] = [];
  for (const name of new Set([...optionsBefore.keys(), ...optionsAfter.keys()])) {
    const was = optionsBefore.get(name) ?? '(none)';
    const now = optionsAfter.get(name) ?? '(none)';
    if (was !== now) options.push(`${name}: ${was} → ${now}`);
  }
  const beforeResult = canonicalTexts(before.correlation, before.fit).result;
  const afterResult = canonicalTexts(after.correlation, after.fit).result;
  return { rowsAdded, rowsRemoved, rowsChanged, rows: rows.slice(0, 50), options, resultChanged: beforeResult !== afterResult, maxCurveChange: curveChange(before.fit, after.fit) };
}

function curveChange(before: PolynomialFit, after: PolynomialFit): WhatChanged['maxCurveChange'] {
  const min = Math.max(before.range.min, after.range.min);
  const max = Math.min(before.range.max, after.range.max);
  if (!(min <= max)) return null;
  let deltaY = 0;
  let atX = min;
  for (let i = 0; i <= 400; i++) {
    const x = i === 400 ? max : min + ((max - min) * i) / 400;
    const delta = Math.abs(evaluateFit(after, x).y - evaluateFit(before, x).y);
    if (delta > deltaY) {
      deltaY = delta;
      atX = x;
    }
  }
  // s is in y's unit only for an unweighted fit without a y transform; otherwise no ratio is given.
  const s = after.statistics.residualStdDev;
  const overS = !after.weighted && after.transformY === 'identity' && s > 0 && Number.isFinite(s) ? deltaY / s : null;
  return { deltaY, atX, overS, min, max };
}
