/**
 * Seam crossings per revolution.
 *
 * In the ball frame the front stagnation point runs once per turn around the
 * circle q . w = sin(gyro) (its path on the ball). Each time the seam cuts that
 * circle, a seam passes the stagnation point once per turn. We count the sign
 * changes of q . w - sin(gyro) around the closed seam polyline. A sample lying
 * exactly on the circle is counted by the sign on either side of it, so a
 * tangency (touch without crossing) counts 0 and a crossing through a sample counts 1.
 */
import type { SeamSamples } from "../../geometry/seamSamples.js";

export function crossingsPerRevolution(seam: SeamSamples, wx: number, wy: number, wz: number, gyroRad: number): number {
  const pts = seam.points;
  const n = seam.count;
  const level = Math.sin(gyroRad);
  // start from a sample off the circle
  let start = -1;
  for (let i = 0; i < n; i++) {
    const d = pts[3 * i] * wx + pts[3 * i + 1] * wy + pts[3 * i + 2] * wz - level;
    if (d !== 0) {
      start = i;
      break;
    }
  }
  if (start < 0) return 0;
  let count = 0;
  let prev = Math.sign(pts[3 * start] * wx + pts[3 * start + 1] * wy + pts[3 * start + 2] * wz - level);
  for (let k = 1; k <= n; k++) {
    const i = (start + k) % n;
    const sgn = Math.sign(pts[3 * i] * wx + pts[3 * i + 1] * wy + pts[3 * i + 2] * wz - level);
    if (sgn === 0) continue;
    if (sgn !== prev) count++;
    prev = sgn;
  }
  return count;
}
