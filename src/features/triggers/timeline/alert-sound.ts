/**
 * The short chime for a new trigger, made with the Web Audio API (no audio files): two soft sine
 * tones a fifth apart, each with a quick rise and a gentle fade so it never clicks or blares.
 * Browsers keep audio muted until the page has had a click or a key press; until then the chime
 * is silently skipped (the title badge and the list still show the trigger).
 */

type AudioContextConstructor = new () => AudioContext;

let context: AudioContext | null = null;

function audioContext(): AudioContext | null {
  if (context) return context;
  const Constructor = (globalThis as { AudioContext?: AudioContextConstructor }).AudioContext;
  if (!Constructor) return null;
  context = new Constructor();
  return context;
}

/** Lets the chime play later: call from a user gesture (any click or key on the page). */
export function unlockAlertSound(): void {
  const audio = audioContext();
  if (audio && audio.state === "suspended") void audio.resume().catch(() => undefined);
}

/** Tone frequencies in hertz and their start offsets in seconds. */
const TONES: ReadonlyArray<{ frequency: number; at: number }> = [
  { frequency: 660, at: 0 },
  { frequency: 990, at: 0.16 },
];
const TONE_SECONDS = 0.22;
const PEAK_GAIN = 0.12;

/** Plays the chime once; returns false when the browser cannot (no Web Audio, or not yet allowed). */
export function playNewTriggerChime(): boolean {
  const audio = audioContext();
  if (!audio || audio.state !== "running") return false;
  const start = audio.currentTime + 0.01;
  for (const tone of TONES) {
    const oscillator = audio.createOscillator();
    const gain = audio.createGain();
    oscillator.type = "sine";
    oscillator.frequency.value = tone.frequency;
    const t0 = start + tone.at;
    gain.gain.setValueAtTime(0, t0);
    gain.gain.linearRampToValueAtTime(PEAK_GAIN, t0 + 0.02);
    gain.gain.exponentialRampToValueAtTime(0.0005, t0 + TONE_SECONDS);
    oscillator.connect(gain).connect(audio.destination);
    oscillator.start(t0);
    oscillator.stop(t0 + TONE_SECONDS + 0.02);
  }
  return true;
}
