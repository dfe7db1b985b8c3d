import { ref, shallowRef, type Ref } from 'vue'
import type { CreateSurveyBody, SurveyDto } from '@shared/api'
import { useRoomsStore } from '@/stores/rooms'
import { useSurveysStore } from '@/stores/surveys'
import { useAsyncState } from './useAsyncState'

/** The room page's survey dialogs: add, edit and delete, each with its own busy and error state. */
export function useSurveyEditing(roomId: Ref<number>) {
  const surveysStore = useSurveysStore()
  const roomsStore = useRoomsStore()
  const isFormOpen = ref(false)
  const editing = shallowRef<SurveyDto | null>(null)
  const isDeleteOpen = ref(false)
  const deleting = shallowRef<SurveyDto | null>(null)

  // The room's survey count and last survey date change with its surveys.
  const refreshRoom = () => roomsStore.fetchRoom(roomId.value).catch(() => undefined)

  const save = useAsyncState(async (body: CreateSurveyBody) => {
    const survey = editing.value ? await surveysStore.updateSurvey(editing.value, body) : await surveysStore.createSurvey(roomId.value, body)
    void refreshRoom()
    return survey
  })
  const remove = useAsyncState(async (survey: SurveyDto) => {
    await surveysStore.deleteSurvey(survey)
    void refreshRoom()
    return survey
  })

  function openNew(): void {
    editing.value = null
    save.error.value = null
    isFormOpen.value = true
  }
  function openEdit(survey: SurveyDto): void {
    editing.value = survey
    save.error.value = null
    isFormOpen.value = true
  }
  async function submit(body: CreateSurveyBody): Promise<void> {
    if (await save.run(body)) isFormOpen.value = false
  }
  function askDelete(survey: SurveyDto): void {
    deleting.value = survey
    remove.error.value = null
    isDeleteOpen.value = true
  }
  async function confirmDelete(): Promise<void> {
    if (deleting.value && (await remove.run(deleting.value))) isDeleteOpen.value = false
  }

  return { isFormOpen, editing, save, openNew, openEdit, submit, isDeleteOpen, deleting, remove, askDelete, confirmDelete }
}
