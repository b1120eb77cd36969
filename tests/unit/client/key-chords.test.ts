import { describe, expect, it } from "vitest";
import { CHORD_WINDOW_MS, createChordMatcher, isTypingTarget } from "../../../src/lib/key-chords.ts";

const bindings = [
  { shortcut: "o", path: "/" },
  { shortcut: "a", path: "/admin/accounts" },
];

describe("createChordMatcher", () => {
  it("navigates on g then a bound letter", () => {
    const press = createChordMatcher(bindings);
    expect(press({ key: "g", at: 0 })).toBeNull();
    expect(press({ key: "a", at: 300 })).toBe("/admin/accounts");
  });

  it("ignores a letter without the g first", () => {
    const press = createChordMatcher(bindings);
    expect(press({ key: "a", at: 0 })).toBeNull();
  });

  it("lets the chord lapse after the time window", () => {
    const press = createChordMatcher(bindings);
    press({ key: "g", at: 0 });
    expect(press({ key: "o", at: CHORD_WINDOW_MS + 1 })).toBeNull();
  });

  it("needs a fresh g after each chord", () => {
    const press = createChordMatcher(bindings);
    press({ key: "g", at: 0 });
    expect(press({ key: "o", at: 10 })).toBe("/");
    expect(press({ key: "a", at: 20 })).toBeNull();
  });

  it("treats g g as a restart rather than losing the chord", () => {
    const press = createChordMatcher(bindings);
    press({ key: "g", at: 0 });
    expect(press({ key: "g", at: 100 })).toBeNull();
    expect(press({ key: "o", at: 200 })).toBe("/");
  });

  it("breaks the chord on a modified key (browser shortcuts keep working)", () => {
    const press = createChordMatcher(bindings);
    press({ key: "g", at: 0 });
    expect(press({ key: "a", at: 10, ctrlKey: true })).toBeNull();
    expect(press({ key: "a", at: 20 })).toBeNull();
  });

  it("accepts upper-case letters (Caps Lock on)", () => {
    const press = createChordMatcher(bindings);
    press({ key: "G", at: 0 });
    expect(press({ key: "A", at: 10 })).toBe("/admin/accounts");
  });
});

describe("isTypingTarget", () => {
  it("is true for text fields, text areas, selects and editable content", () => {
    expect(isTypingTarget({ tagName: "INPUT", type: "text" })).toBe(true);
    expect(isTypingTarget({ tagName: "input", type: "password" })).toBe(true);
    expect(isTypingTarget({ tagName: "INPUT", type: "datetime-local" })).toBe(true);
    expect(isTypingTarget({ tagName: "TEXTAREA" })).toBe(true);
    expect(isTypingTarget({ tagName: "SELECT" })).toBe(true);
    expect(isTypingTarget({ tagName: "DIV", isContentEditable: true })).toBe(true);
  });

  it("is false for buttons, checkboxes and the page itself", () => {
    expect(isTypingTarget({ tagName: "INPUT", type: "checkbox" })).toBe(false);
    expect(isTypingTarget({ tagName: "BUTTON" })).toBe(false);
    expect(isTypingTarget({ tagName: "BODY" })).toBe(false);
    expect(isTypingTarget(null)).toBe(false);
  });
});
