/**
 * Aerodynamic coefficient models, in one import: drag (drag.ts) and lift
 * (lift.ts), each selectable by name.
 */
export * from "./drag.js";
export * from "./lift.js";
