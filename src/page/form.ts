/// <reference lib="dom" />
/**
 * The pitch form: what a coach types, read as the `screen` command's options (the
 * same names, values as typed), so the page's screen takes the command line's one
 * path and says the command line's words when a value is refused, beside the field
 * that gave it. The gyro sign is never assumed: with spin efficiency below 100 % the
 * sign must be chosen, as `--gyro-sign` must be given.
 */
import { FORM_FIELDS as F, type FormField } from "../render/page3d/pageIds.js";
import type { PitchEcho } from "../screening/report.js";
import type { Request } from "../jobs/request/values.js";

function el<T extends HTMLElement>(id: string): T {
  const e = document.getElementById(id);
  if (!e) throw new Error(`the page has no element #${id}`);
  return e as T;
}

const value = (f: FormField) => el<HTMLInputElement | HTMLSelectElement>(F[f].id).value.trim();

/** Which form field gives each command-line option (for placing a message). */
const FIELD_OF_OPTION: Record<string, FormField> = {
  name: "name",
  hand: "hand",
  speed: "speed",
  spin: "spin",
  tilt: "tilt",
  "tilt-deg": "tilt",
  view: "view",
  gyro: "gyro",
  efficiency: "gyro",
  "gyro-sign": "gyroSign",
  want: "want",
  "elevation-ft": "elevation",
  "elevation-m": "elevation",
  "temperature-f": "temperature",
  "temperature-c": "temperature",
};

/** How the page names each option in a message (the field's label, with the unit the option reads). */
const OPTION_WORDS: Record<string, string> = {
  name: "Pitch name",
  hand: "Throwing hand",
  speed: "Speed",
  spin: "Spin rate",
  tilt: "Tilt",
  "tilt-deg": "Tilt in degrees",
  view: "View",
  gyro: "Gyro",
  efficiency: "Spin efficiency",
  "gyro-sign": "Gyro sign",
  want: "Wanted seam movement",
  "elevation-ft": "Field elevation (ft)",
  "elevation-m": "Field elevation (m)",
  "temperature-f": "Air temperature (\u00b0F)",
  "temperature-c": "Air temperature (\u00b0C)",
};

/** The form as the `screen` command's options (only what is filled in; air fields left empty mean standard air). */
export function formRequest(): Request {
  const r: Record<string, string> = { hand: value("hand"), speed: value("speed"), spin: value("spin"), view: value("view"), want: value("want") };
  const name = value("name");
  if (name) r.name = name;
  r[value("tiltAs") === "degrees" ? "tilt-deg" : "tilt"] = value("tilt");
  const efficiency = value("gyroAs") === "efficiency";
  const gyro = value("gyro");
  if (efficiency) r.efficiency = gyro;
  else if (gyro) r.gyro = gyro;
  const sign = document.querySelector<HTMLInputElement>(`input[name="gyro-sign"]:checked`);
  if (efficiency && sign) r["gyro-sign"] = sign.value;
  const elevation = value("elevation");
  if (elevation) r[value("elevationUnit") === "m" ? "elevation-m" : "elevation-ft"] = elevation;
  const temperature = value("temperature");
  if (temperature) r[value("temperatureUnit") === "c" ? "temperature-c" : "temperature-f"] = temperature;
  return r;
}

/** Clears every message beside the fields. */
export function clearFieldErrors(): void {
  for (const f of Object.values(F)) {
    const err = document.getElementById(`${f.id}-error`);
    if (err) err.textContent = "";
    document.getElementById(f.id)?.removeAttribute("aria-invalid");
  }
}

/**
 * Shows a refused value's message beside the field of the option it names (the
 * first "--option" in it), in the page's words; returns that field's id, or null when
 * the message names no field of the form.
 */
export function showFieldError(message: string): string | null {
  const m = /--([a-z][a-z-]*)/.exec(message);
  // an efficiency without its sign is the sign's to fix
  const field = /has no gyro sign/.test(message) ? "gyroSign" : m ? FIELD_OF_OPTION[m[1]] : undefined;
  if (!field) return null;
  const words = message.replace(/--([a-z][a-z-]*)/g, (all, option: string) => (OPTION_WORDS[option] ? `\u201c${OPTION_WORDS[option]}\u201d` : all));
  const id = F[field].id;
  el(`${id}-error`).textContent = words;
  el(id).setAttribute("aria-invalid", "true");
  return id;
}

/** The sign choice is asked for only with spin efficiency. */
export function syncGyroSign(): void {
  const efficiency = value("gyroAs") === "efficiency";
  el<HTMLFieldSetElement>(F.gyroSign.id).disabled = !efficiency;
  el(F.gyro.id).setAttribute("placeholder", efficiency ? "e.g. 95" : "0 (pure backspin axis)");
  el(F.tilt.id).setAttribute("placeholder", value("tiltAs") === "degrees" ? "e.g. 45" : "e.g. 1:30");
}

/** Fills the form from a screened pitch's echo (a staff pitch, or the pitch the page opened with). */
export function fillForm(p: PitchEcho, settings: Readonly<Record<string, string>>): void {
  const set = (f: FormField, v: string) => (el<HTMLInputElement | HTMLSelectElement>(F[f].id).value = v);
  set("name", p.name === "pitch" ? "" : p.name);
  set("hand", p.hand);
  set("speed", String(p.speedMph));
  set("spin", String(p.spinRpm));
  if (p.tiltDeg !== undefined) {
    set("tiltAs", "degrees");
    set("tilt", String(p.tiltDeg));
  } else {
    set("tiltAs", "clock");
    set("tilt", p.tilt);
  }
  set("view", p.view);
  // the echo's gyro is signed: give it back as the gyro angle, which carries its sign
  set("gyroAs", "gyro");
  set("gyro", String(p.gyroDeg));
  for (const r of document.querySelectorAll<HTMLInputElement>(`input[name="gyro-sign"]`)) r.checked = false;
  set("want", p.want);
  const air = (f: FormField, unitField: FormField, options: [string, string][]) => {
    const given = options.find(([option]) => settings[option] !== undefined);
    set(f, given ? settings[given[0]] : "");
    if (given) set(unitField, given[1]);
  };
  air("elevation", "elevationUnit", [["elevation-ft", "ft"], ["elevation-m", "m"]]);
  air("temperature", "temperatureUnit", [["temperature-f", "f"], ["temperature-c", "c"]]);
  syncGyroSign();
}
