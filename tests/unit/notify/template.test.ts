import { describe, expect, it } from "vitest";
import { checkTemplate, placeholdersOf, renderTemplate } from "../../../shared/notify/template.ts";

describe("office message templates", () => {
  const allowed = ["rule", "zone", "link"];

  it("fills each placeholder with its value and keeps the text around it", () => {
    expect(renderTemplate("{rule} in {zone}: {link}", { rule: "Shear", zone: "West", link: "http://x/1" })).toBe("Shear in West: http://x/1");
  });

  it("writes a literal brace for a doubled one", () => {
    expect(renderTemplate("{{not a placeholder}} {rule}", { rule: "R" })).toBe("{not a placeholder} R");
    expect(checkTemplate("{{ok}}", allowed)).toEqual([]);
  });

  it("names an unknown placeholder and where it is", () => {
    const problems = checkTemplate("Rule {rule} at {when}", allowed);
    expect(problems).toHaveLength(1);
    expect(problems[0]!.message).toContain("{when}");
    expect(problems[0]!.position).toBe(15);
  });

  it("refuses an unclosed or stray brace", () => {
    expect(checkTemplate("Rule {rule", allowed)[0]!.message).toContain("never closed");
    expect(checkTemplate("Rule } here", allowed)[0]!.message).toContain("no opening");
    expect(checkTemplate("{two words}", allowed)[0]!.message).toContain("not a placeholder name");
  });

  it("lists the placeholders a template uses, once each", () => {
    expect(placeholdersOf("{zone} {rule} {zone}")).toEqual(["zone", "rule"]);
  });
});
