/**
 * The one units module. Everything inside the library is SI (m, s, kg, K, Pa) and
 * radians; people's units (ft, in, mph, km/h, rpm, degrees, deg F, hPa) are
 * converted here, once, at the edges. The foot, inch and mile are exact by the
 * 1959 international yard and pound agreement; the kelvin offset is exact by
 * definition.
 */

/** Radians per degree. */
export const DEG = Math.PI / 180;
/** One international foot in metres (exact). */
export const M_PER_FT = 0.3048;
/** One inch in metres (exact). */
export const M_PER_IN = 0.0254;
/** One centimetre in metres. */
export const M_PER_CM = 0.01;
/** One mile per hour in metres per second (exact: 1609.344 m / 3600 s). */
export const M_PER_S_PER_MPH = 0.44704;
/** One kilometre per hour in metres per second (exact). */
export const M_PER_S_PER_KMH = 1 / 3.6;
/** One revolution per minute in radians per second. */
export const RAD_PER_S_PER_RPM = (2 * Math.PI) / 60;
/** 0 degrees Celsius in kelvin (exact). */
export const KELVIN_AT_0_C = 273.15;
/** Pascals per hectopascal (exact). */
export const PA_PER_HPA = 100;
/** Kilograms per ounce (avoirdupois, exact: 28.349523125 g). */
export const KG_PER_OZ = 0.028349523125;

/** Degrees Fahrenheit to degrees Celsius. */
export function celsiusFromFahrenheit(f: number): number {
  return ((f - 32) * 5) / 9;
}

/** Degrees Celsius to degrees Fahrenheit. */
export function fahrenheitFromCelsius(c: number): number {
  return (c * 9) / 5 + 32;
}
