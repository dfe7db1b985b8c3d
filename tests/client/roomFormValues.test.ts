// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import type { RoomDto } from '@shared/api'
import { convertSizeUnit, emptyRoomFormValues, roomToFormValues } from '@/forms/roomFormValues'
import { validateRoomForm } from '@/forms/validateRoomForm'

const room: RoomDto = {
  id: 3, workspaceId: 1, name: 'Booth', clientName: '', address: '', use: 'other',
  lengthM: 5, widthM: 4, heightM: 2.5, volumeM3: null, effectiveVolumeM3: 50, targetProfile: 'auto', notes: '',
  target: { targetProfile: 'auto', id: 'small-studio-common-practice', name: 'Small studio (common practice)', kind: 'common-practice', citation: null, sourceNote: null, citationText: 'Common practice of the trade (no published standard)', caution: 'Check the current edition.', octaveBands: null },
  surveyCount: 0, lastSurveyOn: null, createdAt: '2026-01-01T00:00:00Z', updatedAt: '2026-01-01T00:00:00Z',
  permissions: { role: 'owner', canEdit: true, canDelete: true, canShare: true, canAddCaptures: true, canJudgeCaptures: true },
}

describe('roomToFormValues', () => {
  it('returns the sizes in feet rounded to 3 decimals when the user works in feet', () => {
    const { values } = roomToFormValues(room, 'ft')

    // 5 m / 0.3048 = 16.4042 ft; 4 m = 13.1234 ft; 2.5 m = 8.2021 ft
    expect([values.length, values.width, values.height]).toEqual(['16.404', '13.123', '8.202'])
    expect(values.sizeMode).toBe('dimensions')
  })

  it('returns the exact metres on save when the rounded feet were not touched', () => {
    const { values, exact } = roomToFormValues(room, 'ft')

    const { body } = validateRoomForm(values, 'ft', exact)

    expect([body!.lengthM, body!.widthM, body!.heightM]).toEqual([5, 4, 2.5])
  })

  it('returns volume mode for a room given by its volume', () => {
    expect(roomToFormValues({ ...room, volumeM3: 62.5 }, 'm').values).toMatchObject({ sizeMode: 'volume', volume: '62.5' })
  })
})

describe('convertSizeUnit', () => {
  it('returns typed metres re-expressed in feet, and back to the same metres', () => {
    const typed = { ...emptyRoomFormValues(), length: '3.048', width: '2,5', height: 'tall' }

    const inFeet = convertSizeUnit(typed, {}, 'm', 'ft')
    const backInMetres = convertSizeUnit(inFeet.values, inFeet.exact, 'ft', 'm')

    expect(inFeet.values.length).toBe('10')
    expect(inFeet.values.height).toBe('tall')
    expect(backInMetres.values.length).toBe('3.048')
    expect(backInMetres.values.width).toBe('2.5')
  })
})
