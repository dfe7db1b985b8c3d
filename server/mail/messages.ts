import type { OutgoingMail } from './mailer'

const SIGNATURE = '\n\n— Ringdown'

export function invitationMail(input: { to: string; inviterName: string; workspaceName: string; roomName: string | null; role: string; link: string; expiresAt: Date }): OutgoingMail {
  const what = input.roomName ? `the room "${input.roomName}" in ${input.workspaceName}` : `the workspace ${input.workspaceName}`
  return {
    to: input.to,
    subject: `${input.inviterName} invites you to ${input.roomName ?? input.workspaceName} on Ringdown`,
    text: `${input.inviterName} invites you to ${what} as ${input.role}.\n\nOpen this link to accept (it works once, until ${input.expiresAt.toUTCString()}):\n${input.link}\n\nIf you did not expect this, ignore this message.${SIGNATURE}`,
  }
}

export function passwordResetMail(input: { to: string; link: string; expiresAt: Date }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Ringdown password',
    text: `Someone asked to reset the password of this account. Open this link to choose a new one (it works once, until ${input.expiresAt.toUTCString()}):\n${input.link}\n\nIf it was not you, ignore this message: your password stays as it is.${SIGNATURE}`,
  }
}

/** The e-mail of a sent report: names the frozen revision and its date, and its verdict line. */
export function reportReadyMail(input: { to: string; roomName: string; link: string; senderName: string; revisionNumber: number; frozenAt: Date; summaryLine: string | null }): OutgoingMail {
  const date = input.frozenAt.toISOString().slice(0, 10)
  const verdict = input.summaryLine ? `\n\nIn short: ${input.summaryLine}` : ''
  return {
    to: input.to,
    subject: `Your acoustic report for ${input.roomName} is ready`,
    text: `${input.senderName} has prepared the measurement report for ${input.roomName} (revision ${input.revisionNumber} of ${date}). This revision stays as it was sent.${verdict}\n\nRead it here (no account needed):\n${input.link}${SIGNATURE}`,
  }
}
