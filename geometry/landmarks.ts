/**
 * Named places on the ball, found from the seam curve (ball frame, see seamCurve.ts).
 *
 * The seam splits the ball into two congruent cover halves: half A holds the +z
 * waist, half B the -z waist. Each half is a dumbbell: two lobes joined by a
 * narrow waist. Our names:
 *   tip-A1, tip-A2, tip-B1, tip-B2  the horseshoe tips: the apex of the seam's
 *                                    U-turn around lobe A1, A2, B1, B2 (the points
 *                                    of the seam farthest from the curve's equator)
 *   waist-A, waist-B                 the middle of each half's narrow waist, halfway
 *                                    between the two tips that face across it
 *   lobe-A1, lobe-A2, lobe-B1, lobe-B2  lobe centres: the point of each lobe
 *                                    farthest from the seam
 *   node-1 .. node-4                 where the seam crosses the curve's equator, in
 *                                    order of increasing t (node-1 at t = 0)
 * Lobe and tip numbering: B1 is the lobe around longitude 45 deg, B2 around 225 deg,
 * A1 around 135 deg, A2 around 315 deg (the order in which the seam's U-turns come
 * for increasing t).
 */
import { BoundedCache } from "./cache.js";
import { seamPoint, seamTangent } from "./seamCurve.js";
import { sampleSeam } from "./seamSamples.js";
import { angleBetween, dot3, unit3, type Vec3 } from "./vec.js";

export type LandmarkKind = "tip" | "waist" | "lobe" | "node";

export interface Landmark {
  readonly name: string;
  readonly kind: LandmarkKind;
  /** Unit direction in the ball frame. */
  readonly direction: Vec3;
  /** Curve parameter where the landmark is on the seam (tips and nodes), radians. */
  readonly t?: number;
  /** Angular distance to the nearest seam point, radians (0 for tips and nodes). */
  readonly seamDistanceRad: number;
}

const SCAN = 4096;
const MAX_ITER = 200;
/** Parameter tolerance for the 1-D searches, radians. */
const T_TOLERANCE = 1e-13;

function point(b: number, t: number): Vec3 {
  const p: Vec3 = [0, 0, 0];
  seamPoint(b, t, p);
  return p;
}

/** Golden-section maximisation of f on [lo, hi]. */
function maximise(f: (t: number) => number, lo: number, hi: number): number {
  const g = (Math.sqrt(5) - 1) / 2;
  let a = lo;
  let b = hi;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < MAX_ITER && b - a > T_TOLERANCE; i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = f(d);
    }
  }
  return 0.5 * (a + b);
}

/** Bisection for a sign change of f on [lo, hi]. */
function bisect(f: (t: number) => number, lo: number, hi: number): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  for (let i = 0; i < MAX_ITER && b - a > T_TOLERANCE; i++) {
    const m = 0.5 * (a + b);
    const fm = f(m);
    if (fm === 0) return m;
    if (Math.sign(fm) === Math.sign(fa)) {
      a = m;
      fa = fm;
    } else b = m;
  }
  return 0.5 * (a + b);
}

/** Angular distance from unit `p` to the seam polyline given by flat unit points. */
export function angleToSeam(p: Readonly<Vec3>, pts: Float64Array): number {
  let best = -2;
  let bestIndex = 0;
  const n = pts.length / 3;
  for (let i = 0; i < n; i++) {
    const d = p[0] * pts[3 * i] + p[1] * pts[3 * i + 1] + p[2] * pts[3 * i + 2];
    if (d > best) {
      best = d;
      bestIndex = i;
    }
  }
  // refine against the two segments beside the nearest sample (great-circle arcs)
  let angle = Math.acos(Math.min(1, best));
  for (const j of [bestIndex - 1, bestIndex]) {
    const i0 = (j + n) % n;
    const i1 = (i0 + 1) % n;
    const a: Vec3 = [pts[3 * i0], pts[3 * i0 + 1], pts[3 * i0 + 2]];
    const b: Vec3 = [pts[3 * i1], pts[3 * i1 + 1], pts[3 * i1 + 2]];
    angle = Math.min(angle, angleToArc(p, a, b));
  }
  return angle;
}

/** Angle from p to the short great-circle arc a-b. */
function angleToArc(p: Readonly<Vec3>, a: Vec3, b: Vec3): number {
  const nx = a[1] * b[2] - a[2] * b[1];
  const ny = a[2] * b[0] - a[0] * b[2];
  const nz = a[0] * b[1] - a[1] * b[0];
  const nn = Math.hypot(nx, ny, nz);
  if (nn < 1e-15) return angleBetween(p, a);
  const n: Vec3 = [nx / nn, ny / nn, nz / nn];
  const pn = dot3(p, n);
  const foot: Vec3 = [p[0] - pn * n[0], p[1] - pn * n[1], p[2] - pn * n[2]];
  const fl = Math.hypot(foot[0], foot[1], foot[2]);
  if (fl > 1e-15) {
    const f: Vec3 = [foot[0] / fl, foot[1] / fl, foot[2] / fl];
    // the foot lies on the arc when it is between a and b
    const ab = angleBetween(a, b);
    if (Math.abs(angleBetween(a, f) + angleBetween(f, b) - ab) < 1e-12) return Math.asin(Math.min(1, Math.abs(pn)));
  }
  return Math.min(angleBetween(p, a), angleBetween(p, b));
}

