/**
 * The preset cameras, as orbit views (render/page3d/orbit.ts: azimuth about the world's
 * up from +z toward +x, elevation from the horizontal). The field frame is drawn at
 * world (x, z, -y) (render/page3d/sceneMath.ts), so:
 *   behind the pitcher  on field +y (toward the pitcher's side), looking toward the plate;
 *   the catcher         on field -y, looking back at the pitcher;
 *   the side            on the pitcher's arm side (field -x for a right-hander, +x for a
 *                       left-hander), looking across the flight.
 * All at the ball's height, so the ball is seen as the pitcher, a coach beside the
 * mound or the catcher sees it.
 */
import type { OrbitView } from "../render/page3d/orbit.js";

export type CameraPreset = "pitcher" | "side" | "catcher";
export const CAMERA_PRESETS: readonly CameraPreset[] = ["pitcher", "side", "catcher"];

/** How far the camera stands from the ball, unit-ball lengths (the start view's). */
export const PRESET_DISTANCE = 6.6;

export function presetView(preset: CameraPreset, hand: "right" | "left"): OrbitView {
  const azimuthRad = preset === "pitcher" ? Math.PI : preset === "catcher" ? 0 : hand === "right" ? -Math.PI / 2 : Math.PI / 2;
  return { azimuthRad, elevationRad: 0, distance: PRESET_DISTANCE };
}
