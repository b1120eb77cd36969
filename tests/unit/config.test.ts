import { describe, expect, it } from "vitest";
import { ConfigError, loadConfig } from "../../server/config.ts";

describe("configuration", () => {
  it("has the documented defaults", () => {
    const c = loadConfig({});
    expect(c.PORT).toBe(8080);
    expect(c.DEMO).toBe(true);
    expect(c.DEMO_PASSWORD).toBe("bellwether-demo");
    expect(c.databaseFile.endsWith("data/bellwether.sqlite")).toBe(true);
  });

  it("names every bad key", () => {
    expect(() => loadConfig({ PORT: "eighty", BCRYPT_COST: "4" })).toThrow(ConfigError);
    try {
      loadConfig({ PORT: "eighty", BCRYPT_COST: "4" });
    } catch (e) {
      expect((e as Error).message).toContain("PORT");
      expect((e as Error).message).toContain("BCRYPT_COST");
    }
  });

  it("reads DEMO as a switch", () => {
    expect(loadConfig({ DEMO: "0" }).DEMO).toBe(false);
    expect(loadConfig({ DEMO: "yes" }).DEMO).toBe(true);
  });
});
