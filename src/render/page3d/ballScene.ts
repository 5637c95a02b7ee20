/// <reference lib="dom" />
/**
 * The WebGL scene: field frame at the root (drawn y-up, see sceneMath.ts), the flow
 * frame inside it (band, flight, spin axis, push, all fixed), and the ball inside
 * the flow frame, turned by its pose at the current phase.
 */
import { AmbientLight, DirectionalLight, Group, Mesh, PerspectiveCamera, Quaternion, Scene, Vector3, WebGLRenderer, type Object3D } from "three";
import { BALL_RADIUS_IN } from "../../../geometry/ball.js";
import type { SeamSamples } from "../../../geometry/seamSamples.js";
import type { Stitches } from "../../../geometry/stitches.js";
import type { Vec3 } from "../../../geometry/vec.js";
import type { Band } from "../../sampling/band.js";
import { coverMesh, seamTube, stitchMesh, type SeamTube } from "./ballMeshes.js";
import type { FieldFrameVectors } from "./data.js";
import { aimArrow, arrowMesh, bandGroup, padMesh, type PadMark } from "./overlays.js";
import { hexToInt, PALETTE } from "./palette.js";
import { BallPose, FIELD_TO_WORLD, flowSpinAxis, flowToFieldQuaternion } from "./sceneMath.js";

/** Where the arrows start and how long they are, unit-ball lengths. */
const ARROW_GAP = 1.04;
const FLIGHT_LENGTH = 0.8;
const SPIN_HALF_LENGTH = 1.5;
const PUSH_MIN_LENGTH = 0.25;
const PUSH_SPAN_LENGTH = 0.65;
/** Side labels: distance from the centre and azimuth off the a line about v. */
const SIDE_LABEL_RADIUS = 1.26;
const SIDE_LABEL_AZIMUTH_RAD = (40 * Math.PI) / 180;
/** The push arrow's start: azimuth off the a line about v, radians. */
const PUSH_AZIMUTH_RAD = (32 * Math.PI) / 180;
/** A seam-force coefficient below this draws no push arrow: there is no direction to show (dimensionless). */
const NO_PUSH = 1e-12;
/** Where a pad's label is anchored: just off the cover, unit-ball lengths. */
const PAD_LABEL_RADIUS = 1.03;

/** A label's place in the scene: its text, colour and world position (the page lays the labels out on screen). */
export interface LabelAnchor {
  readonly key: string;
  readonly text: string;
  readonly color: string;
  readonly world: Vector3;
}

/** Frees the GPU buffers of everything under `root` (geometries, materials, textures) once it leaves the scene. */
function dispose(root: Object3D): void {
  root.traverse((o) => {
    if (o instanceof Mesh) {
      o.geometry.dispose();
      for (const m of Array.isArray(o.material) ? o.material : [o.material]) m.dispose();
    }
  });
}

/** Thrown when the browser gives no WebGL 2 context. */
export class NoWebGLError extends Error {}

/** Whether the browser hands out a WebGL 2 context (the probe's context is released at once). */
function hasWebGL2(doc: Document): boolean {
  try {
    const gl = doc.createElement("canvas").getContext("webgl2");
    gl?.getExtension("WEBGL_lose_context")?.loseContext();
    return gl !== null;
  } catch {
    return false;
  }
}

export class BallScene {
  readonly renderer: WebGLRenderer;
  readonly camera = new PerspectiveCamera(34, 1, 0.1, 60);
  private readonly scene = new Scene();
  private readonly flow = new Group();
  private readonly ball = new Group();
  private readonly pose = new BallPose();
  private readonly poseScratch = new Quaternion();
  private seam: SeamTube | null = null;
  private geometryKey = "";
  private band: Group | null = null;
  private bandCenterRad = Math.PI / 2;
  private readonly spinArrow = arrowMesh(PALETTE.spinAxis, 2 * SPIN_HALF_LENGTH, 0.014);
  private readonly flightArrow = arrowMesh(PALETTE.flight, FLIGHT_LENGTH);
  private pushArrow: Group | null = null;
  // label anchors in the flow frame (the pads': in the ball frame)
  private readonly spinLabel = new Vector3();
  private readonly flightLabel = new Vector3(0, 0, ARROW_GAP + FLIGHT_LENGTH + 0.08);
  private readonly pushLabel = new Vector3();
  private pushShown = false;
  private readonly plusLabel = new Vector3();
  private readonly minusLabel = new Vector3();
  private readonly pads = new Group();
  private padMarks: { label: string; color: string; at: Vector3 }[] = [];

