import { faceForCodePoint, faceHasCodePoint, primaryFace, type FontFace } from './pdfFonts'

export interface TextRun {
  face: FontFace
  text: string
}

// Marks, joiners and variation selectors stay with the character before them (same font), so a
// letter and its accent or an emoji and its modifiers are never split across fonts.
const JOINS_PREVIOUS = /[\p{M}\u200c\u200d\ufe00-\ufe0f\u{1f3fb}-\u{1f3ff}\u{e0020}-\u{e007f}]/u
const IS_NEUTRAL = /[\s\p{P}\p{N}]/u

/**
 * Splits text into runs that one font can print: each character goes to the first face of the
 * fallback chain that has it. Spaces, digits and punctuation stay in the current run when that
 * face has them (fewer font switches). Characters no face has go to the primary face.
 */
export function splitIntoRuns(text: string, weight: 'regular' | 'bold'): TextRun[] {
  const runs: TextRun[] = []
  for (const character of text) {
    const current = runs[runs.length - 1]
    const codePoint = character.codePointAt(0)!
    if (current && (JOINS_PREVIOUS.test(character) || (IS_NEUTRAL.test(character) && faceHasCodePoint(current.face, codePoint)))) {
      current.text += character
      continue
    }
    const face = faceForCodePoint(codePoint, weight) ?? primaryFace(weight)
    if (current && current.face.id === face.id) current.text += character
    else runs.push({ face, text: character })
  }
  return runs
}
