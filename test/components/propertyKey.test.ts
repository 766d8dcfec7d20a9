/** propertyKey: the canonical key that groups correlations on a property page (rule in content/README.md). */
import { describe, expect, it } from 'vitest';
import { propertyKey } from '../../src/components/lib/propertyKey.ts';
import { quantitySchema } from '../../src/schema/index.ts';

describe('propertyKey', () => {
  it('propertyKey(property) lower-cases the name and joins words by single hyphens (computed by hand)', () => {
    expect(propertyKey({ name: 'Specific heat capacity' })).toBe('specific-heat-capacity');
    expect(propertyKey({ name: 'specific  heat   capacity ' })).toBe('specific-heat-capacity');
    expect(propertyKey({ name: 'saturated-liquid density' })).toBe('saturated-liquid-density');
    expect(propertyKey({ name: 'Thermal conductivity (λ)' })).toBe('thermal-conductivity');
    expect(propertyKey({ name: 'Énergie libre' })).toBe('energie-libre');
  });

  it('propertyKey(property) prefers the key the metadata gives', () => {
    expect(propertyKey({ name: 'specific heat', key: 'specific-heat-capacity' })).toBe('specific-heat-capacity');
  });

  it('the schema accepts a well-formed property.key and refuses another', () => {
    const shape = quantitySchema;
    expect(shape.safeParse({ name: 'cp', symbol: 'c_p', unit: 'J/(kg·K)', key: 'specific-heat-capacity' }).success).toBe(true);
    expect(shape.safeParse({ name: 'cp', symbol: 'c_p', unit: 'J/(kg·K)', key: 'Specific Heat' }).success).toBe(false);
  });
});
