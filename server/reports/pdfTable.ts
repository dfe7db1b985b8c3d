import type { PdfWriter } from './pdfWriter'

export interface TableColumn {
  header: string
  width: number
  align?: 'left' | 'right'
}

const PADDING = 3
const HEADER_STYLE = { size: 7.5, bold: true, color: '#0b5d5e' }
const CELL_STYLE = { size: 8 }

function rowHeight(writer: PdfWriter, cells: string[], columns: TableColumn[], style: { size: number; bold?: boolean }): number {
  return Math.max(...cells.map((cell, i) => writer.measure(cell, columns[i]!.width - 2 * PADDING, style))) + 2 * PADDING
}

function drawRow(writer: PdfWriter, cells: string[], columns: TableColumn[], y: number, style: { size: number; bold?: boolean; color?: string }): void {
  let x = writer.doc.page.margins.left
  cells.forEach((cell, i) => {
    const column = columns[i]!
    writer.write(cell, { ...style, align: column.align ?? 'left' }, { x: x + PADDING, y: y + PADDING, width: column.width - 2 * PADDING })
    x += column.width
  })
}

function drawHeader(writer: PdfWriter, columns: TableColumn[]): number {
  const y = writer.doc.y
  const height = rowHeight(writer, columns.map((c) => c.header), columns, HEADER_STYLE)
  drawRow(writer, columns.map((c) => c.header), columns, y, HEADER_STYLE)
  const left = writer.doc.page.margins.left
  const right = left + columns.reduce((sum, c) => sum + c.width, 0)
  writer.doc.moveTo(left, y + height).lineTo(right, y + height).lineWidth(0.6).strokeColor('#0b5d5e').stroke()
  return y + height + 1
}

/**
 * A table whose header and rows are measured before they are drawn: a header that wraps pushes
 * the rows down instead of overlapping them, a row that does not fit starts a new page, and every
 * page repeats the header.
 */
export function drawTable(writer: PdfWriter, columns: TableColumn[], rows: string[][], options: { zebra?: boolean } = {}): void {
  const headerHeight = rowHeight(writer, columns.map((c) => c.header), columns, HEADER_STYLE)
  const firstRowHeight = rows[0] ? rowHeight(writer, rows[0], columns, CELL_STYLE) : 0
  writer.ensureSpace(headerHeight + firstRowHeight + 2)
  let y = drawHeader(writer, columns)
  const left = writer.doc.page.margins.left
  const width = columns.reduce((sum, c) => sum + c.width, 0)
  rows.forEach((cells, index) => {
    const height = rowHeight(writer, cells, columns, CELL_STYLE)
    if (y + height > writer.bottomLimit()) {
      writer.addPage()
      y = drawHeader(writer, columns)
    }
    if (options.zebra !== false && index % 2 === 1) writer.doc.rect(left, y, width, height).fillColor('#f1f5f5').fill()
    drawRow(writer, cells, columns, y, CELL_STYLE)
    y += height
  })
  writer.doc.x = left
  writer.doc.y = y + 6
}
