import { queryOptions, useQuery } from "@tanstack/react-query";
import { api, ApiError } from "@/lib/api-client.ts";
import { mapKeys } from "./map-keys.ts";

/** One stored field: values in the canonical layout (index = j * nx + i), NaN where there is none. */
export interface FieldValues {
  nx: number;
  ny: number;
  values: Float32Array;
}

/**
 * Reads a field's raw bytes (little-endian Float32) and checks them against the size headers and
 * the frame's own grid before anything is drawn from them.
 */
export function decodeFieldBytes(bytes: ArrayBuffer, headers: Headers, expected: { nx: number; ny: number }): FieldValues {
  const nx = Number(headers.get("x-grid-nx"));
  const ny = Number(headers.get("x-grid-ny"));
  const fail = (message: string) => new ApiError({ status: 200, code: "INVALID_RESPONSE", message });
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx <= 0 || ny <= 0) throw fail("The field reply had no valid x-grid-nx / x-grid-ny headers");
  if (nx !== expected.nx || ny !== expected.ny) throw fail(`The field is ${nx} × ${ny} points but the frame's grid is ${expected.nx} × ${expected.ny}`);
  if (bytes.byteLength !== nx * ny * 4) throw fail(`The field reply has ${bytes.byteLength} bytes; ${nx} × ${ny} Float32 values need ${nx * ny * 4}`);
  const view = new DataView(bytes);
  const values = new Float32Array(nx * ny);
  for (let k = 0; k < values.length; k++) values[k] = view.getFloat32(k * 4, true);
  return { nx, ny, values };
}

export async function getFieldValues(frameId: number, key: string, grid: { nx: number; ny: number }, signal?: AbortSignal): Promise<FieldValues> {
  const { bytes, headers } = await api.getBytes(`/api/grids/frames/${frameId}/fields/${encodeURIComponent(key)}`, { signal });
  return decodeFieldBytes(bytes, headers, grid);
}

export const fieldValuesQuery = (frameId: number, key: string, grid: { nx: number; ny: number }) =>
  queryOptions({
    queryKey: mapKeys.field(frameId, key),
    queryFn: ({ signal }) => getFieldValues(frameId, key, grid, signal),
    staleTime: Infinity,
    gcTime: 2 * 60_000,
  });

/** A field of a frame; idle until both the frame's grid and the key are known. */
export function useFieldValues(frameId: number, key: string | null, grid: { nx: number; ny: number } | null) {
  return useQuery({
    ...fieldValuesQuery(frameId, key ?? "", grid ?? { nx: 0, ny: 0 }),
    enabled: key !== null && grid !== null,
  });
}
