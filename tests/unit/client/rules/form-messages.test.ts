import { describe, expect, it } from "vitest";
import { nestedMessages } from "../../../../src/features/rules/editor/form-messages.ts";

describe("messages of a nested form error", () => {
  it("flattens one level and keeps the part's own message under the empty key", () => {
    const error = { message: "Choose at least one recipient", type: "custom", ref: {}, contactIds: { message: "Each contact may be listed once", type: "custom" }, onCall: undefined };
    // Derived in closed form: the react-hook-form error tree above, read one level deep.
    expect(nestedMessages(error)).toEqual({ "": "Choose at least one recipient", contactIds: "Each contact may be listed once" });
  });

  it("gives nothing for no error", () => {
    expect(nestedMessages(undefined)).toEqual({}); // Derived in closed form
  });
});
