/**
 * The ball's own meshes, in the ball frame (geometry/seamCurve.ts), unit radius:
 * the cover, the seam as a tube through the arc-length samples, and the stitches.
 * Every point comes from geometry/ (sampleSeam, stitchLayout): the page draws the
 * same seam the sampler measures, sample for sample.
 */
import { BufferAttribute, BufferGeometry, Color, DoubleSide, Mesh, MeshStandardMaterial, SphereGeometry } from "three";
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import type { Stitches } from "../../../geometry/stitches.js";
import { SEAM_IN_BAND_MINUS, SEAM_IN_BAND_ON_SPLIT, SEAM_IN_BAND_PLUS } from "./liveShare.js";
import { hexToInt, PALETTE } from "./palette.js";

/** Seam tube radius, unit-ball lengths (drawn half sunk into the cover, like a raised seam). */
export const SEAM_TUBE_RADIUS = 0.016;
/** Vertices around the tube. */
const TUBE_SIDES = 6;
/** Stitch legs: half-spread across the seam, half-length along it, ribbon width and height above the cover (unit-ball lengths). */
const STITCH_SPREAD = 0.05;
const STITCH_ALONG = 0.022;
const STITCH_GAP = 0.006;
const STITCH_WIDTH = 0.011;
const STITCH_HEIGHT = 1.014;

/** The cover. */
export function coverMesh(): Mesh {
  const material = new MeshStandardMaterial({ color: hexToInt(PALETTE.cover), roughness: 0.85, metalness: 0 });
  return new Mesh(new SphereGeometry(1, 96, 64), material);
}

export interface SeamTube {
  readonly mesh: Mesh;
  /** Colours each sample's ring by its band state (liveShare.ts SEAM_* constants). */
  setStates(states: Uint8Array): void;
}

