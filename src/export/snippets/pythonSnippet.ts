/**
 * The Python module of a correlation (standard library only): `evaluate(x)` and `prediction_interval(x)`, both
 * raising ValueError outside the validity range. Where x is a temperature both take `scale="K" | "°C" | "°F"` (default
 * the scale of the fit): the range and the mapped variable of that scale are used. Evaluation: transform x, map to t, Horner's rule on the mapped
 * coefficients at full precision, back-transform y. The 95 % prediction interval is v ± q·√(φᵀΣφ + σ_new(x)²)
 * in the fitted space (NIST/SEMATECH e-Handbook §4.5.2.2), taken back through the y transform.
 *
 * @example pythonSnippet(source).includes('def evaluate(x') // => true
 */
import { scaleHeaderLines, snippetScales } from './snippetScales.ts';
import { headerLines, identifier, literal } from './snippetText.ts';
import type { SnippetSource } from './snippetSource.ts';

const list = (values: readonly number[]) => `(${values.map(literal).join(', ')}${values.length === 1 ? ',' : ''})`;

export function pythonSnippet(source: SnippetSource): string {
  const r = source.record;
  const m = r.mapped;
  const covariance = m.covariance.map((row) => list(row.map((value) => value ?? 0))).join(',\n    ');
  const u = r.transforms.x === 'identity' ? 'x' : r.transforms.x === 'reciprocal' ? '1.0 / x' : 'math.log(x)';
  const back = r.transforms.y === 'log' ? 'math.exp' : '';
  const scales = snippetScales(r);
  const native = scales?.find((entry) => entry.native)?.scale;
  const scaleTable =
    scales === null
      ? ''
      : `NATIVE_SCALE = "${native}"
# scale: (x_min, x_max, center, half_width) in that scale
SCALES = {${scales.map((entry) => `"${entry.scale}": ${list([entry.min, entry.max, entry.center, entry.halfWidth])}`).join(', ')}}
`;
  const t =
    scales === null
      ? `def _t(x):
    if not isinstance(x, (int, float)) or isinstance(x, bool) or math.isnan(x):
        raise ValueError("x must be a number")
    if x < X_MIN or x > X_MAX:
        raise ValueError("x = %r is outside the validity range [%r, %r]; the correlation is valid only inside it" % (x, X_MIN, X_MAX))
    return (${u} - CENTER) / HALF_WIDTH`
      : `def _t(x, scale=NATIVE_SCALE):
    if not isinstance(x, (int, float)) or isinstance(x, bool) or math.isnan(x):
        raise ValueError("x must be a number")
    if scale not in SCALES:
        raise ValueError("scale must be one of %s, got %r" % (", ".join(SCALES), scale))
    x_min, x_max, center, half_width = SCALES[scale]
    if x < x_min or x > x_max:
        raise ValueError("x = %r %s is outside the validity range [%r, %r] %s; the correlation is valid only inside it" % (x, scale, x_min, x_max, scale))
    return (x - center) / half_width`;
  const arg = scales === null ? 'x' : 'x, scale=NATIVE_SCALE';
  const call = scales === null ? 'x' : 'x, scale';
  const nativeX = scales === null ? 'x' : 'CENTER + HALF_WIDTH * t';
  return `${[...headerLines(source, 'Python module'), ...scaleHeaderLines(r, 'evaluate(x, scale="°F")')].map((line) => `# ${line}`.trimEnd()).join('\n')}
"""Correlation ${identifier(r.slug)}: evaluate(x) and prediction_interval(x); see the comments above."""
import math

X_MIN = ${literal(r.range.min)}
X_MAX = ${literal(r.range.max)}
CENTER = ${literal(m.center!)}
HALF_WIDTH = ${literal(m.halfWidth!)}
# Mapped coefficients b_0..b_m and their covariance.
B = ${list(m.coefficients.map((value) => value ?? 0))}
COVARIANCE = (
    ${covariance},
)
QUANTILE = ${Number.isFinite(source.quantile) ? literal(source.quantile) : 'float("nan")'}
NOISE_X = ${list(source.profileX)}
NOISE_SD = ${list(source.profileSd)}
${scaleTable}

${t}


def _horner(t):
    v = 0.0
    for b in reversed(B):
        v = v * t + b
    return v


def evaluate(${arg}):
    """y at x; raises ValueError outside the validity range."""
    return ${back}(_horner(_t(${call})))


def _noise_sd(x):
    if x <= NOISE_X[0]:
        return NOISE_SD[0]
    for i in range(1, len(NOISE_X)):
        if x <= NOISE_X[i]:
            w = (x - NOISE_X[i - 1]) / (NOISE_X[i] - NOISE_X[i - 1])
            return NOISE_SD[i - 1] + w * (NOISE_SD[i] - NOISE_SD[i - 1])
    return NOISE_SD[-1]


def prediction_interval(${arg}):
    """(low, high): the 95 % prediction interval of a new observation at x; raises ValueError outside the range."""
    t = _t(${call})
    phi = [t ** k for k in range(len(B))]
    var_fit = sum(phi[j] * COVARIANCE[j][k] * phi[k] for j in range(len(B)) for k in range(len(B)))
    half = QUANTILE * math.sqrt(max(0.0, var_fit) + _noise_sd(${nativeX}) ** 2)
    v = _horner(t)
    return (${back}(v - half), ${back}(v + half))
`;
}
