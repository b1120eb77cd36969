/**
 * The typed tree a checked rule expression becomes. The parser builds it, the compiler turns it into a
 * vectorised evaluator and the formatter prints it back. Conditions and numbers are separate unions, so
 * the compiler never has to ask at run time whether a node yields a mask or a value.
 */
import type { FieldKey } from "../fields.ts";

/** 0-based character offset and length in the text the user typed (what the editor underlines). */
export interface SourceSpan {
  readonly position: number;
  readonly length: number;
}

export type RuleErrorCode =
  | "EMPTY_EXPRESSION"
  | "EXPRESSION_TOO_LONG"
  | "TOO_DEEPLY_NESTED"
  | "UNEXPECTED_CHARACTER"
  | "STRING_NOT_ALLOWED"
  | "MEMBER_ACCESS_NOT_ALLOWED"
  | "ARRAY_NOT_ALLOWED"
  | "ASSIGNMENT_NOT_ALLOWED"
  | "CONDITIONAL_NOT_ALLOWED"
  | "MULTIPLE_STATEMENTS"
  | "COMMENT_NOT_ALLOWED"
  | "UNSUPPORTED_OPERATOR"
  | "INVALID_NUMBER"
  | "SYNTAX_ERROR"
  | "UNBALANCED_PARENTHESIS"
  | "UNKNOWN_FIELD"
  | "UNKNOWN_FUNCTION"
  | "NOT_A_FUNCTION"
  | "FUNCTION_NOT_CALLED"
  | "WRONG_ARGUMENT_COUNT"
  | "CONSTANT_REQUIRED"
  | "WRONG_TYPE"
  | "ARITHMETIC_ON_CATEGORY"
  | "CATEGORY_CODE_UNKNOWN"
  | "DIVISION_BY_ZERO"
  | "NOT_A_CONDITION"
  | "NO_FIELDS";

/** One problem in an expression, placed so an editor can underline it. */
export interface RuleError extends SourceSpan {
  readonly code: RuleErrorCode;
  readonly message: string;
}

export type ComparisonOperator = "<" | "<=" | ">" | ">=" | "==" | "!=";
export type ArithmeticOperator = "+" | "-" | "*" | "/" | "^";
export type LogicalOperator = "and" | "or";
export type NumericFunctionName = "abs" | "sqrt" | "min" | "max" | "hypot" | "kt";

/** Something that has a value at every grid point. */
export type NumberNode =
  | { readonly kind: "field"; readonly key: FieldKey; readonly span: SourceSpan }
  /** `text` is how the constant was written (a number or a category label), kept for printing. */
  | { readonly kind: "constant"; readonly value: number; readonly text: string; readonly span: SourceSpan }
  | { readonly kind: "negate"; readonly operand: NumberNode; readonly span: SourceSpan }
  | {
      readonly kind: "arithmetic";
      readonly op: ArithmeticOperator;
      readonly left: NumberNode;
      readonly right: NumberNode;
      readonly span: SourceSpan;
    }
  | {
      readonly kind: "call";
      readonly name: NumericFunctionName;
      readonly args: readonly NumberNode[];
      readonly span: SourceSpan;
    };

/** Something that is met, not met, or undecided (missing data) at every grid point. */
export type ConditionNode =
  /** A yes/no catalogue field used on its own: met where it is 1. */
  | { readonly kind: "flag"; readonly key: FieldKey; readonly span: SourceSpan }
  | {
      readonly kind: "compare";
      readonly op: ComparisonOperator;
      readonly left: NumberNode;
      readonly right: NumberNode;
      readonly span: SourceSpan;
    }
  /** `oneof(field, a, b, ...)`: the field equals one of the listed constants. */
  | {
      readonly kind: "one-of";
      readonly subject: NumberNode;
      readonly options: readonly NumberNode[];
      readonly span: SourceSpan;
    }
  | { readonly kind: "not"; readonly operand: ConditionNode; readonly span: SourceSpan }
  | {
      readonly kind: "logical";
      readonly op: LogicalOperator;
      readonly left: ConditionNode;
      readonly right: ConditionNode;
      readonly span: SourceSpan;
    };

/** An expression that passed every check: safe to compile and to store. */
export interface CheckedRule {
  /** The text as the user wrote it. */
  readonly expression: string;
  readonly root: ConditionNode;
  /** Catalogue keys the expression reads, in order of first use. */
  readonly fieldKeys: readonly FieldKey[];
  /** One canonical spelling: word operators, single spaces, only the parentheses the meaning needs. */
  readonly normalised: string;
}

export type RuleParseResult =
  | { readonly ok: true; readonly rule: CheckedRule }
  | { readonly ok: false; readonly errors: readonly RuleError[] };
