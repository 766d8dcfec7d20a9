/**
 * Log relative error, the accuracy measure of the NIST StRD reports: roughly the number of correct significant
 * digits. LRE = −log₁₀(|q − c|/|c|), or −log₁₀|q| when c = 0; capped at 15 (the certified digits), floored at 0.
 * Source: NIST StRD documentation, and B. D. McCullough, "Assessing the reliability of statistical software",
 * The American Statistician 52 (1998) 358–366.
 */
export function lre(estimate: number, certified: number): number {
  if (estimate === certified) return 15;
  const error = certified === 0 ? Math.abs(estimate) : Math.abs(estimate - certified) / Math.abs(certified);
  if (!Number.isFinite(error)) return 0;
  return Math.max(0, Math.min(15, -Math.log10(error)));
}
