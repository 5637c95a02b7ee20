/**
 * Orthographic projection of the unit ball onto a drawing.
 *
 * View frame: x to the viewer's right, y up, z toward the viewer (right-handed,
 * x cross y = z). A view is the rotation from the ball frame (geometry/seamCurve.ts)
 * to the view frame, stored as its three rows: the ball-frame directions of the view
 * axes. Drawing: the ball is a disc of radius R px centred at (cx, cy) px; SVG's y
 * grows downward, so a point with view coordinates (x, y, z) on the unit sphere lands
 * at (cx + R x, cy - R y), with depth R z px; it faces the viewer when depth > 0
 * (orthographic: the limb is the great circle z = 0).
 */
import { cross3, dot3, mat3, newMat3, quat, unit3, type Vec3 } from "../../geometry/vec.js";

/** Length of `up`'s part across the line of sight below which it names no direction (unit vectors). */
const PARALLEL_TOLERANCE = 1e-9;

/** Rows of the ball-to-view rotation: each view axis as a unit vector in the ball frame. */
export interface View {
  readonly right: Vec3;
  readonly up: Vec3;
  readonly toViewer: Vec3;
}

/** Where the ball sits in the drawing. */
export interface DiscPlacement {
  /** Ball radius R on the drawing, px (> 0). */
  readonly radiusPx: number;
  /** Disc centre, px from the drawing's left edge. */
  readonly centerXPx: number;
  /** Disc centre, px from the drawing's top edge. */
  readonly centerYPx: number;
}

export interface ProjectedPoint {
  readonly xPx: number;
  readonly yPx: number;
  /** Height toward the viewer above the limb plane, px, in [-R, R] for unit points; visible when > 0. */
  readonly depthPx: number;
}

/**
 * The view whose viewer sits along `toViewer` (ball frame) with `up` (ball frame)
 * showing as up; only the part of `up` across `toViewer` counts.
 * Throws RangeError when either is zero or `up` is parallel to `toViewer`.
 */
export function viewFromDirections(toViewer: Readonly<Vec3>, up: Readonly<Vec3>): View {
  const z = unit3(toViewer);
  const d = dot3(up, z);
  const across: Vec3 = [up[0] - d * z[0], up[1] - d * z[1], up[2] - d * z[2]];
  if (Math.hypot(across[0], across[1], across[2]) < PARALLEL_TOLERANCE * Math.hypot(up[0], up[1], up[2])) {
    throw new RangeError(`view up (${up.join(", ")}) must not be parallel to the viewing direction`);
  }
  const y = unit3(across);
  return { right: cross3(y, z), up: y, toViewer: z };
}

/** The view of a viewer looking along `direction` (ball frame: from the viewer toward the ball), `up` showing as up. */
export function viewLookingAlong(direction: Readonly<Vec3>, up: Readonly<Vec3>): View {
  return viewFromDirections([-direction[0], -direction[1], -direction[2]], up);
}

/** The view for a ball-to-view rotation given as a unit gl-matrix quaternion ([x, y, z, w]). */
export function viewFromRotation(ballToView: Readonly<quat>): View {
  const m = mat3.fromQuat(newMat3(), ballToView as quat);
  // gl-matrix is column-major: row i is (m[i], m[i + 3], m[i + 6])
  const row = (i: number): Vec3 => [m[i], m[i + 3], m[i + 6]];
  return { right: row(0), up: row(1), toViewer: row(2) };
}

/** Projects ball-frame point `p` (unit sphere, or any point in ball radii). */
export function projectPoint(view: View, disc: DiscPlacement, p: Readonly<Vec3>): ProjectedPoint {
  return {
    xPx: disc.centerXPx + disc.radiusPx * dot3(view.right, p),
    yPx: disc.centerYPx - disc.radiusPx * dot3(view.up, p),
    depthPx: disc.radiusPx * dot3(view.toViewer, p),
  };
}

/** Projects flat ball-frame points (3n) to flat [x, y, depth] px triples (3n). */
export function projectPoints(view: View, disc: DiscPlacement, points: Float64Array): Float64Array {
  const out = new Float64Array(points.length);
  const [rx, ry, rz] = view.right;
  const [ux, uy, uz] = view.up;
  const [vx, vy, vz] = view.toViewer;
  const r = disc.radiusPx;
  for (let i = 0; i < points.length; i += 3) {
    const x = points[i], y = points[i + 1], z = points[i + 2];
    out[i] = disc.centerXPx + r * (rx * x + ry * y + rz * z);
    out[i + 1] = disc.centerYPx - r * (ux * x + uy * y + uz * z);
    out[i + 2] = r * (vx * x + vy * y + vz * z);
  }
  return out;
}

/**
 * Runs of consecutive indices 0..n-1 where `keep` holds, in index order. For a closed
 * curve a run that crosses the end is joined with the one at the start, so no run is
 * cut at index 0; a closed curve kept everywhere is one run of length n.
 */
export function runsWhere(n: number, keep: (i: number) => boolean, closed: boolean): number[][] {
  // start just after a dropped index, so a closed curve's run never straddles the start
  let start = 0;
  if (closed) {
    while (start < n && keep(start)) start++;
    if (start === n) return [Array.from({ length: n }, (_, i) => i)];
    start = (start + 1) % n;
  }
  const runs: number[][] = [];
  let run: number[] = [];
  for (let k = 0; k < n; k++) {
    const i = (start + k) % n;
    if (keep(i)) run.push(i);
    else if (run.length) {
      runs.push(run);
      run = [];
    }
  }
  if (run.length) runs.push(run);
  return runs;
}

/**
 * Runs (see `runsWhere`) of projected points (flat [x, y, depth] triples) that face
 * the viewer (depth > 0), or that do not when `wantVisible` is false.
 */
export function depthRuns(projected: Float64Array, closed: boolean, wantVisible = true): number[][] {
  return runsWhere(projected.length / 3, (i) => projected[3 * i + 2] > 0 === wantVisible, closed);
}
