/**
 * Turn zod issues into one-line problems that name the key the way the user wrote it.
 */
import type { z } from 'zod';
import { knownKeys } from './schemaKeys.ts';
import { suggest } from './suggest.ts';

/** A problem with a key path, ready to be positioned in the YAML file. */
export interface KeyProblem {
  /** Key path to position the message at. */
  readonly path: readonly (string | number)[];
  /** Point at the key itself (unknown keys) rather than its value. */
  readonly atKey: boolean;
  readonly message: string;
  readonly hint?: string | undefined;
  /** For an unknown key with a typo hint: the full path of the key it probably meant. */
  readonly typoOf?: string | undefined;
  /** For a missing key: its full path. */
  readonly missing?: string | undefined;
}

/** `fit.exclude[0].reason` style name of a key path. */
export function keyName(path: readonly (string | number)[]): string {
  let name = '';
  for (const segment of path) {
    name += typeof segment === 'number' ? `[${segment}]` : name === '' ? segment : `.${segment}`;
  }
  return name;
}

const DIMENSIONLESS_HINT = 'write unit: "1" for a dimensionless quantity';

function describeReceived(received: string): string {
  if (received === 'null') return 'empty';
  if (received === 'array') return 'a list';
  if (received === 'object') return 'a block of keys';
  return `a ${received}`;
}

function describeExpected(expected: string): string {
  if (expected === 'array') return 'a list';
  if (expected === 'object') return 'a block of keys';
  if (expected === 'integer') return 'a whole number';
  return `a ${expected}`;
}

/**
 * Convert one zod issue from validating against `schema` into problems (an unknown-keys issue gives one per key).
 */
export function issueToProblems(schema: z.ZodTypeAny, issue: z.ZodIssue): KeyProblem[] {
  const path = issue.path;
  const name = keyName(path);
  const last = path[path.length - 1];
  switch (issue.code) {
    case 'unrecognized_keys': {
      const known = knownKeys(schema, path);
      return issue.keys.map((key) => {
        const guess = suggest(key, known);
        return {
          path: [...path, key],
          atKey: true,
          message: path.length === 0 ? `unknown key '${key}'` : `unknown key '${key}' in '${name}'`,
          hint: guess === undefined ? `known keys here: ${known.join(', ')}` : `did you mean '${guess}'?`,
          typoOf: guess === undefined ? undefined : keyName([...path, guess]),
        };
      });
    }
    case 'invalid_type': {
      if (issue.received === 'undefined') {
        const parent = keyName(path.slice(0, -1));
        return [
          {
            path,
            atKey: true,
            message: parent === '' ? `missing required key '${String(last)}'` : `missing required key '${String(last)}' in '${parent}'`,
            hint: last === 'unit' ? DIMENSIONLESS_HINT : undefined,
            missing: name,
          },
        ];
      }
      if (issue.expected === 'integer' && issue.received === 'number') {
        return [{ path, atKey: false, message: `'${name}' must be a whole number` }];
      }
      return [
        {
          path,
          atKey: false,
          message: `'${name}' must be ${describeExpected(issue.expected)}, not ${describeReceived(issue.received)}`,
          hint: last === 'unit' && issue.received === 'null' ? DIMENSIONLESS_HINT : undefined,
        },
      ];
    }
    case 'invalid_enum_value': {
      const guess = suggest(String(issue.received), issue.options.map(String));
      return [
        {
          path,
          atKey: false,
          message: `'${name}' is '${String(issue.received)}'; expected one of: ${issue.options.join(', ')}`,
          hint: guess === undefined ? undefined : `did you mean '${guess}'?`,
        },
      ];
    }
    case 'too_small':
    case 'too_big': {
      if (issue.type === 'number') {
        const bound = Number(issue.code === 'too_small' ? issue.minimum : issue.maximum);
        const relation =
          issue.code === 'too_small' ? (issue.inclusive ? 'at least' : 'greater than') : issue.inclusive ? 'at most' : 'less than';
        return [{ path, atKey: false, message: `'${name}' must be ${relation} ${bound}` }];
      }
      return [
        {
          path,
          atKey: false,
          message: `'${name}' ${issue.message}`,
          hint: last === 'unit' ? DIMENSIONLESS_HINT : undefined,
        },
      ];
    }
    case 'not_finite':
      return [{ path, atKey: false, message: `'${name}' must be a finite number` }];
    default:
      return [{ path, atKey: false, message: name === '' ? issue.message : `'${name}' ${issue.message}` }];
  }
}
