import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ballToFlowAtPhase, ballToFlowQuaternionAtPhaseZero, flowSpinAxis } from "../../geometry/flow.js";
import { quat, vec3, newVec3, type Vec3 } from "../../geometry/vec.js";
import { uniform, unitVector } from "../support/arbitraries.js";

/** R p for a column-major 3x3 matrix (gl-matrix layout: m[3 * col + row]). */
const apply = (m: Float64Array, p: readonly number[]) => [
  m[0] * p[0] + m[3] * p[1] + m[6] * p[2],
  m[1] * p[0] + m[4] * p[1] + m[7] * p[2],
  m[2] * p[0] + m[5] * p[1] + m[8] * p[2],
];
/** R^T p. */
const applyT = (m: Float64Array, p: readonly number[]) => [
  m[0] * p[0] + m[1] * p[1] + m[2] * p[2],
  m[3] * p[0] + m[4] * p[1] + m[5] * p[2],
  m[6] * p[0] + m[7] * p[1] + m[8] * p[2],
];
const GYRO = uniform(-1.4, 1.4);
const PHASE = uniform(0, 2 * Math.PI);
/** Axes on the ball's z axis, where the phase reference falls back from the +z pole to +x. */
const POLE_CASES: [Vec3, number, number][] = [
  [[0, 0, 1], 0.3, 0.7],
  [[0, 0, -1], -0.2, 2.1],
  [[1e-6, 0, Math.sqrt(1 - 1e-12)], 0.5, 4],
];

describe("flow frame and phase convention (geometry/flow.ts)", () => {
  it("is a proper rotation: orthonormal columns and determinant +1, to 1e-14, for 1000 random axes, gyros and phases (definition of a rotation)", () => {
    fc.assert(
      fc.property(unitVector, GYRO, PHASE, (w, gyro, phase) => {
        const m = ballToFlowAtPhase(w[0], w[1], w[2], gyro, phase);
        for (let i = 0; i < 3; i++)
          for (let j = 0; j < 3; j++) {
            const d = m[3 * i] * m[3 * j] + m[3 * i + 1] * m[3 * j + 1] + m[3 * i + 2] * m[3 * j + 2];
            expect(Math.abs(d - (i === j ? 1 : 0))).toBeLessThan(1e-14);
          }
        const det = m[0] * (m[4] * m[8] - m[5] * m[7]) - m[3] * (m[1] * m[8] - m[2] * m[7]) + m[6] * (m[1] * m[5] - m[2] * m[4]);
        expect(Math.abs(det - 1)).toBeLessThan(1e-14);
      }),
      { seed: 11, numRuns: 1000, examples: POLE_CASES },
    );
  });

  it("maps the spin axis to w = (cos gyro, 0, sin gyro) at every phase, to 1e-14, for 1000 random cases (the frame's definition)", () => {
    fc.assert(
      fc.property(unitVector, GYRO, PHASE, (w, gyro, phase) => {
        const f = apply(ballToFlowAtPhase(w[0], w[1], w[2], gyro, phase), w);
        const wf = flowSpinAxis(gyro);
        for (let k = 0; k < 3; k++) expect(Math.abs(f[k] - wf[k])).toBeLessThan(1e-14);
      }),
      { seed: 12, numRuns: 1000, examples: POLE_CASES },
    );
  });

  it("keeps the stagnation point on its path, the circle q . w = sin(gyro), and the across direction a = (1, 0, 0) at (w - sin(g) v) / cos(g), to 1e-14, for 1000 random cases (closed form)", () => {
    fc.assert(
      fc.property(unitVector, GYRO, PHASE, (w, gyro, phase) => {
        const m = ballToFlowAtPhase(w[0], w[1], w[2], gyro, phase);
        const v = applyT(m, [0, 0, 1]);
        const a = applyT(m, [1, 0, 0]);
        const s = Math.sin(gyro);
        const k = Math.cos(gyro);
        expect(Math.abs(v[0] * w[0] + v[1] * w[1] + v[2] * w[2] - s)).toBeLessThan(1e-14);
        for (let i = 0; i < 3; i++) expect(Math.abs(a[i] - (w[i] - s * v[i]) / k)).toBeLessThan(1e-13);
      }),
      { seed: 13, numRuns: 1000, examples: POLE_CASES },
    );
  });

  it("puts the stagnation point, at phase 0, on its path at the point nearest the +z pole (brute-force search over 3600 phases, 10 random cases)", () => {
    fc.assert(
      fc.property(unitVector, GYRO, (w, gyro) => {
        const zAt = (phi: number) => applyT(ballToFlowAtPhase(w[0], w[1], w[2], gyro, phi), [0, 0, 1])[2];
        const z0 = zAt(0);
        for (let j = 1; j < 3600; j++) expect(zAt((2 * Math.PI * j) / 3600)).toBeLessThanOrEqual(z0 + 1e-14);
      }),
      { seed: 14, numRuns: 10 },
    );
  });

  it("turns the ball by +phi about w (right-hand rule): R(phi1 + phi2) = Rot(w_flow, phi2) R(phi1), with Rot from gl-matrix's quaternions, to 1e-13, for 500 random cases", () => {
    fc.assert(
      fc.property(unitVector, GYRO, PHASE, PHASE, (w, gyro, phi1, phi2) => {
        const m1 = ballToFlowAtPhase(w[0], w[1], w[2], gyro, phi1);
        const m12 = ballToFlowAtPhase(w[0], w[1], w[2], gyro, phi1 + phi2);
        const q = quat.setAxisAngle(Float64Array.of(0, 0, 0, 1) as unknown as quat, newVec3(Math.cos(gyro), 0, Math.sin(gyro)), phi2);
        for (const p of [[1, 0, 0], [0, 1, 0], [0, 0, 1]]) {
          const turned = vec3.transformQuat(newVec3(), Float64Array.from(apply(m1, p)) as unknown as vec3, q);
          const direct = apply(m12, p);
          for (let k = 0; k < 3; k++) expect(Math.abs(turned[k] - direct[k])).toBeLessThan(1e-13);
        }
      }),
      { seed: 15, numRuns: 500, examples: POLE_CASES.map(([w, g, p]) => [w, g, 0, p] as [Vec3, number, number, number]) },
    );
  });

  it("gives the same rotation as a unit quaternion at phase 0 (two routes: the matrix, and gl-matrix's quaternion from it), to 1e-13, for 500 random cases", () => {
    fc.assert(
      fc.property(unitVector, GYRO, (w, gyro) => {
        const m = ballToFlowAtPhase(w[0], w[1], w[2], gyro, 0);
        const q = ballToFlowQuaternionAtPhaseZero(w, gyro) as unknown as quat;
        for (const p of [[1, 0, 0], [0, 1, 0], [0, 0, 1]]) {
          const viaQ = vec3.transformQuat(newVec3(), Float64Array.from(p) as unknown as vec3, q);
          const direct = apply(m, p);
          for (let k = 0; k < 3; k++) expect(Math.abs(viaQ[k] - direct[k])).toBeLessThan(1e-13);
        }
      }),
      { seed: 16, numRuns: 500, examples: POLE_CASES.map(([w, g]) => [w, g] as [Vec3, number]) },
    );
  });
});