  constructor(canvas: HTMLCanvasElement) {
    // asked first on a spare canvas, so a browser without WebGL 2 gets our message and no console error from three.js
    if (!hasWebGL2(canvas.ownerDocument)) throw new NoWebGLError("this browser gives no WebGL 2 context");
    try {
      // preserveDrawingBuffer: the picture stays readable after each frame (saving it, the page tests)
      this.renderer = new WebGLRenderer({ canvas, antialias: true, preserveDrawingBuffer: true });
    } catch (err) {
      throw new NoWebGLError((err as Error).message);
    }
    this.renderer.setClearColor(hexToInt(PALETTE.background), 1);
    const field = new Group();
    field.quaternion.copy(FIELD_TO_WORLD);
    field.add(this.flow);
    this.flow.add(this.ball, this.spinArrow, this.flightArrow);
    this.scene.add(field, new AmbientLight(0xffffff, 0.9));
    // the key light rides with the camera so the side you look at is always lit
    const key = new DirectionalLight(0xffffff, 2.2);
    key.position.set(2, 3, 4);
    this.camera.add(key);
    this.scene.add(this.camera);
    aimArrow(this.flightArrow, new Vector3(0, 0, ARROW_GAP), new Vector3(0, 0, 1));
  }

  /** The ball's meshes and the band, rebuilt only when the seam or the band changes. */
  setGeometry(seam: SeamSamples, stitches: Stitches, band: Band): void {
    const key = `${seam.shape}/${seam.count}/${band.centerRad}/${band.widthRad}`;
    if (key === this.geometryKey) return;
    this.geometryKey = key;
    for (const child of [...this.ball.children]) {
      this.ball.remove(child);
      dispose(child);
    }
    this.seam = seamTube(seam);
    this.ball.add(coverMesh(), this.seam.mesh, stitchMesh(stitches), this.pads);
    if (this.band) {
      this.flow.remove(this.band);
      dispose(this.band);
    }
    this.band = bandGroup(band);
    this.flow.add(this.band);
    // side labels sit on the band centre line, turned off the a line so the spin axis and push do not cover them
    const r = SIDE_LABEL_RADIUS * Math.sin(band.centerRad);
    const z = SIDE_LABEL_RADIUS * Math.cos(band.centerRad);
    this.plusLabel.set(r * Math.cos(SIDE_LABEL_AZIMUTH_RAD), -r * Math.sin(SIDE_LABEL_AZIMUTH_RAD), z);
    this.minusLabel.set(-r * Math.cos(SIDE_LABEL_AZIMUTH_RAD), -r * Math.sin(SIDE_LABEL_AZIMUTH_RAD), z);
    this.bandCenterRad = band.centerRad;
  }

  /** Places the flow frame in the field for a pitch and aims the spin axis. */
  setPitch(frame: FieldFrameVectors, gyroRad: number): void {
    flowToFieldQuaternion(frame, this.flow.quaternion);
    const w = flowSpinAxis(gyroRad);
    aimArrow(this.spinArrow, w.clone().multiplyScalar(-SPIN_HALF_LENGTH), w);
    this.spinLabel.copy(w.clone().multiplyScalar(SPIN_HALF_LENGTH + 0.06));
  }

