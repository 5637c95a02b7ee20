/// <reference lib="dom" />
/**
 * What is drawn fixed to the air flow (flow frame of src/sampling/brute.ts: v = +z
 * the flight direction, a = +x the push line): the separation band with its two
 * limiting circles theta = c -+ w/2 about v, tinted by side of the a-split, and
 * the arrows (their labels are the page's, laid out on the screen so none
 * overlaps). The ball turns inside these; they never move. The finger pads ride on
 * the ball.
 */
import {
  BufferAttribute,
  BufferGeometry,
  ConeGeometry,
  CylinderGeometry,
  DoubleSide,
  Group,
  Mesh,
  MeshBasicMaterial,
  MeshStandardMaterial,
  TorusGeometry,
  Vector3,
} from "three";
import type { Band } from "../../sampling/band.js";
import { hexToInt, PALETTE } from "./palette.js";

/** Radius the band is drawn at, just above the cover and below the seam tube's top (unit-ball lengths). */
const BAND_RADIUS = 1.006;
const RING_TUBE = 0.0075;
const BAND_OPACITY = 0.24;

/** A piece of the zone c - w/2 <= theta <= c + w/2 about +z, for azimuths phi0..phi1 (radians from +x toward +y). */
function zonePiece(thetaLo: number, thetaHi: number, phi0: number, phi1: number, color: string): Mesh {
  const rows = 10;
  const cols = 72;
  const positions = new Float32Array(3 * (rows + 1) * (cols + 1));
  const index: number[] = [];
  for (let r = 0; r <= rows; r++) {
    const theta = thetaLo + ((thetaHi - thetaLo) * r) / rows;
    for (let c = 0; c <= cols; c++) {
      const phi = phi0 + ((phi1 - phi0) * c) / cols;
      const k = 3 * (r * (cols + 1) + c);
      positions[k] = BAND_RADIUS * Math.sin(theta) * Math.cos(phi);
      positions[k + 1] = BAND_RADIUS * Math.sin(theta) * Math.sin(phi);
      positions[k + 2] = BAND_RADIUS * Math.cos(theta);
      if (r < rows && c < cols) {
        const a = r * (cols + 1) + c;
        index.push(a, a + 1, a + cols + 1, a + 1, a + cols + 2, a + cols + 1);
      }
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(positions, 3));
  geometry.setIndex(index);
  const material = new MeshBasicMaterial({ color: hexToInt(color), transparent: true, opacity: BAND_OPACITY, side: DoubleSide, depthWrite: false });
  const mesh = new Mesh(geometry, material);
  mesh.renderOrder = 2;
  return mesh;
}

/** The circle theta = const about +z, as a thin torus. */
function bandCircle(theta: number): Mesh {
  const ring = new Mesh(
    new TorusGeometry(BAND_RADIUS * Math.sin(theta), RING_TUBE, 8, 192),
    new MeshBasicMaterial({ color: hexToInt(PALETTE.splitLine) }),
  );
  ring.position.set(0, 0, BAND_RADIUS * Math.cos(theta));
  return ring;
}

/** The split plane q . a = 0 across the band, at azimuth phi (a meridian arc from thetaLo to thetaHi). */
function splitArc(thetaLo: number, thetaHi: number, phi: number): Mesh {
  const steps = 24;
  const positions: number[] = [];
  const index: number[] = [];
  const half = RING_TUBE * 0.8;
  for (let i = 0; i <= steps; i++) {
    const theta = thetaLo + ((thetaHi - thetaLo) * i) / steps;
    // a ribbon along the meridian, its width along the azimuth direction
    const ex = -Math.sin(phi), ey = Math.cos(phi);
    const x = BAND_RADIUS * Math.sin(theta) * Math.cos(phi), y = BAND_RADIUS * Math.sin(theta) * Math.sin(phi), z = BAND_RADIUS * Math.cos(theta);
    positions.push(x - half * ex, y - half * ey, z, x + half * ex, y + half * ey, z);
    if (i < steps) index.push(2 * i, 2 * i + 1, 2 * i + 2, 2 * i + 1, 2 * i + 3, 2 * i + 2);
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(new Float32Array(positions), 3));
  geometry.setIndex(index);
  return new Mesh(geometry, new MeshBasicMaterial({ color: hexToInt(PALETTE.splitLine), side: DoubleSide }));
}

/** The separation band fixed in the flow frame: + side (q . a > 0) and - side tinted apart, both limit circles, the split. */
export function bandGroup(band: Band): Group {
  const lo = band.centerRad - band.widthRad / 2;
  const hi = band.centerRad + band.widthRad / 2;
  const group = new Group();
  group.add(zonePiece(lo, hi, -Math.PI / 2, Math.PI / 2, PALETTE.sidePlus));
  group.add(zonePiece(lo, hi, Math.PI / 2, (3 * Math.PI) / 2, PALETTE.sideMinus));
  group.add(bandCircle(lo), bandCircle(hi));
  group.add(splitArc(lo, hi, Math.PI / 2), splitArc(lo, hi, -Math.PI / 2));
  return group;
}

/** An arrow along +y from the origin: a shaft and a cone, `length` long overall. */
export function arrowMesh(color: string, length: number, shaftRadius = 0.022): Group {
  const head = Math.min(0.22, 0.45 * length);
  const material = new MeshStandardMaterial({ color: hexToInt(color), roughness: 0.5 });
  const shaft = new Mesh(new CylinderGeometry(shaftRadius, shaftRadius, length - head, 16), material);
  shaft.position.y = (length - head) / 2;
  const cone = new Mesh(new ConeGeometry(2.6 * shaftRadius, head, 20), material);
  cone.position.y = length - head / 2;
  const group = new Group();
  group.add(shaft, cone);
  return group;
}

const UP = new Vector3(0, 1, 0);

/** Points an arrow (built along +y) along unit `direction`, starting at `start`. */
export function aimArrow(arrow: Group, start: Vector3, direction: Vector3): void {
  arrow.position.copy(start);
  arrow.quaternion.setFromUnitVectors(UP, direction.clone().normalize());
}

/** A finger pad on the ball: centre and fingertip direction in the ball frame, size in inches. */
export interface PadMark {
  readonly direction: readonly [number, number, number];
  readonly pointing: readonly [number, number, number];
  readonly widthIn: number;
  readonly lengthIn: number;
  readonly label: string;
  /** Grips a seam to set the spin (drawn darker) or not (the thumb, a curled finger). */
  readonly working: boolean;
}

/** Radius the pads are drawn at: above the cover, under the stitches' tops (unit-ball lengths). */
const PAD_RADIUS = 1.008;

/** A pad as an oval patch lying on the ball: its length along the fingertip direction, its width across, both in inches on a ball of `ballRadiusIn`. */
export function padMesh(m: PadMark, ballRadiusIn: number): Mesh {
  const d = new Vector3(...m.direction).normalize();
  const u = new Vector3(...m.pointing).projectOnPlane(d).normalize();
  const v = new Vector3().crossVectors(d, u);
  const a = m.lengthIn / 2 / ballRadiusIn;
  const b = m.widthIn / 2 / ballRadiusIn;
  const rings = 6;
  const around = 36;
  const positions: number[] = [];
  const index: number[] = [];
  const p = new Vector3();
  positions.push(...d.clone().multiplyScalar(PAD_RADIUS).toArray());
  for (let r = 1; r <= rings; r++) {
    for (let k = 0; k < around; k++) {
      const t = (2 * Math.PI * k) / around;
      p.copy(d).addScaledVector(u, (a * r * Math.cos(t)) / rings).addScaledVector(v, (b * r * Math.sin(t)) / rings).normalize().multiplyScalar(PAD_RADIUS);
      positions.push(p.x, p.y, p.z);
    }
  }
  const at = (r: number, k: number) => (r === 0 ? 0 : 1 + (r - 1) * around + (k % around));
  for (let k = 0; k < around; k++) index.push(0, at(1, k), at(1, k + 1));
  for (let r = 1; r < rings; r++) {
    for (let k = 0; k < around; k++) index.push(at(r, k), at(r + 1, k), at(r + 1, k + 1), at(r, k), at(r + 1, k + 1), at(r, k + 1));
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(new Float32Array(positions), 3));
  geometry.setIndex(index);
  const material = new MeshBasicMaterial({ color: hexToInt(m.working ? PALETTE.finger : PALETTE.fingerOther), transparent: true, opacity: 0.78, side: DoubleSide, depthWrite: false });
  const mesh = new Mesh(geometry, material);
  mesh.renderOrder = 3;
  return mesh;
}
