/**
 * Known keys of the object schema found at a path, for typo hints on unknown keys.
 */
import { z } from 'zod';

/** Strip wrappers (default, optional, nullable, refinements) to reach the underlying schema. */
function unwrap(schema: z.ZodTypeAny): z.ZodTypeAny {
  let current = schema;
  for (;;) {
    if (current instanceof z.ZodDefault) current = current._def.innerType;
    else if (current instanceof z.ZodOptional || current instanceof z.ZodNullable) current = current.unwrap();
    else if (current instanceof z.ZodEffects) current = current.innerType();
    else return current;
  }
}

/**
 * The keys the object schema at `path` accepts, or an empty list when the path does not lead to an object.
 * @example knownKeys(correlationMetaSchema, ['property']) // => ['name', 'symbol', 'unit']
 */
export function knownKeys(root: z.ZodTypeAny, path: readonly (string | number)[]): string[] {
  let current = unwrap(root);
  for (const segment of path) {
    if (current instanceof z.ZodObject && typeof segment === 'string') {
      const child = (current.shape as Record<string, z.ZodTypeAny>)[segment];
      if (child === undefined) return [];
      current = unwrap(child);
    } else if (current instanceof z.ZodArray && typeof segment === 'number') {
      current = unwrap(current.element as z.ZodTypeAny);
    } else {
      return [];
    }
  }
  return current instanceof z.ZodObject ? Object.keys(current.shape as object) : [];
}
