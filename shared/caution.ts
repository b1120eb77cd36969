/**
 * The safety caution shown on the sign-in page and carried by the README and every outgoing
 * e-mail. Kept in one place so every copy says the same thing.
 */
export const SAFETY_CAUTION =
  "Bellwether supports forecasters' judgement; it does not replace it. Its thresholds are " +
  "choices made by this office, not official criteria. Official watches and warnings and the " +
  "office's own procedures always take precedence. A notification may be late or may not " +
  "arrive at all, so keep the office's usual backup ways of alerting people in place.";
