import { describe, expect, it } from "vitest";
import { createRefreshGate } from "../../../../src/lib/refresh-gate.ts";

/** A refresh whose completion the test controls. */
function controlledRefresh() {
  const pending: Array<() => void> = [];
  let started = 0;
  return {
    refresh: () => {
      started++;
      return new Promise<void>((resolve) => pending.push(resolve));
    },
    finishOne: async () => {
      pending.shift()?.();
      // Let the gate's await continue.
      await new Promise((resolve) => setTimeout(resolve, 0));
    },
    started: () => started,
  };
}

describe("createRefreshGate", () => {
  it("starts a refresh at once when none is running", () => {
    const control = controlledRefresh();
    const gate = createRefreshGate(control.refresh);
    gate.request();
    expect(control.started()).toBe(1);
    expect(gate.isRunning()).toBe(true);
  });

  it("folds a burst of requests into one follow-up refresh after the running one", async () => {
    const control = controlledRefresh();
    const gate = createRefreshGate(control.refresh);
    gate.request();
    for (let k = 0; k < 20; k++) gate.request();
    expect(control.started()).toBe(1);
    await control.finishOne();
    expect(control.started()).toBe(2);
    await control.finishOne();
    expect(control.started()).toBe(2);
    expect(gate.isRunning()).toBe(false);
  });

  it("keeps going after a failed refresh", async () => {
    let calls = 0;
    const gate = createRefreshGate(async () => {
      calls++;
      if (calls === 1) throw new Error("network down");
    });
    gate.request();
    await new Promise((resolve) => setTimeout(resolve, 0));
    gate.request();
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(calls).toBe(2);
    expect(gate.isRunning()).toBe(false);
  });
});
