/**
 * Accuracy on the NIST StRD linear least-squares suite (polynomial and no-intercept problems). Every certified
 * quantity — each coefficient, its standard deviation, the residual standard deviation and R² — must reach
 * LRE ≥ 12 (12 correct significant digits). Certified values: NIST StRD, copied in test/fixtures/nist-strd.
 */
import { describe, expect, it } from 'vitest';
import { fitPolynomial } from '../../src/core/index.ts';
import { lre } from '../helpers/lre.ts';
import { nistDatasets, powerOf } from '../helpers/nist.ts';

const THRESHOLD = 12;

function certifiedLres(name: string, exact: 'auto' | 'off') {
  const dataset = nistDatasets[name]!;
  const data = Object.freeze({ x: Object.freeze([...dataset.data.x]), y: Object.freeze([...dataset.data.y]) });
  const fit = fitPolynomial(data, { order: dataset.model.degree, intercept: dataset.model.intercept, exact });
  const rows: { quantity: string; lre: number }[] = [];
  for (const parameter of dataset.certified.parameters) {
    const k = powerOf(parameter.name);
    rows.push({ quantity: `${parameter.name} estimate`, lre: lre(fit.coefficients[k]!, parameter.estimate.value!) });
    rows.push({ quantity: `${parameter.name} std. dev.`, lre: lre(fit.standardErrors[k]!, parameter.standardDeviation.value!) });
  }
  rows.push({ quantity: 'residual std. dev.', lre: lre(fit.statistics.residualStdDev, dataset.certified.residualStandardDeviation.value!) });
  rows.push({ quantity: 'R²', lre: lre(fit.statistics.rSquared, dataset.certified.rSquared.value!) });
  return { fit, rows };
}

describe('fitPolynomial on NIST StRD certified values', () => {
  for (const name of Object.keys(nistDatasets)) {
    it(`fitPolynomial(${name}) reaches LRE ≥ ${THRESHOLD} on every certified quantity`, () => {
      const { fit, rows } = certifiedLres(name, 'auto');
      expect(fit.method.refinement).toBe('exact-rational');
      const failing = rows.filter((row) => !(row.lre >= THRESHOLD));
      expect(failing).toEqual([]);
    });
  }

  it('fitPolynomial without exact certification still reaches LRE ≥ 9 on the hardest shared problems (Wampler 1–3)', () => {
    // The floating-point path alone (mapped QR + one refinement step) is what transformed fits rely on.
    for (const name of ['Wampler1', 'Wampler2', 'Wampler3']) {
      const { fit, rows } = certifiedLres(name, 'off');
      expect(fit.method.refinement).toBe('none');
      const estimates = rows.filter((row) => row.quantity.endsWith('estimate'));
      expect(Math.min(...estimates.map((row) => row.lre))).toBeGreaterThanOrEqual(9);
    }
  });
});
