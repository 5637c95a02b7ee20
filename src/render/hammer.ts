/**
 * The Hammer (Hammer-Aitoff) equal-area projection of the whole sphere onto an
 * ellipse with semi-axes 2 sqrt 2 and sqrt 2 (unit sphere; area 4 pi, the sphere's):
 *   x = 2 sqrt(2) cos(lat) sin(lon / 2) / sqrt(1 + cos(lat) cos(lon / 2))
 *   y = sqrt(2) sin(lat) / sqrt(1 + cos(lat) cos(lon / 2))
 * (E. Hammer, 1892; the standard formulas, e.g. in Snyder & Voxland, "An Album of Map
 * Projections", USGS Prof. Paper 1453, 1989 — citation from memory; the tests check
 * the closed forms and the equal-area property directly). Longitude in [-pi, pi] from
 * the ball frame's +x toward +y, latitude
 * from the xy-plane toward +z (geometry/ballCoords.ts). x grows with longitude
 * (east to the right, the ball seen from outside) and y with latitude.
 */

/** Half the width of the Hammer ellipse on the unit sphere: x at longitude +-pi on the equator. */
export const HAMMER_HALF_WIDTH = 2 * Math.SQRT2;
/** Half the height: y at the poles. */
export const HAMMER_HALF_HEIGHT = Math.SQRT2;

/** Writes the Hammer plane point (unit sphere) of (lonRad, latRad) into `out` and returns it; lon in [-pi, pi], lat in [-pi/2, pi/2]. */
export function hammerProject(lonRad: number, latRad: number, out: [number, number] = [0, 0]): [number, number] {
  const c = Math.cos(latRad);
  const k = Math.sqrt(1 + c * Math.cos(lonRad / 2));
  out[0] = (HAMMER_HALF_WIDTH * c * Math.sin(lonRad / 2)) / k;
  out[1] = (HAMMER_HALF_HEIGHT * Math.sin(latRad)) / k;
  return out;
}

/** Longitude (-pi, pi] and latitude of a ball-frame direction (any length > 0), radians. */
export function lonLatOf(x: number, y: number, z: number): [number, number] {
  const rho = Math.hypot(x, y);
  // at the poles longitude is undefined: take 0, which lands on the central meridian
  return [rho === 0 ? 0 : Math.atan2(y, x), Math.atan2(z, rho)];
}
