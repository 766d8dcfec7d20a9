/**
 * The fitted variables in words: u (the transformed x) and v (the transformed y), as plain text or TeX. One place
 * for the wording, used by the equations, the pages, the command line and the exports.
 */
import type { TransformX, TransformY } from '../types.ts';

/**
 * u as text: "T", "1/T" or "ln(T)" (TeX: "T", "1/T", "\ln T").
 * @example transformedXText('reciprocal', 'T') // => "1/T"
 * @example transformedXText('log', 'T', 'tex') // => "\\ln T"
 */
export function transformedXText(transform: TransformX, symbol: string, style: 'plain' | 'tex' = 'plain'): string {
  if (transform === 'reciprocal') return `1/${symbol}`;
  if (transform === 'log') return style === 'tex' ? `\\ln ${symbol}` : `ln(${symbol})`;
  return symbol;
}

/**
 * v as text: "p" or "ln(p)" (TeX: "p", "\ln p").
 * @example transformedYText('log', 'p') // => "ln(p)"
 */
export function transformedYText(transform: TransformY, symbol: string, style: 'plain' | 'tex' = 'plain'): string {
  if (transform === 'log') return style === 'tex' ? `\\ln ${symbol}` : `ln(${symbol})`;
  return symbol;
}
