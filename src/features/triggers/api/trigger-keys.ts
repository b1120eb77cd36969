/** The one query-key factory for triggers and the timeline: live events and actions invalidate through it. */
export const triggerKeys = {
  all: ["triggers"] as const,
  timeline: () => [...triggerKeys.all, "timeline"] as const,
  active: () => [...triggerKeys.all, "active"] as const,
  details: () => [...triggerKeys.all, "detail"] as const,
  detail: (triggerId: number) => [...triggerKeys.details(), triggerId] as const,
  mask: (triggerId: number, frameId: number) => [...triggerKeys.all, "mask", triggerId, frameId] as const,
};
