/** The part of fontkit 2.0.4 we use (it ships no type declarations). */
declare module "fontkit" {
  export interface Glyph {
    readonly advanceWidth: number;
  }
  export interface GlyphRun {
    readonly advanceWidth: number;
  }
  export interface Font {
    readonly unitsPerEm: number;
    readonly ascent: number;
    readonly descent: number;
    readonly postscriptName: string;
    readonly familyName: string;
    readonly numGlyphs: number;
    hasGlyphForCodePoint(codePoint: number): boolean;
    glyphForCodePoint(codePoint: number): Glyph;
    layout(text: string, features?: string[] | Record<string, boolean>): GlyphRun;
  }
  export function create(buffer: Uint8Array, postscriptName?: string): Font;
}
