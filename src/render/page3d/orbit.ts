/// <reference lib="dom" />
/**
 * A small orbit camera: drag (mouse, pen or touch) to turn the view about the ball,
 * the wheel to zoom, and from the keyboard (the canvas takes focus) the arrow keys
 * to turn, + and - to zoom, Home to go back to the start view.
 * Angles are about three.js's world +y (up): azimuth from +z toward +x, elevation
 * from the horizontal plane.
 */
import type { PerspectiveCamera } from "three";
import { DEG } from "../../../geometry/units.js";

/** Elevation stays short of straight up or down so "up" never flips. */
const ELEVATION_LIMIT_RAD = 85 * DEG;
const DISTANCE_RANGE: readonly [number, number] = [3, 14];
const DRAG_RAD_PER_PX = 0.3 * DEG;
const KEY_STEP_RAD = 5 * DEG;
const ZOOM_STEP = 1.12;

export interface OrbitView {
  azimuthRad: number;
  elevationRad: number;
  distance: number;
}

export class OrbitControl {
  view: OrbitView;
  private home: OrbitView;
  private dragging: { id: number; x: number; y: number } | null = null;

  constructor(
    private readonly element: HTMLElement,
    home: OrbitView,
    private readonly onChange: () => void,
  ) {
    this.home = { ...home };
    this.view = { ...home };
    element.addEventListener("pointerdown", (e) => this.pointerDown(e));
    element.addEventListener("pointermove", (e) => this.pointerMove(e));
    element.addEventListener("pointerup", (e) => this.pointerUp(e));
    element.addEventListener("pointercancel", (e) => this.pointerUp(e));
    element.addEventListener("wheel", (e) => this.wheel(e), { passive: false });
    element.addEventListener("keydown", (e) => this.key(e));
  }

  /** Sets a new start view and goes there. */
  setHome(home: OrbitView): void {
    this.home = { ...home };
    this.reset();
  }

  reset(): void {
    this.setView(this.home);
  }

  /** Goes to `view` (a preset camera). */
  setView(view: OrbitView): void {
    this.view = { ...view };
    this.onChange();
  }

  /** Puts the camera on its orbit, looking at the origin. */
  apply(camera: PerspectiveCamera): void {
    const { azimuthRad: az, elevationRad: el, distance: d } = this.view;
    camera.position.set(d * Math.cos(el) * Math.sin(az), d * Math.sin(el), d * Math.cos(el) * Math.cos(az));
    camera.up.set(0, 1, 0);
    camera.lookAt(0, 0, 0);
  }

  private turn(dAzimuthRad: number, dElevationRad: number): void {
    this.view.azimuthRad = (this.view.azimuthRad + dAzimuthRad) % (2 * Math.PI);
    this.view.elevationRad = Math.max(-ELEVATION_LIMIT_RAD, Math.min(ELEVATION_LIMIT_RAD, this.view.elevationRad + dElevationRad));
    this.onChange();
  }

  private zoom(factor: number): void {
    this.view.distance = Math.max(DISTANCE_RANGE[0], Math.min(DISTANCE_RANGE[1], this.view.distance * factor));
    this.onChange();
  }

  private pointerDown(e: PointerEvent): void {
    if (e.button !== 0) return;
    this.dragging = { id: e.pointerId, x: e.clientX, y: e.clientY };
    this.element.setPointerCapture(e.pointerId);
    this.element.focus({ preventScroll: true });
  }

  private pointerMove(e: PointerEvent): void {
    if (!this.dragging || e.pointerId !== this.dragging.id) return;
    const dx = e.clientX - this.dragging.x;
    const dy = e.clientY - this.dragging.y;
    this.dragging.x = e.clientX;
    this.dragging.y = e.clientY;
    // dragging right carries the near side of the ball to the right
    this.turn(-dx * DRAG_RAD_PER_PX, dy * DRAG_RAD_PER_PX);
  }

  private pointerUp(e: PointerEvent): void {
    if (this.dragging && e.pointerId === this.dragging.id) {
      this.dragging = null;
      if (this.element.hasPointerCapture(e.pointerId)) this.element.releasePointerCapture(e.pointerId);
    }
  }

  private wheel(e: WheelEvent): void {
    e.preventDefault();
    this.zoom(e.deltaY > 0 ? ZOOM_STEP : 1 / ZOOM_STEP);
  }

  private key(e: KeyboardEvent): void {
    const actions: Record<string, () => void> = {
      ArrowLeft: () => this.turn(-KEY_STEP_RAD, 0),
      ArrowRight: () => this.turn(KEY_STEP_RAD, 0),
      ArrowUp: () => this.turn(0, KEY_STEP_RAD),
      ArrowDown: () => this.turn(0, -KEY_STEP_RAD),
      "+": () => this.zoom(1 / ZOOM_STEP),
      "=": () => this.zoom(1 / ZOOM_STEP),
      "-": () => this.zoom(ZOOM_STEP),
      _: () => this.zoom(ZOOM_STEP),
      Home: () => this.reset(),
    };
    const action = actions[e.key];
    if (!action) return;
    e.preventDefault();
    action();
  }
}
