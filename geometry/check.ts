/**
 * Input validation shared by the physics modules. Every public function checks
 * its arguments with these and throws a one-line RangeError naming the bad value
 * and the accepted range; the CLI turns RangeError into a one-line error, exit 2.
 */
import type { Vec3 } from "./vec.js";

/** Throws RangeError unless `value` is a finite number in [lo, hi]. */
export function assertInRange(label: string, value: number, lo: number, hi: number, unit: string): void {
  if (!Number.isFinite(value) || value < lo || value > hi) {
    throw new RangeError(`${label} ${value} ${unit} must be a number from ${lo} to ${hi} ${unit}`);
  }
}

/** Throws RangeError unless `value` is a finite number strictly greater than zero (and at most `hi`). */
export function assertPositive(label: string, value: number, unit: string, hi = Infinity): void {
  if (!Number.isFinite(value) || value <= 0 || value > hi) {
    const upper = hi === Infinity ? "" : ` and at most ${hi} ${unit}`;
    throw new RangeError(`${label} ${value} ${unit} must be a number greater than 0${upper}`);
  }
}

/** Throws RangeError unless `v` has three finite components. */
export function assertFiniteVec3(label: string, v: Readonly<Vec3>, unit: string): void {
  if (v.length !== 3 || !Number.isFinite(v[0]) || !Number.isFinite(v[1]) || !Number.isFinite(v[2])) {
    throw new RangeError(`${label} (${Array.from(v).join(", ")}) ${unit} must be three finite numbers`);
  }
}

/** Throws RangeError unless `value` is a finite number >= 0. */
export function assertNonNegative(label: string, value: number, unit: string): void {
  if (!Number.isFinite(value) || value < 0) {
    throw new RangeError(`${label} ${value} ${unit} must be a finite number of at least 0 ${unit}`);
  }
}
