/**
 * Checks of a study's names and expressions against its family's parameters, before any work.
 */
import type { Study } from '../schemas/study';
import { isIssue, parseExpression, unknownSymbolIssues, type ParsedExpression } from './expressions';
import { suggest } from './suggest';
import type { Issue, ParamSpec } from './types';

/**
 * Parse every `derived` and `where` expression.
 * @returns the parsed expressions (in study order) and the syntax issues
 */
export function parseAll(study: Study): { derived: ParsedExpression[]; filters: ParsedExpression[]; issues: Issue[] } {
  const issues: Issue[] = [];
  const keep = (list: ParsedExpression[]) => (p: ParsedExpression | Issue) => (isIssue(p) ? issues.push(p) : list.push(p));
  const derived: ParsedExpression[] = [];
  const filters: ParsedExpression[] = [];
  for (const [name, text] of Object.entries(study.derived ?? {})) keep(derived)(parseExpression(text, `derived.${name}`));
  (study.where ?? []).forEach((text, i) => keep(filters)(parseExpression(text, `where[${i}]`)));
  return { derived, filters, issues };
}

/**
 * Issues in the names of `fixed`, `vary` and `derived`: a name given twice, or a name that
 * is not a family parameter and that no expression reads (most often a typo).
 * @param expressions - the parsed expressions, to know which auxiliary names are read
 */
export function checkNames(study: Study, specs: ReadonlyMap<string, ParamSpec>, expressions: readonly ParsedExpression[]): Issue[] {
  const issues: Issue[] = [];
  const fixed = study.fixed ?? {};
  const vary = study.vary ?? {};
  const read = new Set(expressions.flatMap((e) => e.symbols));
  const family = [...specs.keys()];
  const unknown = (section: string, name: string) => {
    if (specs.has(name) || read.has(name)) return;
    issues.push({
      path: `${section}.${name}`,
      message: `'${name}' is not a parameter of family '${study.family}' and no expression reads it${suggest(name, family)} (parameters: ${family.join(', ')})`,
    });
  };
  for (const name of Object.keys(fixed)) unknown('fixed', name);
  for (const name of Object.keys(vary)) {
    if (name in fixed) issues.push({ path: `vary.${name}`, message: `'${name}' is both fixed and varied` });
    else unknown('vary', name);
  }
  for (const name of Object.keys(study.derived ?? {})) {
    if (name in fixed || name in vary) {
      issues.push({ path: `derived.${name}`, message: `'${name}' is also in ${name in fixed ? 'fixed' : 'vary'}; a derived name takes its value from its expression only` });
    } else unknown('derived', name);
  }
  return issues;
}

/**
 * Issues for names an expression reads that have no value at its place: a `derived`
 * expression sees the family parameters, `fixed`, `vary` and the derived names above it;
 * a `where` filter sees all of them.
 */
export function checkExpressions(
  study: Study,
  specs: ReadonlyMap<string, ParamSpec>,
  derived: readonly ParsedExpression[],
  filters: readonly ParsedExpression[],
): Issue[] {
  const inputs = new Set([...specs.keys(), ...Object.keys(study.fixed ?? {}), ...Object.keys(study.vary ?? {})]);
  const derivedNames = Object.keys(study.derived ?? {});
  const issues: Issue[] = [];
  for (const e of derived) {
    const self = e.path.slice('derived.'.length);
    const at = derivedNames.indexOf(self);
    const later = new Set(derivedNames.slice(at));
    const known = new Set([...[...inputs].filter((n) => !later.has(n)), ...derivedNames.slice(0, at)]);
    issues.push(...unknownSymbolIssues(e, known, later, self));
  }
  const all = new Set([...inputs, ...derivedNames]);
  for (const e of filters) issues.push(...unknownSymbolIssues(e, all));
  return issues;
}
