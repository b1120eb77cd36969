/**
 * Checks a syntax tree against the field catalogue and turns it into the typed rule tree. Every value is a
 * number, a category code, a yes/no flag or a condition; each operator accepts only the kinds that make
 * sense for it. Errors are collected (not just the first) and a node that already failed yields "invalid",
 * which silences its parents, so one mistake produces one message.
 */
import { FIELD_KEYS, FIELDS, fieldByKey, type FieldDefinition, type FieldKey } from "../fields.ts";
import type { SyntaxNode } from "./build-syntax-tree.ts";
import { checkComparison } from "./check-comparison.ts";
import type { ArithmeticOperator, ConditionNode, NumberNode, RuleError, RuleErrorCode, SourceSpan } from "./rule-ast.ts";
import { applyArithmetic, applyNumericFunction, RULE_FUNCTIONS, ruleFunctionByName } from "./rule-functions.ts";
import { didYouMean, suggestNames } from "./suggest-name.ts";
import type { RuleToken } from "./tokenize-rule.ts";

/** What a checked sub-expression turned out to be. */
export type Checked =
  | { readonly type: "number"; readonly node: NumberNode; readonly constant: number | undefined }
  | { readonly type: "category"; readonly node: NumberNode; readonly field: FieldDefinition }
  | { readonly type: "flag"; readonly node: NumberNode; readonly field: FieldDefinition }
  | { readonly type: "condition"; readonly node: ConditionNode }
  | { readonly type: "label"; readonly name: string }
  | { readonly type: "invalid" };

const ARITHMETIC = new Set(["+", "-", "*", "/", "^"]);
const COMPARISON = new Set(["<", "<=", ">", ">=", "==", "!="]);

/** Category label -> the category fields that define it, for `jet_quadrant == left_exit`. */
const LABEL_OWNERS = new Map<string, FieldDefinition[]>();
for (const field of FIELDS) {
  for (const c of field.categories ?? []) LABEL_OWNERS.set(c.label, [...(LABEL_OWNERS.get(c.label) ?? []), field]);
}

export class RuleTypeChecker {
  readonly errors: RuleError[] = [];
  readonly fieldKeys = new Set<FieldKey>();

  constructor(
    private readonly text: string,
    private readonly tokens: readonly RuleToken[],
  ) {}

  /** The whole expression: must be a condition. */
  checkRoot(tree: SyntaxNode): ConditionNode | undefined {
    const root = this.requireCondition(this.check(tree), tree, "A rule must be a condition that is met or not at each point (e.g. mlcape >= 1000), but this expression gives a number.", "NOT_A_CONDITION");
    if (root && this.errors.length === 0 && this.fieldKeys.size === 0) {
      this.report("NO_FIELDS", "The rule uses no field, so it would be the same at every point. Compare a catalogue field, e.g. mlcape >= 1000.", tree);
    }
    return this.errors.length === 0 ? root : undefined;
  }

  check(node: SyntaxNode): Checked {
    switch (node.kind) {
      case "name":
        return this.checkName(node);
      case "number":
        return { type: "number", node: { kind: "constant", value: node.value, text: node.text, span: this.span(node) }, constant: node.value };
      case "prefix":
        return this.checkPrefix(node);
      case "call":
        return this.checkCall(node);
      case "binary":
        if (ARITHMETIC.has(node.op)) return this.checkArithmetic(node);
        if (COMPARISON.has(node.op)) return checkComparison(this, node);
        return this.checkLogical(node);
    }
  }

  private checkName(node: Extract<SyntaxNode, { kind: "name" }>): Checked {
    const field = fieldByKey(node.name);
    if (field) {
      this.fieldKeys.add(field.key as FieldKey);
      const read: NumberNode = { kind: "field", key: field.key as FieldKey, span: this.span(node) };
      if (field.kind === "bool") return { type: "flag", node: read, field };
      if (field.kind === "category") return { type: "category", node: read, field };
      return { type: "number", node: read, constant: undefined };
    }
    if (ruleFunctionByName(node.name)) {
      return this.report("FUNCTION_NOT_CALLED", `"${node.name}" is a function; call it with parentheses: ${node.name}(...).`, node);
    }
    if (LABEL_OWNERS.has(node.name)) return { type: "label", name: node.name };
    if (node.name.toLowerCase() === "true" || node.name.toLowerCase() === "false") {
      return this.report("UNKNOWN_FIELD", `"${node.name}" is not part of rules. Use a yes/no field on its own (e.g. eff_present), or compare it with 1 or 0.`, node);
    }
    const hint = didYouMean(suggestNames(node.name, FIELD_KEYS)) || " Field names come from the catalogue, e.g. mlcape or shear_0_6km.";
    return this.report("UNKNOWN_FIELD", `Unknown field "${node.name}".${hint}`, node);
  }

