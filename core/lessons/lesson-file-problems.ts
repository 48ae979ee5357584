import { findNodeAtLocation, type Node } from 'jsonc-parser';
import type { z } from 'zod';

/**
 * Where a lesson file's problems are, and how they are worded: JSON syntax errors, zod issues and
 * the file's own rules, each turned into a line number an editor shows and a sentence a teacher can act on.
 */

export const SYNTAX_MESSAGES: Record<string, string> = {
  InvalidSymbol: 'This is not valid JSON here (text outside quotes, or a stray character).',
  InvalidNumberFormat: 'This number is not written as JSON numbers are (for example 12, 0.5 or 1e-3).',
  PropertyNameExpected: 'A field name in double quotes was expected here (JSON allows no comma before a closing brace).',
  ValueExpected: 'A value was expected here (JSON allows no comma before a closing bracket).',
  ColonExpected: 'A colon was expected after the field name.',
  CommaExpected: 'A comma was expected here, between two fields or two items.',
  CloseBraceExpected: 'A closing brace } was expected: an object is not closed.',
  CloseBracketExpected: 'A closing bracket ] was expected: a list is not closed.',
  EndOfFileExpected: 'The file should end here: there is text after the lesson object.',
  InvalidCommentToken: 'JSON allows no comments.',
  UnexpectedEndOfComment: 'JSON allows no comments.',
  UnexpectedEndOfString: 'This text is not closed with a double quote before the end of the line.',
  UnexpectedEndOfNumber: 'This number ends too early.',
  InvalidUnicode: 'This \\u escape needs four hexadecimal digits.',
  InvalidEscapeCharacter: 'This backslash escape is not one JSON allows (\\" \\\\ \\/ \\b \\f \\n \\r \\t \\uXXXX).',
  InvalidCharacter: 'Text in JSON cannot hold a raw line break or tab: write \\n or \\t.',
};

/** Offsets to 1-based line numbers, by binary search over where each line starts. */
export function lineLocator(text: string): (offset: number) => number {
  const starts = [0];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || (c === 13 && text.charCodeAt(i + 1) !== 10)) starts.push(i + 1);
  }
  return (offset) => {
    let low = 0;
    let high = starts.length - 1;
    while (low < high) {
      const mid = (low + high + 1) >> 1;
      if (starts[mid]! <= offset) low = mid;
      else high = mid - 1;
    }
    return low + 1;
  };
}

export type Segment = string | number;

/** The node a path names, or its nearest existing parent (a missing field points at its object). */
export function nodeFor(root: Node, path: Segment[]): { node: Node; found: boolean } {
  for (let depth = path.length; depth >= 0; depth--) {
    const node = findNodeAtLocation(root, path.slice(0, depth));
    if (node) return { node, found: depth === path.length };
  }
  return { node: root, found: path.length === 0 };
}

/** A field's line is where its name is written, not where its value starts. */
export function startOf(node: Node): number {
  return node.parent?.type === 'property' ? node.parent.offset : node.offset;
}

/** Fields written twice in one object: JSON readers silently keep one, so a person must choose. */
export function duplicateFields(
  node: Node,
  path: Segment[],
  lineOf: (offset: number) => number,
  problem: (offset: number, path: Segment[], message: string) => void,
): void {
  if (node.type === 'object') {
    const seen = new Map<string, Node>();
    for (const property of node.children ?? []) {
      const [keyNode, valueNode] = property.children ?? [];
      if (!keyNode) continue;
      const name = String(keyNode.value);
      const first = seen.get(name);
      if (first)
        problem(
          property.offset,
          [...path, name],
          `The field "${name}" is written twice in this object (first on line ${lineOf(first.offset)}): keep one.`,
        );
      else seen.set(name, property);
      if (valueNode) duplicateFields(valueNode, [...path, name], lineOf, problem);
    }
  } else if (node.type === 'array') {
    (node.children ?? []).forEach((child, index) => duplicateFields(child, [...path, index], lineOf, problem));
  }
}

const isPlainObject = (value: unknown): value is Record<string, unknown> =>
  typeof value === 'object' && value !== null && !Array.isArray(value);

/** Fields the schema does not know (zod drops them): a misspelt name would otherwise lose its value silently. */
export function unknownFields(raw: unknown, parsed: unknown, path: Segment[], found: Segment[][]): void {
  if (isPlainObject(raw) && isPlainObject(parsed)) {
    for (const key of Object.keys(raw)) {
      if (!(key in parsed)) found.push([...path, key]);
      else unknownFields(raw[key], parsed[key], [...path, key], found);
    }
  } else if (Array.isArray(raw) && Array.isArray(parsed)) {
    raw.forEach((item, index) => unknownFields(item, parsed[index], [...path, index], found));
  }
}

const TYPE_WORDS: Record<string, string> = {
  boolean: 'true or false',
  number: 'a number',
  string: 'text in double quotes',
  array: 'a list in [ ]',
  object: 'an object in { }',
};

/** zod's own wording for a wrong type ("Invalid input: expected boolean, received string"), in plainer words. */
function plainTypeMessage(issue: z.core.$ZodIssue): string | null {
  if (issue.code !== 'invalid_type' || !issue.message.startsWith('Invalid input')) return null;
  return `Expected ${TYPE_WORDS[issue.expected] ?? issue.expected}.`;
}

export function issueMessage(issue: z.core.$ZodIssue, node: Node, found: boolean, field: Segment | undefined): string {
  const facts = issue as { discriminator?: unknown; options?: unknown };
  if (issue.code === 'invalid_union' && facts.discriminator === 'kind' && Array.isArray(facts.options)) {
    if (!found) return `The field "kind" is missing: say which kind of checkpoint this is (${facts.options.join(', ')}).`;
    const named = node.type === 'string' ? ` "${String(node.value)}"` : '';
    return `Unknown checkpoint kind${named}: use one of ${facts.options.join(', ')}.`;
  }
  const message = plainTypeMessage(issue) ?? issue.message;
  if (!found && typeof field === 'string') return `The field "${field}" is missing. ${message}`;
  return message;
}