const landmarkCache = new BoundedCache<number, readonly Landmark[]>("landmarks per seam shape", 16);

/** Every landmark of the seam with shape `b` (computed once per shape, then shared: do not modify). */
export function findLandmarks(b: number): readonly Landmark[] {
  return landmarkCache.get(b, () => Object.freeze(computeLandmarks(b)));
}

function computeLandmarks(b: number): Landmark[] {
  const out: Landmark[] = [];
  const dt = (2 * Math.PI) / SCAN;
  const z = (t: number) => point(b, t)[2];
  const slope: Vec3 = [0, 0, 0];
  const zSlope = (t: number) => {
    seamTangent(b, t, slope);
    return slope[2];
  };

  // horseshoe tips: local extrema of |z| along the seam
  const tips: { t: number; p: Vec3 }[] = [];
  for (let i = 0; i < SCAN; i++) {
    const t0 = (i - 1) * dt;
    const t1 = i * dt;
    const t2 = (i + 1) * dt;
    const a0 = Math.abs(z(t0));
    const a1 = Math.abs(z(t1));
    const a2 = Math.abs(z(t2));
    if (a1 > a0 && a1 >= a2) {
      // the apex is where the seam runs level: a root of z'(t)
      const t = bisect(zSlope, t0, t2);
      tips.push({ t, p: point(b, t) });
    }
  }
  if (tips.length !== 4) throw new Error(`expected 4 horseshoe tips, found ${tips.length} (b = ${b})`);
  // tips above the equator cap half B's lobes; below, half A's (see header)
  const above = tips.filter((x) => x.p[2] > 0);
  const below = tips.filter((x) => x.p[2] < 0);
  const tipNames = new Map<number, string>();
  above.forEach((x, i) => tipNames.set(x.t, `B${i + 1}`));
  below.forEach((x, i) => tipNames.set(x.t, `A${i + 1}`));
  for (const x of tips) {
    out.push({ name: `tip-${tipNames.get(x.t)}`, kind: "tip", direction: x.p, t: x.t, seamDistanceRad: 0 });
  }

  // waists: halfway between the two tips that face each other across the pole
  const seam = sampleSeam(b, 4096);
  for (const [half, pair] of [
    ["A", above],
    ["B", below],
  ] as const) {
    const mid = unit3([pair[0].p[0] + pair[1].p[0], pair[0].p[1] + pair[1].p[1], pair[0].p[2] + pair[1].p[2]]);
    out.push({ name: `waist-${half}`, kind: "waist", direction: mid, seamDistanceRad: angleToSeam(mid, seam.points) });
  }

  // lobe centres: each lobe is mapped onto itself by the mirror through its tip's
  // meridian, so its centre lies on that meridian, between the tip and the far pole
  for (const x of tips) {
    const azimuth = Math.atan2(x.p[1], x.p[0]);
    const tipLat = Math.asin(x.p[2]);
    const onMeridian = (lat: number): Vec3 => [Math.cos(lat) * Math.cos(azimuth), Math.cos(lat) * Math.sin(azimuth), Math.sin(lat)];
    const [lo, hi] = x.p[2] > 0 ? [-Math.PI / 2, tipLat] : [tipLat, Math.PI / 2];
    const lat = maximise((u) => angleToSeam(onMeridian(u), seam.points), lo, hi);
    const centre = onMeridian(lat);
    out.push({
      name: `lobe-${tipNames.get(x.t)}`,
      kind: "lobe",
      direction: centre,
      seamDistanceRad: angleToSeam(centre, seam.points),
    });
  }

  // nodes: sign changes of z along the seam
  let node = 0;
  for (let i = 0; i < SCAN; i++) {
    const t0 = i * dt - dt / 2;
    const t1 = t0 + dt;
    const z0 = z(t0);
    const z1 = z(t1);
    if (z0 === 0 || Math.sign(z0) !== Math.sign(z1)) {
      const t = bisect(z, t0, t1);
      node += 1;
      out.push({ name: `node-${node}`, kind: "node", direction: point(b, t), t: t < 0 ? t + 2 * Math.PI : t, seamDistanceRad: 0 });
    }
  }
  if (node !== 4) throw new Error(`expected 4 equator crossings, found ${node} (b = ${b})`);
  return out;
}

/** Looks up a landmark by name (case-insensitive). */
export function landmarkByName(landmarks: readonly Landmark[], name: string): Landmark | undefined {
  const key = name.trim().toLowerCase();
  return landmarks.find((l) => l.name.toLowerCase() === key);
}

/** The landmark nearest to unit direction `p`, with the angle to it in radians. */
export function nearestLandmark(landmarks: readonly Landmark[], p: Readonly<Vec3>): { landmark: Landmark; angleRad: number } {
  let best = landmarks[0];
  let bestAngle = Infinity;
  for (const l of landmarks) {
    const a = angleBetween(p, l.direction);
    if (a < bestAngle) {
      bestAngle = a;
      best = l;
    }
  }
  return { landmark: best, angleRad: bestAngle };
}
