import { CreateFoundation20261202T0200Z } from "../migrations/20261202T0200Z-create-foundation.ts";

/** Checked-in migrations in the order they run; add new ones at the end. */
export const MIGRATIONS = [CreateFoundation20261202T0200Z];
