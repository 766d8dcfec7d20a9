/**
 * The read-out's pure parts: the symbol and unit of an axis title, and where the read-out box goes so that it
 * stays inside the plot (expected positions worked out by hand).
 */
import { describe, expect, it } from 'vitest';
import { placeBeside, quantityOf } from '../../src/client/chartHover.ts';

describe('quantityOf', () => {
  it('quantityOf(title) reads "name, symbol (unit)" as chartData.ts writes it', () => {
    expect(quantityOf('temperature, T (K)')).toEqual({ symbol: 'T', unit: ' K' });
    expect(quantityOf('specific heat capacity, c_p (J/(kg·K))')).toEqual({ symbol: 'c_p', unit: ' J/(kg·K)' });
    expect(quantityOf('ln of vapour pressure, ln(p_σ / kPa)')).toEqual({ symbol: 'ln(p_σ / kPa)', unit: '' });
    expect(quantityOf('reciprocal temperature, 1/T (1/K)')).toEqual({ symbol: '1/T', unit: ' 1/K' });
    expect(quantityOf('strain, ε')).toEqual({ symbol: 'ε', unit: '' });
  });
});

describe('placeBeside', () => {
  it('placeBeside(…) puts the box right of and below the mark when it fits (12 px gap)', () => {
    expect(placeBeside(100, 50, 200, 60, 760, 340)).toEqual({ left: 112, top: 62 });
  });

  it('placeBeside(…) flips to the left near the right edge and above near the bottom edge', () => {
    // 700 + 12 + 200 > 760, so left = 700 − 12 − 200 = 488; 320 + 12 + 60 > 340, so top = 320 − 12 − 60 = 248.
    expect(placeBeside(700, 320, 200, 60, 760, 340)).toEqual({ left: 488, top: 248 });
  });

  it('placeBeside(…) clamps a box that fits on neither side into the plot', () => {
    // 300 px wide in a 320 px plot, mark at 150: right gives 462 > 320, left gives −162; clamped to 0 … 20.
    expect(placeBeside(150, 10, 300, 40, 320, 200)).toEqual({ left: 0, top: 22 });
    expect(placeBeside(150, 10, 400, 40, 320, 200).left).toBe(0);
  });
});
