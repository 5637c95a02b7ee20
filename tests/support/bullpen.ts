/**
 * A bullpen session for the report's tests (invented test data): pitchers named in
 * several scripts, one with four pitch types (so its table runs onto a second page),
 * flown by the tool's own flight with planted seam orientations (session.ts).
 */
import { seamModel } from "../../src/physics/seamModel/model.js";
import { plantedSession, sessionCsv, type PlantedType } from "./session.js";

export const BULLPEN_TYPES: readonly PlantedType[] = [
  { pitcher: "Zoë Ångström", pitch: "sinker", hand: "right", speedMph: 92, spinRpm: 2150, tilt: "1:45", gyroDeg: 10, latLon: [30, 100] },
  { pitcher: "Zoë Ångström", pitch: "four-seam", hand: "right", speedMph: 94, spinRpm: 2300, tilt: "12:45", gyroDeg: 5, latLon: [0, 0] },
  { pitcher: "Zoë Ångström", pitch: "changeup", hand: "right", speedMph: 84, spinRpm: 1700, tilt: "2:00", gyroDeg: 20, latLon: [40, 60] },
  { pitcher: "Zoë Ångström", pitch: "slider", hand: "right", speedMph: 85, spinRpm: 2400, tilt: "9:30", gyroDeg: 60, latLon: [-20, 30] },
  { pitcher: "Иван Петров", pitch: "curveball", hand: "left", speedMph: 78, spinRpm: 2600, tilt: "5:00", gyroDeg: -15, latLon: [10, -45] },
  { pitcher: "محمد 李小龙 Nguyễn", pitch: "four-seam", hand: "right", speedMph: 93, spinRpm: 2250, tilt: "1:00", gyroDeg: 8, latLon: [0, 10] },
];

/** The session as CSV: 10 throws of each type, 0.5 in of noise on the observed movement. */
export function bullpenCsv(): string {
  return sessionCsv(plantedSession(BULLPEN_TYPES, 10, seamModel(), 11, 0.5));
}