/** A closed tube through the seam samples, one ring per sample, with per-ring colours. */
export function seamTube(seam: SeamSamples): SeamTube {
  const n = seam.count;
  const positions = new Float32Array(3 * n * TUBE_SIDES);
  const normals = new Float32Array(3 * n * TUBE_SIDES);
  const colors = new Float32Array(3 * n * TUBE_SIDES);
  for (let i = 0; i < n; i++) {
    const px = seam.points[3 * i], py = seam.points[3 * i + 1], pz = seam.points[3 * i + 2];
    const tx = seam.tangents[3 * i], ty = seam.tangents[3 * i + 1], tz = seam.tangents[3 * i + 2];
    // b = t x p lies in the cover's tangent plane, across the seam
    const bx = ty * pz - tz * py, by = tz * px - tx * pz, bz = tx * py - ty * px;
    for (let j = 0; j < TUBE_SIDES; j++) {
      const angle = (2 * Math.PI * j) / TUBE_SIDES;
      const c = Math.cos(angle), s = Math.sin(angle);
      const nx = c * px + s * bx, ny = c * py + s * by, nz = c * pz + s * bz;
      const k = 3 * (i * TUBE_SIDES + j);
      positions[k] = px + SEAM_TUBE_RADIUS * nx;
      positions[k + 1] = py + SEAM_TUBE_RADIUS * ny;
      positions[k + 2] = pz + SEAM_TUBE_RADIUS * nz;
      normals[k] = nx;
      normals[k + 1] = ny;
      normals[k + 2] = nz;
    }
  }
  const index = new Uint32Array(6 * n * TUBE_SIDES);
  let w = 0;
  for (let i = 0; i < n; i++) {
    const next = (i + 1) % n;
    for (let j = 0; j < TUBE_SIDES; j++) {
      const j1 = (j + 1) % TUBE_SIDES;
      const a = i * TUBE_SIDES + j, b = next * TUBE_SIDES + j, c = next * TUBE_SIDES + j1, d = i * TUBE_SIDES + j1;
      // wound so that the faces look outward (ring order runs from p toward t x p)
      index[w++] = a; index[w++] = d; index[w++] = b;
      index[w++] = d; index[w++] = c; index[w++] = b;
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(positions, 3));
  geometry.setAttribute("normal", new BufferAttribute(normals, 3));
  const colorAttribute = new BufferAttribute(colors, 3);
  geometry.setAttribute("color", colorAttribute);
  geometry.setIndex(new BufferAttribute(index, 1));
  const mesh = new Mesh(geometry, new MeshStandardMaterial({ vertexColors: true, roughness: 0.6, metalness: 0 }));

  const palette = [PALETTE.seam, PALETTE.sidePlus, PALETTE.sideMinus, PALETTE.splitLine].map((hex) => new Color(hex));
  const stateColor = [0, 0, 0, 0];
  stateColor[SEAM_IN_BAND_PLUS] = 1;
  stateColor[SEAM_IN_BAND_MINUS] = 2;
  stateColor[SEAM_IN_BAND_ON_SPLIT] = 3;
  const setStates = (states: Uint8Array) => {
    for (let i = 0; i < n; i++) {
      const color = palette[stateColor[states[i]] ?? 0];
      for (let j = 0; j < TUBE_SIDES; j++) {
        const k = 3 * (i * TUBE_SIDES + j);
        colors[k] = color.r;
        colors[k + 1] = color.g;
        colors[k + 2] = color.b;
      }
    }
    colorAttribute.needsUpdate = true;
  };
  setStates(new Uint8Array(n));
  return { mesh, setStates };
}

/** Each double stitch as two thin ribbons in a V across the seam, pointing along it. */
export function stitchMesh(stitches: Stitches): Mesh {
  const legs = 2 * stitches.count;
  const positions = new Float32Array(legs * 4 * 3);
  const normals = new Float32Array(legs * 4 * 3);
  const index = new Uint32Array(legs * 6);
  const onBall = (x: number, y: number, z: number): [number, number, number] => {
    const r = STITCH_HEIGHT / Math.hypot(x, y, z);
    return [x * r, y * r, z * r];
  };
  let leg = 0;
  for (let j = 0; j < stitches.count; j++) {
    const cx = stitches.centres[3 * j], cy = stitches.centres[3 * j + 1], cz = stitches.centres[3 * j + 2];
    const tx = stitches.tangents[3 * j], ty = stitches.tangents[3 * j + 1], tz = stitches.tangents[3 * j + 2];
    const ax = stitches.across[3 * j], ay = stitches.across[3 * j + 1], az = stitches.across[3 * j + 2];
    for (const side of [1, -1]) {
      const outer = onBall(cx + side * STITCH_SPREAD * ax - STITCH_ALONG * tx, cy + side * STITCH_SPREAD * ay - STITCH_ALONG * ty, cz + side * STITCH_SPREAD * az - STITCH_ALONG * tz);
      const inner = onBall(cx + side * STITCH_GAP * ax + STITCH_ALONG * tx, cy + side * STITCH_GAP * ay + STITCH_ALONG * ty, cz + side * STITCH_GAP * az + STITCH_ALONG * tz);
      const lx = inner[0] - outer[0], ly = inner[1] - outer[1], lz = inner[2] - outer[2];
      // ribbon width runs across the leg in the cover's tangent plane: centre x leg
      let sx = cy * lz - cz * ly, sy = cz * lx - cx * lz, sz = cx * ly - cy * lx;
      const sLen = Math.hypot(sx, sy, sz);
      sx *= STITCH_WIDTH / 2 / sLen;
      sy *= STITCH_WIDTH / 2 / sLen;
      sz *= STITCH_WIDTH / 2 / sLen;
      const corners = [
        [outer[0] - sx, outer[1] - sy, outer[2] - sz],
        [outer[0] + sx, outer[1] + sy, outer[2] + sz],
        [inner[0] + sx, inner[1] + sy, inner[2] + sz],
        [inner[0] - sx, inner[1] - sy, inner[2] - sz],
      ];
      for (let c = 0; c < 4; c++) {
        const k = 3 * (4 * leg + c);
        positions[k] = corners[c][0];
        positions[k + 1] = corners[c][1];
        positions[k + 2] = corners[c][2];
        normals[k] = cx;
        normals[k + 1] = cy;
        normals[k + 2] = cz;
      }
      const base = 4 * leg;
      index.set([base, base + 1, base + 2, base, base + 2, base + 3], 6 * leg);
      leg++;
    }
  }
  const geometry = new BufferGeometry();
  geometry.setAttribute("position", new BufferAttribute(positions, 3));
  geometry.setAttribute("normal", new BufferAttribute(normals, 3));
  geometry.setIndex(new BufferAttribute(index, 1));
  return new Mesh(geometry, new MeshStandardMaterial({ color: hexToInt(PALETTE.stitch), roughness: 0.7, side: DoubleSide }));
}
