import { describe, expect, it } from "vitest";
import { ApiError } from "../../../../src/lib/api-client.ts";
import { lineRange, soundingProblem } from "../../../../src/features/soundings/sounding-error.ts";

describe("soundingProblem", () => {
  it("keeps the server's line number for a malformed sounding", () => {
    const error = new ApiError({ status: 422, code: "SOUNDING_INVALID", message: "line 4: dewpoint_c 25 is above temp_c 20", details: { line: 4 } });
    expect(soundingProblem(error)).toEqual({ message: "line 4: dewpoint_c 25 is above temp_c 20", line: 4 });
  });

  it("has no line for other failures", () => {
    const error = new ApiError({ status: 0, code: "NETWORK", message: "Could not reach the Bellwether server" });
    expect(soundingProblem(error).line).toBeNull();
  });
});

describe("lineRange", () => {
  const text = "a,b\r\nsecond line\nthird";

  it("finds a line's characters without its line break", () => {
    expect(lineRange(text, 1)).toEqual({ start: 0, end: 3 });
    expect(text.slice(lineRange(text, 2)!.start, lineRange(text, 2)!.end)).toBe("second line");
    expect(text.slice(lineRange(text, 3)!.start, lineRange(text, 3)!.end)).toBe("third");
  });

  it("is null past the end", () => {
    expect(lineRange(text, 4)).toBeNull();
    expect(lineRange(text, 0)).toBeNull();
  });
});
