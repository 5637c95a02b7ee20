/**
 * The instantaneous seam force: one orientation of the ball, one instant.
 *
 * Flow frame (geometry/flow.ts): unit ball, v = +z (front stagnation point at +v,
 * polar angle theta from it), a = +x (across), m = -y (Magnus), azimuth psi about v
 * from +x toward +y.
 *
 * THE RULE, per meridian psi_j = 2 pi j / B (azimuth.ts), walking from the front
 * stagnation point toward the back:
 *   1. the boundary layer starts laminar; left alone it separates at the laminar angle
 *      theta_L (laminarSeparationDeg);
 *   2. a seam crossing in the trip zone [tripStart, tripEnd] trips it turbulent: it then
 *      stays attached up to the turbulent angle theta_T (turbulentSeparationDeg)
 *      (the cricket-ball swing mechanism, Mehta, Annu. Rev. Fluid Mech. 17, 1985);
 *   3. a seam crossing in the fixation band [near, far] (the sampler's band), met while
 *      the layer is still attached, fixes separation at the seam itself.
 * The profile guarantees tripEnd <= near and tripEnd <= theta_L (parameters.ts), so every
 * trip crossing on a meridian comes before every band crossing and the walk reduces to
 *     theta_s = min(theta_b, theta_T)  if the meridian has a trip crossing,
 *     theta_s = min(theta_b, theta_L)  otherwise,
 * with theta_b the first (smallest-theta) band crossing (infinity if none). Crossings
 * ahead of tripStart, between tripEnd and near, or behind separation change nothing.
 * In cosines (larger = nearer the front) this is c_s = max(c_b, tripped ? c_T : c_L).
 *
 * Force: attached-flow pressure ahead of theta_s, wake pressure behind (pressure.ts),
 *     C = -(2/B) scale sum_j [G(theta_s,j) - G(theta_L)] (cos psi_j, sin psi_j),
 * the rectangle rule of pressure.ts's azimuth integral on the periodic grid (exact for a
 * constant G, so the undisturbed line theta_L everywhere gives zero; subtracting G(theta_L)
 * only keeps undisturbed meridians out of the sum). A meridian that separates later than
 * its opposite pushes the ball toward itself: the trip pushes toward the tripped side,
 * early fixation away from the fixed side.
 *
 * Crossings: the seam is the closed polyline of its arc-length samples. A segment that
 * reaches the trip zone or the band up to min(far, theta_T) (tested on its ends' heights,
 * widened by the model's chordMargin) is checked for meridians between its ends'
 * pseudo-angles (azimuth.ts); each crossing is the exact intersection of the chord with
 * the meridian's half-plane, pushed out to the sphere (cos theta = z / |r|). A chord
 * wholly inside the trip zone trips every meridian it crosses without interpolating.
 * Between samples the chord cuts inside the curve by at most (spacing)^2 / 8 (9e-4 at
 * the default 128 samples); the staircase of the meridian grid (steps of order 1/B in C)
 * is the larger error, see DEVELOPERS.md's convergence study. Sharp zone edges: a crossing
 * exactly on an edge counts by rounding, so symmetric attitudes that put a sample on an
 * edge (e.g. whole-degree phases about the ball's z axis) can break a symmetry by one
 * meridian's step.
 */
import { pseudoAngle } from "./azimuth.js";
import type { SeamModel } from "./model.js";
import { pressureIntegralFromTable } from "./pressure.js";

/** Marks a bin with no band crossing (below every cosine). */
const NO_CROSSING = -2;

/** Instantaneous coefficients and separation angles. */
export interface InstantCoefficient {
  /** Force coefficient along a (across), dimensionless, scale applied. */
  across: number;
  /** Force coefficient along m (Magnus direction), dimensionless, scale applied. */
  alongMagnus: number;
  /** Separation angle on the meridian toward +a, rad from the front stagnation point. */
  separationPlusAcrossRad: number;
  /** ... toward -a. */
  separationMinusAcrossRad: number;
  /** ... toward +m. */
  separationPlusMagnusRad: number;
  /** ... toward -m. */
  separationMinusMagnusRad: number;
}

export function emptyInstant(): InstantCoefficient {
  return {
    across: 0,
    alongMagnus: 0,
    separationPlusAcrossRad: 0,
    separationMinusAcrossRad: 0,
    separationPlusMagnusRad: 0,
    separationMinusMagnusRad: 0,
  };
}

