/**
 * A synthetic bullpen session with planted seam orientations (invented test data):
 * throws of a few pitch types, each throw with its own speed, spin, tilt and gyro
 * scattered about the type's, flown in full by the tool's own flight (pitchFlight.ts:
 * aimed at the zone, 1 ms steps, the seam force of the planted orientation) and read
 * on the trade basis, plus optional Gaussian noise on the observed movement.
 */
import { clockToAngle, formatClock, parseClock } from "../../geometry/clock.js";
import { latLonToVector } from "../../geometry/ballCoords.js";
import { toArmSide } from "../../geometry/frames.js";
import type { Vec3 } from "../../geometry/vec.js";
import { flyPitch } from "../../src/physics/pitchFlight.js";
import type { SeamModel } from "../../src/physics/seamModel/model.js";
import type { Pitch } from "../../src/screening/pitch.js";
import { lcg } from "./random.js";

export interface PlantedType {
  readonly pitcher: string;
  readonly pitch: string;
  readonly hand: "right" | "left";
  readonly speedMph: number;
  readonly spinRpm: number;
  readonly tilt: string;
  readonly gyroDeg: number;
  /** Planted orientation: latitude and longitude on the ball, deg. */
  readonly latLon: readonly [number, number];
}

export interface SessionThrow {
  readonly type: PlantedType;
  readonly pitch: Pitch;
  readonly speedMph: number;
  readonly spinRpm: number;
  readonly tiltMinutes: number;
  readonly gyroDeg: number;
  /** Observed movement on the trade basis (50 ft), inches. */
  readonly armIn: number;
  readonly upIn: number;
  readonly planted: Vec3;
}

/** Throws of each type: scatter 1 mph, 80 rpm, 20 minutes of tilt, 7 deg of gyro (1 sd each); noise in inches (1 sd). */
export function plantedSession(types: readonly PlantedType[], perType: number, model: SeamModel, seed: number, noiseIn = 0): SessionThrow[] {
  const rnd = lcg(seed);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - rnd())) * Math.cos(2 * Math.PI * rnd());
  const out: SessionThrow[] = [];
  for (const type of types) {
    const planted = latLonToVector(type.latLon[0], type.latLon[1]);
    for (let i = 0; i < perType; i++) {
      const speedMph = type.speedMph + gauss();
      const spinRpm = type.spinRpm + 80 * gauss();
      const tiltMinutes = (((parseClock(type.tilt) + 20 * gauss()) % 720) + 720) % 720;
      const gyroDeg = type.gyroDeg + 7 * gauss();
      const pitch: Pitch = {
        name: type.pitch, pitcher: type.pitcher, hand: type.hand, speedMPerS: speedMph * 0.44704, spinRadPerS: (spinRpm * Math.PI) / 30,
        tiltRad: clockToAngle(tiltMinutes), view: "pitcher", gyroRad: (gyroDeg * Math.PI) / 180, want: "any",
      };
      const f = flyPitch({ pitch, axisBall: planted, model });
      const obs = toArmSide(f.trade.total.horizontalBreakM, f.trade.total.inducedVerticalBreakM, type.hand);
      out.push({ type, pitch, speedMph, spinRpm, tiltMinutes, gyroDeg, armIn: obs.armSideM / 0.0254 + noiseIn * gauss(), upIn: obs.upM / 0.0254 + noiseIn * gauss(), planted });
    }
  }
  return out;
}

/** The session as a CSV in our own keys (tilt as a clock reading, signed gyro). */
export function sessionCsv(throws: readonly SessionThrow[]): string {
  const rows = ["pitcher,pitch,hand,speed_mph,spin_rpm,tilt,view,gyro_deg,move_arm_in,move_up_in"];
  for (const t of throws) {
    rows.push([t.type.pitcher, t.type.pitch, t.type.hand, t.speedMph.toFixed(2), t.spinRpm.toFixed(0), formatClock(t.tiltMinutes), "pitcher", t.gyroDeg.toFixed(2), t.armIn.toFixed(3), t.upIn.toFixed(3)].join(","));
  }
  return rows.join("\n") + "\n";
}
