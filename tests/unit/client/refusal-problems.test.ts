import { describe, expect, it } from "vitest";
import { ApiError } from "../../../src/lib/api-client.ts";
import { refusalProblems } from "../../../src/lib/refusal-problems.ts";

const refused = (details: unknown) => new ApiError({ status: 400, code: "VALIDATION_FAILED", message: "The upload was refused: first problem", details });

describe("every reason a request was refused", () => {
  it("lists the geometry problems a zone import names", () => {
    const error = refused({ problems: ["CWB: outer ring: the ring is not closed", "RMS: outer ring: the ring crosses itself between vertices 1–2 and 3–4"] });
    // Derived in closed form: each problem becomes one line, in order.
    expect(refusalProblems(error)).toEqual(["CWB: outer ring: the ring is not closed", "RMS: outer ring: the ring crosses itself between vertices 1–2 and 3–4"]);
  });

  it("names the feature of a schema issue, counting from 1", () => {
    const error = refused({ part: "body", issues: [{ field: "features.2.properties.code", message: "Give the zone a code" }, { field: "body", message: "Upload a GeoJSON FeatureCollection" }] });
    // Derived in closed form: index 2 is the third feature; the whole-body issue has no field to name.
    expect(refusalProblems(error)).toEqual(["feature 3, properties.code: Give the zone a code", "Upload a GeoJSON FeatureCollection"]);
  });

  it("reads expression errors and falls back to the message", () => {
    expect(refusalProblems(refused({ errors: [{ code: "UNKNOWN_FIELD", message: 'Unknown field "mlcap".', position: 0, length: 5 }] }))).toEqual(['Unknown field "mlcap".']);
    expect(refusalProblems(refused(undefined))).toEqual(["The upload was refused: first problem"]); // Derived in closed form
    expect(refusalProblems(new Error("offline"))).toEqual(["offline"]);
  });
});
