/**
 * Unit conversions used at the library's edges. Everything inside src/physics
 * is SI (m, s, kg, K, Pa) and radians; convert once, on the way in or out.
 * The foot and inch are exact by the 1959 international yard and pound agreement.
 */

/** One international foot in metres (exact). */
export const M_PER_FT = 0.3048;
/** One inch in metres (exact). */
export const M_PER_IN = 0.0254;
/** One mile per hour in metres per second (exact: 1609.344 m / 3600 s). */
export const M_PER_S_PER_MPH = 0.44704;
/** One revolution per minute in radians per second. */
export const RAD_PER_S_PER_RPM = (2 * Math.PI) / 60;
/** One degree in radians. */
export const RAD_PER_DEG = Math.PI / 180;
/** 0 degrees Celsius in kelvin (exact). */
export const KELVIN_AT_0_C = 273.15;
/** Pascals per hectopascal (exact). */
export const PA_PER_HPA = 100;
