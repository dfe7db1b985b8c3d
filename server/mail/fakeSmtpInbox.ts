import { SMTPServer } from 'smtp-server'
import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises'
import { randomUUID } from 'node:crypto'
import path from 'node:path'
import type { AddressInfo } from 'node:net'
import { simpleParser } from 'mailparser'

/**
 * A local SMTP server that accepts every message on loopback and keeps it as an .eml file: the
 * development and test stand-in for a real mail server (the dev mailbox page lists them).
 */
export async function startFakeSmtpInbox(options: { port: number; mailDir: string }): Promise<{ port: number; close: () => Promise<void> }> {
  await mkdir(options.mailDir, { recursive: true })
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = []
      stream.on('data', (chunk: Buffer) => chunks.push(chunk))
      stream.on('end', () => {
        const name = `${new Date().toISOString().replace(/[:.]/g, '-')}-${randomUUID().slice(0, 8)}.eml`
        writeFile(path.join(options.mailDir, name), Buffer.concat(chunks)).then(() => callback(), callback)
      })
    },
  })
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject)
    server.listen(options.port, '127.0.0.1', () => resolve())
  })
  const { port } = server.server.address() as AddressInfo
  return { port, close: () => new Promise((resolve) => server.close(() => resolve())) }
}

export interface InboxMessage {
  id: string
  to: string
  subject: string
  date: string
  text: string
}

/** The fake inbox's messages, newest first. */
export async function readFakeInbox(mailDir: string): Promise<InboxMessage[]> {
  const names = (await readdir(mailDir).catch(() => [] as string[])).filter((n) => n.endsWith('.eml')).sort().reverse()
  return Promise.all(
    names.map(async (name) => {
      const parsed = await simpleParser(await readFile(path.join(mailDir, name)))
      const to = Array.isArray(parsed.to) ? parsed.to.map((a) => a.text).join(', ') : (parsed.to?.text ?? '')
      return { id: name.replace(/\.eml$/, ''), to, subject: parsed.subject ?? '', date: (parsed.date ?? new Date()).toISOString(), text: parsed.text ?? '' }
    }),
  )
}
