/** The one query-key factory for the notifications area; mutations invalidate through it. */
export const notifyKeys = {
  all: ["notify"] as const,
  contacts: () => [...notifyKeys.all, "contacts"] as const,
  groups: () => [...notifyKeys.all, "groups"] as const,
  shifts: (from: string, to: string) => [...notifyKeys.all, "shifts", from, to] as const,
  shiftsAll: () => [...notifyKeys.all, "shifts"] as const,
  settings: () => [...notifyKeys.all, "settings"] as const,
  deliveries: (triggerId: number) => [...notifyKeys.all, "deliveries", triggerId] as const,
  fakes: () => [...notifyKeys.all, "fakes"] as const,
  fakeMail: () => [...notifyKeys.fakes(), "mail"] as const,
  fakeSms: () => [...notifyKeys.fakes(), "sms"] as const,
  fakeStatus: () => [...notifyKeys.fakes(), "status"] as const,
};
