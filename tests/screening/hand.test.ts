import { describe, expect, it } from "vitest";
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { coverModel } from "../../geometry/coverRegions.js";
import { DEFAULT_SEAM_SHAPE } from "../../geometry/seamCurve.js";
import { sampleSeam } from "../../geometry/seamSamples.js";
import { clockToAngle, parseClock } from "../../geometry/clock.js";
import { angleBetween, cross3, dot3, rotateAbout, unit3, type Vec3 } from "../../geometry/vec.js";
import { applyRotation, PAD_SIZE_IN, pitchKindFromName, placeFingers, transposeRotation } from "../../src/screening/hand.js";
import { turnFromHold } from "../../src/screening/holdTurn.js";
import { pitchFrame } from "../../src/screening/pitch.js";
import { sinkerPitch } from "../support/pitches.js";

const seam = sampleSeam(DEFAULT_SEAM_SHAPE, 2048);
const cover = coverModel(DEFAULT_SEAM_SHAPE);
const frame = pitchFrame(sinkerPitch());
const AXIS: Vec3 = unit3([0.3, 0.8, 0.5]);
const SPACING_IN = 0.8;
const TOL_RAD = 1e-9;

describe("hand model: the finger pattern of each pitch kind (common practice, no source)", () => {
  it.each([
    ["four-seam", "fastball"], ["Two-Seam", "fastball"], ["sinker", "fastball"], ["cutter", "fastball"],
    ["changeup", "changeup"], ["circle change", "changeup"], ["splitter", "changeup"],
    ["curveball", "breaking"], ["slider", "breaking"], ["sweeper", "breaking"], ["knuckle-curve", "breaking"],
  ])("reads the kind from the name %s as %s", (name, kind) => {
    expect(pitchKindFromName(name)).toEqual({ kind, fromName: true });
  });

  it("takes the fastball pattern, and says so, for a name that names no kind", () => {
    expect(pitchKindFromName("the hard one")).toEqual({ kind: "fastball", fromName: false });
  });

  it("points the working fingertips the way they pull the ball round: against the surface's motion at the trailing point (omega x T), up the back for 12:00 backspin, across the back for 9:00 side spin, and always across the line of the pads (side by side, never one over the other) [rigid rotation: v = omega x r]", () => {
    for (const [tilt, name] of [["12:00", "four-seam"], ["9:00", "slider"], ["1:45", "sinker"], ["4:30", "curveball"]] as const) {
      for (const gyroDeg of [0, 25]) {
        const f = pitchFrame(sinkerPitch({ name, tiltRad: clockToAngle(parseClock(tilt)), gyroRad: (gyroDeg * Math.PI) / 180 }));
        const kind = pitchKindFromName(name).kind;
        const g = placeFingers(AXIS, f, seam, cover, SPACING_IN, kind);
        const toField = (v: Vec3) => applyRotation(g.ballToField, v);
        const [a, b] = g.pads.filter((p) => p.working && p.finger !== "thumb");
        const tField = toField(g.trailingPoint);
        const surface = cross3(f.spinAxis, tField);
        for (const p of [a, b]) {
          // against the surface's motion: the fingertip's direction has a negative part along omega x T
          expect(dot3(toField(p.pointing), surface)).toBeLessThan(-0.9);
        }
        // across the line joining the two pads (within 5 deg of square)
        const line = unit3([b.direction[0] - a.direction[0], b.direction[1] - a.direction[1], b.direction[2] - a.direction[2]]);
        expect(Math.abs(dot3(line, a.pointing))).toBeLessThan(Math.sin((5 * Math.PI) / 180));
        if (gyroDeg === 0 && tilt === "12:00") expect(toField(a.pointing)[2]).toBeGreaterThan(0.99);
        if (gyroDeg === 0 && tilt === "9:00") expect(Math.abs(toField(a.pointing)[2])).toBeLessThan(0.1);
      }
    }
  });

  it("puts a fastball's index and middle pads one spacing apart across the trailing point, index on the glove side, thumb at the bottom", () => {
    const g = placeFingers(AXIS, frame, seam, cover, SPACING_IN, "fastball");
    expect(g.pads.map((p) => p.finger)).toEqual(["index", "middle", "thumb"]);
    const [i, m, t] = g.pads;
    expect(Math.abs(angleBetween(i.direction, m.direction) * BALL_RADIUS_IN - SPACING_IN)).toBeLessThan(1e-9);
    // the midpoint is the trailing point: equal angles to it
    expect(Math.abs(angleBetween(i.direction, g.trailingPoint) - angleBetween(m.direction, g.trailingPoint))).toBeLessThan(TOL_RAD);
    const toField = (v: Vec3) => applyRotation(g.ballToField, v);
    const glove: Vec3 = [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
    expect(dot3(toField(i.direction), glove)).toBeGreaterThan(dot3(toField(m.direction), glove));
    expect(toField(t.direction)[2]).toBeCloseTo(-1, 12);
    expect([i.working, m.working, t.working]).toEqual([true, true, false]);
  });

  it("puts a breaking ball's middle pad on the trailing point and the index one spacing toward the glove side (offset)", () => {
    const g = placeFingers(AXIS, frame, seam, cover, SPACING_IN, "breaking");
    const [m, i] = g.pads;
    expect([m.finger, i.finger]).toEqual(["middle", "index"]);
    expect(angleBetween(m.direction, g.trailingPoint)).toBeLessThan(TOL_RAD);
    expect(Math.abs(angleBetween(i.direction, m.direction) * BALL_RADIUS_IN - SPACING_IN)).toBeLessThan(1e-9);
    const glove: Vec3 = [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
    expect(dot3(applyRotation(g.ballToField, i.direction), glove)).toBeGreaterThan(dot3(applyRotation(g.ballToField, m.direction), glove));
  });

  it("gives a changeup three fingers and a circle: middle and ring working at the back, the index resting on the glove side beside the thumb", () => {
    const g = placeFingers(AXIS, frame, seam, cover, SPACING_IN, "changeup");
    expect(g.pads.map((p) => [p.finger, p.working])).toEqual([["middle", true], ["ring", true], ["index", false], ["thumb", false]]);
    const f = (k: number) => applyRotation(g.ballToField, g.pads[k].direction);
    const glove: Vec3 = [-frame.armSide[0], -frame.armSide[1], -frame.armSide[2]];
    // the circle sits on the glove side of the ball, the thumb's pad 0.9 in from the index pad
    expect(dot3(f(2), glove)).toBeGreaterThan(0.8);
    expect(Math.abs(angleBetween(g.pads[2].direction, g.pads[3].direction) * BALL_RADIUS_IN - 0.9)).toBeLessThan(1e-9);
  });

  it("points every fingertip tangent to the ball (unit, at right angles to its pad's direction)", () => {
    for (const kind of ["fastball", "changeup", "breaking"] as const) {
      for (const p of placeFingers(AXIS, frame, seam, cover, SPACING_IN, kind).pads) {
        expect(Math.hypot(...p.pointing)).toBeCloseTo(1, 12);
        expect(Math.abs(dot3(p.pointing, p.direction))).toBeLessThan(1e-12);
      }
    }
  });

  it("uses an adult's pad sizes, narrower than the default finger spacing so side-by-side pads do not overlap", () => {
    for (const s of Object.values(PAD_SIZE_IN)) {
      expect(s.widthIn).toBeGreaterThan(0.4);
      expect(s.widthIn).toBeLessThan(SPACING_IN);
      expect(s.lengthIn).toBeGreaterThan(s.widthIn);
    }
  });
});

describe("the turn in the hand from a classic hold (closed forms)", () => {
  const hold = placeFingers([0, 0, 1], frame, seam, cover, SPACING_IN);
  const wf = frame.spinAxis;
  const v = frame.flight;
  const vw = dot3(v, wf);
  const P = unit3([-(v[0] - vw * wf[0]), -(v[1] - vw * wf[1]), -(v[2] - vw * wf[2])]);
  const toBall = (f: Vec3) => applyRotation(transposeRotation(hold.ballToField), f);

  it("is no turn for the hold itself", () => {
    const t = turnFromHold([0, 0, 1], [0, 0, 1], hold.ballToField, frame);
    expect(t.angleRad).toBe(0);
  });

  it("turns by the angle between the axes, 20 deg, and splits it into twist and roll with twist^2 + roll^2 = angle^2", () => {
    const grip = rotateAbout([0, 0, 1], unit3([1, 0.3, 0]), (20 * Math.PI) / 180);
    const t = turnFromHold(grip, [0, 0, 1], hold.ballToField, frame);
    expect(t.angleRad).toBeCloseTo((20 * Math.PI) / 180, 12);
    expect(Math.hypot(t.twistRad, t.rollRad)).toBeCloseTo(t.angleRad, 12);
  });

  it("reads a turn of the ball about the pitcher's line of sight as a pure twist, counter-clockwise for a rotation toward the pitcher (right-hand rule)", () => {
    const alpha = (15 * Math.PI) / 180;
    // the ball turned by +alpha about P (toward the pitcher): the ball point now on the spin axis
    const grip = toBall(rotateAbout(wf, P, -alpha));
    const t = turnFromHold(grip, [0, 0, 1], hold.ballToField, frame);
    expect(t.angleRad).toBeCloseTo(alpha, 12);
    expect(t.twistRad).toBeCloseTo(-alpha, 12);
    expect(t.rollRad).toBeLessThan(1e-12);
  });

  it("reads a turn about the axis across the spin axis and the line of sight as a pure roll of the face along the spin axis", () => {
    const n = unit3([wf[1] * P[2] - wf[2] * P[1], wf[2] * P[0] - wf[0] * P[2], wf[0] * P[1] - wf[1] * P[0]]);
    const alpha = (12 * Math.PI) / 180;
    const grip = toBall(rotateAbout(wf, n, -alpha));
    const t = turnFromHold(grip, [0, 0, 1], hold.ballToField, frame);
    expect(t.rollRad).toBeCloseTo(alpha, 12);
    expect(Math.abs(t.twistRad)).toBeLessThan(1e-12);
    // the face moves along +-w_f: its arm-side and up parts are w_f's own, up to sign
    const armW = dot3(wf, frame.armSide), upW = wf[2];
    expect(Math.abs(t.rollArmSide * upW - t.rollUp * armW)).toBeLessThan(1e-9);
  });

  it("takes the shortest turn over the ball's own half-turns: an axis and its image under a half-turn of the seam are one grip", () => {
    // the two-seam axis (1,1,0)/sqrt 2 and its half-turn image (-1,-1,0)/sqrt 2 are one grip
    const two = placeFingers(unit3([1, 1, 0]), frame, seam, cover, SPACING_IN);
    expect(turnFromHold(unit3([-1, -1, 0]), unit3([1, 1, 0]), two.ballToField, frame).angleRad).toBeLessThan(1e-9);
  });
});
