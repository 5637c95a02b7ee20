/**
 * The turn-averaged seam force over every spin-axis position of a sphere grid, at one
 * gyro angle, evaluating one cell per orbit of the seam's symmetry group.
 *
 * The symmetry rule (ball frame: geometry/seamCurve.ts; group: geometry/symmetry.ts;
 * flow frame and phase: geometry/flow.ts). Let g map the seam S onto itself and let
 * R_phi(w) be the ball-to-flow rotation for spin axis w at phase phi (gyro fixed).
 * g keeps the ball's pole z or reverses it, so g e1(w) = sigma e1(g w) with sigma = +-1.
 *   - g proper (the identity and the three half-turns): R_phi(g w) g = R_{phi + delta}(w),
 *     delta = 0 or pi; the flow sees the same seam at a shifted phase, so the timeline is
 *     shifted and the turn average (across, alongMagnus) is unchanged.
 *   - g improper (the two mirrors and the two rotoreflections): with M = diag(1, -1, 1), the
 *     flow-frame mirror that keeps v and a and reverses m, M R_phi(g w) g is a rotation
 *     taking w to w_f and e1(w) to sigma (cos phi u0 - sin phi u1), so it is
 *     R_{-phi + delta}(w). The flow sees the mirror image, under M, of the seam for w at
 *     the reversed phase. The model commutes with M (it maps meridian psi to -psi, bin j to
 *     bin B - j, and leaves polar angles alone), so C_a(g w) = C_a(w) and
 *     C_m(g w) = -C_m(w), the timeline run backwards.
 * On the arc-length samples (their count a multiple of 4, so the group maps the sample set
 * onto itself) and with the phase count a multiple of 4, both hold to rounding; the tests
 * check all eight elements at random axes and gyros. An axis fixed by an improper element
 * (on a mirror plane) therefore has no Magnus part.
 */
import { SEAM_SYMMETRIES } from "../../../geometry/symmetry.js";
import { orbitRepresentatives, symmetryImage, type SphereGrid } from "../../../geometry/sphereGrid.js";
import { assertGyro } from "../../sampling/band.js";
import type { SeamModel } from "./model.js";
import { turnAverage } from "./turn.js";

export interface CoefficientMap {
  /** Turn-averaged coefficient along a at each cell (spin axis = the cell's centre), dimensionless, scale applied. */
  readonly across: Float64Array;
  /** Turn-averaged coefficient along m at each cell. */
  readonly alongMagnus: Float64Array;
  /** Cells evaluated (one per orbit). */
  readonly evaluated: number;
}

/**
 * The turn average at every cell of `grid` (ball frame) at gyro `gyroRad`.
 * @throws RangeError for |gyro| >= pi/2.
 */
export function coefficientMap(model: SeamModel, gyroRad: number, grid: SphereGrid): CoefficientMap {
  assertGyro(gyroRad);
  const n = grid.count;
  const across = new Float64Array(n);
  const alongMagnus = new Float64Array(n);
  const rep = orbitRepresentatives(grid);
  const axis: [number, number, number] = [0, 0, 0];
  const c = { across: 0, alongMagnus: 0 };
  const pts = grid.points;
  // which signs of the Magnus part reached a cell from its representative: 1 proper, 2 improper
  const reached = new Uint8Array(n);
  let evaluated = 0;
  for (let i = 0; i < n; i++) {
    if (rep[i] !== i) continue;
    axis[0] = pts[3 * i];
    axis[1] = pts[3 * i + 1];
    axis[2] = pts[3 * i + 2];
    turnAverage(model, axis, gyroRad, c);
    evaluated++;
    for (let g = 0; g < SEAM_SYMMETRIES.length; g++) {
      const k = symmetryImage(grid, i, g);
      const proper = SEAM_SYMMETRIES[g].proper;
      reached[k] |= proper ? 1 : 2;
      across[k] = c.across;
      // a cell reached both ways is fixed by an improper element: its Magnus part is 0 exactly
      alongMagnus[k] = reached[k] === 3 ? 0 : proper ? c.alongMagnus : -c.alongMagnus;
    }
  }
  return { across, alongMagnus, evaluated };
}
