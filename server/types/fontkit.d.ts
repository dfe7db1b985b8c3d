declare module 'fontkit' {
  export interface Font {
    postscriptName: string
    hasGlyphForCodePoint(codePoint: number): boolean
  }
  /** Parses a font file (TTF, OTF, WOFF, WOFF2); for a collection (TTC) pass the face's PostScript name. */
  export function create(buffer: Buffer, postscriptName?: string): Font
}
