import { describe, expect, it } from "vitest";
import { stepSelection, timelineKeyAction } from "../../../../src/features/triggers/timeline/timeline-selection.ts";

// A heading, two triggers, a grid arrival (not selectable), an escalation.
const keys = [null, "trigger-9", "trigger-8", null, "escalation-8"];

describe("stepSelection", () => {
  it("starts at the first selectable row whichever way the first step goes", () => {
    expect(stepSelection(keys, null, 1)).toBe("trigger-9");
    expect(stepSelection(keys, null, -1)).toBe("trigger-9");
  });

  it("moves down and up over rows that cannot be selected", () => {
    expect(stepSelection(keys, "trigger-9", 1)).toBe("trigger-8");
    expect(stepSelection(keys, "trigger-8", 1)).toBe("escalation-8");
    expect(stepSelection(keys, "escalation-8", -1)).toBe("trigger-8");
  });

  it("stays put at either end", () => {
    expect(stepSelection(keys, "escalation-8", 1)).toBe("escalation-8");
    expect(stepSelection(keys, "trigger-9", -1)).toBe("trigger-9");
  });

  it("keeps following the same row when a new trigger arrives on top", () => {
    const after = [null, "trigger-10", ...keys.slice(1)];
    expect(stepSelection(after, "trigger-8", -1)).toBe("trigger-9");
  });

  it("starts again at the top when the selected row has gone (filtered out), and gives null for a list with nothing to select", () => {
    expect(stepSelection(keys, "trigger-1", 1)).toBe("trigger-9");
    expect(stepSelection([null, null], null, 1)).toBeNull();
  });
});

describe("timelineKeyAction", () => {
  it("maps the timeline's keys", () => {
    expect(timelineKeyAction({ key: "j" })).toEqual({ type: "move", step: 1 });
    expect(timelineKeyAction({ key: "k" })).toEqual({ type: "move", step: -1 });
    expect(timelineKeyAction({ key: "a" })).toEqual({ type: "acknowledge", withNote: true });
    expect(timelineKeyAction({ key: "A" })).toEqual({ type: "acknowledge", withNote: false });
    expect(timelineKeyAction({ key: "Enter" })).toEqual({ type: "open" });
    expect(timelineKeyAction({ key: "h" })).toEqual({ type: "handover" });
  });

  it("leaves other keys, arrows and anything with Ctrl, Cmd or Alt to the browser", () => {
    expect(timelineKeyAction({ key: "x" })).toBeNull();
    expect(timelineKeyAction({ key: "ArrowDown" })).toBeNull();
    expect(timelineKeyAction({ key: "a", ctrlKey: true })).toBeNull();
    expect(timelineKeyAction({ key: "j", metaKey: true })).toBeNull();
    expect(timelineKeyAction({ key: "Enter", altKey: true })).toBeNull();
  });
});
