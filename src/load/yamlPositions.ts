/**
 * Find where a key path sits in a parsed YAML document, so that a schema problem can name its line and column.
 */
import { isMap, isScalar, isSeq, type Document, type LineCounter, type Node } from 'yaml';
import type { Position } from './diagnostic.ts';

/** What a path resolves to: the key and value nodes when they exist, or the deepest ancestor that does. */
export interface YamlLocation {
  /** True when the whole path exists. */
  readonly found: boolean;
  /** Key node of the last map entry reached (for unknown keys and missing children). */
  readonly key: Node | null;
  /** Value node of the last entry reached. */
  readonly value: Node | null;
}

/** Walk `path` through maps and sequences, as far as it exists. */
export function locate(document: Document, path: readonly (string | number)[]): YamlLocation {
  let value: Node | null = (document.contents as Node | null) ?? null;
  let key: Node | null = null;
  for (const segment of path) {
    if (isMap(value)) {
      const pair = value.items.find((item) => isScalar(item.key) && String(item.key.value) === String(segment));
      if (pair === undefined) return { found: false, key, value };
      key = (pair.key as Node | null) ?? null;
      value = (pair.value as Node | null) ?? null;
    } else if (isSeq(value) && typeof segment === 'number') {
      const item = value.items[segment] as Node | undefined;
      if (item === undefined) return { found: false, key, value };
      key = null;
      value = item;
    } else {
      return { found: false, key, value };
    }
  }
  return { found: true, key, value };
}

/** Line and column (1-based) of a node's start, or line 1 when there is no node. */
export function positionOf(node: Node | null, lineCounter: LineCounter): Position {
  const offset = node?.range?.[0];
  if (offset === undefined) return { line: 1, column: 1 };
  const { line, col } = lineCounter.linePos(offset);
  return { line, column: col };
}

/** Position of the value at `path` (or of its key, or the nearest ancestor). */
export function valuePosition(document: Document, lineCounter: LineCounter, path: readonly (string | number)[]): Position {
  const location = locate(document, path);
  return positionOf(location.value ?? location.key, lineCounter);
}

/** Position of the key at `path` (or of its value, or the nearest ancestor's key). */
export function keyPosition(document: Document, lineCounter: LineCounter, path: readonly (string | number)[]): Position {
  const location = locate(document, path);
  if (!location.found) return positionOf(location.key ?? null, lineCounter);
  return positionOf(location.key ?? location.value, lineCounter);
}
