import { describe, expect, it } from "vitest";
import { ballToFlowAtPhase, ballToFlowQuaternionAtPhaseZero } from "../../geometry/flow.js";
import { quat, vec3, newVec3 } from "../../geometry/vec.js";
import { lcg, randomUnit } from "../support/random.js";

const apply = (m: Float64Array, p: readonly number[]) => [
  m[0] * p[0] + m[3] * p[1] + m[6] * p[2],
  m[1] * p[0] + m[4] * p[1] + m[7] * p[2],
  m[2] * p[0] + m[5] * p[1] + m[8] * p[2],
];
const applyT = (m: Float64Array, p: readonly number[]) => [
  m[0] * p[0] + m[1] * p[1] + m[2] * p[2],
  m[3] * p[0] + m[4] * p[1] + m[5] * p[2],
  m[6] * p[0] + m[7] * p[1] + m[8] * p[2],
];

describe("flow frame and phase convention (geometry/flow.ts)", () => {
  const rnd = lcg(2024);
  const cases = Array.from({ length: 40 }, () => ({ w: randomUnit(rnd), gyro: (2 * rnd() - 1) * 1.4, phase: 2 * Math.PI * rnd() }));
  cases.push({ w: [0, 0, 1], gyro: 0.3, phase: 0.7 }, { w: [0, 0, -1], gyro: -0.2, phase: 2.1 });

  it("is a proper rotation: orthonormal columns and determinant +1, to 1e-14 (closed form)", () => {
    for (const c of cases) {
      const m = ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, c.phase);
      for (let i = 0; i < 3; i++)
        for (let j = 0; j < 3; j++) {
          const d = m[3 * i] * m[3 * j] + m[3 * i + 1] * m[3 * j + 1] + m[3 * i + 2] * m[3 * j + 2];
          expect(Math.abs(d - (i === j ? 1 : 0))).toBeLessThan(1e-14);
        }
      const det = m[0] * (m[4] * m[8] - m[5] * m[7]) - m[3] * (m[1] * m[8] - m[2] * m[7]) + m[6] * (m[1] * m[5] - m[2] * m[4]);
      expect(Math.abs(det - 1)).toBeLessThan(1e-14);
    }
  });

  it("maps the spin axis to w = (cos gyro, 0, sin gyro) at every phase (the frame's definition)", () => {
    for (const c of cases) {
      const f = apply(ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, c.phase), c.w);
      expect(Math.abs(f[0] - Math.cos(c.gyro))).toBeLessThan(1e-14);
      expect(Math.abs(f[1])).toBeLessThan(1e-14);
      expect(Math.abs(f[2] - Math.sin(c.gyro))).toBeLessThan(1e-14);
    }
  });

  it("puts the stagnation point, at phase 0, on its path at the point nearest the +z pole (brute-force search over 3600 phases)", () => {
    for (const c of cases.slice(0, 10)) {
      const zAt = (phi: number) => applyT(ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, phi), [0, 0, 1])[2];
      const z0 = zAt(0);
      for (let j = 1; j < 3600; j++) expect(zAt((2 * Math.PI * j) / 3600)).toBeLessThanOrEqual(z0 + 1e-14);
    }
  });

  it("turns the ball by +phi about w (right-hand rule): R(phi) = Rot(w_flow, phi) R(0), to 1e-13", () => {
    for (const c of cases) {
      const m0 = ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, 0);
      const m1 = ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, c.phase);
      const q = quat.setAxisAngle(Float64Array.of(0, 0, 0, 1) as unknown as quat, newVec3(Math.cos(c.gyro), 0, Math.sin(c.gyro)), c.phase);
      for (const p of [[1, 0, 0], [0, 1, 0], [0, 0, 1]]) {
        const turned = vec3.transformQuat(newVec3(), Float64Array.from(apply(m0, p)) as unknown as vec3, q);
        const direct = apply(m1, p);
        for (let k = 0; k < 3; k++) expect(Math.abs(turned[k] - direct[k])).toBeLessThan(1e-13);
      }
    }
  });

  it("gives the same rotation as a unit quaternion at phase 0 (two routes), to 1e-13", () => {
    for (const c of cases) {
      const m = ballToFlowAtPhase(c.w[0], c.w[1], c.w[2], c.gyro, 0);
      const q = ballToFlowQuaternionAtPhaseZero(c.w, c.gyro) as unknown as quat;
      for (const p of [[1, 0, 0], [0, 1, 0], [0, 0, 1]]) {
        const viaQ = vec3.transformQuat(newVec3(), Float64Array.from(p) as unknown as vec3, q);
        const direct = apply(m, p);
        for (let k = 0; k < 3; k++) expect(Math.abs(viaQ[k] - direct[k])).toBeLessThan(1e-13);
      }
    }
  });
});
