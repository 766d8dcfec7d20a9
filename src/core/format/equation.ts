/**
 * The fitted equation as text: TeX for the pages (rendered by KaTeX at build time, no katex import here) and plain
 * text for the terminal. Coefficients carry the digits that significantDigits asks for.
 */
import { formatCoefficient } from './formatCoefficient.ts';
import { transformedXText, transformedYText } from './transformText.ts';
import type { PolynomialFit } from '../types.ts';

export interface EquationSymbols {
  /** Symbol of the independent variable, e.g. 'T' (TeX allowed). */
  readonly x: string;
  /** Symbol of the property, e.g. 'c_p'. */
  readonly y: string;
}

/** What an equation is written from: the coefficients with their digits and the transforms. */
export type EquationFit = Pick<PolynomialFit, 'coefficients' | 'intercept' | 'significantDigits' | 'transformX' | 'transformY'>;

/** u as a factor of a power: bare for identity, in parentheses otherwise ("(1/T)", "(\\ln T)", "ln(T)"). */
function variableFactor(fit: EquationFit, x: string, style: 'plain' | 'tex'): string {
  const text = transformedXText(fit.transformX, x, style);
  return fit.transformX === 'identity' || (style === 'plain' && fit.transformX === 'log') ? text : `(${text})`;
}

function texNumber(text: string): string {
  const match = /^(-?[\d.]+)e([+-]?\d+)$/.exec(text);
  return match ? `${match[1]}\\times10^{${Number(match[2])}}` : text;
}

/**
 * TeX of v = Σ a_k u^k, e.g. "c_p = 1.23 + 4.5\\times10^{-3}\\,T".
 * @example equationTex(fit, { x: 'T', y: 'p' }) // => "p = 1.5 - 0.25\\,(1/T)" for a₀ = 1.5, a₁ = −0.25 in u = 1/T
 */
export function equationTex(fit: PolynomialFit, symbols: EquationSymbols): string {
  const u = variableFactor(fit, symbols.x, 'tex');
  const lhs = transformedYText(fit.transformY, symbols.y, 'tex');
  const terms: string[] = [];
  fit.coefficients.forEach((a, k) => {
    if (k === 0 && !fit.intercept) return;
    const text = formatCoefficient(Math.abs(a), fit.significantDigits[k]!);
    const sign = a < 0 ? '-' : '+';
    const power = k === 0 ? '' : k === 1 ? `\\,${u}` : `\\,${u}^{${k}}`;
    terms.push(`${terms.length === 0 ? (a < 0 ? '-' : '') : ` ${sign} `}${texNumber(text)}${power}`);
  });
  return `${lhs} = ${terms.join('')}`;
}

/** Which digits a plain-text equation carries. */
export interface EquationPlainOptions {
  /**
   * `printed` (default): each coefficient with its significant digits, exactly as the page and the TeX print it;
   * `full`: the shortest decimal that reads back as the same double (every digit the fit has).
   */
  readonly digits?: 'printed' | 'full';
}

/**
 * Plain-text equation for terminals and copying, ASCII only, e.g. "y = 1.23 + 4.5e-3*x - 6.7e-6*x^2": `*` for
 * products, `^` for powers, `-` for minus, exponents as e-notation that every programming language reads.
 * @example equationPlain(fit, { x: 'T', y: 'p' }) gives "ln(p) = 1.5 - 0.25*T" for a₀ = 1.5, a₁ = −0.25 under ln y;
 * with { digits: 'full' } each coefficient is printed as String(value).
 */
export function equationPlain(fit: EquationFit, symbols: EquationSymbols, options: EquationPlainOptions = {}): string {
  const full = options.digits === 'full';
  const u = variableFactor(fit, symbols.x, 'plain');
  const lhs = transformedYText(fit.transformY, symbols.y, 'plain');
  const terms: string[] = [];
  fit.coefficients.forEach((a, k) => {
    if (k === 0 && !fit.intercept) return;
    const text = full ? String(Math.abs(a)) : formatCoefficient(Math.abs(a), fit.significantDigits[k]!);
    const sign = a < 0 ? '-' : '+';
    const power = k === 0 ? '' : k === 1 ? `*${u}` : `*${u}^${k}`;
    terms.push(`${terms.length === 0 ? (a < 0 ? '-' : '') : ` ${sign} `}${text}${power}`);
  });
  return `${lhs} = ${terms.join('')}`;
}
