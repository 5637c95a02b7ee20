/**
 * Overlays on a ball drawing (ball frame; view and disc as in projection.ts; marks
 * and colours as in ballStyle.ts). Each function adds its marks to a drawing group (scene.ts).
 */
import { BALL_RADIUS_IN } from "../../geometry/ball.js";
import { findLandmarks } from "../../geometry/landmarks.js";
import { cross3, dot3, perpendicularUnit, unit3, type Vec3 } from "../../geometry/vec.js";
import type { Band } from "../sampling/band.js";
import { BALL_STYLE as S } from "./ballStyle.js";
import { depthRuns, projectPoint, projectPoints, runsWhere, type DiscPlacement, type View } from "./projection.js";
import { smallCirclePoints } from "./sphereCircle.js";
import { addText, formatNumber, type SceneNode as G } from "./scene.js";
import { pointsAttribute, polylinePath } from "./svgPath.js";

/** How far the spin-axis stubs reach beyond the surface, ball radii. */
const AXIS_STUB_RADII = 0.3;
/** Samples per edge circle and per band strip. */
const CIRCLE_POINTS = 360;

export interface FingerPad {
  /** Centre of the pad on the ball, ball frame (normalised here). */
  readonly direction: Vec3;
  readonly label: string;
  /** Pad radius measured along the surface, inches (0 < r < a quarter circumference). */
  readonly radiusIn: number;
}

export interface PushArrow {
  /** Direction of the push (any length; normalised here). */
  readonly direction: Vec3;
  /** Frame of `direction`: the ball frame, or the view frame (x right, y up, z toward the viewer). */
  readonly frame: "ball" | "view";
  readonly label?: string;
}

export interface FlowBandOverlay {
  /** Flight direction v in the ball frame; the front stagnation point is +v (src/sampling/band.ts). */
  readonly flowDirection: Vec3;
  /** Band theta in [c - w/2, c + w/2] from +v. */
  readonly band: Band;
}

/** Three corners of a filled arrowhead with its tip at (x, y) pointing along unit (ux, uy), px. */
function arrowHead(x: number, y: number, ux: number, uy: number, sizePx: number): number[] {
  const bx = x - sizePx * ux, by = y - sizePx * uy;
  const w = 0.45 * sizePx;
  return [x, y, bx - w * uy, by + w * ux, bx + w * uy, by - w * ux];
}

/**
 * The spin axis: the far stub goes into `under` (drawn before the ball, which hides
 * the part of it behind the disc), the rest into `over`.
 */
export function drawSpinAxis(under: G, over: G, view: View, disc: DiscPlacement, axis: Readonly<Vec3>, digits: number): void {
  const a = unit3(axis);
  const r = disc.radiusPx;
  const ends = [1, -1].map((sign) => {
    const pierce = projectPoint(view, disc, [sign * a[0], sign * a[1], sign * a[2]]);
    const k = sign * (1 + AXIS_STUB_RADII);
    return { sign, pierce, tip: projectPoint(view, disc, [k * a[0], k * a[1], k * a[2]]) };
  });
  const gu = under.group().attr({ class: "sa-axis-far" });
  const go = over.group().attr({ class: "sa-axis" });
  go.path()
    .attr({ d: polylinePath([ends[1].pierce.xPx, ends[1].pierce.yPx, ends[0].pierce.xPx, ends[0].pierce.yPx], false, digits) })
    .attr({ fill: "none", stroke: S.axis, "stroke-width": 1, "stroke-dasharray": "4 3" });
  for (const e of ends) {
    const near = e.pierce.depthPx >= 0;
    const g = near ? go : gu;
    const opacity = near ? 1 : S.hiddenOpacity;
    g.path()
      .attr({ d: polylinePath([e.pierce.xPx, e.pierce.yPx, e.tip.xPx, e.tip.yPx], false, digits) })
      .attr({ fill: "none", stroke: S.axis, "stroke-width": 2, opacity });
    const dx = e.tip.xPx - e.pierce.xPx, dy = e.tip.yPx - e.pierce.yPx;
    const len = Math.hypot(dx, dy);
    if (e.sign > 0 && len > 0.02 * r) {
      g.polygon().attr({ points: pointsAttribute(arrowHead(e.tip.xPx, e.tip.yPx, dx / len, dy / len, 9), digits) })
        .attr({ fill: S.axis, opacity });
    }
    // pierce markers sit on the surface, so the far ones are hidden by the ball: show them faded on top
    go.circle().attr({ cx: e.pierce.xPx, cy: e.pierce.yPx, r: 4, class: e.sign > 0 ? "sa-axis-plus" : "sa-axis-minus" })
      .attr({ fill: e.sign > 0 ? S.axis : S.halo, stroke: S.axis, "stroke-width": 1.5, opacity });
  }
}

