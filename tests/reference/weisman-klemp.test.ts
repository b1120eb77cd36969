import { describe, expect, it } from "vitest";
import { diagnoseColumn } from "../../shared/meteo/index.ts";
import { liftSettingsFor, loadProfile } from "../../shared/meteo/column/diagnose-column.ts";
import { resolveColumnOptions } from "../../shared/meteo/column/column-options.ts";
import { liftMostUnstableParcel } from "../../shared/meteo/parcel/parcel-sources.ts";
import { ParcelResult } from "../../shared/meteo/parcel/parcel-result.ts";
import { straightHodograph, weismanKlempProfile } from "../helpers/weisman-klemp-sounding.ts";

// Check values: Source: Weisman and Klemp (1982) analytic sounding, evaluated with Bellwether's parcel conventions by
// the team's independent reference procedure (Python, 10-m levels). Tolerances: 1 % CAPE, 1 J/kg CIN, 10 m heights.
const profile = weismanKlempProfile({ qv0: 0.014, dz: 10, top: 16000, wind: straightHodograph });
const reference = diagnoseColumn(profile);
const f = reference.fields;

function closePercent(actual: number | null, expected: number, percent: number): void {
  expect(actual).not.toBeNull();
  expect(Math.abs((actual as number) / expected - 1) * 100).toBeLessThan(percent);
}

describe("Weisman-Klemp (1982) sounding, qv0 = 14 g/kg", () => {
  it("surface-based parcel", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    closePercent(f.sbcape, 1852, 1);
    expect(Math.abs(f.sbcin! - -47.9)).toBeLessThan(1);
    expect(Math.abs(f.sblcl_hgt! - 999)).toBeLessThan(10);
    expect(Math.abs(f.sblfc_hgt! - 1612)).toBeLessThan(10);
    expect(Math.abs(f.sbel_hgt! - 11437)).toBeLessThan(10);
  });

  it("mixed-layer parcel", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    closePercent(f.mlcape, 2017, 1);
    expect(Math.abs(f.mlcin! - -23.7)).toBeLessThan(1);
    expect(Math.abs(f.mllcl_hgt! - 1094)).toBeLessThan(10);
    expect(Math.abs(f.mllfc_hgt! - 1525)).toBeLessThan(10);
    expect(Math.abs(f.mlel_hgt! - 11654)).toBeLessThan(10);
  });

  it("most-unstable parcel starts at 1210 m / 870.3 hPa", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    closePercent(f.mucape, 2404, 1);
    expect(Math.abs(f.mucin! - -0.3)).toBeLessThan(1);
    expect(Math.abs(f.muel_hgt! - 12035)).toBeLessThan(10);
    expect(Math.abs(f.mu_src_pres! - 87030)).toBeLessThan(10);
    expect(Math.abs(reference.meta.muSource.height! - 1210)).toBeLessThan(10);
    const options = resolveColumnOptions(undefined, "reference");
    const ws = loadProfile(profile, false);
    const mu = new ParcelResult();
    liftMostUnstableParcel(ws, liftSettingsFor(options), mu);
    expect(Math.abs(mu.lclHeight - 1300)).toBeLessThan(10);
    expect(Math.abs(mu.lfcHeight - 1342)).toBeLessThan(10);
  });

  it("surface θe is 341.21 K", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    expect(f.thetae_sfc!).toBeCloseTo(341.21, 1);
  });

  it("SB CAPE without the virtual-temperature correction is 1745 J/kg", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    const dry = diagnoseColumn(profile, { virtualCorrection: false });
    closePercent(dry.fields.sbcape, 1745, 1);
    expect(Math.abs(dry.fields.sbcin! - -47.6)).toBeLessThan(1);
  });

  for (const [qv0, cape] of [
    [0.011, 521],
    [0.012, 902],
    [0.016, 2984],
  ] as const) {
    it(`SB CAPE for qv0 = ${qv0 * 1000} g/kg is ${cape} J/kg`, () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
      const result = diagnoseColumn(weismanKlempProfile({ qv0, dz: 50, top: 16000 }));
      closePercent(result.fields.sbcape, cape, 1);
    });
  }

  it("effective inflow layer 0-3080 m, ESRH 115.5, EBWD 30 m/s, scp_eff 5.55 (integration case)", () => {
    // Source: Weisman and Klemp (1982) sounding under Bellwether conventions, team reference procedure (see file header)
    expect(f.eff_present).toBe(1);
    expect(f.eff_base_hgt).toBe(0);
    expect(Math.abs(f.eff_top_hgt! - 3080)).toBeLessThan(10);
    closePercent(f.srh_eff, 115.5, 3);
    expect(f.shear_eff!).toBeCloseTo(30, 6);
    closePercent(f.scp_eff, 5.55, 3);
  });

  it("meets the supercell rules of thumb it was built to illustrate", () => {
    // Source: Weisman and Klemp (1982) (0-6 km shear ≥ 20 m/s supports supercells; From memory: exact split);
    // Thompson et al. (2004): scp_eff ≥ 1 favours supercells.
    expect(f.shear_0_6km!).toBeGreaterThanOrEqual(20);
    expect(f.scp_eff!).toBeGreaterThanOrEqual(1);
    // Common practice (no source): MLCAPE ≥ 1000 J/kg is "moderate" instability.
    expect(f.mlcape!).toBeGreaterThanOrEqual(1000);
  });

  it("the table path agrees with the reference integrator within 1 % / 10 J/kg CAPE and 1 J/kg + 2 % CIN", () => {
    // Source: requirement of the team's pseudo-adiabat error budget.
    const fast = diagnoseColumn(profile, { pseudoAdiabat: "table" }).fields;
    for (const [cape, cin] of [
      ["sbcape", "sbcin"],
      ["mlcape", "mlcin"],
      ["mucape", "mucin"],
    ] as const) {
      expect(Math.abs(fast[cape]! - f[cape]!)).toBeLessThanOrEqual(Math.max(10, 0.01 * f[cape]!));
      expect(Math.abs(fast[cin]! - f[cin]!)).toBeLessThanOrEqual(1 + 0.02 * Math.abs(f[cin]!));
    }
  });
});
