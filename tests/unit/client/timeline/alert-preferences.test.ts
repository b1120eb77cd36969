import { describe, expect, it } from "vitest";
import { readAlertPreferences, titleWithBadge, writeAlertPreference, type KeyValueStore } from "../../../../src/features/triggers/timeline/alert-preferences.ts";
import { createPageShortcutStore } from "../../../../src/lib/page-shortcuts.ts";

function memoryStore(): KeyValueStore & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return { data, getItem: (key) => data.get(key) ?? null, setItem: (key, value) => void data.set(key, value) };
}

describe("alert preferences", () => {
  it("start with sound and badge on", () => {
    expect(readAlertPreferences(memoryStore())).toEqual({ sound: true, titleBadge: true });
    expect(readAlertPreferences(null)).toEqual({ sound: true, titleBadge: true });
  });

  it("remember each switch on its own", () => {
    const store = memoryStore();
    writeAlertPreference(store, "sound", false);
    expect(readAlertPreferences(store)).toEqual({ sound: false, titleBadge: true });
    writeAlertPreference(store, "titleBadge", false);
    writeAlertPreference(store, "sound", true);
    expect(readAlertPreferences(store)).toEqual({ sound: true, titleBadge: false });
  });

  it("fall back to on when storage refuses or holds something unexpected", () => {
    const refusing: KeyValueStore = {
      getItem: () => {
        throw new Error("storage disabled");
      },
      setItem: () => {
        throw new Error("quota exceeded");
      },
    };
    expect(readAlertPreferences(refusing)).toEqual({ sound: true, titleBadge: true });
    expect(() => writeAlertPreference(refusing, "sound", false)).not.toThrow();
    const odd = memoryStore();
    odd.data.set("bellwether.timeline.sound", "maybe");
    expect(readAlertPreferences(odd).sound).toBe(true);
  });
});

describe("titleWithBadge", () => {
  it("puts the open count in front of the title while the badge is on", () => {
    expect(titleWithBadge("Bellwether", 3, true)).toBe("(3) Bellwether");
    expect(titleWithBadge("Bellwether", 250, true)).toBe("(99+) Bellwether");
  });

  it("leaves the title alone with nothing open or the badge off", () => {
    expect(titleWithBadge("Bellwether", 0, true)).toBe("Bellwether");
    expect(titleWithBadge("Bellwether", 3, false)).toBe("Bellwether");
  });
});

describe("page shortcut store", () => {
  it("lists what open pages registered, and forgets a page that leaves", () => {
    const store = createPageShortcutStore();
    let changes = 0;
    store.subscribe(() => changes++);
    const first = [{ label: "one", keys: ["j"] }];
    const second = [{ label: "two", keys: ["k"] }];
    const leaveFirst = store.register(first);
    store.register(second);
    expect(store.list().map((s) => s.label)).toEqual(["one", "two"]);
    const before = store.list();
    expect(store.list()).toBe(before); // the same array until something changes (React's external stores need that)
    leaveFirst();
    expect(store.list().map((s) => s.label)).toEqual(["two"]);
    expect(changes).toBe(3);
  });
});
