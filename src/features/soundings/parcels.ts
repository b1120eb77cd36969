/** The three parcels the library lifts, in the order the toggle cycles through them. */
export const PARCEL_IDS = ["sb", "ml", "mu"] as const;
export type ParcelId = (typeof PARCEL_IDS)[number];

export const PARCEL_NAMES: Record<ParcelId, string> = { sb: "surface-based", ml: "mixed-layer", mu: "most-unstable" };

/** Where each parcel starts, for legends and tooltips. */
export const PARCEL_ORIGINS: Record<ParcelId, string> = {
  sb: "lifted from the surface",
  ml: "mean of the lowest 100 hPa",
  mu: "highest θe in the lowest 300 hPa",
};

export const PARCEL_TAGS: Record<ParcelId, string> = { sb: "SB", ml: "ML", mu: "MU" };

/** The mixed-layer parcel is the usual first look, so its areas are shaded when the page opens. */
export const DEFAULT_SHADED_PARCEL: ParcelId = "ml";

export function nextParcel(id: ParcelId): ParcelId {
  return PARCEL_IDS[(PARCEL_IDS.indexOf(id) + 1) % PARCEL_IDS.length];
}

/** Catalogue keys of one parcel's fields. */
export function parcelFieldKeys(id: ParcelId) {
  return { cape: `${id}cape`, cin: `${id}cin`, el: `${id}el_hgt` } as const;
}
