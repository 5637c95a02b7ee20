/**
 * Field geometry in the field frame: x toward the catcher's right, y from home
 * plate toward the pitcher, z up, origin at the rear point of home plate on the
 * ground (y = 0 at the rear point, z = 0 at ground level, x = 0 on the line to
 * the middle of the pitcher's plate).
 *
 * Official Baseball Rules 2.01 and 2.04: pitcher's plate to the rear point of home plate,
 * 60 ft 6 in. Rule 2.02: home plate is a 17 in square with two corners cut off:
 * 17 in front edge, 8.5 in sides, 12 in edges meeting at the rear point. Its
 * front edge is taken as 17 in ahead of the rear point (the usual figure; the
 * rule's own edge lengths give 8.5 + sqrt(12^2 - 8.5^2) = 16.97 in), so the front
 * edge is 59 ft 1 in from the pitcher's plate.
 */
import { M_PER_FT, M_PER_IN } from "../../geometry/units.js";

/** Pitcher's plate (front edge of the rubber) to the rear point of home plate, m (60 ft 6 in). */
export const RUBBER_Y_M = 60.5 * M_PER_FT;
/** The plane y of the front edge of home plate, m (17 in ahead of the rear point). */
export const PLATE_FRONT_Y_M = 17 * M_PER_IN;
/** Home plate width along x, m (17 in). */
export const PLATE_WIDTH_M = 17 * M_PER_IN;
