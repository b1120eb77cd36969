import { describe, expect, it } from "vitest";
import { decodeGrib2, Grib2DecodeError, scanGrib2 } from "../../../server/ingest/grib2/index.ts";
import { putUint } from "../../fixtures/grib2/own-encoder/octets.ts";
import { buildMessage, readSections, sectionOf } from "../../fixtures/grib2/own-encoder/message-builder.ts";
import { readFixture } from "./helpers/fixtures.ts";

// This file never loads the JPEG 2000 codec, so it can check the error for a missing codec.

function errorOf(action: () => unknown): Grib2DecodeError {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(Grib2DecodeError);
    return error as Grib2DecodeError;
  }
  throw new Error("expected a Grib2DecodeError, but decoding succeeded");
}

/** Byte offsets of sections 1-7 in a single-field message. */
function sectionOffsets(message: Uint8Array): Record<number, number> {
  const offsets: Record<number, number> = {};
  let pos = 16;
  while (pos < message.length - 4) {
    offsets[message[pos + 4]] = pos;
    pos += (message[pos] << 24) + (message[pos + 1] << 16) + (message[pos + 2] << 8) + message[pos + 3];
  }
  return offsets;
}

/** A copy of the 12 x 9, 16-bit simple-packing fixture (395 bytes) changed by `edit`. */
function edited(edit: (bytes: Uint8Array, sections: Record<number, number>) => void, name = "simple-16bit.grib2"): Uint8Array {
  const bytes = readFixture(name).slice();
  edit(bytes, sectionOffsets(bytes));
  return bytes;
}

describe("files that are not GRIB2", () => {
  it("rejects text", () => {
    const error = errorOf(() => decodeGrib2(new TextEncoder().encode("temperature,pressure\n")));
    expect(error.message).toMatch(/not a GRIB file: expected the marker "GRIB"/);
    expect(error).toMatchObject({ messageNumber: 1, section: 0, byteOffset: 0 });
  });

  it("rejects an empty file", () => {
    expect(errorOf(() => decodeGrib2(new Uint8Array(0))).message).toMatch(/not a GRIB file: it is empty/);
  });

  it("rejects GRIB edition 1", () => {
    const error = errorOf(() => decodeGrib2(edited((b) => (b[7] = 1))));
    expect(error.message).toMatch(/GRIB edition 1 is not supported/);
  });

  it("rejects bytes after a message that are neither padding nor another message", () => {
    const message = readFixture("simple-16bit.grib2");
    const withTail = new Uint8Array(message.length + 8);
    withTail.set(message);
    withTail.set(new TextEncoder().encode("trailing"), message.length);
    const error = errorOf(() => decodeGrib2(withTail));
    expect(error).toMatchObject({ messageNumber: 2, byteOffset: message.length });
    expect(error.message).toMatch(/unexpected bytes/);
  });

  it("accepts zero padding after the last message", () => {
    const message = readFixture("simple-16bit.grib2");
    const padded = new Uint8Array(message.length + 16);
    padded.set(message);
    expect(decodeGrib2(padded)).toHaveLength(1);
  });
});

describe("truncated files and wrong lengths", () => {
  it("a truncated file names the declared and the available length", () => {
    const bytes = readFixture("simple-16bit.grib2");
    const error = errorOf(() => decodeGrib2(bytes.subarray(0, bytes.length - 10)));
    expect(error.message).toBe(
      `GRIB2, message 1, section 0, at byte 0: truncated: the message declares ${bytes.length} bytes but only ${bytes.length - 10} remain in the file`,
    );
  });

  it("a file cut inside its third message names message 3", () => {
    const bytes = readFixture("multi-message.grib2");
    const fields = scanGrib2(bytes);
    const cut = fields[2].byteOffset + 40;
    const error = errorOf(() => decodeGrib2(bytes.subarray(0, cut)));
    expect(error).toMatchObject({ messageNumber: 3, section: 0, byteOffset: fields[2].byteOffset });
  });

  it("a missing end marker is reported where the total length puts it", () => {
    const bytes = edited((b) => (b[b.length - 1] = 0x36));
    const error = errorOf(() => decodeGrib2(bytes));
    expect(error).toMatchObject({ section: 8, byteOffset: bytes.length - 4 });
    expect(error.message).toMatch(/end marker "7777" missing/);
  });

  it("a section length that is too long shows up at the next section", () => {
    let section3 = 0;
    const bytes = edited((b, s) => {
      section3 = s[3];
      putUint(b, s[3], b[s[3] + 3] + 4, 4);
    });
    const error = errorOf(() => decodeGrib2(bytes));
    expect(error.section).toBe(3);
    expect(error.byteOffset).toBeGreaterThan(section3);
    expect(error.message).toMatch(/expected section 4 after section 3, found section number \d+ \(is the declared length of section 3 wrong\?\)/);
  });

  it("a section shorter than its fixed octets is rejected", () => {
    let section5 = 0;
    const bytes = edited((b, s) => {
      section5 = s[5];
      putUint(b, s[5], 8, 4);
    });
    const error = errorOf(() => decodeGrib2(bytes));
    expect(error).toMatchObject({ section: 5, byteOffset: section5 });
    expect(error.message).toMatch(/declared length 8 is shorter than the 11 octets/);
  });

  it("a section running past the end of its message is rejected", () => {
    const error = errorOf(() => decodeGrib2(edited((b, s) => putUint(b, s[7], 100000, 4))));
    expect(error.section).toBe(7);
    expect(error.message).toMatch(/declared length 100000 runs past the end of the message/);
  });
});

