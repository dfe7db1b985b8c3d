import { documentRoutes } from './routeDocs'

// Routes defined in server/app.ts itself.
documentRoutes('Service', {
  'GET /api/health': {
    summary: 'Whether the server reaches PostgreSQL and Redis',
    responseDescription: 'ok (200) or degraded (503), with the state of each service.',
  },
  'GET /api/dev/mailbox': {
    summary: 'The messages of the local fake mail inbox',
    description: 'Answers only requests from this machine.',
    isDevelopmentOnly: true,
  },
})
