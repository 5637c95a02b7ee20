import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  celsiusFromFahrenheit,
  DEG,
  fahrenheitFromCelsius,
  KELVIN_AT_0_C,
  KG_PER_OZ,
  M_PER_CM,
  M_PER_FT,
  M_PER_IN,
  M_PER_S_PER_KMH,
  M_PER_S_PER_MPH,
  PA_PER_HPA,
  RAD_PER_S_PER_RPM,
} from "../../geometry/units.js";
import { uniform } from "../support/arbitraries.js";

// The inch, foot, mile and avoirdupois pound are exact by the 1959 international yard and pound
// agreement (1 yd = 0.9144 m, 1 lb = 0.45359237 kg); the kelvin offset and the Fahrenheit scale
// by definition (NIST Special Publication 811, Guide for the Use of the International System of
// Units, 2008, appendix B; from memory).

describe("units", () => {
  it("uses the exact international factors: 1 ft = 12 in = 0.3048 m, 1 yd = 0.9144 m, 1 mi = 1760 yd = 1609.344 m, to 1e-15 relative", () => {
    expect(Math.abs(M_PER_FT - 0.9144 / 3)).toBeLessThan(1e-16);
    expect(Math.abs(M_PER_IN * 12 - M_PER_FT)).toBeLessThan(1e-16);
    expect(Math.abs(M_PER_S_PER_MPH * 3600 - 1760 * 0.9144) / 1609.344).toBeLessThan(1e-15);
    expect(Math.abs(M_PER_CM * 2.54 - M_PER_IN)).toBeLessThan(1e-17);
  });

  it("puts 1 mph at 1.609344 km/h exactly and 1 km/h at 1/3.6 m/s, to 1e-15 relative", () => {
    expect(Math.abs(M_PER_S_PER_MPH / M_PER_S_PER_KMH - 1.609344) / 1.609344).toBeLessThan(1e-15);
    expect(Math.abs(M_PER_S_PER_KMH * 3.6 - 1)).toBeLessThan(1e-15);
  });

  it("makes 16 oz one avoirdupois pound, 0.45359237 kg, to 1e-15 relative", () => {
    expect(Math.abs(16 * KG_PER_OZ - 0.45359237) / 0.45359237).toBeLessThan(1e-15);
  });

  it("makes 180 deg pi rad and 60 rpm one turn per second (2 pi rad/s), to 1e-15 relative", () => {
    expect(Math.abs(180 * DEG - Math.PI)).toBeLessThan(1e-15);
    expect(Math.abs(60 * RAD_PER_S_PER_RPM - 2 * Math.PI)).toBeLessThan(1e-15);
  });

  it("puts water's fixed points and the crossing of the scales where the definitions do: 32 F = 0 C, 212 F = 100 C, -40 F = -40 C; 0 C = 273.15 K; 1013.25 hPa = 101325 Pa (to 1e-12)", () => {
    expect(Math.abs(celsiusFromFahrenheit(32))).toBeLessThan(1e-12);
    expect(Math.abs(celsiusFromFahrenheit(212) - 100)).toBeLessThan(1e-12);
    expect(Math.abs(celsiusFromFahrenheit(-40) + 40)).toBeLessThan(1e-12);
    expect(KELVIN_AT_0_C).toBe(273.15);
    expect(Math.abs(1013.25 * PA_PER_HPA - 101325)).toBeLessThan(1e-9);
  });

  it("round-trips temperatures F -> C -> F and C -> F -> C within 1e-12 deg, and a 1 F step is 5/9 C, for 1000 random values from -100 to 200", () => {
    fc.assert(
      fc.property(uniform(-100, 200), (t) => {
        expect(Math.abs(fahrenheitFromCelsius(celsiusFromFahrenheit(t)) - t)).toBeLessThan(1e-12);
        expect(Math.abs(celsiusFromFahrenheit(fahrenheitFromCelsius(t)) - t)).toBeLessThan(1e-12);
        expect(Math.abs(celsiusFromFahrenheit(t + 1) - celsiusFromFahrenheit(t) - 5 / 9)).toBeLessThan(1e-12);
      }),
      { seed: 1959, numRuns: 1000 },
    );
  });

  it("round-trips user values through SI (mph, ft, in, rpm, deg, oz) within 4e-16 relative, for 1000 random values from 1e-3 to 1e4", () => {
    const factors = [M_PER_S_PER_MPH, M_PER_S_PER_KMH, M_PER_FT, M_PER_IN, M_PER_CM, RAD_PER_S_PER_RPM, DEG, KG_PER_OZ, PA_PER_HPA];
    fc.assert(
      fc.property(uniform(-3, 4).map((e) => 10 ** e), fc.constantFrom(...factors), (x, factor) => {
        expect(Math.abs((x * factor) / factor - x) / x).toBeLessThanOrEqual(4e-16);
      }),
      { seed: 1960, numRuns: 1000 },
    );
  });
});
