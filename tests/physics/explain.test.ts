import { describe, expect, it } from "vitest";
import { latLonToVector } from "../../geometry/ballCoords.js";
import { Explainer } from "../../src/physics/explain.js";
import { seamModel } from "../../src/physics/seamModel/model.js";
import { releasePosition } from "../../src/physics/launch.js";
import { flyPitch } from "../../src/physics/pitchFlight.js";
import { toArmSide } from "../../geometry/frames.js";
import { symmetricAngle } from "../../src/screening/screen.js";
import { sinkerPitch } from "../support/pitches.js";
import { DEG } from "../../geometry/units.js";

const sinker = sinkerPitch();

describe("explain", () => {
  it("recovers a planted seam orientation from a flight the tool simulated (the planted axis, up to the ball's symmetry, is among the matches that fit within 0.1 in, within 2.5 grid spacings)", () => {
    const pos = releasePosition({ hand: "right" });
    const launch = { verticalRad: -1 * DEG, horizontalRad: Math.atan2(-pos[0], pos[1]) };
    const explainer = new Explainer({ gridSpacingRad: 2 * DEG, top: 20 });
    for (const [lat, lon] of [
      [30, 100],
      [-20, 60],
    ]) {
      const planted = latLonToVector(lat, lon);
      // the same model, so only the grid and the linearisation differ
      const f = flyPitch({ pitch: sinker, axisBall: planted, launch, model: seamModel() });
      const obs = toArmSide(f.fromRelease.breakM.xM, f.fromRelease.breakM.zM, "right");
      const e = explainer.explain({ pitch: sinker, observedArmSideM: obs.armSideM, observedUpM: obs.upM });
      // the spin alone explains most of it, the residual is the seam part
      const seam = toArmSide(f.fromRelease.seamM.xM, f.fromRelease.seamM.zM, "right");
      expect(Math.abs(e.residualArmSideM - seam.armSideM)).toBeLessThan(0.005);
      expect(Math.abs(e.residualUpM - seam.upM)).toBeLessThan(0.005);
      expect(e.matches[0].fitErrorM).toBeLessThan(0.1 * 0.0254);
      const near = e.matches.filter((m) => m.fitErrorM < 0.1 * 0.0254).map((m) => symmetricAngle(m.axis, planted));
      expect(Math.min(...near)).toBeLessThan(5 * DEG);
    }
  });

  it("leaves nothing to explain when the observed movement is the spin's own (the best seam match moves the ball less than 0.25 in: on the 4 deg grid the weakest orientations still move it about 0.1 in)", () => {
    const e0 = new Explainer({ top: 1 }).explain({ pitch: sinker, observedArmSideM: 0, observedUpM: 0 });
    const e = new Explainer({ top: 1 }).explain({ pitch: sinker, observedArmSideM: e0.magnusArmSideM, observedUpM: e0.magnusUpM });
    expect(Math.hypot(e.residualArmSideM, e.residualUpM)).toBeLessThan(1e-12);
    expect(Math.hypot(e.matches[0].seamArmSideM, e.matches[0].seamUpM)).toBeLessThan(0.25 * 0.0254);
  });
});
