/** The part of fontkit 2.0.4 we use (it ships no type declarations). */
declare module "fontkit" {
  export interface PathCommand {
    readonly command: "moveTo" | "lineTo" | "quadraticCurveTo" | "bezierCurveTo" | "closePath";
    readonly args: readonly number[];
  }
  export interface Glyph {
    readonly advanceWidth: number;
    readonly path: { readonly commands: readonly PathCommand[] };
  }
  export interface GlyphPosition {
    readonly xAdvance: number;
    readonly yAdvance: number;
    readonly xOffset: number;
    readonly yOffset: number;
  }
  export interface GlyphRun {
    readonly advanceWidth: number;
    readonly glyphs: readonly Glyph[];
    readonly positions: readonly GlyphPosition[];
  }
  export interface Font {
    readonly unitsPerEm: number;
    readonly ascent: number;
    readonly descent: number;
    readonly postscriptName: string;
    readonly familyName: string;
    readonly numGlyphs: number;
    /** Every code point the cmap maps. */
    readonly characterSet: readonly number[];
    hasGlyphForCodePoint(codePoint: number): boolean;
    glyphForCodePoint(codePoint: number): Glyph;
    layout(text: string, features?: string[] | Record<string, boolean>): GlyphRun;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font;
}
