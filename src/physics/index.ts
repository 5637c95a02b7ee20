/** The pitch-flight physics library: one import for the CLI. Pure, no I/O. */
export * from "./units.js";
export type { Vec3 } from "./vec3.js";
export * from "./air.js";
export * from "./aero.js";
export { BALL_MASS_KG, BALL_RADIUS_M, crossSectionM2 } from "./ball.js";
export { PLATE_FRONT_Y_M, PLATE_WIDTH_M, RUBBER_Y_M } from "./field.js";
export * from "./launch.js";
export type { SeamForceHook, SeamForceInput } from "./forces.js";
export { spinDecayFactor } from "./spinDecay.js";
export { DEFAULT_STEP_S, simulateFlight } from "./flight.js";
export type { FlightOptions, FlightResult, Launch } from "./flight.js";
export { movementVersusSpinless } from "./movement.js";
export type { Movement, PlateOffset } from "./movement.js";
