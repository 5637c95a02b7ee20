import { describe, it } from "vitest";
import { PLATE_FRONT_Y_M, PLATE_WIDTH_M, RUBBER_Y_M } from "../../src/physics/field.js";
import { M_PER_IN } from "../../geometry/units.js";
import { expectAbsolute } from "../support/tolerance.js";

describe("field geometry (Official Baseball Rules 2.01, 2.02, 2.04)", () => {
  it("rubber to rear point of home plate is 60 ft 6 in = 18.4404 m within 1e-12 m (rules 2.01 and 2.04)", () => {
    expectAbsolute(RUBBER_Y_M, 18.4404, 1e-12);
  });

  it("front edge of the plate is 59 ft 1 in from the rubber (60 ft 6 in less the plate's 17 in, rules 2.01 and 2.02) within 1e-12 m", () => {
    expectAbsolute(RUBBER_Y_M - PLATE_FRONT_Y_M, (59 * 12 + 1) * M_PER_IN, 1e-12);
  });

  it("puts the front edge where rule 2.02's edges put it: 8.5 + sqrt(12^2 - 8.5^2) = 16.97 in ahead of the rear point, within 0.05 in; the plate is 17 in wide within 1e-12 m", () => {
    // Rule 2.02: a 17 in square with two corners removed, 8.5 in sides and 12 in edges meeting at the rear point.
    const depthIn = 8.5 + Math.sqrt(12 * 12 - 8.5 * 8.5);
    expectAbsolute(PLATE_FRONT_Y_M / M_PER_IN, depthIn, 0.05);
    expectAbsolute(PLATE_WIDTH_M, 17 * M_PER_IN, 1e-12);
  });
});
