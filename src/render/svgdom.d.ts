/**
 * The one svgdom entry point we use (svgdom 0.1.29 ships no type declarations).
 * Its window is a DOM for SVG only; svg.js is pointed at it with registerWindow.
 */
declare module "svgdom" {
  export function createSVGWindow(): Window & typeof globalThis;
}
