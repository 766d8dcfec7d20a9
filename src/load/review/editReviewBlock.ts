/**
 * Edit the review block of a metadata file in place, changing nothing else: the keys asked for are replaced at
 * their value's character range (or added as new lines after the block's last entry, or in a new block at the
 * end), keys asked to go are removed with their line. Every other byte is kept: comments, key order, quoting,
 * indentation, a BOM and CRLF line ends. Offsets are those of the YAML parser on the decoded text (UTF-16 code
 * units), applied to the same text, so characters outside the BMP cannot shift them.
 *
 * The edit is then checked: the edited text must parse to the original data with only the review keys changed.
 */
import { isDeepStrictEqual } from 'node:util';
import { isMap, isScalar, parseDocument, stringify, type Node, type Pair, type Scalar } from 'yaml';

/** Why an edit cannot be made safely; the CLI prints it with the file's name. */
export class ReviewEditError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ReviewEditError';
  }
}

interface Edit {
  readonly start: number;
  readonly end: number;
  readonly text: string;
}

/** A string as a YAML scalar, keeping the quoting style of the value it replaces. */
function scalarText(value: string, previous: Node | null | undefined): string {
  const type = isScalar(previous) ? (previous as Scalar).type : undefined;
  if (type === 'QUOTE_DOUBLE') return JSON.stringify(value);
  if (type === 'QUOTE_SINGLE') return `'${value.replace(/'/g, "''")}'`;
  return stringify(value, { lineWidth: 0 }).replace(/\r?\n$/, '');
}

/** Offset of the start of the line holding `offset`. */
function lineStart(text: string, offset: number): number {
  return text.lastIndexOf('\n', offset - 1) + 1;
}

/** Offset just after the line end of the line holding `offset` (or the text's end). */
function afterLineEnd(text: string, offset: number): number {
  if (offset > 0 && text[offset - 1] === '\n') return offset;
  const newline = text.indexOf('\n', offset);
  return newline < 0 ? text.length : newline + 1;
}

/**
 * @param raw the file's text as read (a BOM, if any, included)
 * @param set review keys to write, in the order new ones should appear
 * @param remove review keys to delete
 * @throws ReviewEditError when the file cannot be edited safely (no top-level map, a review block in flow style)
 * @example editReviewBlock('review:\n  status: draft # c\n', { status: 'approved' }, []) // => "review:\n  status: approved # c\n"
 */
export function editReviewBlock(raw: string, set: Readonly<Record<string, string>>, remove: readonly string[] = []): string {
  const bom = raw.startsWith('\uFEFF') ? '\uFEFF' : '';
  const text = raw.slice(bom.length);
  const eol = text.includes('\r\n') ? '\r\n' : '\n';
  const document = parseDocument(text, { uniqueKeys: true });
  if (document.errors.length > 0) throw new ReviewEditError(`cannot edit: YAML syntax error (${document.errors[0]!.message.split('\n')[0]})`);
  const root = document.contents;
  if (!isMap(root) || root.flow) throw new ReviewEditError('cannot edit: the metadata is not a block of keys');
  const reviewPair = root.items.find((pair) => isScalar(pair.key) && pair.key.value === 'review') as Pair<Scalar, Node | null> | undefined;
  const edits: Edit[] = [];

  if (reviewPair === undefined || reviewPair.value === null || (isScalar(reviewPair.value) && reviewPair.value.value === null)) {
    const lines = Object.entries(set).map(([key, value]) => `  ${key}: ${scalarText(value, undefined)}${eol}`).join('');
    if (reviewPair === undefined) {
      const needsNewline = text.length > 0 && !text.endsWith('\n');
      edits.push({ start: text.length, end: text.length, text: `${needsNewline ? eol : ''}review:${eol}${lines}` });
    } else {
      const keyEnd = reviewPair.key.range![1];
      const at = afterLineEnd(text, keyEnd);
      edits.push({ start: at, end: at, text: `${at === text.length && !text.endsWith('\n') ? eol : ''}${lines}` });
    }
  } else {
    const block = reviewPair.value;
    if (!isMap(block) || block.flow) throw new ReviewEditError("cannot edit: the review block is not a block of keys (write it as 'review:' with one key per line)");
    const pairs = block.items as Pair<Scalar, Node | null>[];
    const first = pairs[0]!;
    const firstKeyStart = first.key.range![0];
    const indent = text.slice(lineStart(text, firstKeyStart), firstKeyStart);
    if (!/^[ ]*$/.test(indent)) throw new ReviewEditError('cannot edit: the review block does not start each key on its own line');
    const find = (key: string) => pairs.find((pair) => isScalar(pair.key) && pair.key.value === key);
    const additions: string[] = [];
    for (const [key, value] of Object.entries(set)) {
      const pair = find(key);
      if (pair === undefined) {
        additions.push(`${indent}${key}: ${scalarText(value, undefined)}${eol}`);
      } else if (pair.value === null || !pair.value.range || pair.value.range[0] === pair.value.range[1]) {
        // `key:` with no value: write the value after the colon.
        const colon = text.indexOf(':', pair.key.range![1]);
        edits.push({ start: colon + 1, end: colon + 1, text: ` ${scalarText(value, undefined)}` });
      } else {
        edits.push({ start: pair.value.range[0], end: pair.value.range[1], text: scalarText(value, pair.value) });
      }
    }
    for (const key of remove) {
      const pair = find(key);
      if (pair === undefined) continue;
      const start = lineStart(text, pair.key.range![0]);
      const end = afterLineEnd(text, pair.value?.range?.[1] ?? pair.key.range![1]);
      edits.push({ start, end, text: '' });
    }
    if (additions.length > 0) {
      const last = pairs[pairs.length - 1]!;
      const lastEnd = last.value?.range?.[1] ?? last.key.range![1];
      const at = afterLineEnd(text, lastEnd);
      const needsNewline = at === text.length && !text.endsWith('\n');
      edits.push({ start: at, end: at, text: `${needsNewline ? eol : ''}${additions.join('')}` });
    }
  }

  let edited = text;
  for (const edit of [...edits].sort((a, b) => b.start - a.start)) edited = edited.slice(0, edit.start) + edit.text + edited.slice(edit.end);
  verify(text, edited, set, remove);
  return bom + edited;
}

/** The edited text must read as the original with only the review keys changed. */
function verify(before: string, after: string, set: Readonly<Record<string, string>>, remove: readonly string[]): void {
  const expected = parseDocument(before).toJS() as Record<string, unknown>;
  const review = { ...((expected['review'] as Record<string, unknown> | null | undefined) ?? {}) };
  for (const key of remove) delete review[key];
  Object.assign(review, set);
  expected['review'] = review;
  const parsed = parseDocument(after);
  if (parsed.errors.length > 0 || !isDeepStrictEqual(parsed.toJS(), expected)) {
    throw new ReviewEditError('cannot edit the review block safely in this file (the edited text would not read back as intended); nothing was written');
  }
}
