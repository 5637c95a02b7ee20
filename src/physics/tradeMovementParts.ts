/**
 * The trade's movement (tradeMovement.ts) split into parts on the same basis:
 * every part is a difference of constant-acceleration fits over one window.
 *
 * Field frame (geometry/frames.ts): x toward the catcher's right, y from the rear
 * point of home plate toward the pitcher, z up. Breaks are in the plate plane:
 * horizontal +x, induced vertical up (gravity removed).
 *
 * The same launch is flown as movement.ts flies it, sharing release, air and drag:
 *   full        gravity + drag + Magnus + seam hook   (the options as given)
 *   spinless    gravity + drag
 *   magnusOnly  gravity + drag + Magnus
 *   seamOnly    gravity + drag + seam hook
 * and each flight is fitted over the same window, trade(.) being its
 * (horizontal, induced vertical) break. The parts are
 *   drag         trade(spinless)                        drag's own deflection
 *   Magnus       trade(magnusOnly) - trade(spinless)
 *   seam         trade(seamOnly)   - trade(spinless)    zero without a seam hook
 *   interaction  trade(full) - drag - Magnus - seam     the forces acting together
 * so drag + Magnus + seam + interaction = trade(full) by construction. A part
 * is a force's push together with the change it makes to drag's deflection:
 * backspin keeps a pitch from descending as steeply, so drag's upward share
 * (drag is along -v) is smaller in the magnusOnly flight than in the spinless
 * one, and the Magnus part is a little less than 1/2 a_Magnus T^2. Each
 * flight has its own window time T (every force changes the speed along y a
 * little), so a part also carries the small change in T between the flights it
 * compares. Without a seam hook, magnusOnly is the full flight and seamOnly the
 * spinless one: two flights, seam and interaction exactly 0.
 */
import type { FlightOptions, FlightResult, Launch } from "./flight.js";
import { tradeMovement, type TradeBreak, type TradeMovement, type TradeMovementOptions } from "./tradeMovement.js";
import { recordFlight, type TrajectorySamples } from "./trajectory.js";

/** The window for the parts: the plate plane and gravity come from the flight options, so the fit and the flights agree. */
export type TradeWindowOptions = Omit<TradeMovementOptions, "plateYM" | "gravityMPerS2">;

export interface TradeMovementParts {
  /** The full flight's trade movement. */
  readonly total: TradeMovement;
  /** The gravity-and-drag flight's trade movement (its break is `dragM`). */
  readonly spinless: TradeMovement;
  /** trade(spinless), m. */
  readonly dragM: TradeBreak;
  /** trade(magnusOnly) - trade(spinless), m. */
  readonly magnusM: TradeBreak;
  /** trade(seamOnly) - trade(spinless), m (zero without a seam hook). */
  readonly seamM: TradeBreak;
  /** total - drag - Magnus - seam, m. */
  readonly interactionM: TradeBreak;
  /** The four flights at the plate (magnusOnly is full and seamOnly spinless without a seam hook). */
  readonly flights: {
    readonly full: FlightResult;
    readonly spinless: FlightResult;
    readonly magnusOnly: FlightResult;
    readonly seamOnly: FlightResult;
  };
}

function difference(a: TradeBreak, b: TradeBreak): TradeBreak {
  return {
    horizontalBreakM: a.horizontalBreakM - b.horizontalBreakM,
    inducedVerticalBreakM: a.inducedVerticalBreakM - b.inducedVerticalBreakM,
  };
}

function asBreak(m: TradeBreak): TradeBreak {
  return { horizontalBreakM: m.horizontalBreakM, inducedVerticalBreakM: m.inducedVerticalBreakM };
}

/**
 * Flies the launch two or four times and splits its trade movement into drag,
 * Magnus, seam and interaction parts (definitions in the file header).
 *
 * @param options flight options; its plateYM is the window's end and its gravity
 *   is what the induced vertical break removes. Any `trajectory` callback is
 *   replaced by the recorder.
 * @param window the window start (default 50 ft).
 * @throws RangeError as simulateFlight and tradeMovement do.
 */
export function tradeMovementParts(launch: Launch, options: FlightOptions = {}, window: TradeWindowOptions = {}): TradeMovementParts {
  const fitOptions: TradeMovementOptions = {
    ...(window.windowStartM !== undefined ? { windowStartM: window.windowStartM } : {}),
    ...(options.plateYM !== undefined ? { plateYM: options.plateYM } : {}),
    ...(options.gravityMPerS2 !== undefined ? { gravityMPerS2: options.gravityMPerS2 } : {}),
  };
  const fly = (o: FlightOptions): { flight: FlightResult; samples: TrajectorySamples } => recordFlight(launch, o);
  const full = fly(options);
  const spinless = fly({ ...options, magnus: false, seamForce: undefined });
  const hasSeam = options.seamForce !== undefined;
  const magnusOnly = hasSeam ? fly({ ...options, seamForce: undefined }) : full;
  const seamOnly = hasSeam ? fly({ ...options, magnus: false }) : spinless;

  const total = tradeMovement(full.samples, fitOptions);
  const base = tradeMovement(spinless.samples, fitOptions);
  const withMagnus = hasSeam ? tradeMovement(magnusOnly.samples, fitOptions) : total;
  const withSeam = hasSeam ? tradeMovement(seamOnly.samples, fitOptions) : base;
  const dragM = asBreak(base);
  const magnusM = difference(withMagnus, base);
  const seamM = difference(withSeam, base);
  const interactionM: TradeBreak = {
    horizontalBreakM: total.horizontalBreakM - dragM.horizontalBreakM - magnusM.horizontalBreakM - seamM.horizontalBreakM,
    inducedVerticalBreakM: total.inducedVerticalBreakM - dragM.inducedVerticalBreakM - magnusM.inducedVerticalBreakM - seamM.inducedVerticalBreakM,
  };
  return {
    total,
    spinless: base,
    dragM,
    magnusM,
    seamM,
    interactionM,
    flights: { full: full.flight, spinless: spinless.flight, magnusOnly: magnusOnly.flight, seamOnly: seamOnly.flight },
  };
}
