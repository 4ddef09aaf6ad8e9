// Reading JSON input files with positions: syntax errors, duplicate keys and every Issue
// path become file:line:column.
import { readFileSync } from 'node:fs';
import { findNodeAtLocation, parseTree, printParseErrorCode, type Node, type ParseError } from 'jsonc-parser';
import { formatPath, InputError, issue, parsePath, type Issue } from '../../shared/errors';
import type { Model } from '../../shared/schemas/model';
import type { Structure } from '../../shared/engine/structure';
import { toStructure, type ModelCheck } from '../../shared/engine/to-structure';

/** 1-based position in a text file. */
export interface Position { line: number; column: number }

/** A parsed JSON file and a way back from a dotted path to where it is in the file. */
export interface JsonDocument {
  data: unknown;
  /** Position of the key (or array element) a path names, else of its nearest ancestor. */
  locate(path: string): Position | undefined;
}

// Keyed by printParseErrorCode's names (ParseErrorCode is a const enum, out of reach here).
const SYNTAX: Record<string, string> = {
  InvalidSymbol: 'unexpected character',
  InvalidNumberFormat: 'invalid number',
  PropertyNameExpected: 'expected a key in double quotes',
  ValueExpected: 'expected a value',
  ColonExpected: 'expected a colon',
  CommaExpected: 'expected a comma',
  CloseBraceExpected: "expected '}'",
  CloseBracketExpected: "expected ']'",
  EndOfFileExpected: 'unexpected text after the end of the document',
  InvalidCommentToken: 'comments are not allowed in JSON',
  UnexpectedEndOfComment: 'comments are not allowed in JSON',
  UnexpectedEndOfString: 'unterminated string',
  UnexpectedEndOfNumber: 'incomplete number',
  InvalidUnicode: 'invalid \\u escape',
  InvalidEscapeCharacter: 'invalid escape character',
  InvalidCharacter: 'control character in a string (write it as an escape)',
};

function positions(text: string): (offset: number) => Position {
  const starts = [0];
  for (const m of text.matchAll(/\r\n|\r|\n/g)) starts.push(m.index + m[0].length);
  return (offset) => {
    let [lo, hi] = [0, starts.length - 1];
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (starts[mid] <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: offset - starts[lo] + 1 };
  };
}

/** The first syntax error, in words; the ones after it are usually its echoes. */
function describeSyntax(text: string, e: ParseError): { offset: number; message: string } {
  const before = text.slice(0, e.offset).trimEnd();
  const next = text[e.offset];
  if (!text.trim()) return { offset: e.offset, message: 'the file is empty' };
  const name = printParseErrorCode(e.error);
  if (before.endsWith(',') && (next === '}' || next === ']') && (name === 'PropertyNameExpected' || name === 'ValueExpected'))
    return { offset: before.length - 1, message: 'trailing comma is not allowed in JSON' };
  if (name === 'InvalidSymbol') {
    const token = text.slice(e.offset, e.offset + Math.min(e.length, 20));
    if (token.startsWith("'")) return { offset: e.offset, message: 'strings need double quotes' };
    return { offset: e.offset, message: `unexpected ${JSON.stringify(token)}` };
  }
  return { offset: e.offset, message: SYNTAX[name] ?? 'invalid JSON' };
}

function duplicateKeys(root: Node, at: (offset: number) => Position, path: (string | number)[], out: Issue[]): void {
  if (root.type === 'object') {
    const seen = new Map<string, number>();
    for (const prop of root.children ?? []) {
      const [keyNode, value] = prop.children ?? [];
      const key = String(keyNode?.value);
      const first = seen.get(key);
      const here = at(prop.offset);
      if (first !== undefined) out.push({ ...issue('json-duplicate-key', formatPath([...path, key]), key, first), ...here });
      else seen.set(key, here.line);
      if (value) duplicateKeys(value, at, [...path, key], out);
    }
  } else if (root.type === 'array') {
    (root.children ?? []).forEach((child, i) => duplicateKeys(child, at, [...path, i], out));
  }
}

function readText(file: string): string {
  try {
    return readFileSync(file, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === 'ENOENT') throw new InputError(file, [issue('file-not-found', '')]);
    const reason = code === 'EISDIR' ? 'it is a directory' : code === 'EACCES' ? 'permission denied' : (err as Error).message;
    throw new InputError(file, [issue('file-unreadable', '', reason)]);
  }
}

/** Read and parse a strict JSON file; throws InputError on a missing file, bad syntax or a duplicate key. */
export function readJsonFile(file: string): JsonDocument {
  // A byte-order mark becomes a space, so offsets still match the file.
  const text = readText(file).replace(/^\uFEFF/, ' ');
  const at = positions(text);
  const errors: ParseError[] = [];
  const root = parseTree(text, errors, { disallowComments: true, allowTrailingComma: false, allowEmptyContent: false });
  if (errors.length || !root) {
    const { offset, message } = errors.length ? describeSyntax(text, errors[0]) : { offset: 0, message: 'the file is empty' };
    throw new InputError(file, [{ ...issue('json-syntax', '', message), ...at(offset) }]);
  }
  const dups: Issue[] = [];
  duplicateKeys(root, at, [], dups);
  if (dups.length) throw new InputError(file, dups);
  // JSON.parse gives the exact JSON values (1e999 → Infinity, "__proto__" an own key).
  const data: unknown = JSON.parse(text);
  return {
    data,
    locate(path) {
      let segs = parsePath(path);
      if (!segs) return undefined;
      for (;;) {
        const node = segs.length ? findNodeAtLocation(root, segs) : root;
        if (node) return at(node.parent?.type === 'property' ? node.parent.offset : node.offset);
        segs = segs.slice(0, -1);
      }
    },
  };
}

/** A model file read, checked and converted to SI. */
export interface LoadedModel { structure: Structure; model: Model; units: ModelCheck['units'] }

/** Read a model file and build its structure; throws InputError listing every issue with its line. */
export function loadModelFile(file: string): LoadedModel {
  const doc = readJsonFile(file);
  const check = toStructure(doc.data);
  if (!check.structure || check.issues.length) {
    const located = check.issues.map((i) => ({ ...i, ...doc.locate(i.path) }));
    located.sort((a, b) => (a.line ?? Infinity) - (b.line ?? Infinity) || (a.column ?? 0) - (b.column ?? 0));
    throw new InputError(file, located);
  }
  return { structure: check.structure, model: doc.data as Model, units: check.units };
}