  private checkPrefix(node: Extract<SyntaxNode, { kind: "prefix" }>): Checked {
    const operand = this.check(node.operand);
    if (node.op === "not") {
      const hint = '"not" needs a condition. It applies only to the value right after it, so write not (mlcape > 1000).';
      const condition = this.requireCondition(operand, node.operand, hint, "WRONG_TYPE");
      return condition ? { type: "condition", node: { kind: "not", operand: condition, span: this.span(node) } } : { type: "invalid" };
    }
    const number = this.requireNumber(operand, node.operand, `"${node.op}"`);
    if (!number) return { type: "invalid" };
    if (node.op === "+") return { type: "number", ...number };
    const constant = number.constant === undefined ? undefined : -number.constant;
    return { type: "number", node: { kind: "negate", operand: number.node, span: this.span(node) }, constant };
  }

  private checkArithmetic(node: Extract<SyntaxNode, { kind: "binary" }>): Checked {
    const left = this.requireNumber(this.check(node.left), node.left, `"${node.op}"`);
    const right = this.requireNumber(this.check(node.right), node.right, `"${node.op}"`);
    if (!left || !right) return { type: "invalid" };
    if (node.op === "/" && right.constant === 0) {
      return this.report("DIVISION_BY_ZERO", `Division by zero: "${this.quote(node.right)}" is always 0.`, node.right);
    }
    const op = node.op as ArithmeticOperator;
    const folded = left.constant !== undefined && right.constant !== undefined ? applyArithmetic(op, left.constant, right.constant) : undefined;
    const result: NumberNode = { kind: "arithmetic", op, left: left.node, right: right.node, span: this.span(node) };
    return this.finiteConstant({ type: "number", node: result, constant: folded }, node);
  }

  private checkLogical(node: Extract<SyntaxNode, { kind: "binary" }>): Checked {
    const op = node.op === "or" ? "or" : "and";
    const message = (side: SyntaxNode): string =>
      `"${this.quote(side)}" is a value, not a condition; "${op}" joins conditions such as mlcape >= 1000.`;
    const left = this.requireCondition(this.check(node.left), node.left, message(node.left), "WRONG_TYPE");
    const right = this.requireCondition(this.check(node.right), node.right, message(node.right), "WRONG_TYPE");
    if (!left || !right) return { type: "invalid" };
    return { type: "condition", node: { kind: "logical", op, left, right, span: this.span(node) } };
  }

  private checkCall(node: Extract<SyntaxNode, { kind: "call" }>): Checked {
    const info = ruleFunctionByName(node.name);
    const nameSpan = { first: node.nameIndex, last: node.nameIndex };
    if (!info) {
      node.args.forEach((a) => this.check(a)); // still report mistakes inside the arguments
      if (fieldByKey(node.name)) return this.report("NOT_A_FUNCTION", `"${node.name}" is a field, not a function.`, nameSpan);
      const names = RULE_FUNCTIONS.map((f) => f.name);
      const hint = didYouMean(suggestNames(node.name, names)) || ` Rules may call ${names.join(", ")}.`;
      return this.report("UNKNOWN_FUNCTION", `Unknown function "${node.name}".${hint}`, nameSpan);
    }
    const count = node.args.length;
    if (count < info.minArgs || count > info.maxArgs) {
      const wanted = info.maxArgs === Infinity ? `at least ${info.minArgs} values` : info.minArgs === 1 ? "1 value" : `${info.minArgs} values`;
      return this.report("WRONG_ARGUMENT_COUNT", `${info.name}() takes ${wanted} but got ${count}: ${info.signature}.`, node);
    }
    if (info.name === "oneof") return this.checkOneOf(node);
    const args = node.args.map((a) => this.requireNumber(this.check(a), a, `${info.name}()`));
    if (args.some((a) => a === undefined)) return { type: "invalid" };
    const numbers = args as { node: NumberNode; constant: number | undefined }[];
    if (info.name === "kt" && numbers[0].constant === undefined) {
      return this.report("CONSTANT_REQUIRED", "kt() converts a threshold written in knots to m/s; give it a number, e.g. shear_0_6km >= kt(40).", node.args[0]);
    }
    const constants = numbers.map((a) => a.constant);
    const folded = constants.every((c) => c !== undefined) ? applyNumericFunction(info.name, constants as number[]) : undefined;
    const call: NumberNode = { kind: "call", name: info.name, args: numbers.map((a) => a.node), span: this.span(node) };
    return this.finiteConstant({ type: "number", node: call, constant: folded }, node);
  }