/**
 * The separation band as the flow sees it: the visible parts of the circles
 * theta = c -+ w/2 about +v, and the visible part of the band between them tinted.
 * For each phi the visible part of [theta1, theta2] is one interval: depth is
 * A cos(theta) + B sin(theta), positive on an open half-turn of theta, and the band is
 * shorter than a half-turn; its end is the zero theta = psi + pi/2 (mod pi), psi = atan2(B, A).
 */
export function drawFlowBand(g: G, view: View, disc: DiscPlacement, overlay: FlowBandOverlay, digits: number): void {
  const v = unit3(overlay.flowDirection);
  const t1 = overlay.band.centerRad - overlay.band.widthRad / 2;
  const t2 = overlay.band.centerRad + overlay.band.widthRad / 2;
  if (!(t1 > 0 && t2 < Math.PI)) throw new RangeError(`band ${t1} to ${t2} rad must lie inside (0, pi)`);
  const e1 = perpendicularUnit(v); // the same start of phi as smallCirclePoints
  const e2 = cross3(v, e1);
  const A = dot3(v, view.toViewer);
  const lo = new Float64Array(CIRCLE_POINTS);
  const hi = new Float64Array(CIRCLE_POINTS);
  const depth = (theta: number, B: number) => A * Math.cos(theta) + B * Math.sin(theta);
  for (let k = 0; k < CIRCLE_POINTS; k++) {
    const phi = (2 * Math.PI * k) / CIRCLE_POINTS;
    const B = Math.cos(phi) * dot3(e1, view.toViewer) + Math.sin(phi) * dot3(e2, view.toViewer);
    const zero0 = Math.atan2(B, A) + Math.PI / 2;
    const zero = zero0 - Math.PI * Math.floor((zero0 - t1) / Math.PI); // the first zero at or above t1
    const in1 = depth(t1, B) > 0, in2 = depth(t2, B) > 0;
    lo[k] = in1 ? t1 : in2 ? zero : NaN;
    hi[k] = in2 ? t2 : in1 ? Math.min(zero, t2) : NaN;
  }
  const at = (theta: number, k: number): Vec3 => {
    const phi = (2 * Math.PI * k) / CIRCLE_POINTS;
    const c = Math.cos(theta), s = Math.sin(theta);
    const cp = s * Math.cos(phi), sp = s * Math.sin(phi);
    return [c * v[0] + cp * e1[0] + sp * e2[0], c * v[1] + cp * e1[1] + sp * e2[1], c * v[2] + cp * e1[2] + sp * e2[2]];
  };
  const xy = (theta: Float64Array, run: readonly number[]) =>
    run.flatMap((k) => {
      const p = projectPoint(view, disc, at(theta[k], k));
      return [p.xPx, p.yPx];
    });
  let tint = "";
  for (const run of runsWhere(CIRCLE_POINTS, (k) => !Number.isNaN(lo[k]), true)) {
    if (run.length === CIRCLE_POINTS) tint += polylinePath(xy(lo, run), true, digits) + polylinePath(xy(hi, run), true, digits);
    else tint += polylinePath([...xy(lo, run), ...xy(hi, [...run].reverse())], true, digits);
  }
  const group = g.group().attr({ class: "sa-band" });
  if (tint) group.path().attr({ d: tint, fill: S.bandTint, "fill-opacity": S.bandTintOpacity, "fill-rule": "evenodd", stroke: "none" });
  let edges = "";
  for (const theta of [t1, t2]) {
    const p = projectPoints(view, disc, smallCirclePoints(v, theta, CIRCLE_POINTS));
    for (const run of depthRuns(p, true)) {
      edges += polylinePath(run.flatMap((k) => [p[3 * k], p[3 * k + 1]]), run.length === CIRCLE_POINTS, digits);
    }
  }
  if (edges) group.path().attr({ d: edges, fill: "none", stroke: S.bandEdge, "stroke-width": 1.2 });
  const front = projectPoint(view, disc, v);
  if (front.depthPx > 0) {
    const d = 4;
    group.polygon()
      .attr({ points: pointsAttribute([front.xPx, front.yPx - d, front.xPx + d, front.yPx, front.xPx, front.yPx + d, front.xPx - d, front.yPx], digits) })
      .attr({ fill: "none", stroke: S.bandEdge, "stroke-width": 1.2, class: "sa-stagnation" });
  }
}

