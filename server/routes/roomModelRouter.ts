import { Router } from 'express'
import { z } from 'zod'
import * as roomModel from '../controllers/roomModelController'
import { validate } from '../middleware/validate'
import { requireAuth } from '../middleware/requireAuth'
import { idParam } from '../../shared/api/common'
import { customMaterialBodySchema, layoutBodySchema, treatmentBodySchema } from '../../shared/api/roomModel'
import { documentRoutes } from '../openapi/routeDocs'

const roomParams = z.object({ roomId: idParam })
const workspaceParams = z.object({ workspaceId: idParam })
const materialParams = z.object({ workspaceId: idParam, materialId: idParam })

/** The room model's saved inputs (layout, treatment plan) and the workspace material library. */
export function roomModelRouter() {
  const router = Router()
  router.get('/rooms/:roomId/model', requireAuth, validate({ params: roomParams }), roomModel.show)
  router.put('/rooms/:roomId/model/layout', requireAuth, validate({ params: roomParams, body: layoutBodySchema }), roomModel.saveLayout)
  router.put('/rooms/:roomId/model/treatment', requireAuth, validate({ params: roomParams, body: treatmentBodySchema }), roomModel.saveTreatment)
  router.get('/workspaces/:workspaceId/materials', requireAuth, validate({ params: workspaceParams }), roomModel.listMaterials)
  router.post('/workspaces/:workspaceId/materials', requireAuth, validate({ params: workspaceParams, body: customMaterialBodySchema }), roomModel.createMaterial)
  router.delete('/workspaces/:workspaceId/materials/:materialId', requireAuth, validate({ params: materialParams }), roomModel.deleteMaterial)
  return router
}

documentRoutes('Room model', {
  'GET /api/rooms/{roomId}/model': { summary: 'The room model: layout, treatment plan and what follows from them' },
  'PUT /api/rooms/{roomId}/model/layout': { summary: 'Save the speaker and listener layout' },
  'PUT /api/rooms/{roomId}/model/treatment': { summary: 'Save the treatment plan' },
  'GET /api/workspaces/{workspaceId}/materials': { summary: 'The workspace’s own absorber materials' },
  'POST /api/workspaces/{workspaceId}/materials': { summary: 'Add a material with its absorption per band', status: 201 },
  'DELETE /api/workspaces/{workspaceId}/materials/{materialId}': { summary: 'Delete a material', status: 204, responseDescription: 'Deleted.' },
})
