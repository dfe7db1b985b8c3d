import { request } from './http'

/** One message of the local fake inbox. */
export interface DevMailMessage {
  id: string
  to: string
  subject: string
  /** ISO 8601. */
  date: string
  text: string
}

/** Newest first; 404 unless mail goes to the fake inbox and the request comes from this machine. */
export function listDevMailbox(): Promise<DevMailMessage[]> {
  return request<DevMailMessage[]>('GET', '/dev/mailbox')
}
