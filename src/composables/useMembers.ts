import { ref, watch, type Ref } from 'vue'
import type { AddMemberBody, MemberDto, Role } from '@shared/api'
import * as membersApi from '@/api/members'
import { useAsyncState } from './useAsyncState'

/** The members of a workspace, and the owner's changes to them. */
export function useMembers(workspaceId: Ref<number | null>) {
  const members = ref<MemberDto[]>([])
  const busyUserId = ref<number | null>(null)

  function replace(member: MemberDto): void {
    const others = members.value.filter((m) => m.userId !== member.userId)
    members.value = [...others, member].sort((a, b) => a.name.localeCompare(b.name))
  }
  function requireWorkspace(): number {
    if (workspaceId.value === null) throw new Error('Choose a workspace first.')
    return workspaceId.value
  }

  const load = useAsyncState(async (id: number) => (members.value = await membersApi.listMembers(id)))
  const add = useAsyncState(async (body: AddMemberBody) => {
    const member = await membersApi.addMember(requireWorkspace(), body)
    replace(member)
    return member
  })
  const change = useAsyncState(async (userId: number, role: Role) => {
    busyUserId.value = userId
    try {
      const member = await membersApi.updateMember(requireWorkspace(), userId, { role })
      replace(member)
      return member
    } finally {
      busyUserId.value = null
    }
  })
  const remove = useAsyncState(async (userId: number) => {
    await membersApi.removeMember(requireWorkspace(), userId)
    members.value = members.value.filter((m) => m.userId !== userId)
    return userId
  })

  watch(workspaceId, (id) => {
    if (id !== null) void load.run(id)
  }, { immediate: true })

  return { members, busyUserId, load, add, change, remove }
}
