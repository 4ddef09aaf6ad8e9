/**
 * Study expressions (`derived`, `where`): parsed and checked with mathjs before any work,
 * compiled once, evaluated against one reused scope. Only arithmetic, comparisons, logic,
 * the conditional operator and a fixed list of functions are allowed: no assignment, no
 * property access, no matrices, no units.
 */
import type { EvalFunction, MathNode, SymbolNode as SymbolNodeType } from 'mathjs';
import { mathjs } from '../math';

import { suggest } from './suggest';
import type { Issue } from './types';

/** Functions a study expression may call. */
export const EXPRESSION_FUNCTIONS: ReadonlySet<string> = new Set([
  'abs', 'sqrt', 'cbrt', 'exp', 'log', 'log10', 'log2', 'pow', 'hypot', 'min', 'max', 'floor', 'ceil',
  'round', 'fix', 'sign', 'mod', 'sin', 'cos', 'tan', 'asin', 'acos', 'atan', 'atan2', 'sinh', 'cosh',
  'tanh', 'not', 'isInteger', 'equalText', 'compareText',
]);

/** Named constants a study expression may use, besides true, false, NaN and Infinity. */
export const EXPRESSION_CONSTANTS: ReadonlySet<string> = new Set(['pi', 'e', 'tau']);

const ALLOWED_NODES = new Set([
  'ConstantNode', 'SymbolNode', 'OperatorNode', 'ParenthesisNode', 'FunctionNode', 'ConditionalNode', 'RelationalNode',
]);

/** An expression that parsed, with the symbols it reads (not the functions it calls). */
export interface ParsedExpression {
  readonly path: string;
  readonly text: string;
  readonly node: MathNode;
  /** Distinct symbols read as values, in order of first appearance in the tree. */
  readonly symbols: readonly string[];
}

/** A compiled expression, ready to evaluate against a scope. */
export interface CompiledExpression {
  readonly path: string;
  /** For `derived`: the name it defines. */
  readonly name: string;
  readonly text: string;
  readonly code: EvalFunction;
}

/**
 * Parse one study expression and check its shape (allowed node types, allowed functions).
 * Which symbols are known is checked afterwards by `unknownSymbolIssues`.
 * @param path - where the expression sits in the study, e.g. `where[1]`
 */
export function parseExpression(text: string, path: string): ParsedExpression | Issue {
  let node: MathNode;
  try {
    node = mathjs().parse(text);
  } catch (e) {
    const err = e as Error & { char?: number };
    // mathjs counts characters from 1
    const position = typeof err.char === 'number' ? Math.max(0, err.char - 1) : undefined;
    return { path, message: `cannot read the expression: ${err.message}`, position };
  }
  const symbols: string[] = [];
  let bad: Issue | undefined;
  node.traverse((n, childPath, parent) => {
    if (bad) return;
    if (!ALLOWED_NODES.has(n.type)) {
      const name = (n as MathNode & { name?: string }).name;
      bad = { path, message: `${describeNode(n.type)} is not allowed in a study expression`, position: name ? symbolPosition(text, name) : undefined };
      return;
    }
    if (n.type !== 'SymbolNode') return;
    const name = (n as SymbolNodeType).name;
    if (parent?.type === 'FunctionNode' && childPath === 'fn') {
      if (!EXPRESSION_FUNCTIONS.has(name)) {
        bad = { path, message: `unknown function '${name}'${suggest(name, [...EXPRESSION_FUNCTIONS])}`, position: symbolPosition(text, name) };
      }
      return;
    }
    if (!EXPRESSION_CONSTANTS.has(name) && !symbols.includes(name)) symbols.push(name);
  });
  return bad ?? { path, text, node, symbols };
}

/** True when `parseExpression` gave an issue rather than an expression. */
export function isIssue(x: ParsedExpression | Issue): x is Issue {
  return !('node' in x);
}

/**
 * Issues for the symbols of an expression that are not known at its place.
 * @param known - names that have a value when the expression is evaluated
 * @param later - names that get a value only after it (derived further down), for a clearer message
 * @param self - for a derived expression, the name it defines
 */
