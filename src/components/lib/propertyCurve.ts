/**
 * A correlation's curve on the property pages (src/pages/properties/[key].astro, propertyGroups.ts): its fit and
 * 95 % bands sampled at PROPERTY_CURVE_SAMPLES points over its validity range, to five significant digits. It
 * depends on the correlation alone, so the files workers compute it once beside the downloads (folderExtras.ts) and
 * write it as PROPERTY_CURVE_FILE (packed JSON, src/load/packedJson.ts: every double back bit for bit, null and −0
 * included); the property pages read it (builtPropertyCurve.ts) instead of evaluating the bands of every correlation
 * on the thread that renders the pages, and compute it here when it is not there (`astro dev`, tests).
 */
import { fromPackedJson, toPackedJson } from '../../load/packedJson.ts';
import { curveRows, type CurveRow } from '../../render/index.ts';
import type { PolynomialFit } from './entryView.ts';

/** Curve samples per correlation on a property page: enough for a smooth curve, small enough for many sources. */
export const PROPERTY_CURVE_SAMPLES = 60;

/** File name in a correlation's folder of downloads; the leading dot keeps it out of the output. */
export const PROPERTY_CURVE_FILE = '.property-curve.txt';

/**
 * @example propertyCurve(fit, entry.range).length // => 60
 */
export function propertyCurve(fit: PolynomialFit, range: { readonly min: number; readonly max: number }): CurveRow[] {
  return curveRows(fit, range, PROPERTY_CURVE_SAMPLES, 5);
}

/**
 * The file's text: the rows' six columns one after another, as one packed array.
 * @example readPropertyCurve(propertyCurveText(rows)) // => rows
 */
export function propertyCurveText(rows: readonly CurveRow[]): string {
  return toPackedJson(rows.flat());
}

/** The rows of a propertyCurveText text, or undefined when it is not one. */
export function readPropertyCurve(text: string): CurveRow[] | undefined {
  let flat: unknown;
  try {
    flat = fromPackedJson(text);
  } catch {
    return undefined;
  }
  if (!Array.isArray(flat) || flat.length !== 6 * PROPERTY_CURVE_SAMPLES) return undefined;
  const rows: CurveRow[] = [];
  for (let i = 0; i < flat.length; i += 6) rows.push(flat.slice(i, i + 6) as unknown as CurveRow);
  return rows;
}