/**
 * Finger pads as the caps they cover on the surface. A cap facing the viewer entirely
 * is an exact ellipse (the orthographic image of a circle); one cut by the limb is a
 * polygon whose hidden boundary points are pushed out to the limb along their
 * direction from the centre, which traces the limb arc inside the cap for caps
 * smaller than a hemisphere; one facing away entirely is a faded dashed outline.
 */
export function drawFingerPads(g: G, view: View, disc: DiscPlacement, pads: readonly FingerPad[], digits: number, labels: G = g): void {
  const group = g.group().attr({ class: "sa-pads" });
  const r = disc.radiusPx;
  for (const pad of pads) {
    const alpha = pad.radiusIn / BALL_RADIUS_IN;
    if (!(alpha > 0 && alpha < Math.PI / 2)) {
      throw new RangeError(`finger pad "${pad.label}" radius ${pad.radiusIn} in must be above 0 and below a quarter circumference`);
    }
    const d = unit3(pad.direction);
    const dz = dot3(d, view.toViewer);
    const centre = projectPoint(view, disc, [Math.cos(alpha) * d[0], Math.cos(alpha) * d[1], Math.cos(alpha) * d[2]]);
    const style = { fill: S.padFill, "fill-opacity": S.padFillOpacity, stroke: S.padOutline, "stroke-width": 1.2 };
    if (dz > Math.sin(alpha) || dz < -Math.sin(alpha)) {
      // SVG's y is down, so the minor axis (along the pad's offset from the centre) is (dx, -dy)
      const angleDeg = (Math.atan2(dot3(d, view.right), dot3(d, view.up)) * 180) / Math.PI;
      const e = group.ellipse().attr({ cx: centre.xPx, cy: centre.yPx, rx: r * Math.sin(alpha), ry: r * Math.sin(alpha) * Math.abs(dz) });
      e.attr({ transform: `rotate(${formatNumber(angleDeg, digits)} ${formatNumber(centre.xPx, digits)} ${formatNumber(centre.yPx, digits)})` });
      if (dz > 0) e.attr(style);
      else e.attr({ fill: "none", stroke: S.padOutline, "stroke-width": 1, "stroke-dasharray": "3 2", opacity: S.hiddenOpacity });
    } else {
      const p = projectPoints(view, disc, smallCirclePoints(d, alpha, 96));
      const xy: number[] = [];
      for (let k = 0; k < p.length; k += 3) {
        const x = p[k] - disc.centerXPx, y = p[k + 1] - disc.centerYPx;
        const s = p[k + 2] > 0 ? 1 : r / Math.max(Math.hypot(x, y), 1e-9);
        xy.push(disc.centerXPx + s * x, disc.centerYPx + s * y);
      }
      group.path().attr({ d: polylinePath(xy, true, digits), ...style });
    }
    // the letter at full strength over every mark: a pad on the far side says so by its dashed outline
    addText(labels, centre.xPx, centre.yPx + 4, pad.label, { sizePx: 11, fill: S.padOutline, anchor: "middle", weight: "bold", haloPx: 2.5, className: "sa-pad-label" });
  }
}

