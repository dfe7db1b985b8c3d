import type { RoomDto } from '@shared/api'
import { encodeWav } from '@shared/acoustics/wav/encodeWav'
import * as capturesApi from '@/api/captures'
import * as roomsApi from '@/api/rooms'
import * as surveysApi from '@/api/surveys'
import { captureFormData } from '@/forms/captureDraft'
import { learnDemoNotes } from '@/learn/learnDemoNotes'
import { LEARN_SAMPLE_RATE_HZ, synthesizeLearnImpulse, type LearnDemoSettings } from '@/learn/runLearnDemo'
import { todayIsoDate } from '@/utils/formatDate'
import { useAsyncState } from './useAsyncState'

/** A classroom-sized box for the demo room, m: a volume is needed for the target and the modes. */
const DEMO_ROOM_M = { lengthM: 9, widthM: 7, heightM: 3 }
/** −6 dB headroom: the synthetic peak is exactly full scale, which 24-bit PCM cannot hold. */
const HEADROOM_GAIN = 0.5

/**
 * Saves the demo as a classroom room with one survey holding the synthetic impulse response
 * as a capture, so students opening the room read the same decay through the normal pages.
 */
export function useSaveLearnDemo() {
  return useAsyncState(async (workspaceId: number, name: string, settings: LearnDemoSettings): Promise<RoomDto> => {
    const room = await roomsApi.createRoom(workspaceId, {
      name, clientName: '', address: '', use: 'classroom', ...DEMO_ROOM_M, volumeM3: null, targetProfile: 'auto', notes: learnDemoNotes(settings),
    })
    const survey = await surveysApi.createSurvey(room.id, { name: 'Synthetic decay', measuredOn: todayIsoDate(), temperatureC: null, humidityPercent: null, treatmentDescription: 'Made in the Learn view.' })
    const impulse = synthesizeLearnImpulse(settings).map((value) => value * HEADROOM_GAIN)
    const bytes = encodeWav(impulse, { sampleRateHz: LEARN_SAMPLE_RATE_HZ, encoding: 'pcm24' })
    const file = new File([bytes as Uint8Array<ArrayBuffer>], `synthetic-room-seed-${settings.seed}.wav`, { type: 'audio/wav' })
    const fields = { kind: 'impulse' as const, channel: 0, sourceLabel: 'Synthetic', receiverLabel: 'Demo', positionXM: null, positionYM: null, positionZM: null, sweepF1Hz: null, sweepF2Hz: null, sweepDurationS: null }
    await capturesApi.uploadCapture(survey.id, captureFormData(fields, file, null))
    return room
  })
}
