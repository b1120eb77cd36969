/** The one query-key factory for accounts: every mutation invalidates `userKeys.all`. */
export const userKeys = {
  all: ["users"] as const,
  list: () => [...userKeys.all, "list"] as const,
};
