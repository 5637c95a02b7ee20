import { describe, expect, it } from "vitest";
import { runCli } from "../support/cli.js";

describe("seam-atlas landmarks", () => {
  it("lists the 14 landmarks with directions, and JSON on request", () => {
    const r = runCli(["landmarks", "--json"]);
    expect(r.code).toBe(0);
    const j = JSON.parse(r.stdout);
    expect(j.landmarks.map((l: { name: string }) => l.name)).toContain("lobe-A2");
    expect(j.landmarks).toHaveLength(14);
  });

  it("puts the waists at the poles, 1 3/16 in / 2 = 0.59375 in from the seam on the 9 1/8 in ball (R. B. Thompson, \"Designing a Baseball Cover\", College Math. J. 29(1), 1998), to 1e-9 in, and the tips at height 2 sqrt(ab) (the published curve's z = 2 sqrt(ab) sin 2t) to 1e-12", () => {
    const j = JSON.parse(runCli(["landmarks", "--json"]).stdout);
    const byName = (name: string) => j.landmarks.find((l: { name: string }) => l.name === name);
    for (const name of ["waist-A", "waist-B"]) expect(Math.abs(byName(name).seamDistanceIn - 1.1875 / 2)).toBeLessThan(1e-9);
    expect(byName("waist-A").latLon).toBe("90.0N,0.0E");
    const b = j.seamShape;
    for (const name of ["tip-A1", "tip-A2", "tip-B1", "tip-B2"]) expect(Math.abs(Math.abs(byName(name).direction[2]) - 2 * Math.sqrt((1 - b) * b))).toBeLessThan(1e-12);
  });
});