/** The push as an arrow from the ball's centre, 1.3 ball radii long when it lies across the line of sight. */
export function drawPushArrow(g: G, view: View, disc: DiscPlacement, push: PushArrow, digits: number, labels: G = g): void {
  const u = unit3(push.direction);
  const [x, y, z] = push.frame === "view" ? u : [dot3(u, view.right), dot3(u, view.up), dot3(u, view.toViewer)];
  const group = g.group().attr({ class: "sa-push" });
  const cx = disc.centerXPx, cy = disc.centerYPx;
  const across = Math.hypot(x, y);
  let labelX = cx, labelY = cy - 16;
  let anchor: "start" | "middle" | "end" = "middle";
  if (across < 0.1) {
    // nearly along the line of sight: an arrow would be a dot, so show which way
    group.circle().attr({ cx, cy, r: 9, fill: S.halo, stroke: S.push, "stroke-width": 2 });
    if (z > 0) group.circle().attr({ cx, cy, r: 2.5, fill: S.push });
    else group.path().attr({ d: `M${cx - 5} ${cy - 5}L${cx + 5} ${cy + 5}M${cx - 5} ${cy + 5}L${cx + 5} ${cy - 5}`, stroke: S.push, "stroke-width": 2 });
  } else {
    const len = 1.25 * disc.radiusPx * across;
    const ux = x / across, uy = -y / across;
    const tx = cx + len * ux, ty = cy + len * uy;
    group.path().attr({ d: polylinePath([cx, cy, tx - 8 * ux, ty - 8 * uy], false, digits), stroke: S.push, "stroke-width": 3, fill: "none" });
    group.polygon().attr({ points: pointsAttribute(arrowHead(tx, ty, ux, uy, 13), digits), fill: S.push });
    // beside the shaft on its upper side, text running away from it: clear of the side words
    // under the ball; an arrow pointing steeply down has it halfway along, inside the ball
    const side = Math.abs(ux) < 0.35 ? (uy > 0 ? 1 : -1) : ux > 0 ? -1 : 1;
    const ox = -side * 11 * uy, oy = side * 11 * ux;
    const along = uy > 0.6 ? 0.55 : 0.8;
    labelX = cx + along * len * ux + ox;
    labelY = cy + along * len * uy + oy + 4;
    anchor = ox > 3 ? "start" : ox < -3 ? "end" : "middle";
  }
  if (push.label) addText(labels, labelX, labelY, push.label, { sizePx: 11, fill: S.push, anchor, weight: "bold", haloPx: 2.5 });
}

/** Dots and names of the landmarks (geometry/landmarks.ts) that face the viewer; `names` picks some (case-insensitive). */
export function drawLandmarks(g: G, view: View, disc: DiscPlacement, b: number, names: readonly string[] | "all", labels: G = g): void {
  const wanted = names === "all" ? null : new Set(names.map((n) => n.toLowerCase()));
  const group = g.group().attr({ class: "sa-landmarks" });
  for (const l of findLandmarks(b)) {
    if (wanted && !wanted.has(l.name.toLowerCase())) continue;
    const p = projectPoint(view, disc, l.direction);
    if (!(p.depthPx > 0)) continue;
    group.circle().attr({ cx: p.xPx, cy: p.yPx, r: 2.2, fill: S.landmark });
    addText(labels, p.xPx + 4, p.yPx - 4, l.name, { sizePx: 9, fill: S.landmark, haloPx: 2 });
  }
}

export interface FingerMark {
  /** Centre of the fingertip pad, ball frame (normalised here). */
  readonly direction: Vec3;
  /** Tangent at the pad toward the fingertip, ball frame. */
  readonly pointing: Vec3;
  /** Pad width across the finger and length along it, inches (real size on the nominal ball). */
  readonly widthIn: number;
  readonly lengthIn: number;
  readonly label: string;
  /** Working fingers are drawn stronger than resting ones. */
  readonly working: boolean;
}

/** How much of the finger behind its pad is drawn, inches along the surface. */
const FINGER_BODY_IN = 1.1;

/**
 * Fingers as they lie on the ball: each finger's body as a band of its real width
 * running back from the pad along the surface (away from the fingertip), and the
 * pad as the oval it covers (width across, length along the finger). Parts facing
 * away from the viewer are left out; a pad wholly on the far side shows as a faded
 * dashed outline, so the thumb beneath the ball still reads in a view from above.
 */