  /**
   * Sets the orientation shown: the ball-frame spin axis, the gyro, and the push: the
   * seam-force model's turn-averaged coefficient (across = along a = flow +x, alongMagnus
   * along m = flow -y), drawn in its direction across the flow with a length relative to `pushScale`.
   */
  setOrientation(axis: Readonly<Vec3>, gyroRad: number, push: { readonly across: number; readonly alongMagnus: number }, pushScale: number): void {
    this.pose.setOrientation(axis, gyroRad);
    if (this.pushArrow) {
      this.flow.remove(this.pushArrow);
      dispose(this.pushArrow);
    }
    this.pushArrow = null;
    const size = Math.hypot(push.across, push.alongMagnus);
    this.pushShown = size > NO_PUSH;
    if (!this.pushShown) return;
    const length = PUSH_MIN_LENGTH + PUSH_SPAN_LENGTH * Math.min(1, size / Math.max(pushScale, NO_PUSH));
    const direction = new Vector3(push.across / size, -push.alongMagnus / size, 0);
    // from the band's centre line on the side it points to, turned a little off that azimuth so that it
    // stands clear of the spin axis, which leaves the ball close to +-a
    const ring = Math.sin(this.bandCenterRad);
    const azimuth = Math.atan2(direction.y, direction.x) + PUSH_AZIMUTH_RAD;
    const start = new Vector3(ring * Math.cos(azimuth), ring * Math.sin(azimuth), Math.cos(this.bandCenterRad)).multiplyScalar(ARROW_GAP);
    this.pushArrow = arrowMesh(PALETTE.push, length, 0.03);
    aimArrow(this.pushArrow, start, direction);
    this.flow.add(this.pushArrow);
    this.pushLabel.copy(start).addScaledVector(direction, length + 0.04);
  }

  /**
   * The finger pads of the grip on the ball (ball frame, src/screening/hand.ts: the
   * pads' centres, the fingertip direction and the pad sizes in inches), carried round
   * with the ball; none to clear them.
   */
  setPads(marks: readonly PadMark[]): void {
    for (const child of [...this.pads.children]) {
      this.pads.remove(child);
      dispose(child);
    }
    this.padMarks = [];
    for (const m of marks) {
      this.pads.add(padMesh(m, BALL_RADIUS_IN));
      const d = new Vector3(m.direction[0], m.direction[1], m.direction[2]).normalize();
      this.padMarks.push({ label: m.label, color: m.working ? PALETTE.finger : PALETTE.fingerOther, at: d.multiplyScalar(PAD_LABEL_RADIUS) });
    }
  }

  showPads(shown: boolean): void {
    this.pads.visible = shown;
  }

  /** The labels' places in the world at the current pose (after setPhase). */
  labelAnchors(): LabelAnchor[] {
    this.scene.updateMatrixWorld(true);
    const inFlow = (key: string, text: string, color: string, at: Vector3): LabelAnchor => ({ key, text, color, world: at.clone().applyMatrix4(this.flow.matrixWorld) });
    const out = [
      inFlow("flight", "flight", PALETTE.flight, this.flightLabel),
      inFlow("spin", "spin axis", PALETTE.spinAxis, this.spinLabel),
      ...(this.pushShown ? [inFlow("push", "seam push", PALETTE.push, this.pushLabel)] : []),
      inFlow("plus", "+ side", PALETTE.sidePlus, this.plusLabel),
      inFlow("minus", "\u2212 side", PALETTE.sideMinus, this.minusLabel),
    ];
    if (this.pads.visible) {
      for (const p of this.padMarks) out.push({ key: `pad-${p.label}`, text: p.label, color: p.color, world: p.at.clone().applyMatrix4(this.ball.matrixWorld) });
    }
    return out;
  }

  /** Turns the ball to phase `phiRad` (radians) of its revolution. */
  setPhase(phiRad: number): void {
    this.ball.quaternion.copy(this.pose.at(phiRad, this.poseScratch));
  }

  /** Colours the seam by each sample's band state (liveShare.ts). */
  setSeamStates(states: Uint8Array): void {
    this.seam?.setStates(states);
  }

  resize(widthPx: number, heightPx: number, pixelRatio: number): void {
    this.renderer.setPixelRatio(pixelRatio);
    this.renderer.setSize(widthPx, heightPx, false);
    this.camera.aspect = widthPx / Math.max(1, heightPx);
    this.camera.updateProjectionMatrix();
  }

  render(): void {
    this.renderer.render(this.scene, this.camera);
  }
}
