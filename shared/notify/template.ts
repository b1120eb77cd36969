/**
 * Office message templates: plain text with `{name}` placeholders. Deliberately tiny (no logic, no
 * escaping rules to learn): `{{` and `}}` write a literal brace, anything else in braces must be a
 * placeholder the template's kind knows, so a typo is caught when the template is saved rather than
 * when a trigger fires at 3 a.m.
 */

export type TemplateProblem = { message: string; position: number };

type Token = { kind: "text"; text: string } | { kind: "placeholder"; name: string; position: number };

function tokenize(template: string): { tokens: Token[]; problems: TemplateProblem[] } {
  const tokens: Token[] = [];
  const problems: TemplateProblem[] = [];
  let text = "";
  for (let i = 0; i < template.length; i++) {
    const ch = template[i]!;
    if (ch === "{" && template[i + 1] === "{") {
      text += "{";
      i++;
    } else if (ch === "}" && template[i + 1] === "}") {
      text += "}";
      i++;
    } else if (ch === "{") {
      const end = template.indexOf("}", i + 1);
      const name = end < 0 ? "" : template.slice(i + 1, end);
      if (end < 0 || !/^[a-zA-Z][a-zA-Z0-9]*$/.test(name)) {
        problems.push({ message: end < 0 ? "A { is never closed (write {{ for a literal brace)" : `"{${name}}" is not a placeholder name`, position: i });
        if (end < 0) break;
        i = end;
        continue;
      }
      if (text) tokens.push({ kind: "text", text });
      text = "";
      tokens.push({ kind: "placeholder", name, position: i });
      i = end;
    } else if (ch === "}") {
      problems.push({ message: "A } has no opening { (write }} for a literal brace)", position: i });
    } else {
      text += ch;
    }
  }
  if (text) tokens.push({ kind: "text", text });
  return { tokens, problems };
}

/** Problems in a template for the given allowed placeholders (empty when it is fine). */
export function checkTemplate(template: string, allowed: readonly string[]): TemplateProblem[] {
  const { tokens, problems } = tokenize(template);
  for (const token of tokens) {
    if (token.kind === "placeholder" && !allowed.includes(token.name)) {
      problems.push({ message: `Unknown placeholder {${token.name}}; use one of ${allowed.map((a) => `{${a}}`).join(", ")}`, position: token.position });
    }
  }
  return problems;
}

/** The placeholder names a template uses, in order of first use. */
export function placeholdersOf(template: string): string[] {
  const names: string[] = [];
  for (const token of tokenize(template).tokens) if (token.kind === "placeholder" && !names.includes(token.name)) names.push(token.name);
  return names;
}

/** Fills a checked template; an unknown placeholder (which `checkTemplate` would have refused) renders empty. */
export function renderTemplate(template: string, values: Readonly<Record<string, string>>): string {
  return tokenize(template)
    .tokens.map((t) => (t.kind === "text" ? t.text : (values[t.name] ?? "")))
    .join("");
}
