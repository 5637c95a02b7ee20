import { describe, expect, it } from "vitest";
import {
  airState,
  humidAirDensity,
  reynoldsNumber,
  saturationVapourPressurePa,
  spinFactor,
  standardAtmosphere,
  sutherlandViscosity,
} from "../../src/physics/air.js";
import { M_PER_S_PER_MPH, RAD_PER_S_PER_RPM } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

describe("U.S. Standard Atmosphere 1976, troposphere", () => {
  // U.S. Standard Atmosphere, 1976, tabulated density at geometric altitude.
  // 0 m: seen; 500-2000 m: from memory, recomputed to 4 digits (project REFERENCES.md).
  const table: ReadonlyArray<readonly [number, number]> = [
    [0, 1.225],
    [500, 1.1673],
    [1000, 1.1117],
    [1500, 1.0581],
    [2000, 1.0066],
  ];
  for (const [elevationM, densityKgM3] of table) {
    it(`density at ${elevationM} m matches the 1976 table ${densityKgM3} kg/m^3 within 0.1 %`, () => {
      expectRelative(standardAtmosphere(elevationM).densityKgM3, densityKgM3, 1e-3);
    });
  }

  it("sea level is 288.15 K and 101325 Pa (1976 standard, seen) within 1e-9 relative", () => {
    const sea = standardAtmosphere(0);
    expectRelative(sea.temperatureK, 288.15, 1e-9);
    expectRelative(sea.pressurePa, 101325, 1e-9);
  });

  it("at 1000 m geometric: 281.651 K within 0.01 K and 89876 Pa within 0.1 % (1976 table, from memory)", () => {
    const a = standardAtmosphere(1000);
    expectAbsolute(a.temperatureK, 281.651, 0.01);
    expectRelative(a.pressurePa, 89876, 1e-3);
  });

  it("rejects elevations outside -500 to 5000 m with a RangeError naming the value", () => {
    expect(() => standardAtmosphere(5001)).toThrow(RangeError);
    expect(() => standardAtmosphere(-501)).toThrow(/elevation -501 m/);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(RangeError);
  });
});

describe("humid air (virtual-temperature law with Buck 1981 e_s)", () => {
  // Check values at 101325 Pa, derived in REFERENCES.md from rho = (P - 0.378 e)/(R_d T) and Buck (1981).
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

  it("Buck e_s at 20 C is 2339.3 Pa within 0.1 % (handbook saturation pressure of water, from memory)", () => {
    expectRelative(saturationVapourPressurePa(20), 2339.3, 1e-3);
  });

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

describe("Sutherland viscosity (U.S. Standard Atmosphere 1976, eq. 51)", () => {
  it("mu(288.15 K) is 1.7894e-5 Pa s within 0.1 % (1976 table, from memory)", () => {
    expectRelative(sutherlandViscosity(288.15), 1.7894e-5, 1e-3);
    expectRelative(airState().viscosityPaS, 1.7894e-5, 1e-3);
  });
});

describe("dimensionless groups", () => {
  it("Re spans about 1.1e5 to 2.4e5 for 50 to 110 mph in sea-level air, within 3 % (Nathan 2008, seen)", () => {
    const air = airState();
    const re = (mph: number) => reynoldsNumber(mph * M_PER_S_PER_MPH, 2 * 0.0364, air.densityKgM3, air.viscosityPaS);
    expectRelative(re(50), 1.1e5, 0.03);
    expectRelative(re(110), 2.4e5, 0.03);
  });

  it("S = R omega / v is 0.19059 for 0.0364 m, 2000 rpm, 40 m/s (definition, Nathan 2008; hand-computed) within 1e-4", () => {
    expectRelative(spinFactor(0.0364, 2000 * RAD_PER_S_PER_RPM, 40), 0.190590, 1e-4);
  });

  it("rejects a zero speed in S and a negative diameter in Re", () => {
    expect(() => spinFactor(0.0364, 200, 0)).toThrow(RangeError);
    expect(() => reynoldsNumber(40, -1, 1.2, 1.8e-5)).toThrow(/diameter -1 m/);
  });
});
