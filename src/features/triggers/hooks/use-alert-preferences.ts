import { useSyncExternalStore } from "react";
import { readAlertPreferences, writeAlertPreference, type AlertPreferences, type KeyValueStore } from "../timeline/alert-preferences.ts";

function browserStore(): KeyValueStore | null {
  try {
    return window.localStorage;
  } catch {
    return null;
  }
}

// One copy per tab, shared by the switches on the timeline and the alerts that run on every page.
let current: AlertPreferences | null = null;
const listeners = new Set<() => void>();

function snapshot(): AlertPreferences {
  current ??= readAlertPreferences(browserStore());
  return current;
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  // Another tab changed a switch: follow it.
  const onStorage = () => {
    current = readAlertPreferences(browserStore());
    listener();
  };
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}

export function setAlertPreference(name: keyof AlertPreferences, on: boolean): void {
  writeAlertPreference(browserStore(), name, on);
  current = { ...snapshot(), [name]: on };
  for (const listener of listeners) listener();
}

/** The sound and title-badge switches, remembered in this browser. */
export function useAlertPreferences(): AlertPreferences {
  return useSyncExternalStore(subscribe, snapshot, snapshot);
}
