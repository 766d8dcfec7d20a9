/**
 * A TeX symbol as plain text for downloads and terminals: commands lose their backslash, groups their braces.
 * @example plainSymbol('\\varepsilon_{th}') // => "varepsilon_th"
 * @example plainSymbol('\\Delta h_{lv}') // => "Delta h_lv"
 */
export function plainSymbol(tex: string): string {
  return tex.replace(/\\[,;:! ]/g, ' ').replace(/\\([A-Za-z]+)/g, '$1').replace(/[{}]/g, '').replace(/\s+/g, ' ').trim();
}
