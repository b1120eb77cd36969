/**
 * Whether the timeline plays a sound for a new trigger and shows the count of open triggers in the
 * tab's title. Both start on (a new trigger must be hard to miss) and each forecaster may turn them
 * off; the choice is kept in this browser's local storage.
 */
export interface AlertPreferences {
  sound: boolean;
  titleBadge: boolean;
}

export const DEFAULT_ALERT_PREFERENCES: AlertPreferences = { sound: true, titleBadge: true };

const STORAGE_KEYS: Record<keyof AlertPreferences, string> = {
  sound: "bellwether.timeline.sound",
  titleBadge: "bellwether.timeline.title-badge",
};

/** The part of Web Storage used here, so tests can pass a plain object. */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

/** Reads the stored choices; anything missing, unreadable or refused by the browser falls back to on. */
export function readAlertPreferences(store: KeyValueStore | null): AlertPreferences {
  const read = (name: keyof AlertPreferences): boolean => {
    try {
      const value = store?.getItem(STORAGE_KEYS[name]);
      return value === "off" ? false : value === "on" ? true : DEFAULT_ALERT_PREFERENCES[name];
    } catch {
      return DEFAULT_ALERT_PREFERENCES[name];
    }
  };
  return { sound: read("sound"), titleBadge: read("titleBadge") };
}

export function writeAlertPreference(store: KeyValueStore | null, name: keyof AlertPreferences, on: boolean): void {
  try {
    store?.setItem(STORAGE_KEYS[name], on ? "on" : "off");
  } catch {
    // Storage can be full or disabled (private windows); the choice then lasts for this page only.
  }
}

/** The tab title with the open-trigger count in front, "(3) Timeline · Bellwether", when the badge is on. */
export function titleWithBadge(baseTitle: string, openCount: number, badgeOn: boolean): string {
  if (!badgeOn || openCount <= 0) return baseTitle;
  return `(${openCount > 99 ? "99+" : openCount}) ${baseTitle}`;
}
