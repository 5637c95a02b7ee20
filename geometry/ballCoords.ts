/**
 * Latitude and longitude on the ball (ball frame, see seamCurve.ts):
 * latitude from the curve's equator plane (z = 0), positive toward +z (waist-A);
 * longitude from +x (node-1) toward +y (node-2), in (-180, 180] deg.
 * Written "12.5N,45E" (north = toward +z, east = toward +y).
 */
import { unit3, type Vec3 } from "./vec.js";
import { DEG } from "./units.js";

export interface LatLon {
  /** Latitude, degrees in [-90, 90]. */
  readonly latDeg: number;
  /** Longitude, degrees in (-180, 180]. */
  readonly lonDeg: number;
}

export function latLonToVector(latDeg: number, lonDeg: number): Vec3 {
  const lat = latDeg * DEG;
  const lon = lonDeg * DEG;
  return [Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat)];
}

export function vectorToLatLon(v: Readonly<Vec3>): LatLon {
  const u = unit3(v);
  const latDeg = Math.atan2(u[2], Math.hypot(u[0], u[1])) / DEG;
  let lonDeg = Math.hypot(u[0], u[1]) < 1e-15 ? 0 : Math.atan2(u[1], u[0]) / DEG;
  if (lonDeg <= -180) lonDeg += 360;
  return { latDeg, lonDeg };
}

/** "12.5N,45.0E" with `digits` decimals. */
export function formatLatLon(p: LatLon, digits = 1): string {
  // a value that rounds to zero takes the positive letter, never "0.0S"
  const part = (x: number, pos: string, neg: string) => {
    const text = Math.abs(x).toFixed(digits);
    return `${text}${x < 0 && Number(text) !== 0 ? neg : pos}`;
  };
  const lat = part(p.latDeg, "N", "S");
  const lon = part(p.lonDeg, "E", "W");
  return `${lat},${lon}`;
}

/** Parses "12.5N,45E" (also with a space after the comma); returns null when the text is not of that form. */
export function parseLatLon(text: string): LatLon | null {
  const m = /^\s*(\d+(?:\.\d+)?)\s*([NSns])\s*,\s*(\d+(?:\.\d+)?)\s*([EWew])\s*$/.exec(text);
  if (!m) return null;
  const lat = Number(m[1]) * (m[2].toUpperCase() === "S" ? -1 : 1);
  const lon = Number(m[3]) * (m[4].toUpperCase() === "W" ? -1 : 1);
  if (Math.abs(lat) > 90) throw new RangeError(`latitude ${m[1]}${m[2]} in "${text}" must be at most 90 deg`);
  if (Math.abs(lon) > 180) throw new RangeError(`longitude ${m[3]}${m[4]} in "${text}" must be at most 180 deg`);
  return { latDeg: lat, lonDeg: lon };
}
