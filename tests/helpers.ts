/** Shared test helpers: a deterministic random stream and random unit vectors. */
export function lcg(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    // Numerical Recipes' 32-bit LCG constants (Press et al., Numerical Recipes, 2nd ed., sec. 7.1)
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
}

export function randomUnit(rnd: () => number): [number, number, number] {
  // uniform on the sphere: z uniform in [-1, 1] (Archimedes), longitude uniform
  const z = 2 * rnd() - 1;
  const phi = 2 * Math.PI * rnd();
  const r = Math.sqrt(1 - z * z);
  return [r * Math.cos(phi), r * Math.sin(phi), z];
}

import { clockToAngle, parseClock } from "../geometry/clock.js";
import type { Pitch } from "../src/screening/pitch.js";

/** A right-hander's sinker (92 mph, 2150 rpm, tilt 1:45, gyro 10 deg, wanted push arm side): invented test data. */
export function sinkerPitch(over: Partial<Pitch> = {}): Pitch {
  return {
    name: "sinker",
    pitcher: "",
    hand: "right",
    speedMPerS: 92 * 0.44704,
    spinRadPerS: (2150 * 2 * Math.PI) / 60,
    tiltRad: clockToAngle(parseClock("1:45")),
    view: "pitcher",
    gyroRad: (10 * Math.PI) / 180,
    want: "arm",
    ...over,
  };
}