export function drawFingers(g: G, view: View, disc: DiscPlacement, fingers: readonly FingerMark[], digits: number, labels: G = g): void {
  const group = g.group().attr({ class: "sa-fingers" });
  const r = disc.radiusPx;
  const pxPerIn = r / BALL_RADIUS_IN;
  for (const f of fingers) {
    const c = unit3(f.direction);
    const k0 = dot3(f.pointing, c);
    const u = unit3([f.pointing[0] - k0 * c[0], f.pointing[1] - k0 * c[1], f.pointing[2] - k0 * c[2]]);
    const x = cross3(c, u);
    // the finger's body: the great circle from the pad's back edge, away from the tip
    const body: number[] = [];
    const start = f.lengthIn / 2 / BALL_RADIUS_IN;
    const steps = 24;
    for (let i = 0; i <= steps; i++) {
      const a = -(start * 0.2 + ((FINGER_BODY_IN / BALL_RADIUS_IN) * i) / steps);
      const p: Vec3 = [Math.cos(a) * c[0] + Math.sin(a) * u[0], Math.cos(a) * c[1] + Math.sin(a) * u[1], Math.cos(a) * c[2] + Math.sin(a) * u[2]];
      const q = projectPoint(view, disc, p);
      if (q.depthPx > 0) body.push(q.xPx, q.yPx);
      else if (body.length) break;
    }
    if (body.length >= 4) {
      group.path().attr({
        d: polylinePath(body, false, digits), fill: "none", stroke: S.fingerFill, "stroke-width": f.widthIn * pxPerIn * 0.95,
        "stroke-opacity": f.working ? 0.5 : 0.32, "stroke-linecap": "round", class: "sa-finger",
      });
    }
    // the pad: an oval on the surface, half-axes along (u) and across (x) the finger
    const a = f.lengthIn / 2 / BALL_RADIUS_IN, b = f.widthIn / 2 / BALL_RADIUS_IN;
    const ring: number[] = [];
    let visible = 0;
    const n = 48;
    for (let i = 0; i < n; i++) {
      const phi = (2 * Math.PI * i) / n;
      const da = a * Math.cos(phi), db = b * Math.sin(phi);
      const ang = Math.hypot(da, db);
      const t: Vec3 = [(da * u[0] + db * x[0]) / ang, (da * u[1] + db * x[1]) / ang, (da * u[2] + db * x[2]) / ang];
      const p: Vec3 = [Math.cos(ang) * c[0] + Math.sin(ang) * t[0], Math.cos(ang) * c[1] + Math.sin(ang) * t[1], Math.cos(ang) * c[2] + Math.sin(ang) * t[2]];
      const q = projectPoint(view, disc, p);
      if (q.depthPx > 0) visible++;
      // a hidden boundary point is pushed out to the limb, which traces the limb inside the pad
      const dx = q.xPx - disc.centerXPx, dy = q.yPx - disc.centerYPx;
      const s = q.depthPx > 0 ? 1 : r / Math.max(Math.hypot(dx, dy), 1e-9);
      ring.push(disc.centerXPx + s * dx, disc.centerYPx + s * dy);
    }
    const centre = projectPoint(view, disc, c);
    if (visible > 0) {
      group.path().attr({
        d: polylinePath(ring, true, digits), fill: S.padFill, "fill-opacity": f.working ? 0.78 : 0.5, stroke: S.padOutline,
        "stroke-width": 1.2, class: "sa-pad",
      });
    } else {
      const far: number[] = [];
      for (let i = 0; i < n; i++) {
        const phi = (2 * Math.PI * i) / n;
        const da = a * Math.cos(phi), db = b * Math.sin(phi);
        const ang = Math.hypot(da, db);
        const p: Vec3 = [0, 1, 2].map((k) => Math.cos(ang) * c[k] + Math.sin(ang) * ((da * u[k] + db * x[k]) / ang)) as Vec3;
        const q = projectPoint(view, disc, p);
        far.push(q.xPx, q.yPx);
      }
      group.path().attr({ d: polylinePath(far, true, digits), fill: "none", stroke: S.padOutline, "stroke-width": 1, "stroke-dasharray": "3 2", opacity: 0.55, class: "sa-pad-far" });
    }
    // the letter at full strength over every mark: a finger on the far side says so by its dashed outline
    addText(labels, centre.xPx, centre.yPx + 4, f.label, { sizePx: 11, fill: S.padOutline, anchor: "middle", weight: "bold", haloPx: 3, className: "sa-pad-label" });
  }
}
