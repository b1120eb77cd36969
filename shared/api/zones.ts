import { z } from "zod";
import { zoneGeometrySchema } from "../zones/zone-geometry.ts";

const code = z
  .string()
  .trim()
  .min(1, "Give the zone a code")
  .max(20)
  .regex(/^[A-Za-z0-9_-]+$/, "Zone codes use letters, digits, dash and underscore");
const name = z.string().trim().min(1, "Give the zone a name").max(120);

export const createZoneInput = z.object({ code, name, geometry: zoneGeometrySchema });
export type CreateZoneInput = z.infer<typeof createZoneInput>;

export const updateZoneInput = z
  .object({ code: code.optional(), name: name.optional(), geometry: zoneGeometrySchema.optional() })
  .refine((v) => Object.keys(v).length > 0, "Send at least one of code, name, geometry");
export type UpdateZoneInput = z.infer<typeof updateZoneInput>;

/** An uploaded FeatureCollection: each feature's properties carry `code` and `name`. */
export const importZonesInput = z.object({
  type: z.literal("FeatureCollection", { error: 'Upload a GeoJSON FeatureCollection ("type": "FeatureCollection")' }),
  features: z
    .array(
      z.object({
        type: z.literal("Feature"),
        properties: z.object({ code, name }, { error: "Each feature needs properties.code and properties.name" }),
        geometry: zoneGeometrySchema,
      }),
    )
    .min(1, "The collection holds no features")
    .max(500),
});
export type ImportZonesInput = z.infer<typeof importZonesInput>;

export const zoneDto = z.object({
  id: z.number().int(),
  code: z.string(),
  name: z.string(),
  geometry: zoneGeometrySchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  /** Grid points the zone covers on each stored grid; a zone with 0 on a grid is flagged there. */
  coverage: z.array(z.object({ geometryKey: z.string(), points: z.number().int() })),
  /** True when the zone covers no point of at least one stored grid. */
  coversNothing: z.boolean(),
});
export type ZoneDto = z.infer<typeof zoneDto>;