describe("declared sizes larger than the data", () => {
  it("more packed values than grid points", () => {
    const error = errorOf(() => decodeGrib2(edited((b, s) => putUint(b, s[5] + 5, 109, 4))));
    expect(error.section).toBe(5);
    expect(error.message).toMatch(/section 5 declares 109 packed values but the grid has 108 points and there is no bitmap/);
  });

  it("section 7 shorter than the packed values need", () => {
    const parts = readSections(readFixture("simple-16bit.grib2"));
    const data = sectionOf(parts, 7).slice(0, 105);
    putUint(data, 0, data.length, 4);
    const message = buildMessage(parts.discipline, [1, 3, 4, 5, 6].map((n) => sectionOf(parts, n)).concat([data]));
    const error = errorOf(() => decodeGrib2(message));
    expect(error.section).toBe(7);
    // Source: 108 values x 16 bits = 216 bytes (Derived in closed form)
    expect(error.message).toMatch(/108 values of 16 bits need 216 bytes of data but section 7 holds 100/);
  });

  it("a bitmap shorter than the grid", () => {
    const parts = readSections(readFixture("bitmap-simple.grib2"));
    const bitmap = sectionOf(parts, 6).slice(0, 10);
    putUint(bitmap, 0, bitmap.length, 4);
    const message = buildMessage(parts.discipline, [sectionOf(parts, 1), sectionOf(parts, 3), sectionOf(parts, 4), sectionOf(parts, 5), bitmap, sectionOf(parts, 7)]);
    const error = errorOf(() => decodeGrib2(message));
    expect(error.section).toBe(6);
    // Source: 108 points need ceil(108 / 8) = 14 bytes (Derived in closed form)
    expect(error.message).toMatch(/bitmap for 108 points needs 14 bytes but section 6 holds 4/);
  });

  it("a CCSDS stream cut short", () => {
    const parts = readSections(readFixture("ccsds.grib2"));
    const data = sectionOf(parts, 7).slice(0, 60);
    putUint(data, 0, data.length, 4);
    const message = buildMessage(parts.discipline, [1, 3, 4, 5, 6].map((n) => sectionOf(parts, n)).concat([data]));
    const error = errorOf(() => decodeGrib2(message));
    expect(error.section).toBe(7);
    expect(error.message).toMatch(/payload too short|bit stream ended/);
  });

  it("complex packing whose group lengths do not add up", () => {
    const error = errorOf(() => decodeGrib2(edited((b, s) => putUint(b, s[5] + 42, 1000, 4), "complex.grib2")));
    expect(error.section).toBe(7);
    expect(error.message).toMatch(/group lengths add up to \d+ values but section 5 declares 108/);
  });
});

describe("templates and codes outside what Bellwether decodes", () => {
  it.each([
    [3, 12, 40, /grid definition template 3\.40 is not supported/],
    [4, 7, 99, /product definition template 4\.99 is not supported/],
    [5, 9, 50, /data representation template 5\.50 is not supported/],
  ])("section %i template %i", (section, octet, template, pattern) => {
    let expectedOffset = 0;
    const bytes = edited((b, s) => {
      expectedOffset = s[section] + octet;
      putUint(b, s[section] + octet, template, 2);
    });
    const error = errorOf(() => decodeGrib2(bytes));
    expect(error).toMatchObject({ messageNumber: 1, section, byteOffset: expectedOffset });
    expect(error.message).toMatch(pattern);
  });

  it("a forecast time in months", () => {
    const error = errorOf(() => decodeGrib2(edited((b, s) => (b[s[4] + 17] = 3))));
    expect(error.message).toMatch(/unit of time range 3 \(Code Table 4\.4\) is not supported/);
  });

  it("an impossible reference time", () => {
    const error = errorOf(() => decodeGrib2(edited((b, s) => (b[s[1] + 14] = 13))));
    expect(error.section).toBe(1);
    expect(error.message).toMatch(/reference time 2007-13-23 12:0:0 is not a valid UTC date and time/);
  });

  it("a predefined bitmap, and 'previous bitmap' with none before it", () => {
    expect(errorOf(() => decodeGrib2(edited((b, s) => (b[s[6] + 5] = 5)))).message).toMatch(/predefined bitmap/);
    expect(errorOf(() => decodeGrib2(edited((b, s) => (b[s[6] + 5] = 254)))).message).toMatch(/no earlier field in this message/);
  });

  it("an unknown shape of the Earth", () => {
    expect(errorOf(() => decodeGrib2(edited((b, s) => (b[s[3] + 14] = 42)))).message).toMatch(/shape of the Earth code 42/);
  });
});

describe("JPEG 2000 without the codec loaded", () => {
  it("scanGrib2 still lists the field", () => {
    expect(scanGrib2(readFixture("jpeg2000.grib2"))[0].dataTemplate).toBe(40);
  });

  it("decodeGrib2 says to load the codec", () => {
    const error = errorOf(() => decodeGrib2(readFixture("jpeg2000.grib2")));
    expect(error.section).toBe(7);
    expect(error.message).toMatch(/await loadGrib2Codecs\(\)/);
  });
});
