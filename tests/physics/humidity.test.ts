import { describe, expect, it } from "vitest";
import { airState } from "../../src/physics/air.js";
import { humidAirDensity, saturationVapourPressurePa } from "../../src/physics/humidity.js";
import { expectRelative } from "../support/tolerance.js";

describe("humid air (virtual-temperature law with Buck 1981 e_s)", () => {
  // Check values at 101325 Pa, derived from rho = (P - 0.378 e) / (R_d T), R_d = 287.05 J/(kg K)
  // (standard meteorology texts) and A. L. Buck, J. Appl. Meteorol. 20, 1527 (1981), e = RH e_s.
  const cases: ReadonlyArray<readonly [number, number, number]> = [
    [20, 0, 1.2041],
    [20, 50, 1.1989],
    [30, 80, 1.1497],
  ];
  for (const [temperatureC, rhPct, densityKgM3] of cases) {
    it(`density at ${temperatureC} C, ${rhPct} % RH, 101325 Pa is ${densityKgM3} kg/m^3 within 0.1 %`, () => {
      expectRelative(humidAirDensity(101325, temperatureC + 273.15, rhPct), densityKgM3, 1e-3);
      const air = airState({ temperatureC, pressurePa: 101325, relativeHumidityPct: rhPct });
      expectRelative(air.densityKgM3, densityKgM3, 1e-3);
    });
  }

  it("dry air at 288.15 K and 101325 Pa is the 1976 standard's sea-level 1.2250 kg/m^3 within 1e-4 relative (U.S. Standard Atmosphere 1976, seen: a second route, R* / M0 = 287.053 J/(kg K) against R_d = 287.05)", () => {
    expectRelative(humidAirDensity(101325, 288.15, 0), 1.225, 1e-4);
  });

  // Saturation vapour pressure of water over a flat liquid surface, handbook tables
  // (e.g. CRC Handbook of Chemistry and Physics, "Vapor pressure of water"), from memory.
  for (const [temperatureC, pressurePa] of [
    [0, 611.2],
    [10, 1228.1],
    [20, 2339.3],
    [30, 4246.9],
  ] as const) {
    it(`Buck e_s at ${temperatureC} C is ${pressurePa} Pa within 0.1 % (handbook table of the vapour pressure of water, from memory)`, () => {
      expectRelative(saturationVapourPressurePa(temperatureC), pressurePa, 1e-3);
    });
  }

  it("humid air is lighter than dry air at the same T and P (water 18 g/mol vs air 29 g/mol)", () => {
    expect(humidAirDensity(90000, 300, 60)).toBeLessThan(humidAirDensity(90000, 300, 0));
  });

  it("rejects temperature outside -40 to 60 C, RH outside 0 to 100 %, pressure outside 500 to 1100 hPa", () => {
    expect(() => airState({ temperatureC: 61 })).toThrow(/temperature 61 deg C/);
    expect(() => airState({ temperatureC: -41 })).toThrow(RangeError);
    expect(() => airState({ relativeHumidityPct: 101 })).toThrow(/relative humidity 101 %/);
    expect(() => airState({ relativeHumidityPct: -1 })).toThrow(RangeError);
    expect(() => airState({ pressurePa: 49999 })).toThrow(/pressure 49999 Pa/);
    expect(() => airState({ pressurePa: 110001 })).toThrow(RangeError);
  });
});
