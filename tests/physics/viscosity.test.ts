import { describe, expect, it } from "vitest";
import { airState } from "../../src/physics/air.js";
import { sutherlandViscosity } from "../../src/physics/viscosity.js";
import { expectRelative } from "../support/tolerance.js";

describe("Sutherland viscosity (U.S. Standard Atmosphere 1976, eq. 51)", () => {
  it("mu(288.15 K) is 1.7894e-5 Pa s within 0.1 % (U.S. Standard Atmosphere 1976 table, from memory)", () => {
    expectRelative(sutherlandViscosity(288.15), 1.7894e-5, 1e-3);
    expectRelative(airState().viscosityPaS, 1.7894e-5, 1e-3);
  });

  it("matches the handbook air table at 250 K and 300 K, 1.596e-5 and 1.846e-5 Pa s, within 0.5 % (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, table A.4, from memory)", () => {
    expectRelative(sutherlandViscosity(250), 1.596e-5, 5e-3);
    expectRelative(sutherlandViscosity(300), 1.846e-5, 5e-3);
  });

  it("rejects temperatures outside 150 to 500 K", () => {
    expect(() => sutherlandViscosity(149)).toThrow(RangeError);
    expect(() => sutherlandViscosity(501)).toThrow(RangeError);
  });
});
