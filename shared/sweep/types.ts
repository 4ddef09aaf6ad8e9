/**
 * Shapes shared by the sweep modules. `ParamSpec` has the same shape as the one the family
 * modules export, so a family's parameter list can be passed to `planSpace` as it is.
 */

/** One parameter of a truss family, as the family declares it. */
export interface ParamSpec {
  /** Identifier used in study files and expressions. */
  name: string;
  /** Unit of the parameter's numbers (a mathjs unit such as "m", or "" for a pure number). */
  unit: string;
  /** Value used when a study neither fixes nor varies the parameter. */
  default: number | string;
  /** Smallest allowed value, in `unit`. */
  min?: number;
  /** Largest allowed value, in `unit`. */
  max?: number;
  /** Whole numbers only (panel counts). */
  integer?: boolean;
  /** For a choice: the allowed strings. */
  options?: string[];
  /** One line for `panelpoint families` and the web form. */
  description: string;
}

/** A parameter value: a number in the parameter's unit, or an option string. */
export type ParamValue = number | string;

/** Values of the parameters of one variant, by name. */
export type Params = Record<string, ParamValue>;

/** A problem found in a study before any work, located in the study file. */
export interface Issue {
  /** Where in the study: `vary.depth.step`, `where[1]`, `derived.depth`, `combinations.cases.D`. */
  path: string;
  /** What is wrong, in words the user can act on. */
  message: string;
  /** For an expression: 0-based character offset of the bad symbol or syntax error in its text. */
  position?: number;
}
