export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string }

/** http(s) URLs up to whitespace; trailing sentence punctuation is not part of the link. */
const URL_PATTERN = /https?:\/\/[^\s<>"]+/g
const TRAILING_PUNCTUATION = /[.,;:!?)\]]+$/

/** Splits plain mail text into text and link parts, in order, so links can be made clickable. */
export function splitTextLinks(text: string): TextPart[] {
  const parts: TextPart[] = []
  let last = 0
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index
    const href = match[0].replace(TRAILING_PUNCTUATION, '')
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) })
    parts.push({ kind: 'link', text: href, href })
    last = start + href.length
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) })
  return parts
}
