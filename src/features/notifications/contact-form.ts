import type { FieldErrors, Resolver } from "react-hook-form";
import { contactInput, type Channel, type ContactDto, type ContactValues } from "@shared/api/notifications.ts";

/** The contact dialog's fields, as the inputs hold them. */
export interface ContactFormValues {
  name: string;
  organisation: string;
  email: string;
  mobile: string;
  channels: Channel[];
  quietEnabled: boolean;
  quietHours: { start: string; end: string; timeZone: string };
  userId: string;
  active: boolean;
}

/** Empty inputs become null, and quiet hours count only when switched on. */
export function toContactInput(values: ContactFormValues) {
  const { quietEnabled, quietHours, email, mobile, userId, ...rest } = values;
  return { ...rest, email: email.trim() || null, mobile: mobile.trim() || null, quietHours: quietEnabled ? quietHours : null, userId: userId ? Number(userId) : null };
}

/**
 * Checks the dialog with the same schema the server uses, so every message appears beside the
 * field it is about (the paths match: "email", "quietHours.start", …).
 */
export const contactResolver: Resolver<ContactFormValues, unknown, ContactValues> = async (values) => {
  const result = contactInput.safeParse(toContactInput(values));
  if (result.success) return { values: result.data, errors: {} };
  const errors: Record<string, unknown> = {};
  for (const issue of result.error.issues) {
    const path = issue.path.map(String);
    let node = errors;
    for (const key of path.slice(0, -1)) node = (node[key] ??= {}) as Record<string, unknown>;
    node[path.at(-1) ?? "name"] ??= { type: issue.code, message: issue.message };
  }
  return { values: {}, errors: errors as FieldErrors<ContactFormValues> };
};

export function contactFormValues(contact: ContactDto | null, officeTimeZone: string): ContactFormValues {
  return {
    name: contact?.name ?? "",
    organisation: contact?.organisation ?? "",
    email: contact?.email ?? "",
    mobile: contact?.mobile ?? "",
    channels: contact?.channels ?? ["email"],
    quietEnabled: Boolean(contact?.quietHours),
    quietHours: contact?.quietHours ?? { start: "22:00", end: "06:00", timeZone: officeTimeZone },
    userId: contact?.userId ? String(contact.userId) : "",
    active: contact?.active ?? true,
  };
}