  private checkOneOf(node: Extract<SyntaxNode, { kind: "call" }>): Checked {
    const [subjectNode, ...optionNodes] = node.args;
    const subject = this.check(subjectNode);
    if (subject.type === "invalid") return subject;
    if (subject.type !== "category") {
      return this.report("WRONG_TYPE", `oneof() needs a category field first, such as jet_quadrant; "${this.quote(subjectNode)}" is not one.`, subjectNode);
    }
    const options = optionNodes.map((o) => this.categoryCode(subject.field, this.check(o), o));
    if (options.some((o) => o === undefined)) return { type: "invalid" };
    return { type: "condition", node: { kind: "one-of", subject: subject.node, options: options as NumberNode[], span: this.span(node) } };
  }

  /** A constant standing for one of `field`'s categories (a code or a label), or undefined after reporting why not. */
  categoryCode(field: FieldDefinition, value: Checked, node: SyntaxNode): NumberNode | undefined {
    const categories = field.categories ?? [];
    const listing = categories.map((c) => `${c.code} ${c.label}`).join(", ");
    if (value.type === "invalid") return undefined;
    if (value.type === "label") {
      const category = categories.find((c) => c.label === value.name);
      if (category) return { kind: "constant", value: category.code, text: value.name, span: this.span(node) };
      this.report("CATEGORY_CODE_UNKNOWN", `${field.key} has no category "${value.name}". Its categories are ${listing}.`, node);
      return undefined;
    }
    if (value.type === "number" && value.constant !== undefined) {
      if (categories.some((c) => c.code === value.constant)) return value.node;
      this.report("CATEGORY_CODE_UNKNOWN", `${field.key} has no category ${value.constant}. Its categories are ${listing}.`, node);
      return undefined;
    }
    this.report("WRONG_TYPE", `"${field.key}" is a category; compare it with one of its codes or labels: ${listing}.`, node);
    return undefined;
  }

  requireNumber(value: Checked, node: SyntaxNode, user: string): { node: NumberNode; constant: number | undefined } | undefined {
    switch (value.type) {
      case "number":
        return value;
      case "category":
        this.report("ARITHMETIC_ON_CATEGORY", `"${value.field.key}" is a category (its codes name classes, not amounts), so ${user} cannot use it. Compare it with == or oneof().`, node);
        return undefined;
      case "flag":
        this.report("WRONG_TYPE", `"${value.field.key}" is a yes/no field; ${user} needs a number.`, node);
        return undefined;
      case "condition":
        this.report("WRONG_TYPE", `"${this.quote(node)}" is a condition; ${user} needs a number. Join conditions with and / or.`, node);
        return undefined;
      case "label":
        this.reportLabel(value.name, node);
        return undefined;
      case "invalid":
        return undefined;
    }
  }

  requireCondition(value: Checked, node: SyntaxNode, message: string, code: RuleErrorCode): ConditionNode | undefined {
    switch (value.type) {
      case "condition":
        return value.node;
      case "flag":
        return { kind: "flag", key: value.field.key as FieldKey, span: this.span(node) };
      case "label":
        this.reportLabel(value.name, node);
        return undefined;
      case "invalid":
        return undefined;
      default:
        this.report(code, message, node);
        return undefined;
    }
  }

  reportLabel(name: string, node: SyntaxNode): void {
    const owner = LABEL_OWNERS.get(name)![0].key;
    this.report("UNKNOWN_FIELD", `"${name}" is a category of ${owner}, not a field. Compare the field with it: ${owner} == ${name}.`, node);
  }

  report(code: RuleErrorCode, message: string, at: { first: number; last: number }): { type: "invalid" } {
    this.errors.push({ code, message, ...this.span(at) });
    return { type: "invalid" };
  }

  span(at: { first: number; last: number }): SourceSpan {
    const start = this.tokens[at.first];
    const end = this.tokens[at.last];
    return { position: start.position, length: end.position + end.length - start.position };
  }

  quote(at: { first: number; last: number }): string {
    const { position, length } = this.span(at);
    const text = this.text.slice(position, position + length);
    return text.length > 40 ? `${text.slice(0, 39)}…` : text;
  }

  private finiteConstant(value: Extract<Checked, { type: "number" }>, node: SyntaxNode): Checked {
    if (value.constant === undefined || Number.isFinite(value.constant)) return value;
    return this.report("INVALID_NUMBER", `"${this.quote(node)}" has no finite value.`, node);
  }
}
