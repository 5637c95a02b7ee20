import { describe, expect, it } from "vitest";
import { liftCoefficient, parseLiftModelName, sawickiLiftCoefficient } from "../../src/physics/lift.js";
import { expectAbsolute } from "../support/tolerance.js";

const sawicki = { name: "sawicki" } as const;

describe("Sawicki, Hubbard & Stronge, \"How to hit home runs\", Am. J. Phys. 71(11), 1152 (2003): the lift coefficient (from memory)", () => {
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

  it("is the same law by name and by the direct function: 1.5 S below 0.1, 0.09 + 0.6 S above, at 200 spin factors from 0 to 0.6 within 1e-15", () => {
    for (let i = 0; i < 200; i++) {
      const s = (0.6 * i) / 199;
      const closedForm = s < 0.1 ? 1.5 * s : 0.09 + 0.6 * s;
      expectAbsolute(liftCoefficient(sawicki, s), closedForm, 1e-15);
      expectAbsolute(sawickiLiftCoefficient(s), closedForm, 1e-15);
    }
  });

  it("rejects a negative spin factor and an unknown model name", () => {
    expect(() => liftCoefficient(sawicki, -0.1)).toThrow(RangeError);
    expect(() => parseLiftModelName("nathan")).toThrow(/lift model "nathan" must be one of: sawicki/);
  });
});
