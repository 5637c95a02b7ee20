/** Helpers shared by the seam-model tests: constructed seams, rotations, turning points. */
import type { SeamSamples } from "../../../geometry/seamSamples.js";

import { DEG } from "../../../geometry/units.js";

export { DEG };

/** A unit point at polar angle theta (from flow +z) and azimuth psi (from flow +x toward +y). */
export function polarPoint(thetaRad: number, psiRad: number): [number, number, number] {
  return [Math.sin(thetaRad) * Math.cos(psiRad), Math.sin(thetaRad) * Math.sin(psiRad), Math.cos(thetaRad)];
}

/** Builds closed-polyline seam samples from a list of unit points (equal weights, no tangents). */
export function samplesFrom(points: readonly (readonly [number, number, number])[]): SeamSamples {
  const n = points.length;
  const flat = new Float64Array(3 * n);
  points.forEach((p, i) => flat.set(p, 3 * i));
  return { shape: 0, count: n, length: 0, points: flat, tangents: new Float64Array(3 * n), params: new Float64Array(n) };
}

/** Points along the circle of polar angle theta from azimuth psi0 to psi1 (inclusive), every stepRad. */
export function arcPoints(thetaRad: number, psi0: number, psi1: number, stepRad = 0.5 * DEG): [number, number, number][] {
  const steps = Math.max(1, Math.ceil(Math.abs(psi1 - psi0) / stepRad));
  return Array.from({ length: steps + 1 }, (_, k) => polarPoint(thetaRad, psi0 + ((psi1 - psi0) * k) / steps));
}

/** Points along the meridian psi from polar angle theta0 to theta1 (inclusive). */
export function meridianPoints(psiRad: number, theta0: number, theta1: number, stepRad = 0.5 * DEG): [number, number, number][] {
  const steps = Math.max(1, Math.ceil(Math.abs(theta1 - theta0) / stepRad));
  return Array.from({ length: steps + 1 }, (_, k) => polarPoint(theta0 + ((theta1 - theta0) * k) / steps, psiRad));
}

/** An arc traced out and back (a closed polyline that crosses each meridian of its span twice at the same place). */
export function outAndBack(points: [number, number, number][]): [number, number, number][] {
  return [...points, ...points.slice(1, -1).reverse()];
}

/**
 * Column-major ball-to-flow rotation taking the ball direction `d` (unit) to flow +z, with
 * a roll `rollRad` about it: flow x = f1 . q, flow y = f2 . q, flow z = d . q.
 */
export function rotationTaking(d: readonly [number, number, number], rollRad: number): Float64Array {
  const helper: [number, number, number] = Math.abs(d[2]) < 0.9 ? [0, 0, 1] : [1, 0, 0];
  const dot = helper[0] * d[0] + helper[1] * d[1] + helper[2] * d[2];
  let u = [helper[0] - dot * d[0], helper[1] - dot * d[1], helper[2] - dot * d[2]];
  const nu = Math.hypot(u[0], u[1], u[2]);
  u = u.map((x) => x / nu);
  const v = [d[1] * u[2] - d[2] * u[1], d[2] * u[0] - d[0] * u[2], d[0] * u[1] - d[1] * u[0]];
  const c = Math.cos(rollRad);
  const s = Math.sin(rollRad);
  const f1 = [c * u[0] + s * v[0], c * u[1] + s * v[1], c * u[2] + s * v[2]];
  const f2 = [d[1] * f1[2] - d[2] * f1[1], d[2] * f1[0] - d[0] * f1[2], d[0] * f1[1] - d[1] * f1[0]];
  const m = new Float64Array(9);
  for (let col = 0; col < 3; col++) {
    m[3 * col] = f1[col];
    m[3 * col + 1] = f2[col];
    m[3 * col + 2] = d[col];
  }
  return m;
}

/**
 * Turning points of a periodic signal that stand out by more than `fraction` of its range
 * (hysteresis, so the azimuth bins' fine staircase does not count). Two laps, counting the
 * second, so every turning point is confirmed exactly once.
 */
export function turningPoints(f: ArrayLike<number>, fraction: number): { maxima: number; minima: number } {
  const n = f.length;
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < n; i++) {
    lo = Math.min(lo, f[i]);
    hi = Math.max(hi, f[i]);
  }
  const h = fraction * (hi - lo);
  let rising = f[1] >= f[0];
  let ext = f[0];
  let maxima = 0;
  let minima = 0;
  for (let k = 1; k < 2 * n; k++) {
    const v = f[k % n];
    if (rising) {
      if (v > ext) ext = v;
      else if (v < ext - h) {
        if (k >= n) maxima++;
        rising = false;
        ext = v;
      }
    } else if (v < ext) ext = v;
    else if (v > ext + h) {
      if (k >= n) minima++;
      rising = true;
      ext = v;
    }
  }
  return { maxima, minima };
}

/** Fourier sine and cosine amplitudes (b_h, a_h) of harmonic h of a periodic sample. */
export function harmonic(f: ArrayLike<number>, h: number): { sin: number; cos: number; amplitude: number } {
  const n = f.length;
  let a = 0;
  let b = 0;
  for (let j = 0; j < n; j++) {
    a += f[j] * Math.cos((2 * Math.PI * h * j) / n);
    b += f[j] * Math.sin((2 * Math.PI * h * j) / n);
  }
  a *= 2 / n;
  b *= 2 / n;
  return { sin: b, cos: a, amplitude: Math.hypot(a, b) };
}
