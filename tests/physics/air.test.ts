import { describe, expect, it } from "vitest";
import { airState, reynoldsNumber, spinFactor } from "../../src/physics/air.js";
import { M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectRelative } from "../support/tolerance.js";

describe("air state", () => {
  it("at 1000 m with no overrides has the 1976 table's 1.1117 kg/m^3 within 0.1 % and the standard's 281.651 K within 1e-3 relative (U.S. Standard Atmosphere 1976, from memory)", () => {
    const air = airState({ elevationM: 1000 });
    expectRelative(air.densityKgM3, 1.1117, 1e-3);
    expectRelative(air.temperatureK, 281.651, 1e-3);
    expect(air.relativeHumidityPct).toBe(0);
  });

  it("takes a measured temperature and pressure over the standard's: 30 C, 95000 Pa dry air is P / (R_d T) = 1.09171 kg/m^3 within 1e-4 relative (ideal gas, R_d = 287.05 J/(kg K), hand-computed)", () => {
    const air = airState({ elevationM: 1000, temperatureC: 30, pressurePa: 95000 });
    expectRelative(air.densityKgM3, 95000 / (287.05 * 303.15), 1e-12);
    expectRelative(air.densityKgM3, 1.09171, 1e-4);
  });
});

describe("dimensionless groups", () => {
  it("Re spans about 1.1e5 to 2.4e5 for 50 to 110 mph in sea-level air, within 3 % (A. M. Nathan, Am. J. Phys. 76(2), 119 (2008), seen)", () => {
    const air = airState();
    const re = (mph: number) => reynoldsNumber(mph * M_PER_S_PER_MPH, 2 * 0.0364, air.densityKgM3, air.viscosityPaS);
    expectRelative(re(50), 1.1e5, 0.03);
    expectRelative(re(110), 2.4e5, 0.03);
  });

  it("Re = rho v D / mu is 1.99352e5 for 1.225 kg/m^3, 40 m/s, 0.0728 m and 1.7894e-5 Pa s (definition, hand-computed) within 1e-5 relative", () => {
    expectRelative(reynoldsNumber(40, 0.0728, 1.225, 1.7894e-5), 1.99352e5, 1e-5);
  });

  it("S = R omega / v is 0.19059 for 0.0364 m, 2000 rpm, 40 m/s (definition, Nathan 2008; hand-computed) within 1e-4", () => {
    expectRelative(spinFactor(0.0364, 2000 * RAD_PER_S_PER_RPM, 40), 0.190590, 1e-4);
  });

  it("rejects a zero speed in S and a negative diameter in Re", () => {
    expect(() => spinFactor(0.0364, 200, 0)).toThrow(RangeError);
    expect(() => reynoldsNumber(40, -1, 1.2, 1.8e-5)).toThrow(/diameter -1 m/);
  });
});
