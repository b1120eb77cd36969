import type { ZoneGeometry } from "@shared/zones/zone-geometry.ts";

/** A zone as the rule screens need it (the route hands these over from the zones feature). */
export interface ZoneOption {
  id: number;
  code: string;
  name: string;
  coversNothing: boolean;
  geometry: ZoneGeometry;
}

/** A named contact or group a rule may notify; null lists mean none can be looked up yet. */
export interface RecipientOption {
  id: number;
  label: string;
}

export interface RecipientOptions {
  contacts: readonly RecipientOption[] | null;
  groups: readonly RecipientOption[] | null;
}

/** "CWB Cottonwood Breaks (demo)", or "zone 7" for one that is no longer listed (archived). */
export function zoneLabelFor(zones: readonly ZoneOption[]): (id: number) => string {
  const byId = new Map(zones.map((z) => [z.id, z]));
  return (id) => {
    const zone = byId.get(id);
    return zone ? `${zone.code} ${zone.name}` : `zone ${id} (archived)`;
  };
}
