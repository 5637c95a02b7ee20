/**
 * The preset cameras (src/page/cameras.ts) and the ball as held at release
 * (src/render/page3d/sceneMath.ts releasePhase): where each camera stands in the
 * field, and that the turning ball's pose at the release phase is the hand model's
 * release rotation (src/screening/hand.ts), so the finger pads drawn on the turning
 * ball sit where the card draws them.
 */
import { Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { DEG } from "../../geometry/units.js";
import { presetView, type CameraPreset } from "../../src/page/cameras.js";
import { BallPose, fieldToWorld, flowToFieldQuaternion, releasePhase } from "../../src/render/page3d/sceneMath.js";
import { applyRotation } from "../../src/screening/hand.js";
import { demoScreen } from "../support/viewPage.js";

/** The orbit camera's position for a view (render/page3d/orbit.ts apply, closed form). */
function cameraAt(v: { azimuthRad: number; elevationRad: number; distance: number }): Vector3 {
  return new Vector3(Math.cos(v.elevationRad) * Math.sin(v.azimuthRad), Math.sin(v.elevationRad), Math.cos(v.elevationRad) * Math.cos(v.azimuthRad)).multiplyScalar(v.distance);
}

describe("preset cameras", () => {
  const expected: [CameraPreset, "right" | "left", [number, number, number], string][] = [
    ["pitcher", "right", [0, 1, 0], "behind the pitcher: field +y, toward the pitcher from the plate"],
    ["catcher", "left", [0, -1, 0], "the catcher: field -y"],
    ["side", "right", [-1, 0, 0], "a right-hander's arm side: field -x (the pitcher's right as he faces the plate)"],
    ["side", "left", [1, 0, 0], "a left-hander's arm side: field +x"],
  ];
  for (const [preset, hand, field, where] of expected) {
    it(`stands ${where}, at the ball's height`, () => {
      const at = cameraAt(presetView(preset, hand)).normalize();
      const want = fieldToWorld(field);
      expect(at.distanceTo(want)).toBeLessThan(1e-12);
    });
  }
});

describe("the ball at release", () => {
  const outcome = demoScreen();
  it("stands, at the release phase, exactly as the hand model holds it: the same ball-to-field rotation (to 1e-9), for every grip and hold of every demo pitch", () => {
    let checked = 0;
    for (const { report, result } of outcome.screened) {
      const gyroRad = report.input.pitch.gyroDeg * DEG;
      for (const o of [...report.candidates, ...report.references]) {
        const phi = releasePhase(result.frame, o.axis, gyroRad, o.release.ballToField);
        expect(phi).toBeGreaterThanOrEqual(0);
        expect(phi).toBeLessThan(2 * Math.PI);
        const pose = new BallPose();
        pose.setOrientation(o.axis, gyroRad);
        const toField = flowToFieldQuaternion(result.frame).multiply(pose.at(phi));
        for (const e of [[1, 0, 0], [0, 1, 0], [0, 0, 1]] as [number, number, number][]) {
          const drawn = new Vector3(...e).applyQuaternion(toField);
          const held = applyRotation(o.release.ballToField, e);
          expect(Math.hypot(drawn.x - held[0], drawn.y - held[1], drawn.z - held[2])).toBeLessThan(1e-9);
        }
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(20);
  });
});
