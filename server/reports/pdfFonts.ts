import { createRequire } from 'node:module'
import { existsSync, readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import * as fontkit from 'fontkit'
import { logger } from '../logger'

/** One font file (or one face of a collection) the report may print with. */
export interface FontFace {
  id: string
  file: string
  postscriptName?: string
}

const require = createRequire(import.meta.url)
const DEBIAN_NOTO = '/usr/share/fonts/truetype/noto'
const DEBIAN_CJK = '/usr/share/fonts/opentype/noto'
const bundled = (name: string) => require.resolve(`@fontsource/${name}`)
const isDebianFont = (name: string) => existsSync(path.join(DEBIAN_NOTO, name))

function debianFace(id: string, name: string): FontFace[] {
  return isDebianFont(name) ? [{ id, file: path.join(DEBIAN_NOTO, name) }] : []
}

/** The Noto Sans subsets bundled with the app (npm), used where Debian's full Noto Sans is missing. */
function bundledSansFaces(weight: 400 | 700): FontFace[] {
  return ['latin', 'latin-ext', 'greek', 'greek-ext', 'cyrillic', 'cyrillic-ext', 'vietnamese', 'devanagari'].map((subset) => ({
    id: `sans-${subset}-${weight}`,
    file: bundled(`noto-sans/files/noto-sans-${subset}-${weight}-normal.woff`),
  }))
}

/** Monochrome Noto Emoji (outlines print; colour bitmap emoji fonts do not), bundled from npm in numbered subsets. */
function emojiFaces(): FontFace[] {
  const dir = path.dirname(bundled('noto-emoji/files/noto-emoji-0-400-normal.woff'))
  return readdirSync(dir)
    .filter((name) => /^noto-emoji-\d+-400-normal\.woff$/.test(name))
    .sort()
    .map((name) => ({ id: `emoji-${name.match(/\d+/)![0]}`, file: path.join(dir, name) }))
}

/** Debian's Noto Sans fonts for further scripts (Arabic, Hebrew, Thai, Armenian, Georgian, Indic …). */
function debianScriptFaces(weight: 'Regular' | 'Bold'): FontFace[] {
  if (!existsSync(DEBIAN_NOTO)) return []
  const preferred = ['Arabic', 'Hebrew', 'Thai', 'Armenian', 'Georgian', 'Devanagari', 'Bengali', 'Tamil', 'Ethiopic', 'Khmer', 'Lao', 'Myanmar', 'Sinhala', 'Symbols', 'Symbols2', 'Math']
  const names = readdirSync(DEBIAN_NOTO).filter((name) => /^NotoSans[A-Z][A-Za-z0-9]*-(Regular|Bold)\.ttf$/.test(name) && !/^NotoSans(Display|Mono)/.test(name))
  const script = (name: string) => name.slice('NotoSans'.length, name.indexOf('-'))
  const byScript = new Map<string, string>()
  for (const name of names) {
    const key = script(name)
    if (name.endsWith(`-${weight}.ttf`) || !byScript.has(key)) byScript.set(key, name)
  }
  const ordered = [...preferred.filter((s) => byScript.has(s)), ...[...byScript.keys()].filter((s) => !preferred.includes(s)).sort()]
  return ordered.map((s) => ({ id: `script-${s}-${weight}`, file: path.join(DEBIAN_NOTO, byScript.get(s)!) }))
}

function cjkFace(weight: 'Regular' | 'Bold'): FontFace[] {
  const file = path.join(DEBIAN_CJK, `NotoSansCJK-${weight}.ttc`)
  return existsSync(file) ? [{ id: `cjk-${weight}`, file, postscriptName: `NotoSansCJKjp-${weight}` }] : []
}

/**
 * The fallback chain of a weight, in the order a character is looked up: Noto Sans (Latin, Greek,
 * Cyrillic; Debian's full font, else the bundled subsets), then Noto Sans CJK (Japanese, Chinese,
 * Korean), the other Noto scripts, and Noto Emoji last.
 */
function chainOf(weight: 'regular' | 'bold'): FontFace[] {
  const debianWeight = weight === 'regular' ? 'Regular' : 'Bold'
  const sans = debianFace(`sans-${weight}`, `NotoSans-${debianWeight}.ttf`)
  return [
    ...(sans.length > 0 ? sans : bundledSansFaces(weight === 'regular' ? 400 : 700)),
    ...cjkFace(debianWeight),
    ...debianScriptFaces(debianWeight),
    ...emojiFaces(),
  ]
}

const chains = { regular: chainOf('regular'), bold: chainOf('bold') }
const buffers = new Map<string, Buffer>()
const parsed = new Map<string, fontkit.Font>()
const lookups = { regular: new Map<number, FontFace | null>(), bold: new Map<number, FontFace | null>() }
const reportedMissing = new Set<number>()

/** The bytes of a face (read once per process). */
export function fontBytes(face: FontFace): Buffer {
  let bytes = buffers.get(face.file)
  if (!bytes) {
    bytes = readFileSync(face.file)
    buffers.set(face.file, bytes)
  }
  return bytes
}

function parsedFace(face: FontFace): fontkit.Font {
  let font = parsed.get(face.id)
  if (!font) {
    font = fontkit.create(fontBytes(face), face.postscriptName)
    parsed.set(face.id, font)
  }
  return font
}

/** The first face of the chain that has a glyph for the code point; null when none has. */
export function faceForCodePoint(codePoint: number, weight: 'regular' | 'bold'): FontFace | null {
  const cache = lookups[weight]
  if (cache.has(codePoint)) return cache.get(codePoint)!
  const face = chains[weight].find((candidate) => parsedFace(candidate).hasGlyphForCodePoint(codePoint)) ?? null
  cache.set(codePoint, face)
  if (!face && !reportedMissing.has(codePoint)) {
    reportedMissing.add(codePoint)
    logger.warn({ codePoint: codePoint.toString(16) }, 'no report font has this character; install fonts-noto-core and fonts-noto-cjk')
  }
  return face
}

/** The face text without a special script is set in (and the one missing characters fall back to). */
export function primaryFace(weight: 'regular' | 'bold'): FontFace {
  return chains[weight][0]!
}

/** Whether a face has a glyph for the code point. */
export function faceHasCodePoint(face: FontFace, codePoint: number): boolean {
  return parsedFace(face).hasGlyphForCodePoint(codePoint)
}
