import { z } from 'zod'

const coordinate = (label: string) => z.number({ error: `${label} must be a number of metres.` }).min(0, `${label} must be inside the room (at least 0 m).`).max(200)
const pointSchema = z.object({ xM: coordinate('x'), yM: coordinate('y'), zM: coordinate('z') })
export type PointDto = z.infer<typeof pointSchema>

/** Coordinates: x along the length from the front wall, y across from the left wall, z up from the floor. */
export const layoutBodySchema = z.object({
  speakers: z.array(pointSchema.extend({ label: z.string().trim().min(1, 'Name each speaker.').max(60) })).min(1, 'Place at least one speaker.').max(8),
  listener: pointSchema,
  airTemperatureC: z.number().min(-20).max(50).default(20),
})
export type LayoutDto = z.infer<typeof layoutBodySchema>

const BOUNDARIES = ['front wall', 'rear wall', 'left wall', 'right wall', 'floor', 'ceiling'] as const
const materialId = z.string().trim().min(1, 'Choose a material.').max(80)

export const treatmentBodySchema = z.object({
  surfaceMaterials: z.object({
    floor: materialId,
    ceiling: materialId,
    walls: materialId,
    frontWall: materialId.optional(),
    rearWall: materialId.optional(),
    leftWall: materialId.optional(),
    rightWall: materialId.optional(),
  }),
  openings: z.array(z.object({ name: z.string().trim().min(1).max(60), boundary: z.enum(BOUNDARIES), areaM2: z.number().positive().max(1000), materialId })).max(30).default([]),
  absorbers: z
    .array(
      z.object({
        name: z.string().trim().min(1, 'Name each absorber.').max(60),
        materialId,
        areaM2: z.number().positive('Area must be more than 0 m².').max(1000),
        count: z.number().int().min(1, 'Count is at least 1.').max(500),
        mountedOn: z.enum(BOUNDARIES).optional(),
      }),
    )
    .max(100)
    .default([]),
})
export type TreatmentDto = z.infer<typeof treatmentBodySchema>

export const customMaterialBodySchema = z.object({
  name: z.string().trim().min(1, 'Name the material.').max(80),
  kind: z.enum(['surface', 'object']).default('surface'),
  /** One value per octave 63 … 8000 Hz; null where unknown. */
  coefficients: z.array(z.number().min(0, 'Coefficients are at least 0.').max(1.5, 'Coefficients above 1.5 are not plausible.').nullable()).length(8, 'Give eight values, 63 Hz to 8 kHz (leave unknown ones empty).'),
  source: z.string().trim().min(3, 'Say where the values come from (data sheet, test report).').max(300),
})
export type CustomMaterialBody = z.infer<typeof customMaterialBodySchema>

export interface MaterialDto {
  id: string
  name: string
  kind: 'surface' | 'object'
  coefficients: (number | null)[]
  source: string
  caution?: string
  isBuiltIn: boolean
}

export interface RoomModelDto {
  roomId: number
  layout: LayoutDto | null
  treatment: TreatmentDto | null
  updatedAt: string | null
}