export function unknownSymbolIssues(
  expr: ParsedExpression,
  known: ReadonlySet<string>,
  later: ReadonlySet<string> = new Set(),
  self?: string,
): Issue[] {
  const issues: Issue[] = [];
  for (const name of expr.symbols) {
    if (known.has(name)) continue;
    const message =
      name === self
        ? `'${name}' is defined by this expression and cannot read itself`
        : later.has(name)
          ? `'${name}' is derived further down; move its line in \`derived\` above this one`
          : mathjs().Unit.isValuelessUnit(name)
            ? `'${name}' reads as a unit; study expressions use plain numbers, each in its parameter's unit`
            : `unknown name '${name}'${suggest(name, [...known])}`;
    issues.push({ path: expr.path, message, position: symbolPosition(expr.text, name) });
  }
  return issues;
}

/**
 * Compile a checked expression. `==` and `!=` against a string (an option) become text
 * comparisons, since mathjs compares with `==` by numeric value; `and`, `or` and `not`
 * become conditionals, which give the same booleans about thirty times faster in mathjs.
 * @param stringNames - symbols whose values are strings
 */
export function compileExpression(expr: ParsedExpression, name: string, stringNames: ReadonlySet<string>): CompiledExpression {
  const isText = (n: MathNode) =>
    (n.type === 'ConstantNode' && typeof (n as MathNode & { value: unknown }).value === 'string') ||
    (n.type === 'SymbolNode' && stringNames.has((n as SymbolNodeType).name));
  const { ConditionalNode, ConstantNode, FunctionNode, SymbolNode } = mathjs();
  const yes = new ConstantNode(true);
  const no = new ConstantNode(false);
  const test = (n: MathNode) => new ConditionalNode(n, yes, no);
  const rewrite = (n: MathNode): MathNode => {
    const m = n.map((child) => rewrite(child));
    if (m.type !== 'OperatorNode') return m;
    const { fn, args } = m as MathNode & { fn: string; args: MathNode[] };
    if ((fn === 'equal' || fn === 'unequal') && args.some(isText)) {
      const same = new FunctionNode(new SymbolNode('equalText'), args);
      return fn === 'equal' ? same : new ConditionalNode(same, no, yes);
    }
    if (fn === 'and') return new ConditionalNode(args[0], test(args[1]), no);
    if (fn === 'or') return new ConditionalNode(args[0], yes, test(args[1]));
    if (fn === 'not') return new ConditionalNode(args[0], no, yes);
    return m;
  };
  return { path: expr.path, name, text: expr.text, code: rewrite(expr.node).compile() };
}

/**
 * 0-based offset of the first occurrence of identifier `name` in `text` as a whole token,
 * outside string literals and number literals; undefined when absent.
 */
export function symbolPosition(text: string, name: string): number | undefined {
  let i = 0;
  while (i < text.length) {
    const c = text[i];
    if (c === '"' || c === "'") {
      i++;
      while (i < text.length && text[i] !== c) i += text[i] === '\\' ? 2 : 1;
      i++;
    } else if (/[0-9.]/.test(c)) {
      const m = /^(?:\d*\.?\d+|\d+\.)(?:[eE][+-]?\d+)?/.exec(text.slice(i));
      i += m ? m[0].length : 1;
    } else if (/[A-Za-z_$\u00c0-\uffff]/.test(c)) {
      const start = i;
      while (i < text.length && /[A-Za-z0-9_$\u00c0-\uffff]/.test(text[i])) i++;
      if (text.slice(start, i) === name) return start;
    } else i++;
  }
  return undefined;
}

function describeNode(type: string): string {
  const words: Record<string, string> = {
    AssignmentNode: 'assignment (=; use == to compare)',
    FunctionAssignmentNode: 'a function definition',
    AccessorNode: 'property access',
    IndexNode: 'indexing',
    ArrayNode: 'a matrix',
    ObjectNode: 'an object',
    RangeNode: 'a range (:)',
    BlockNode: 'several statements (; or newline)',
  };
  return words[type] ?? type;
}
