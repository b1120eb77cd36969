/**
 * Tells the NetCDF flavours apart by their magic bytes (Unidata, "NetCDF file format
 * specifications"; HDF5 File Format Specification, superblock signature).
 */
export type NetcdfFlavour = "classic" | "64-bit-offset" | "cdf5" | "hdf5" | "unknown";

const HDF5_SIGNATURE = [0x89, 0x48, 0x44, 0x46, 0x0d, 0x0a, 0x1a, 0x0a];
// HDF5 may sit after a user block of 512 bytes times a power of two; netCDF-4 writers use 0.
const HDF5_SIGNATURE_OFFSETS = [0, 512, 1024, 2048, 4096];

export function detectNetcdfFlavour(bytes: Uint8Array): NetcdfFlavour {
  if (bytes.length >= 4 && bytes[0] === 0x43 && bytes[1] === 0x44 && bytes[2] === 0x46) {
    if (bytes[3] === 1) return "classic";
    if (bytes[3] === 2) return "64-bit-offset";
    if (bytes[3] === 5) return "cdf5";
    return "unknown";
  }
  for (const offset of HDF5_SIGNATURE_OFFSETS) {
    if (bytes.length < offset + HDF5_SIGNATURE.length) break;
    if (HDF5_SIGNATURE.every((byte, k) => bytes[offset + k] === byte)) return "hdf5";
  }
  return "unknown";
}
