/**
 * Parses the token list with expr-eval-fork and turns the instruction list it produces (reverse Polish,
 * with `and`/`or` right-hand sides nested as sub-lists) into a plain syntax tree whose nodes know which
 * tokens they cover, so later checks can point at the exact text.
 *
 * Why positions can be recovered: in reverse Polish the names and numbers keep their left-to-right order,
 * so the k-th leaf instruction is the k-th name/number token. Operators sit right after their left operand
 * (binary) or right before their operand (prefix), once grouping parentheses are counted in.
 */
import { Parser } from "expr-eval-fork";
import type { SyntaxStructure } from "./check-syntax.ts";
import type { RuleToken } from "./tokenize-rule.ts";

export type SyntaxNode =
  | { readonly kind: "name"; readonly name: string; readonly first: number; readonly last: number }
  | { readonly kind: "number"; readonly value: number; readonly text: string; readonly first: number; readonly last: number }
  | { readonly kind: "prefix"; readonly op: "-" | "+" | "not"; readonly operand: SyntaxNode; readonly first: number; readonly last: number }
  | {
      readonly kind: "binary";
      readonly op: string;
      readonly left: SyntaxNode;
      readonly right: SyntaxNode;
      readonly opIndex: number;
      readonly first: number;
      readonly last: number;
    }
  | {
      readonly kind: "call";
      readonly name: string;
      readonly nameIndex: number;
      readonly args: readonly SyntaxNode[];
      readonly first: number;
      readonly last: number;
    };

/** The parser disagreed with the token checks; never expected, reported as a syntax error. */
export class TreeBuildError extends Error {}

interface Instruction {
  readonly type: string;
  readonly value: unknown;
}

/**
 * One shared parser. Everything the language leaves out is switched off, and the operator, function and
 * constant tables are replaced by prototype-free objects holding only what rules use. With prototype-free
 * tables, names such as `constructor` or `toString` stay plain names instead of matching inherited keys.
 * The fork is used only to parse: it never evaluates anything, so its function table stays empty.
 */
const parser = createRuleParser();

function createRuleParser(): Parser {
  const p = new Parser({
    allowMemberAccess: false,
    operators: {
      add: true, subtract: true, multiply: true, divide: true, power: true, comparison: true, logical: true,
      remainder: false, concatenate: false, conditional: false, factorial: false, in: false, assignment: false, fndef: false,
    },
  });
  const table = (keys: readonly string[]): Record<string, true> => Object.assign(Object.create(null), Object.fromEntries(keys.map((k) => [k, true])));
  // binaryOps and ternaryOps exist at run time but are missing from the package's type declarations.
  const tables = p as unknown as Record<"unaryOps" | "binaryOps" | "ternaryOps" | "functions" | "consts", object>;
  tables.unaryOps = table(["-", "+", "not"]);
  tables.binaryOps = table(["+", "-", "*", "/", "^", "==", "!=", "<", "<=", ">", ">=", "and", "or"]);
  tables.ternaryOps = table([]);
  tables.functions = table([]);
  tables.consts = table([]);
  return p;
}

export function buildSyntaxTree(tokens: readonly RuleToken[], structure: SyntaxStructure): SyntaxNode {
  const source = tokens.map((t) => t.canonical).join(" ");
  const parsed = parser.parse(source) as unknown as { tokens?: unknown };
  if (!Array.isArray(parsed.tokens)) throw new TreeBuildError("the parser returned no instruction list");
  const leaves = tokens.flatMap((t, i) => (t.kind === "name" || t.kind === "number" ? [i] : []));
  const builder = new TreeBuilder(tokens, structure, leaves);
  const root = builder.build(parsed.tokens as Instruction[]);
  if (builder.leafCursor !== leaves.length) throw new TreeBuildError("not every token was used");
  return root;
}

class TreeBuilder {
  leafCursor = 0;

  constructor(
    private readonly tokens: readonly RuleToken[],
    private readonly structure: SyntaxStructure,
    private readonly leaves: readonly number[],
  ) {}

  build(instructions: readonly Instruction[]): SyntaxNode {
    const stack: SyntaxNode[] = [];
    const pop = (): SyntaxNode => stack.pop() ?? fail("operand missing");
    for (const ins of instructions) {
      switch (ins.type) {
        case "IVAR": {
          const i = this.nextLeaf("name", ins.value);
          stack.push(this.group({ kind: "name", name: this.tokens[i].text, first: i, last: i }));
          break;
        }
        case "INUMBER": {
          if (typeof ins.value !== "number") fail("non-numeric literal");
          const i = this.nextLeaf("number", ins.value);
          stack.push(this.group({ kind: "number", value: ins.value as number, text: this.tokens[i].text, first: i, last: i }));
          break;
        }
        case "IOP1": {
          const operand = pop();
          const opIndex = this.expectOperator(operand.first - 1, ins.value);
          const op = ins.value as "-" | "+" | "not";
          stack.push(this.group({ kind: "prefix", op, operand, first: opIndex, last: operand.last }));
          break;
        }
        case "IOP2": {
          const right = pop();
          const left = pop();
          const opIndex = this.expectOperator(left.last + 1, ins.value);
          stack.push(this.group({ kind: "binary", op: ins.value as string, left, right, opIndex, first: left.first, last: right.last }));
          break;
        }
        case "IFUNCALL": {
          const args = stack.splice(stack.length - Number(ins.value));
          const callee = pop();
          if (callee.kind !== "name" || callee.first !== callee.last) fail("call of something that is not a name");
          const close = this.structure.matching[callee.first + 1] ?? -1;
          if (close < 0) fail("call without parentheses");
          stack.push(this.group({ kind: "call", name: (callee as { name: string }).name, nameIndex: callee.first, args, first: callee.first, last: close }));
          break;
        }
        case "IEXPR":
          if (!Array.isArray(ins.value)) fail("malformed sub-expression");
          stack.push(this.build(ins.value as Instruction[]));
          break;
        default:
          fail(`unexpected instruction ${ins.type}`);
      }
    }
    if (stack.length !== 1) fail("expression did not reduce to one value");
    return stack[0];
  }

  private nextLeaf(kind: "name" | "number", value: unknown): number {
    const i = this.leaves[this.leafCursor++];
    const t = i === undefined ? undefined : this.tokens[i];
    const same = kind === "name" ? t?.text === value : t !== undefined && Number(t.text) === value;
    if (t?.kind !== kind || !same) fail(`leaf ${String(value)} out of order`);
    return i;
  }

  private expectOperator(index: number, op: unknown): number {
    const t = this.tokens[index];
    if (t?.kind !== "operator" || t.canonical !== op) fail(`operator ${String(op)} not where expected`);
    return index;
  }

  /** Widens a node over the grouping parentheses around it (never over a call's own parentheses). */
  private group<T extends SyntaxNode>(node: T): T {
    let first = node.first;
    let last = node.last;
    const { matching, callOpen } = this.structure;
    while (first > 0 && this.tokens[first - 1].kind === "open" && !callOpen[first - 1] && matching[first - 1] === last + 1) {
      first--;
      last++;
    }
    return first === node.first ? node : { ...node, first, last };
  }
}

function fail(reason: string): never {
  throw new TreeBuildError(reason);
}
