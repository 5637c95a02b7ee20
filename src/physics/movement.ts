/**
 * Pitch movement ("break") at the plate: how far spin and seams move the ball
 * from where the same launch would cross the plate with gravity and drag only.
 *
 * All four flights share the release, air and drag; they differ only in which
 * of the two spin-driven forces is on:
 *   spinless    gravity + drag
 *   magnusOnly  gravity + drag + Magnus
 *   seamOnly    gravity + drag + seam hook
 *   flight      gravity + drag + Magnus + seam hook   (the options as given)
 * Each break is that flight's plate crossing minus spinless's, in x and z at
 * the same plane y = plate front (not at the same time). The two parts need not
 * add up exactly, because each force changes the path the other acts along;
 * the remainder is reported as `interactionM`.
 */
import { simulateFlight, type FlightOptions, type FlightResult, type Launch } from "./flight.js";

/** A displacement in the plate plane, m: x toward the catcher's right, z up. */
export interface PlateOffset {
  readonly xM: number;
  readonly zM: number;
}

export interface Movement {
  /** The flight with everything on (as the options say). */
  readonly flight: FlightResult;
  /** The same launch with gravity and drag only. */
  readonly spinless: FlightResult;
  /** flight - spinless, m. */
  readonly breakM: PlateOffset;
  /** magnusOnly - spinless, m. */
  readonly magnusBreakM: PlateOffset;
  /** seamOnly - spinless, m (zero without a seam hook). */
  readonly seamBreakM: PlateOffset;
  /** breakM - magnusBreakM - seamBreakM, m: the part due to the two acting together. */
  readonly interactionM: PlateOffset;
}

function offset(a: FlightResult, b: FlightResult): PlateOffset {
  return { xM: a.plateCrossingM[0] - b.plateCrossingM[0], zM: a.plateCrossingM[2] - b.plateCrossingM[2] };
}

/**
 * Break of a pitch versus the spinless flight, split into Magnus and seam parts.
 * Runs two flights without a seam hook, four with one. A `trajectory` callback in
 * the options sees the full flight only.
 *
 * @throws RangeError as simulateFlight does.
 */
export function movementVersusSpinless(launch: Launch, options: FlightOptions = {}): Movement {
  const flight = simulateFlight(launch, options);
  // only the flight as given reports its trajectory
  const others: FlightOptions = { ...options, trajectory: undefined };
  const spinless = simulateFlight(launch, { ...others, magnus: false, seamForce: undefined });
  const hasSeam = options.seamForce !== undefined;
  const magnusOnly = hasSeam ? simulateFlight(launch, { ...others, seamForce: undefined }) : flight;
  const seamOnly = hasSeam ? simulateFlight(launch, { ...others, magnus: false }) : spinless;
  const breakM = offset(flight, spinless);
  const magnusBreakM = offset(magnusOnly, spinless);
  const seamBreakM = offset(seamOnly, spinless);
  return {
    flight,
    spinless,
    breakM,
    magnusBreakM,
    seamBreakM,
    interactionM: { xM: breakM.xM - magnusBreakM.xM - seamBreakM.xM, zM: breakM.zM - magnusBreakM.zM - seamBreakM.zM },
  };
}