/**
 * The model at one instant. The flow-frame seam points come from the orientation loaded
 * into the scratch (turn.ts: x = hA - s C, y = -D, z = hZ + k C with C = e1 cos phi - e2 sin phi,
 * D = e1 sin phi + e2 cos phi) at phase (cosPhi, sinPhi). It
 * writes result[0..1] = (C_x, C_y), scale applied, and result[2..5] = cos theta_s at the
 * meridians of bins 0, B/4, B/2, 3B/4 (toward +a, -m, -a, +m). No allocation.
 */
export function evaluateFlowPoints(model: SeamModel, cosPhi: number, sinPhi: number): void {
  const sc = model.scratch;
  const hA = sc.heightAcross, hZ = sc.heightAlong, e1 = sc.e1, e2 = sc.e2;
  const sg = sc.orientation[0], kg = sc.orientation[1];
  const tripped = sc.tripped;
  const bandCos = sc.bandCos;
  const bins = model.bins;
  const nb = bins.count;
  const binCos = bins.cos, binSin = bins.sin, threshold = bins.threshold, cellCount = bins.cellCount;
  const n = model.seam.count;
  const cs = model.cosines;
  const cTripStart = cs[0], cTripEnd = cs[1], cNear = cs[2], cFar = cs[3], cTurb = cs[4], cLam = cs[5];
  // band crossings matter up to the band's far edge or turbulent separation, whichever is
  // first; the segment test is widened by the chord's sag so that a crossing pushed out to
  // the sphere (|cos| grows by at most that factor) is never missed
  const margin = model.chordMargin;
  const bandLo = (cFar > cTurb ? cFar : cTurb) - margin;
  const bandHi = cNear + margin;
  const tripLo = cTripEnd - margin;
  const tripHi = cTripStart + margin;
  const innerTripLo = cTripEnd + margin;
  const innerTripHi = cTripStart - margin;
  tripped.fill(0);
  bandCos.fill(NO_CROSSING);
  let px: number, py: number, pz: number;
  {
    const a = e1[n - 1], b = e2[n - 1];
    const C = a * cosPhi - b * sinPhi;
    px = hA[n - 1] - sg * C;
    py = -(a * sinPhi + b * cosPhi);
    pz = hZ[n - 1] + kg * C;
  }
  let pp = 0;
  let pHave = false;
  for (let i = 0; i < n; i++) {
    const a = e1[i], b = e2[i];
    const C = a * cosPhi - b * sinPhi;
    const x = hA[i] - sg * C;
    const y = -(a * sinPhi + b * cosPhi);
    const z = hZ[i] + kg * C;
    const zLo = z < pz ? z : pz;
    const zHi = z < pz ? pz : z;
    if ((zHi >= tripLo && zLo <= tripHi) || (zHi >= bandLo && zLo <= bandHi)) {
      if (!pHave) pp = pseudoAngle(px, py);
      const p = pseudoAngle(x, y);
      // Rare cases (the wrap past p = 4, meridian indices past B) take the same arithmetic
      // as the common ones with a selected constant, so the optimiser sees every operation
      // from the first calls and never deoptimises on a path met late (a deoptimised loop
      // can be left running in on-stack-replacement code with boxed doubles, 1.5-2x slower).
      let d = p - pp;
      d -= d > 2 ? 4 : d < -2 ? -4 : 0;
      const lo = d >= 0 ? pp : p;
      const hi = lo + (d >= 0 ? d : -d);
      // meridians with threshold in (lo, hi], counted with wrap-around past p = 4
      let jStart = cellCount[(lo * nb) | 0];
      if (jStart < nb && threshold[jStart] <= lo) jStart++;
      const wraps = hi >= 4 ? 1 : 0;
      const hw = hi - 4 * wraps;
      let jEnd = cellCount[(hw * nb) | 0];
      if (jEnd < nb && threshold[jEnd] <= hw) jEnd++;
      jEnd += nb * wraps;
      if (zLo >= innerTripLo && zHi <= innerTripHi) {
        // the whole chord (pushed out to the sphere) lies in the trip zone: every crossing trips
        for (let jj = jStart; jj < jEnd; jj++) tripped[jj - (jj < nb ? 0 : nb)] = 1;
      } else for (let jj = jStart; jj < jEnd; jj++) {
        const j = jj - (jj < nb ? 0 : nb);
        const cj = binCos[j], sj = binSin[j];
        const dp = cj * py - sj * px;
        const dq = cj * y - sj * x;
        // t = dp / (dp - dq), in [0, 1] but for rounding; a NaN (dp = dq = 0) fails t > 0 and gives 0
        const tr = dp / (dp - dq);
        const t = tr > 0 ? (tr < 1 ? tr : 1) : 0;
        const zc = pz + t * (z - pz);
        const h = cj * (px + t * (x - px)) + sj * (py + t * (y - py));
        const c = zc / Math.sqrt(h * h + zc * zc);
        if (c <= cTripStart && c >= cTripEnd) tripped[j] = 1;
        else if (c <= cNear && c >= cFar && c > bandCos[j]) bandCos[j] = c;
      }
      pp = p;
      pHave = true;
    } else pHave = false;
    px = x;
    py = y;
    pz = z;
  }
  const table = model.pressure;
  const gLam = model.pressureLaminar;
  const stepTurb = model.pressureTurbulentStep;
  let sx = 0;
  let sy = 0;
  for (let j = 0; j < nb; j++) {
    const b = bandCos[j];
    const base = tripped[j] === 1 ? cTurb : cLam;
    let dg: number;
    if (b > base) dg = pressureIntegralFromTable(table, b) - gLam;
    else if (base === cTurb) dg = stepTurb;
    else continue;
    sx += dg * binCos[j];
    sy += dg * binSin[j];
  }
  const k = (-2 / nb) * model.scale;
  const r = sc.result;
  r[0] = k * sx;
  r[1] = k * sy;
  const q = nb / 4;
  for (let s = 0; s < 4; s++) {
    const j = s * q;
    const base = tripped[j] === 1 ? cTurb : cLam;
    const b = bandCos[j];
    r[2 + s] = b > base ? b : base;
  }
}

