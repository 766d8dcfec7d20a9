/**
 * The C99 header of a correlation: `int <slug>_evaluate(double x, double *y)`, returning 0 and setting *y inside the
 * validity range, 1 outside it and 2 for NaN (leaving *y untouched). Header-only (static functions); needs <math.h>
 * (link with -lm) only under a log transform. Same evaluation as pythonSnippet.ts. Comments are block comments
 * with any comment terminator in the handbook's text broken up. Where x is a temperature the header also has
 * `int <slug>_evaluate_in(double x, int scale, double *y)` with scale <SLUG>_KELVIN, _CELSIUS or _FAHRENHEIT (3 for an
 * unknown scale); `_evaluate` keeps its meaning (x in the scale of the fit).
 *
 * @example cSnippet(source).includes('_evaluate(double x, double *y)') // => true
 */
import { scaleHeaderLines, snippetScales } from './snippetScales.ts';
import { headerLines, identifier, literal } from './snippetText.ts';
import type { SnippetSource } from './snippetSource.ts';

export function cSnippet(source: SnippetSource): string {
  const r = source.record;
  const m = r.mapped;
  const name = identifier(r.slug);
  const guard = `${name.toUpperCase()}_H`;
  const u = r.transforms.x === 'identity' ? 'x' : r.transforms.x === 'reciprocal' ? '1.0 / x' : 'log(x)';
  const v = 'v';
  const y = r.transforms.y === 'log' ? `exp(${v})` : v;
  const scales = snippetScales(r);
  const scaleNames: Record<string, string> = { K: 'KELVIN', '°C': 'CELSIUS', '°F': 'FAHRENHEIT' };
  const prefix = name.toUpperCase();
  const comment = [...headerLines(source, 'C99 header'), ...scaleHeaderLines(r, `${name}_evaluate_in(x, ${prefix}_FAHRENHEIT, &y)`)]
    .map((line) => ` * ${line.replace(/\*\//g, '* /').replace(/\?\?/g, '? ?')}`.trimEnd())
    .join('\n');
  const coefficients = m.coefficients.map((value) => literal(value ?? 0));
  const horner = `    v = 0.0;
    for (k = ${coefficients.length - 1}; k >= 0; k--) v = v * t + b[k];
    *y = ${y};
    return 0;
}`;
  const nativeOnly = `static int ${name}_evaluate(double x, double *y)
{
    static const double b[${coefficients.length}] = { ${coefficients.join(', ')} };
    double t, v;
    int k;
    if (x != x) return 2;
    if (x < ${name}_x_min || x > ${name}_x_max) return 1;
    t = (${u} - ${literal(m.center!)}) / ${literal(m.halfWidth!)};
${horner}
`;
  const withScales =
    scales === null
      ? ''
      : `${scales.map((entry, i) => `#define ${prefix}_${scaleNames[entry.scale]} ${i}`).join('\n')}

static int ${name}_evaluate_in(double x, int scale, double *y)
{
    /* per scale: x_min, x_max, center, half-width */
    static const double s[${scales.length}][4] = { ${scales.map((entry) => `{ ${[entry.min, entry.max, entry.center, entry.halfWidth].map(literal).join(', ')} }`).join(', ')} };
    static const double b[${coefficients.length}] = { ${coefficients.join(', ')} };
    double t, v;
    int k;
    if (scale < 0 || scale > ${scales.length - 1}) return 3;
    if (x != x) return 2;
    if (x < s[scale][0] || x > s[scale][1]) return 1;
    t = (x - s[scale][2]) / s[scale][3];
${horner}

static int ${name}_evaluate(double x, double *y)
{
    return ${name}_evaluate_in(x, ${prefix}_${scaleNames[scales.find((entry) => entry.native)!.scale]}, y);
}
`;
  return `/*
${comment}
 *
 * int ${name}_evaluate(double x, double *y): returns 0 and sets *y inside the validity range,
 * 1 when x is outside it and 2 when x is NaN (then *y is left unchanged).${scales === null ? '' : `
 * int ${name}_evaluate_in(double x, int scale, double *y): the same with x in ${prefix}_KELVIN,
 * ${prefix}_CELSIUS or ${prefix}_FAHRENHEIT (3 for an unknown scale).`}
 */
#ifndef ${guard}
#define ${guard}
${r.transforms.x === 'log' || r.transforms.y === 'log' ? '#include <math.h>\n' : ''}
static const double ${name}_x_min = ${literal(r.range.min)};
static const double ${name}_x_max = ${literal(r.range.max)};

${scales === null ? nativeOnly : withScales}
#endif /* ${guard} */
`;
}
