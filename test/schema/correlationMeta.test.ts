/**
 * The metadata schema: documented field by field, explicit defaults, cross-field rules, and the criterion list
 * kept equal to the order selector's registry.
 */
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { orderCriteria } from '../../src/core/index.ts';
import { CRITERIA, CRITERION_TITLES, correlationMetaSchema, correlationEntrySchema, type CorrelationMetaInput } from '../../src/schema/index.ts';

const MINIMAL: CorrelationMetaInput = Object.freeze({
  title: 'Density of test liquid',
  property: { name: 'density', symbol: '\\rho', unit: 'kg/m³' },
  variable: { name: 'temperature', symbol: 'T', unit: 'K' },
  material: { name: 'Test liquid' },
  source: { citation: 'Invented for tests.', method: 'measured', date: '2026-01-01', preparedBy: 'tests' },
  data: { x: 'T', y: 'rho' },
}) as CorrelationMetaInput;

function unwrap(schema: z.ZodTypeAny): z.ZodTypeAny {
  if (schema instanceof z.ZodDefault) return unwrap(schema._def.innerType);
  if (schema instanceof z.ZodOptional || schema instanceof z.ZodNullable) return unwrap(schema.unwrap());
  if (schema instanceof z.ZodEffects) return unwrap(schema.innerType());
  if (schema instanceof z.ZodArray) return unwrap(schema.element as z.ZodTypeAny);
  return schema;
}

/** Paths of object fields without a .describe() text, at any depth. */
function undocumented(schema: z.ZodTypeAny, path = ''): string[] {
  const inner = unwrap(schema);
  if (!(inner instanceof z.ZodObject)) return [];
  return Object.entries(inner.shape as Record<string, z.ZodTypeAny>).flatMap(([key, child]) => {
    const childPath = path === '' ? key : `${path}.${key}`;
    const described = child.description !== undefined || unwrap(child).description !== undefined;
    return [...(described ? [] : [childPath]), ...undocumented(child, childPath)];
  });
}

function messages(input: unknown): string[] {
  const result = correlationMetaSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
}

describe('correlationMetaSchema', () => {
  it('every metadata field carries a .describe() text', () => {
    expect(undocumented(correlationMetaSchema)).toEqual([]);
  });

  it('correlationMetaSchema.parse(minimal) fills every default explicitly', () => {
    const meta = correlationMetaSchema.parse(MINIMAL);
    expect(meta.invented).toBe(false);
    expect(meta.tags).toEqual([]);
    expect(meta.review).toEqual({ status: 'draft' });
    expect(meta.data).toEqual({ file: 'data.csv', x: 'T', y: 'rho', replicates: false });
    expect(meta.fit).toEqual({
      order: 'auto',
      maxOrder: 10,
      intercept: true,
      transform: { x: 'identity', y: 'identity' },
      weights: 'none',
      passThrough: [],
      exclude: [],
    });
  });

  it('parsing is idempotent, as Astro re-validates the loader output', () => {
    const once = correlationMetaSchema.parse(MINIMAL);
    expect(correlationMetaSchema.parse(once)).toEqual(once);
  });

  it('cross-field rules name the key to fix', () => {
    expect(messages({ ...MINIMAL, fit: { order: 3 } })).toEqual(["fit.order: is a fixed order but 'fit.reason' does not say why"]);
    expect(messages({ ...MINIMAL, fit: { criterion: 'chiSquare' } })).toEqual(["fit.criterion: is 'chiSquare', which needs weights: uncertainty"]);
    expect(messages({ ...MINIMAL, fit: { weights: 'uncertainty' } })).toEqual(["fit.weights: is 'uncertainty' but data.uncertainty names no column"]);
    expect(messages({ ...MINIMAL, fit: { exclude: [{ row: 2, x: 300, reason: 'both' }] } })).toEqual(["fit.exclude.0: needs exactly one of 'row' or 'x'"]);
    expect(messages({ ...MINIMAL, fit: { range: { min: 350, max: 300 } } })).toEqual(['fit.range.max: must be greater than range.min']);
    expect(messages({ ...MINIMAL, review: { status: 'approved' } })).toEqual([
      "review.reviewer: is required when status is 'approved'",
      "review.date: is required when status is 'approved'",
    ]);
    expect(messages({ ...MINIMAL, source: { ...MINIMAL.source, method: 'derived' } })).toEqual(["source.derivedFrom: is required when method is 'derived'"]);
  });

  it('CRITERIA lists exactly the order selector criteria', () => {
    expect([...CRITERIA].sort()).toEqual(Object.keys(orderCriteria).sort());
  });

  it('every criterion has a title in words for the pages, and no title is its short name', () => {
    expect(Object.keys(CRITERION_TITLES).sort()).toEqual([...CRITERIA].sort());
    for (const name of CRITERIA) expect(CRITERION_TITLES[name], name).not.toMatch(/[a-z][A-Z]/);
  });

  it('correlationEntrySchema documents its fields too', () => {
    expect(undocumented(correlationEntrySchema).filter((path) => !path.startsWith('meta'))).toEqual([]);
  });
});
