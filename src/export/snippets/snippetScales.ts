/**
 * The temperature scales a snippet accepts its x in, from the record's temperatureScales: per scale its validity
 * range and the centre and half-width of the mapped variable in that scale (the mapped coefficients are the same in
 * every scale, so a snippet evaluates t = (x − center_S)/halfWidth_S and the same Horner sum). Both are the exact
 * conversions of the native ones, rounded once (src/core/temperature/). Null when x is not a temperature.
 *
 * @example snippetScales(record)?.map((scale) => scale.scale) // => ['K', '°C', '°F'] for a fit in kelvin
 */
import type { CorrelationRecord } from '../correlationRecord.ts';

export interface SnippetScale {
  readonly scale: 'K' | '°C' | '°F';
  readonly native: boolean;
  readonly min: number;
  readonly max: number;
  readonly center: number;
  readonly halfWidth: number;
}

export function snippetScales(record: CorrelationRecord): SnippetScale[] | null {
  const scales = record.temperatureScales;
  if (scales === null || scales === undefined) return null;
  return scales.scales.map((form) => ({
    scale: form.scale,
    native: form.native,
    min: form.range.min!,
    max: form.range.max!,
    center: form.mapped.center!,
    halfWidth: form.mapped.halfWidth!,
  }));
}

/**
 * One comment line on the scales: how to ask for one and each other scale's validity range (each scale's equation
 * and check values are in the record's temperatureScales, e.g. coefficients.json).
 */
export function scaleHeaderLines(record: CorrelationRecord, how: string): string[] {
  const scales = record.temperatureScales;
  if (scales === null || scales === undefined) return [];
  const others = scales.scales.filter((form) => !form.native).map((form) => `${form.range.min} to ${form.range.max} ${form.scale}`);
  return [`Temperature scales: x may also be ${others.join(' or ')}: ${how} (default ${scales.native}); exact re-expression, equations and check values per scale in coefficients.json.`];
}
