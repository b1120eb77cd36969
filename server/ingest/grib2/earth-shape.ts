import { isAllOnes, readUint32 } from "./bytes.ts";
import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";

/** Figure of the Earth declared by a grid definition (WMO-No. 306, GRIB2 Code Table 3.2). */
export interface EarthShape {
  /** Code figure from Code Table 3.2. */
  code: number;
  /** Semi-major and semi-minor axes in metres; equal for a sphere. */
  semiMajorAxis: number;
  semiMinorAxis: number;
  /**
   * Radius used for spherical projection maths. For a sphere it is the sphere's radius; for a spheroid it is the
   * mean radius (2a + b) / 3 (Moritz 1980, Geodetic Reference System 1980), because Bellwether's grids are spherical.
   */
  sphereRadius: number;
}

function sphere(code: number, radius: number): EarthShape {
  return { code, semiMajorAxis: radius, semiMinorAxis: radius, sphereRadius: radius };
}

function spheroid(code: number, a: number, b: number): EarthShape {
  return { code, semiMajorAxis: a, semiMinorAxis: b, sphereRadius: (2 * a + b) / 3 };
}

/** WGS 84 flattening 1/298.257223563 (NIMA TR8350.2, 2000). */
const WGS84_A = 6378137;
const WGS84_B = WGS84_A * (1 - 1 / 298.257223563);

/**
 * Reads octets 15-30 of a grid definition template (shape code, then three scale factor + scaled value pairs:
 * radius, major axis, minor axis), which templates 3.0, 3.20 and 3.30 share.
 */
export function readEarthShape(bytes: Uint8Array, sectionOffset: number, where: Grib2ErrorLocation): EarthShape {
  const code = bytes[sectionOffset + 14];
  const scaled = (factorOctet: number, label: string): number => {
    const at = sectionOffset + factorOctet - 1;
    if (bytes[at] === 0xff || isAllOnes(bytes, at + 1, 4)) {
      throw new Grib2DecodeError(where, `shape of the Earth ${code} needs the ${label}, but it is coded as missing`);
    }
    return readUint32(bytes, at + 1) / 10 ** bytes[at];
  };
  switch (code) {
    case 0:
      return sphere(0, 6367470);
    case 1:
      return sphere(1, scaled(16, "radius of the spherical Earth"));
    case 2:
      return spheroid(2, 6378160, 6356775); // IAU 1965
    case 3:
      return spheroid(3, scaled(21, "major axis") * 1000, scaled(26, "minor axis") * 1000);
    case 4:
      return spheroid(4, 6378137, 6356752.314); // IAG-GRS80
    case 5:
      return spheroid(5, WGS84_A, WGS84_B);
    case 6:
      return sphere(6, 6371229);
    case 7:
      return spheroid(7, scaled(21, "major axis"), scaled(26, "minor axis"));
    case 8:
      return sphere(8, 6371200);
    case 9:
      return spheroid(9, 6377563.396, 6356256.909); // OSGB 1936 (Airy 1830)
    default:
      throw new Grib2DecodeError(where, `shape of the Earth code ${code} (Code Table 3.2) is not supported`);
  }
}