/** Copies the scratch result into `out` (angles by arccos of the stored cosines). */
export function readInstant(model: SeamModel, out: InstantCoefficient): InstantCoefficient {
  const r = model.scratch.result;
  out.across = r[0];
  out.alongMagnus = -r[1];
  out.separationPlusAcrossRad = Math.acos(r[2]);
  out.separationMinusMagnusRad = Math.acos(r[3]);
  out.separationMinusAcrossRad = Math.acos(r[4]);
  out.separationPlusMagnusRad = Math.acos(r[5]);
  return out;
}

/**
 * The instantaneous coefficient for one ball orientation.
 * @param model from seamModel().
 * @param ballToFlow rotation taking ball-frame vectors to the flow frame, column-major
 *   3x3 (gl-matrix mat3 layout, as geometry/flow.ts's ballToFlowAtPhase writes).
 * @param out overwritten and returned.
 * @throws RangeError unless ballToFlow has 9 finite numbers.
 */
export function instantaneousCoefficient(
  model: SeamModel,
  ballToFlow: ArrayLike<number>,
  out: InstantCoefficient = emptyInstant(),
): InstantCoefficient {
  if (ballToFlow.length !== 9) throw new RangeError(`ball-to-flow matrix has ${ballToFlow.length} entries; it must have 9`);
  for (let i = 0; i < 9; i++) {
    if (!Number.isFinite(ballToFlow[i])) throw new RangeError(`ball-to-flow matrix entry ${i} = ${ballToFlow[i]} must be a finite number`);
  }
  const m0 = ballToFlow[0], m1 = ballToFlow[1], m2 = ballToFlow[2];
  const m3 = ballToFlow[3], m4 = ballToFlow[4], m5 = ballToFlow[5];
  const m6 = ballToFlow[6], m7 = ballToFlow[7], m8 = ballToFlow[8];
  // Load the flow-frame points in the turn's representation (turn.ts) with phase 0 and
  // gyro 0, where x = q.w k - s C, y = -D, z = q.w s + k C reduce to x = hA, y = -e2, z = hZ + e1.
  const pts = model.seam.points;
  const sc = model.scratch;
  const hA = sc.heightAcross, hZ = sc.heightAlong, e1 = sc.e1, e2 = sc.e2;
  const n = model.seam.count;
  for (let i = 0; i < n; i++) {
    const bx = pts[3 * i], by = pts[3 * i + 1], bz = pts[3 * i + 2];
    hA[i] = m0 * bx + m3 * by + m6 * bz;
    e2[i] = -(m1 * bx + m4 * by + m7 * bz);
    e1[i] = m2 * bx + m5 * by + m8 * bz;
    hZ[i] = 0;
  }
  sc.orientation[0] = 0;
  sc.orientation[1] = 1;
  evaluateFlowPoints(model, 1, 0);
  return readInstant(model, out);
}
