import { execFileSync } from 'node:child_process'
import { copyFileSync, mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { deflateSync, crc32 } from 'node:zlib'
import { screenshotPath } from './browser'

const scratch = mkdtempSync(path.join(tmpdir(), 'ringdown-pdf-'))
let counter = 0

/** Text of a PDF by Debian's pdftotext (poppler-utils), with -layout so table rows stay on one line. */
export function pdfText(pdf: Buffer): string {
  const file = path.join(scratch, `report-${++counter}.pdf`)
  writeFileSync(file, pdf)
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' })
}

/** Rasterises page 1 with pdftoppm (110 dpi) into the screenshots folder; returns the PNG path. */
export function savePageOneImage(pdf: Buffer, name: string): string {
  const file = path.join(scratch, `${name}.pdf`)
  writeFileSync(file, pdf)
  const prefix = path.join(scratch, name)
  execFileSync('pdftoppm', ['-png', '-r', '110', '-f', '1', '-l', '1', '-singlefile', file, prefix])
  const target = screenshotPath(name)
  copyFileSync(`${prefix}.png`, target)
  return target
}

function chunk(type: string, data: Buffer): Buffer {
  const typed = Buffer.concat([Buffer.from(type, 'ascii'), data])
  const length = Buffer.alloc(4)
  length.writeUInt32BE(data.length)
  const crc = Buffer.alloc(4)
  crc.writeUInt32BE(crc32(typed))
  return Buffer.concat([length, typed, crc])
}

/** A small RGB PNG (a teal square with an amber bar) built by hand: PNG spec signature, IHDR, IDAT, IEND. */
export function tinyLogoPng(widthPx = 48, heightPx = 24): Buffer {
  const header = Buffer.alloc(13)
  header.writeUInt32BE(widthPx, 0)
  header.writeUInt32BE(heightPx, 4)
  header.set([8, 2, 0, 0, 0], 8)
  const rows: number[] = []
  for (let y = 0; y < heightPx; y++) {
    rows.push(0)
    for (let x = 0; x < widthPx; x++) rows.push(...(y > heightPx * 0.7 ? [0xc7, 0x7d, 0x12] : [0x0b, 0x5d, 0x5e]))
  }
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', header), chunk('IDAT', deflateSync(Buffer.from(rows))), chunk('IEND', Buffer.alloc(0))])
}
