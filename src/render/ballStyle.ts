/**
 * The visual language of seam-atlas ball drawings (our own; no other product's).
 *
 * Palette "bone and oxblood": the cover is bone white, lit from the upper left by
 * a radial gradient that darkens to a warm grey at the limb, so the disc reads as a
 * sphere. The seam channel is a dusty rose band of the real seam width; the double
 * stitches are oxblood Vs on it. The seam on the far side shows as a faint dashed
 * oxblood centre line, as if seen through the cover.
 * Marks:
 *   spin axis      indigo ink; dashed through the ball, solid stubs outside it;
 *                  positive end (right-hand rule) a filled dot with an arrowhead on
 *                  its stub, negative end an open ring; far-side ends at 40 % opacity
 *   flow band      the separation band seen by the flow: cornflower tint between
 *                  its two edge circles (solid steel blue); the front stagnation
 *                  point a small open steel-blue diamond
 *   finger pads    ochre translucent ellipses with a dark brown outline and label;
 *                  fingers drawn as tan bands of their real width behind the pads
 *   push arrow     spruce green arrow from the centre; a push along the line of
 *                  sight is a ring with a dot (toward the viewer) or a cross (away)
 *   landmarks      small graphite dots with haloed graphite labels
 * A legend row under the ball names the marks that are drawn.
 */
export const BALL_STYLE = {
  font: "DejaVu Sans, Verdana, sans-serif",
  coverLight: "#fffdf7",
  coverMid: "#efe8da",
  coverLimb: "#bdb19b",
  coverOutline: "#7d725f",
  seamBand: "#d9ab9c",
  stitch: "#8e2a26",
  hiddenSeam: "#8e2a26",
  hiddenSeamOpacity: 0.22,
  axis: "#2b3a67",
  hiddenOpacity: 0.4,
  bandTint: "#6f9fd8",
  bandTintOpacity: 0.22,
  bandEdge: "#3d6f9e",
  padFill: "#e3a83b",
  padFillOpacity: 0.45,
  padOutline: "#6b4a12",
  fingerFill: "#c98a4b",
  push: "#2f6f4f",
  ink: "#2c2c2c",
  landmark: "#4a4a4a",
  halo: "#ffffff",
} as const;
