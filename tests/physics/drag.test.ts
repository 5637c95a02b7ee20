import { describe, expect, it } from "vitest";
import {
  DEFAULT_CONSTANT_DRAG_COEFFICIENT,
  dragCoefficient,
  giordanoB2PerMass,
  liftCoefficient,
  parseDragModelName,
  parseLiftModelName,
} from "../../src/physics/aero.js";
import { crossSectionM2 } from "../../geometry/ball.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

const sawicki = { name: "sawicki" } as const;
const giordano = { name: "giordano" } as const;

describe("Sawicki, Hubbard & Stronge (2003) lift coefficient (from memory)", () => {
  it("C_L = 1.5 S below S = 0.1: 0.075 at S = 0.05 within 1e-12", () => {
    expectAbsolute(liftCoefficient(sawicki, 0.05), 0.075, 1e-12);
  });

  it("C_L = 0.09 + 0.6 S from S = 0.1: 0.21 at S = 0.2 and 0.33 at S = 0.4 within 1e-12", () => {
    expectAbsolute(liftCoefficient(sawicki, 0.2), 0.21, 1e-12);
    expectAbsolute(liftCoefficient(sawicki, 0.4), 0.33, 1e-12);
  });

  it("is continuous at S = 0.1: both branches give 0.15 within 1e-9", () => {
    expectAbsolute(liftCoefficient(sawicki, 0.1 - 1e-12), 0.15, 1e-9);
    expectAbsolute(liftCoefficient(sawicki, 0.1), 0.15, 1e-9);
  });

  it("gives no lift without spin (C_L(0) = 0 exactly)", () => {
    expect(liftCoefficient(sawicki, 0)).toBe(0);
  });

  it("rejects a negative spin factor and an unknown model name", () => {
    expect(() => liftCoefficient(sawicki, -0.1)).toThrow(RangeError);
    expect(() => parseLiftModelName("nathan")).toThrow(/lift model "nathan" must be one of: sawicki/);
  });
});

describe("Giordano & Nakanishi drag, converted to C_D at 1.225 kg/m^3 and the 0.145 kg, 0.0364 m ball", () => {
  it("reproduces B2/m = rho A C_D / (2 m) at the reference state at 10, 35 and 45 m/s within 1e-12 relative (G&N closed form)", () => {
    const perCd = (1.225 * crossSectionM2(0.0364)) / (2 * 0.145);
    for (const v of [10, 35, 45]) {
      const b2m = 0.0039 + 0.0058 / (1 + Math.exp((v - 35) / 5));
      expectRelative(giordanoB2PerMass(v), b2m, 1e-12);
      expectRelative(dragCoefficient(giordano, v) * perCd, b2m, 1e-12);
    }
  });

  it("gives C_D about 0.55 slow (5 m/s) and 0.31 at 40 m/s, within 0.01 (REFERENCES.md, derived)", () => {
    expectAbsolute(dragCoefficient(giordano, 5), 0.55, 0.01);
    expectAbsolute(dragCoefficient(giordano, 40), 0.31, 0.01);
  });

  it("falls through the drag crisis: C_D at 45 m/s is below C_D at 25 m/s", () => {
    expect(dragCoefficient(giordano, 45)).toBeLessThan(dragCoefficient(giordano, 25));
  });
});

describe("constant drag model and model selection", () => {
  it("returns the user C_D (0.5) and defaults to 0.35, independent of speed, within 1e-15", () => {
    expectAbsolute(dragCoefficient({ name: "constant", dragCoefficient: 0.5 }, 30), 0.5, 1e-15);
    expectAbsolute(dragCoefficient({ name: "constant" }, 10), DEFAULT_CONSTANT_DRAG_COEFFICIENT, 1e-15);
    expect(DEFAULT_CONSTANT_DRAG_COEFFICIENT).toBe(0.35);
  });

  it("rejects C_D outside 0 to 2, negative speeds and unknown names", () => {
    expect(() => dragCoefficient({ name: "constant", dragCoefficient: 2.5 }, 30)).toThrow(/drag coefficient 2.5/);
    expect(() => dragCoefficient(giordano, -1)).toThrow(RangeError);
    expect(() => parseDragModelName("reynolds")).toThrow(/drag model "reynolds" must be one of: constant, giordano/);
    expect(parseDragModelName("giordano")).toBe("giordano");
  });
});
