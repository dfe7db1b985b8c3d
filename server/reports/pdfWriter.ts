import PDFDocument from 'pdfkit'
import { fontBytes, primaryFace, type FontFace } from './pdfFonts'
import { splitIntoRuns } from './textRuns'

export interface TextStyle {
  size: number
  bold?: boolean
  color?: string
  align?: 'left' | 'right' | 'center'
}

const MEASURE_PAGE = { width: 2000, height: 100_000 }

/**
 * Writes text that may mix scripts: each run goes in the font that has its characters (with the
 * fonts registered per document on first use). Heights are measured by laying the same text out
 * in a scratch document, so wrapped cells and names of any length are measured, never guessed.
 */
export class PdfWriter {
  readonly doc: PDFKit.PDFDocument
  private readonly scratch: PDFKit.PDFDocument
  private readonly registered = new WeakMap<PDFKit.PDFDocument, Set<string>>()

  constructor(doc: PDFKit.PDFDocument) {
    this.doc = doc
    this.scratch = new PDFDocument({ size: [MEASURE_PAGE.width, MEASURE_PAGE.height], margin: 0, autoFirstPage: true })
    this.scratch.on('data', () => undefined)
  }

  private use(target: PDFKit.PDFDocument, face: FontFace): void {
    let names = this.registered.get(target)
    if (!names) this.registered.set(target, (names = new Set()))
    if (!names.has(face.id)) {
      target.registerFont(face.id, fontBytes(face), face.postscriptName)
      names.add(face.id)
    }
    target.font(face.id)
  }

  private draw(target: PDFKit.PDFDocument, text: string, x: number, y: number, width: number, style: TextStyle): void {
    const runs = splitIntoRuns(text.length > 0 ? text : ' ', style.bold ? 'bold' : 'regular')
    target.fillColor(style.color ?? '#222222').fontSize(style.size)
    // PDFKit places continued runs of different fonts correctly only in left-aligned text.
    const align = runs.length > 1 ? 'left' : (style.align ?? 'left')
    runs.forEach((run, i) => {
      this.use(target, run.face)
      const options = { width, align, continued: i < runs.length - 1, lineGap: 1 }
      if (i === 0) target.text(run.text, x, y, options)
      else target.text(run.text, options)
    })
  }

  /** Height the text takes at this width and style, pt. */
  measure(text: string, width: number, style: TextStyle): number {
    this.draw(this.scratch, text, 0, 0, width, style)
    const height = this.scratch.y
    this.scratch.x = 0
    this.scratch.y = 0
    return height
  }

  /** Writes a block at (x, y) (default: the current position at the left margin) and moves below it. */
  write(text: string, style: TextStyle, at: { x?: number; y?: number; width?: number } = {}): void {
    const x = at.x ?? this.doc.page.margins.left
    const width = at.width ?? this.contentWidth() - (x - this.doc.page.margins.left)
    const height = this.measure(text, width, style)
    const y = at.y ?? this.ensureSpace(height)
    this.draw(this.doc, text, x, y, width, style)
    this.doc.x = this.doc.page.margins.left
    this.doc.y = y + height
  }

  /** Moves down by some points (a paragraph gap). */
  gap(points: number): void {
    this.doc.y += points
  }

  contentWidth(): number {
    return this.doc.page.width - this.doc.page.margins.left - this.doc.page.margins.right
  }

  bottomLimit(): number {
    return this.doc.page.height - this.doc.page.margins.bottom
  }

  /** Starts a new page when the next `height` points do not fit; returns the y to write at. */
  ensureSpace(height: number, layout?: 'portrait' | 'landscape'): number {
    if (this.doc.y + height > this.bottomLimit()) this.addPage(layout)
    return this.doc.y
  }

  addPage(layout: 'portrait' | 'landscape' = this.doc.page.layout as 'portrait' | 'landscape'): void {
    this.doc.addPage({ size: 'A4', layout, margins: this.doc.page.margins })
    this.doc.x = this.doc.page.margins.left
    this.doc.y = this.doc.page.margins.top
  }

  /** The face used for chart labels drawn from SVG (plain Latin text only). */
  chartFontName(): string {
    const face = primaryFace('regular')
    this.use(this.doc, face)
    return face.id
  }

  close(): void {
    this.scratch.end()
  }
}
