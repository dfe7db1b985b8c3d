/**
 * The sign-ins of the invented demo workspace that the seed creates by default
 * (server/db/seed.ts). Shown on the sign-in page so a first visitor can look around.
 */
export interface DemoAccount {
  label: string
  email: string
  password: string
}

export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { label: 'Owner', email: 'owner@ringdown.test', password: 'ringdown-demo' },
]
