import { parseArgs } from 'node:util'

/** A mistake in the command line: printed as one line, exit code 2. */
export class UsageError extends Error {}

export interface UploadOptions {
  url: string
  token: string
  surveyId: number
  files: string[]
  kind: 'impulse' | 'sweep'
  channel: number
  sourceLabel: string
  /** Null: each file's name without its extension. */
  receiverLabel: string | null
  sweep: { f1Hz: number; f2Hz: number; durationS: number } | null
  referencePath: string | null
  isJson: boolean
  timeoutS: number
}

export const HELP = `Upload captures (WAV) into a Ringdown survey, wait for their analysis and print their
reverberation times at 1 kHz.

usage: npm run --silent upload -- --url URL --token TOKEN --survey ID [options] file.wav ...

  --url URL            the Ringdown server, e.g. https://ringdown.example (or RINGDOWN_URL)
  --token TOKEN        a personal API token, rdt_… (or RINGDOWN_TOKEN; Settings → API tokens)
  --survey ID          the survey the captures belong to (the number in the survey's address)
  --kind KIND          impulse (default) or sweep: what every file is
  --channel N          the channel to analyse, from 0 (default 0)
  --source LABEL       the source of every file, e.g. "Left speaker"
  --receiver LABEL     the receiver position of every file (default: each file's name without .wav)
  --sweep-f1 HZ        sweep recordings: the sweep's start frequency
  --sweep-f2 HZ        sweep recordings: the sweep's end frequency
  --sweep-seconds S    sweep recordings: the sweep's duration
  --reference FILE     sweep recordings: the reference sweep file instead of the three above
  --timeout S          how long to wait for each analysis, seconds (default 600)
  --json               print the results as JSON instead of a table
  --help               print this help

Progress goes to standard error, results to standard output. The exit code is 0 when every file
was analysed, 1 when any failed (one line per failed file on standard error) and 2 for a mistake
in the command line.`

function positiveNumber(value: string | undefined, name: string): number | undefined {
  if (value === undefined) return undefined
  const parsed = Number(value)
  if (!Number.isFinite(parsed) || parsed <= 0) throw new UsageError(`--${name} must be a positive number (got "${value}")`)
  return parsed
}

function required(value: string | undefined, what: string): string {
  if (!value) throw new UsageError(`${what} is missing`)
  return value
}

function sweepOf(values: Record<string, string | boolean | undefined>): UploadOptions['sweep'] {
  const f1Hz = positiveNumber(values['sweep-f1'] as string | undefined, 'sweep-f1')
  const f2Hz = positiveNumber(values['sweep-f2'] as string | undefined, 'sweep-f2')
  const durationS = positiveNumber(values['sweep-seconds'] as string | undefined, 'sweep-seconds')
  const given = [f1Hz, f2Hz, durationS].filter((v) => v !== undefined).length
  if (given === 0) return null
  if (given < 3) throw new UsageError('a sweep needs all of --sweep-f1, --sweep-f2 and --sweep-seconds')
  if (f1Hz! >= f2Hz!) throw new UsageError('--sweep-f2 must be above --sweep-f1')
  return { f1Hz: f1Hz!, f2Hz: f2Hz!, durationS: durationS! }
}

/** The options of one run, or null when --help was asked for. The token may come from the environment. */
export function parseUploadArgs(argv: string[], env: NodeJS.ProcessEnv): UploadOptions | null {
  let parsed
  try {
    parsed = parseArgs({
      args: argv,
      allowPositionals: true,
      options: {
        url: { type: 'string' }, token: { type: 'string' }, survey: { type: 'string' }, kind: { type: 'string' },
        channel: { type: 'string' }, source: { type: 'string' }, receiver: { type: 'string' },
        'sweep-f1': { type: 'string' }, 'sweep-f2': { type: 'string' }, 'sweep-seconds': { type: 'string' },
        reference: { type: 'string' }, timeout: { type: 'string' }, json: { type: 'boolean' }, help: { type: 'boolean' },
      },
    })
  } catch (error) {
    throw new UsageError((error as Error).message)
  }
  const { values, positionals } = parsed
  if (values.help) return null
  const url = required(values.url ?? env.RINGDOWN_URL, '--url (or RINGDOWN_URL)')
  if (!/^https?:\/\/[^/]/.test(url)) throw new UsageError(`--url must start with http:// or https:// (got "${url}")`)
  const token = required(values.token ?? env.RINGDOWN_TOKEN, '--token (or RINGDOWN_TOKEN)')
  const surveyId = Number(required(values.survey, '--survey'))
  if (!Number.isInteger(surveyId) || surveyId <= 0) throw new UsageError(`--survey must be a survey number (got "${values.survey}")`)
  if (positionals.length === 0) throw new UsageError('name at least one WAV file to upload')
  const kind = values.kind ?? 'impulse'
  if (kind !== 'impulse' && kind !== 'sweep') throw new UsageError(`--kind must be impulse or sweep (got "${kind}")`)
  const channel = Number(values.channel ?? '0')
  if (!Number.isInteger(channel) || channel < 0) throw new UsageError(`--channel must be a whole number from 0 (got "${values.channel}")`)
  const sweep = sweepOf(values)
  const referencePath = values.reference ?? null
  if (sweep && referencePath) throw new UsageError('give either --sweep-f1/--sweep-f2/--sweep-seconds or --reference, not both')
  if (kind === 'sweep' && !sweep && !referencePath) throw new UsageError('sweep recordings need --sweep-f1, --sweep-f2 and --sweep-seconds, or --reference')
  if (kind === 'impulse' && (sweep || referencePath)) throw new UsageError('sweep options only go with --kind sweep')
  return {
    url: url.replace(/\/+$/, ''), token, surveyId, files: positionals, kind, channel,
    sourceLabel: values.source ?? '', receiverLabel: values.receiver ?? null, sweep, referencePath,
    isJson: values.json ?? false, timeoutS: positiveNumber(values.timeout, 'timeout') ?? 600,
  }
}
