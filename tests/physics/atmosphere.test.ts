import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { STANDARD_GRAVITY_M_PER_S2, standardAtmosphere } from "../../src/physics/atmosphere.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";
import { uniform } from "../support/arbitraries.js";

describe("U.S. Standard Atmosphere 1976, troposphere", () => {
  // U.S. Standard Atmosphere, 1976 (NOAA-S/T 76-1562), density tabulated against geometric
  // altitude: 1.2250 kg/m^3 at 0 m (seen); 500-2000 m from memory, recomputed to 4 digits.
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

  it("sea level is 288.15 K and 101325 Pa (U.S. Standard Atmosphere 1976, seen) within 1e-9 relative", () => {
    const sea = standardAtmosphere(0);
    expectRelative(sea.temperatureK, 288.15, 1e-9);
    expectRelative(sea.pressurePa, 101325, 1e-9);
  });

  it("at 1000 m geometric: 281.651 K within 0.01 K and 89876 Pa within 0.1 % (U.S. Standard Atmosphere 1976 table, from memory)", () => {
    const a = standardAtmosphere(1000);
    expectAbsolute(a.temperatureK, 281.651, 0.01);
    expectRelative(a.pressurePa, 89876, 1e-3);
  });

  it("is in hydrostatic balance: dP/dZ = -rho g0 (r0 / (r0 + Z))^2 by central differences (h = 1 m) within 1e-6 relative, for 200 random elevations (U.S. Standard Atmosphere 1976, eqs. 17-18 and 33a)", () => {
    // A second route to the pressure law: the standard derives it from hydrostatics and the
    // ideal gas law with gravity falling off as (r0 / (r0 + Z))^2, r0 = 6356.766 km. The
    // central difference is exact to O(h^2 P''' / 6), about 1e-10 relative here.
    const r0M = 6356766;
    fc.assert(
      fc.property(uniform(-499, 4999), (zM) => {
        const h = 1;
        const dPdZ = (standardAtmosphere(zM + h).pressurePa - standardAtmosphere(zM - h).pressurePa) / (2 * h);
        const a = standardAtmosphere(zM);
        const g = STANDARD_GRAVITY_M_PER_S2 * (r0M / (r0M + zM)) ** 2;
        expectRelative(dPdZ, -a.densityKgM3 * g, 1e-6);
      }),
      { seed: 1976, numRuns: 200 },
    );
  });

  it("rejects elevations outside -500 to 5000 m with a RangeError naming the value", () => {
    expect(() => standardAtmosphere(5001)).toThrow(RangeError);
    expect(() => standardAtmosphere(-501)).toThrow(/elevation -501 m/);
    expect(() => standardAtmosphere(Number.NaN)).toThrow(RangeError);
  });
});
