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

/** Names for contact and group ids in descriptions ("Partners · 2 contacts"), where the lists are known. */
export function recipientNamesFor(options: RecipientOptions): { contact?: (id: number) => string; group?: (id: number) => string } {
  const namer = (list: readonly RecipientOption[] | null) => {
    if (!list) return undefined;
    const byId = new Map(list.map((o) => [o.id, o.label]));
    return (id: number) => byId.get(id) ?? `#${id}`;
  };
  return { contact: namer(options.contacts), group: namer(options.groups) };
}
