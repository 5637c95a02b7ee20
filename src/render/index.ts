/** The rendering library's public surface: pure SVG renderers and the view helpers they take. */
export { renderBallSvg, type BallDrawingOptions, type BallModel, type BallOverlays } from "./ballDrawing.js";
export { type FingerPad, type FlowBandOverlay, type PushArrow } from "./ballOverlays.js";
export { SEAM_HALF_WIDTH_RAD, SEAM_WIDTH_IN } from "./ballSeam.js";
export { BALL_STYLE } from "./ballStyle.js";
export { hexToOklab, oklabToHex, rampColor, VERDIGRIS_ANCHORS, VERDIGRIS_NAME } from "./colorScale.js";
export { HAMMER_HALF_HEIGHT, HAMMER_HALF_WIDTH, hammerProject, lonLatOf } from "./hammer.js";
export {
  depthRuns, projectPoint, projectPoints, runsWhere, viewFromDirections, viewFromRotation, viewLookingAlong,
  type DiscPlacement, type ProjectedPoint, type View,
} from "./projection.js";
export { renderSphereMapSvg, type MapMarker, type SphereMapOptions } from "./sphereMapDrawing.js";
export { createSvgCanvas, DEFAULT_SVG_DIGITS, formatNumber, serializeSvg } from "./svgContext.js";
