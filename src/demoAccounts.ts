/**
 * The sign-ins of the invented demo workspace that the seed creates by default. Keep in step
 * with server/db/demoData.ts (the client cannot import server code).
 */
export interface DemoAccount {
  label: string
  email: string
  password: string
}

const DEMO_PASSWORD = 'ringdown-demo'

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { label: 'Owner', email: 'owner@ringdown.test', password: DEMO_PASSWORD },
  { label: 'Engineer', email: 'engineer@ringdown.test', password: DEMO_PASSWORD },
  { label: 'Client', email: 'client@ringdown.test', password: DEMO_PASSWORD },
  { label: 'Viewer', email: 'viewer@ringdown.test', password: DEMO_PASSWORD },
]
