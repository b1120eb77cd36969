import { describe, expect, it } from "vitest";
import { BoundedCache } from "../../../shared/grid/bounded-cache.ts";

describe("BoundedCache", () => {
  it("builds once per key and evicts the least recently used entry", () => {
    const cache = new BoundedCache<number>(2);
    let builds = 0;
    const build = (value: number) => () => {
      builds++;
      return value;
    };
    cache.getOrBuild("a", build(1));
    cache.getOrBuild("b", build(2));
    // Common practice (no source): a hit does not rebuild and makes "a" the most recent entry.
    expect(cache.getOrBuild("a", build(99))).toBe(1);
    cache.getOrBuild("c", build(3)); // evicts "b", the least recently used
    expect(builds).toBe(3);
    expect(cache.getOrBuild("a", build(99))).toBe(1);
    expect(cache.getOrBuild("b", build(20))).toBe(20);
    expect(builds).toBe(4);
  });
});
