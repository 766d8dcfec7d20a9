/**
 * The cautions that go with every published correlation, page and download. One wording, kept here so the CLI,
 * the pages and the coefficient files cannot drift apart.
 */
export const CAUTIONS: readonly string[] = [
  'Valid only inside the fitted range; outside it the correlation is an extrapolation and may be badly wrong.',
  'Not for design use without checking against the applicable codes and standards and the judgement of a qualified engineer.',
];

/**
 * The cautions for one fit, naming its range, e.g. "Valid only for 250 K ≤ T ≤ 900 K (the fitted range); …".
 * @param unit unit of the independent variable ('' for none)
 * @param variable its symbol as plain text (default 'x')
 * @example cautionsFor({ min: 250, max: 400 }, 'K', 'T')[0] // => "Valid only for 250 K ≤ T ≤ 400 K (the fitted range); outside it …"
 */
export function cautionsFor(range: { readonly min: number; readonly max: number }, unit = '', variable = 'x'): string[] {
  const suffix = unit ? ` ${unit}` : '';
  return [
    `Valid only for ${range.min}${suffix} ≤ ${variable} ≤ ${range.max}${suffix} (the fitted range); outside it the correlation is an extrapolation and may be badly wrong.`,
    CAUTIONS[1]!,
  ];
}
