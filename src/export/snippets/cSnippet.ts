/**
 * The C99 header of a correlation: `int <slug>_evaluate(double x, double *y)`, returning 0 and setting *y inside the
 * validity range, 1 outside it and 2 for NaN (leaving *y untouched). Header-only (static functions); needs <math.h>
 * (link with -lm) only under a log transform. Same evaluation as pythonSnippet.ts. Comments are block comments
 * with any comment terminator in the handbook's text broken up.
 *
 * @example cSnippet(source).includes('_evaluate(double x, double *y)') // => true
 */
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
  const comment = headerLines(source, 'C99 header')
    .map((line) => ` * ${line.replace(/\*\//g, '* /').replace(/\?\?/g, '? ?')}`.trimEnd())
    .join('\n');
  const coefficients = m.coefficients.map((value) => literal(value ?? 0));
  return `/*
${comment}
 *
 * int ${name}_evaluate(double x, double *y): returns 0 and sets *y inside the validity range,
 * 1 when x is outside it and 2 when x is NaN (then *y is left unchanged).
 */
#ifndef ${guard}
#define ${guard}
${r.transforms.x === 'log' || r.transforms.y === 'log' ? '#include <math.h>\n' : ''}
static const double ${name}_x_min = ${literal(r.range.min)};
static const double ${name}_x_max = ${literal(r.range.max)};

static int ${name}_evaluate(double x, double *y)
{
    static const double b[${coefficients.length}] = { ${coefficients.join(', ')} };
    double t, v;
    int k;
    if (x != x) return 2;
    if (x < ${name}_x_min || x > ${name}_x_max) return 1;
    t = (${u} - ${literal(m.center!)}) / ${literal(m.halfWidth!)};
    v = 0.0;
    for (k = ${coefficients.length - 1}; k >= 0; k--) v = v * t + b[k];
    *y = ${y};
    return 0;
}

#endif /* ${guard} */
`;
}
