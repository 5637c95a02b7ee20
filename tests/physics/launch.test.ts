import { describe, expect, it } from "vitest";
import { PLATE_FRONT_Y_M, RUBBER_Y_M } from "../../src/physics/field.js";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { M_PER_FT, M_PER_IN, M_PER_S_PER_MPH, DEG } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";

describe("field geometry (Official Baseball Rules 2.01, 2.02, 2.04)", () => {
  it("rubber to rear point of home plate is 60 ft 6 in = 18.4404 m within 1e-12 m", () => {
    expectAbsolute(RUBBER_Y_M, 18.4404, 1e-12);
  });

  it("front edge of the plate is 59 ft 1 in from the rubber (REFERENCES.md) within 1e-12 m", () => {
    expectAbsolute(RUBBER_Y_M - PLATE_FRONT_Y_M, (59 * 12 + 1) * M_PER_IN, 1e-12);
  });
});

describe("release point", () => {
  it("defaults to 6 ft extension (y = 54.5 ft), 6 ft height, 1.5 ft toward a right-hander's arm side (x < 0) within 1e-12 m", () => {
    const [x, y, z] = releasePosition();
    expectAbsolute(y, 54.5 * M_PER_FT, 1e-12);
    expectAbsolute(z, 6 * M_PER_FT, 1e-12);
    expectAbsolute(x, -1.5 * M_PER_FT, 1e-12);
    expectAbsolute(releasePosition({ hand: "left" })[0], 1.5 * M_PER_FT, 1e-12);
  });

  it("rejects an extension of 4 m (range 0 to 3 m)", () => {
    expect(() => releasePosition({ extensionM: 4 })).toThrow(/release extension 4 m/);
  });
});

describe("release velocity from speed and angles", () => {
  it("has the given speed (95 mph = 42.4688 m/s exactly) and its direction returns the angles, within 1e-12", () => {
    const speed = 95 * M_PER_S_PER_MPH;
    expectAbsolute(speed, 42.4688, 1e-12);
    const up = -2 * DEG;
    const side = 3 * DEG;
    const [vx, vy, vz] = releaseVelocity(speed, up, side);
    expectRelative(Math.hypot(vx, vy, vz), speed, 1e-12);
    expectAbsolute(Math.atan2(vz, Math.hypot(vx, vy)), up, 1e-12);
    expectAbsolute(Math.atan2(vx, -vy), side, 1e-12);
    expect(vy).toBeLessThan(0);
  });

  it("rejects a zero speed and a vertical angle of 90 deg", () => {
    expect(() => releaseVelocity(0, 0, 0)).toThrow(/release speed 0 m\/s/);
    expect(() => releaseVelocity(40, Math.PI / 2, 0)).toThrow(RangeError);
  });
});
