import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import { allows, type AccessLevel } from '#shared/team/access'

/** What the API says about the open sketch beside its document: my access and its review. */
export interface SketchAccessInfo {
  id: string
  access: AccessLevel
  status: string
  owner: string
  checker: { name: string; email: string } | null
  reviewRevision: number | null
  isChecker: boolean
  approvedBy: string | null
  approvedAt: string | null
  approvedRevision: { number: number; note: string; approvedBy: string; approvedAt: string } | null
}

/**
 * My access to the open sketch and its review state, for the editor and the team panels to read:
 * `canEdit` false makes the editor read-only (nothing is saved; loads can still be dragged to
 * explore). Reset when another sketch opens (`set` replaces everything).
 */
export const useAccessStore = defineStore('access', () => {
  const info = ref<SketchAccessInfo | null>(null)
  const access = computed<AccessLevel | null>(() => info.value?.access ?? null)
  const canEdit = computed(() => allows(access.value, 'edit'))
  const canComment = computed(() => allows(access.value, 'comment'))
  const canManage = computed(() => allows(access.value, 'manage'))
  /** True once the open sketch is known to be shared with me for reading only (false while nothing is loaded). */
  const readOnly = computed(() => info.value !== null && !canEdit.value)

  /** Takes the access fields of a sketch as GET /api/sketches/:id answers it. */
  function set(s: SketchAccessInfo): void {
    info.value = {
      id: s.id, access: s.access, status: s.status, owner: s.owner, checker: s.checker, reviewRevision: s.reviewRevision,
      isChecker: s.isChecker, approvedBy: s.approvedBy, approvedAt: s.approvedAt, approvedRevision: s.approvedRevision,
    }
  }

  /** Re-reads the open sketch's access and review (after a submission, a decision, a restore). */
  async function refresh(): Promise<void> {
    if (!info.value) return
    set(await $fetch<SketchAccessInfo>(`/api/sketches/${info.value.id}`))
  }

  function reset(): void {
    info.value = null
  }

  return { info, access, canEdit, canComment, canManage, readOnly, set, refresh, reset }
})
