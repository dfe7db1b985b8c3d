export interface HealthResponse {
  status: 'ok' | 'degraded'
  database: 'ok' | 'unreachable'
  redis: 'ok' | 'unreachable'
  version: string
}
