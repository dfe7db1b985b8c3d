// @vitest-environment jsdom
import { describe, expect, it } from 'vitest'
import { expectWithin } from '../helpers/tolerance'
import { emptyRoomFormValues, type RoomFormValues } from '@/forms/roomFormValues'
import { serverFieldsToRoomForm, validateRoomForm } from '@/forms/validateRoomForm'

function values(overrides: Partial<RoomFormValues>): RoomFormValues {
  return { ...emptyRoomFormValues(), name: 'Control room A', use: 'control-room', length: '5.2', width: '3.9', height: '2.6', ...overrides }
}

describe('validateRoomForm', () => {
  it('returns a body in metres with no errors when a room has a name, a use and three dimensions', () => {
    const { body, errors } = validateRoomForm(values({ clientName: '  Test client ' }), 'm')

    expect(errors).toEqual({})
    expect(body).toEqual({
      name: 'Control room A', clientName: 'Test client', address: '', use: 'control-room',
      lengthM: 5.2, widthM: 3.9, heightM: 2.6, volumeM3: null, notes: '',
    })
  })

  it('returns dimensions converted to metres when they were typed in feet (1 ft = 0.3048 m)', () => {
    const { body } = validateRoomForm(values({ length: '20', width: '15', height: '9' }), 'ft')

    expectWithin(body!.lengthM!, 6.096, 1e-12)
    expectWithin(body!.widthM!, 4.572, 1e-12)
    expectWithin(body!.heightM!, 2.7432, 1e-12)
  })

  it('returns a volume in m³ and no dimensions when the room is given by its volume in ft³', () => {
    const { body, errors } = validateRoomForm(values({ sizeMode: 'volume', volume: '1000' }), 'ft')

    expect(errors).toEqual({})
    expectWithin(body!.volumeM3!, 28.316846592, 1e-9)
    expect([body!.lengthM, body!.widthM, body!.heightM]).toEqual([null, null, null])
  })

  it('accepts a decimal comma', () => {
    const { body } = validateRoomForm(values({ length: '5,25' }), 'm')

    expect(body!.lengthM).toBe(5.25)
  })

  it('returns an error on the missing height, pointing to the volume, when only two dimensions are given', () => {
    const { body, errors } = validateRoomForm(values({ height: '' }), 'm')

    expect(body).toBeNull()
    expect(errors).toEqual({ height: 'Enter the height, or give the volume instead.' })
  })

  it('returns errors for zero, negative and non-numeric dimensions, in the unit the user chose', () => {
    const { errors } = validateRoomForm(values({ length: '0', width: '-3', height: 'tall' }), 'ft')

    expect(errors.length).toBe('Length must be more than 0 ft.')
    expect(errors.width).toBe('Width must be more than 0 ft.')
    expect(errors.height).toBe('Height must be a number, e.g. 4.2.')
  })

  it('returns an error when a dimension is over 200 m, stated in feet for a user working in feet', () => {
    expect(validateRoomForm(values({ length: '201' }), 'm').errors.length).toBe('Length must be at most 200 m.')
    // 200 m / 0.3048 = 656.17 ft
    expect(validateRoomForm(values({ length: '700' }), 'ft').errors.length).toBe('Length must be at most 656 ft.')
    expect(validateRoomForm(values({ length: '656' }), 'ft').errors).toEqual({})
  })

  it('returns an error when the volume is missing or not positive in volume mode', () => {
    expect(validateRoomForm(values({ sizeMode: 'volume', volume: '' }), 'm').errors).toEqual({ volume: 'Enter the volume.' })
    expect(validateRoomForm(values({ sizeMode: 'volume', volume: '-5' }), 'm').errors).toEqual({ volume: 'Volume must be more than 0 m³.' })
  })

  it('returns errors for a missing name and use', () => {
    const { body, errors } = validateRoomForm(values({ name: '   ', use: null }), 'm')

    expect(body).toBeNull()
    expect(errors).toEqual({ name: 'Name the room.', use: 'Choose what the room is used for.' })
  })

  it('returns an error when the name is longer than the API accepts (120 characters)', () => {
    expect(validateRoomForm(values({ name: 'x'.repeat(121) }), 'm').errors.name).toBe('Keep this under 120 characters.')
  })

  it('ignores the dimension inputs in volume mode and the volume input in dimension mode', () => {
    expect(validateRoomForm(values({ sizeMode: 'volume', volume: '60', length: 'junk' }), 'm').errors).toEqual({})
    expect(validateRoomForm(values({ volume: 'junk' }), 'm').body!.volumeM3).toBeNull()
  })

  it('returns the remembered exact metres while a rounded figure is left as shown', () => {
    // 5 m shows as 16.404 ft; saving unchanged must send 5 m, not 16.404 × 0.3048 = 5.0000 m ± 0.1 mm.
    const { body } = validateRoomForm(values({ length: '16.404' }), 'ft', { length: { text: '16.404', valueSi: 5 } })

    expect(body!.lengthM).toBe(5)
  })
})

describe('serverFieldsToRoomForm', () => {
  it('returns the server messages on the matching inputs and drops unknown fields', () => {
    const errors = serverFieldsToRoomForm({ lengthM: 'Length must be more than 0 m.', volumeM3: 'Too big.', name: 'Name the room.', workspaceId: 'x' })

    expect(errors).toEqual({ length: 'Length must be more than 0 m.', volume: 'Too big.', name: 'Name the room.' })
  })
})
