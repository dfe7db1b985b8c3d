import type { Express } from 'express'
import { listMountedRoutes, routeKey } from './listMountedRoutes'
import { documentedRouteKeys } from './routeDocs'

/**
 * Mounted routes without a documentRoutes() entry, and entries that name no mounted route.
 * Both lists should be empty; the API document's test prints them.
 */
export function checkRouteDocs(app: Express): { undocumented: string[]; stale: string[] } {
  const mounted = listMountedRoutes(app).map(routeKey)
  const documented = documentedRouteKeys()
  return {
    undocumented: mounted.filter((key) => !documented.includes(key)),
    stale: documented.filter((key) => !mounted.includes(key)),
  }
}
