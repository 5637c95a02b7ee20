import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { releasePosition, releaseVelocity } from "../../src/physics/launch.js";
import { M_PER_FT, M_PER_S_PER_MPH, DEG } from "../../geometry/units.js";
import { expectAbsolute, expectRelative } from "../support/tolerance.js";
import { uniform } from "../support/arbitraries.js";

describe("release point", () => {
  it("defaults to 6 ft extension (y = 54.5 ft; a typical extension is about 6 to 6.3 ft, common practice, no source), 6 ft height, 1.5 ft toward a right-hander's arm side (x < 0) within 1e-12 m", () => {
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

  it("returns the speed and both angles for 300 random launches (speed 10-49 m/s, vertical -20 to 20 deg, horizontal -10 to 10 deg) within 1e-12 (spherical angles, closed form)", () => {
    fc.assert(
      fc.property(
        uniform(10, 49),
        uniform(-20, 20),
        uniform(-10, 10),
        (speed, upDeg, sideDeg) => {
          const [vx, vy, vz] = releaseVelocity(speed, upDeg * DEG, sideDeg * DEG);
          expectRelative(Math.hypot(vx, vy, vz), speed, 1e-12);
          expectAbsolute(Math.atan2(vz, Math.hypot(vx, vy)), upDeg * DEG, 1e-12);
          expectAbsolute(Math.atan2(vx, -vy), sideDeg * DEG, 1e-12);
        },
      ),
      { seed: 95, numRuns: 300 },
    );
  });

  it("rejects a zero speed and a vertical angle of 90 deg", () => {
    expect(() => releaseVelocity(0, 0, 0)).toThrow(/release speed 0 m\/s/);
    expect(() => releaseVelocity(40, Math.PI / 2, 0)).toThrow(RangeError);
  });
});
