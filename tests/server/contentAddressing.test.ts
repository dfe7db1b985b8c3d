import { describe, expect, it } from 'vitest'
import { createHash } from 'node:crypto'
import { Readable, Writable } from 'node:stream'
import { pipeline } from 'node:stream/promises'
import { contentKey, incomingKey, sha256OfContentKey } from '../../server/storage/contentKeys'
import { ContentMeter } from '../../server/storage/contentMeter'

describe('contentKey', () => {
  const sha256 = createHash('sha256').update('ringdown').digest('hex')

  it('names content by its sha256 under two short folders, and reads the sha256 back', () => {
    expect(contentKey(sha256)).toBe(`content/${sha256.slice(0, 2)}/${sha256.slice(2, 4)}/${sha256}`)
    expect(sha256OfContentKey(contentKey(sha256))).toBe(sha256)
  })

  it('refuses anything but a lower-case hex sha256, and reads no sha256 from other keys', () => {
    expect(() => contentKey(sha256.toUpperCase())).toThrow()
    expect(() => contentKey('../../etc/passwd')).toThrow()
    expect(sha256OfContentKey(incomingKey())).toBeNull()
    expect(sha256OfContentKey(`content/xx/yy/${sha256}`)).toBeNull()
  })

  it('gives every upload its own temporary key', () => {
    expect(incomingKey()).not.toBe(incomingKey())
    expect(incomingKey()).toMatch(/^incoming\//)
  })
})

describe('ContentMeter', () => {
  it('passes every byte through unchanged and reports sha256, size and the first bytes', async () => {
    const chunks = [Buffer.from('RIFF'), Buffer.alloc(1000, 7), Buffer.from('tail')]
    const whole = Buffer.concat(chunks)
    const meter = new ContentMeter(10)
    const seen: Buffer[] = []
    await pipeline(Readable.from(chunks), meter, new Writable({ write(chunk, _encoding, done) { seen.push(chunk); done() } }))
    expect(Buffer.concat(seen).equals(whole)).toBe(true)
    const result = meter.result()
    expect(result.sha256).toBe(createHash('sha256').update(whole).digest('hex'))
    expect(result.byteSize).toBe(whole.length)
    expect(Buffer.from(result.headBytes).equals(whole.subarray(0, 10))).toBe(true)
  })

  it('keeps the whole file as its head when the file is shorter than the limit', async () => {
    const meter = new ContentMeter(1024)
    await pipeline(Readable.from([Buffer.from('short')]), meter, new Writable({ write(_chunk, _encoding, done) { done() } }))
    expect(Buffer.from(meter.result().headBytes).toString()).toBe('short')
  })
})
