import { defineStore } from 'pinia'
import { ref } from 'vue'
import { errorMessage } from '#shared/utils/errors'

export interface Toast {
  id: number
  kind: 'error' | 'info' | 'success'
  text: string
}

/** Short-lived messages in the corner: errors from the server, confirmations, undo offers. */
export const useToastStore = defineStore('toasts', () => {
  const toasts = ref<Toast[]>([])
  let next = 1

  function push(kind: Toast['kind'], text: string, ms = kind === 'error' ? 7000 : 3500): number {
    const id = next++
    toasts.value.push({ id, kind, text })
    if (import.meta.client) setTimeout(() => dismiss(id), ms)
    return id
  }

  function dismiss(id: number): void {
    toasts.value = toasts.value.filter(t => t.id !== id)
  }

  return { toasts, push, dismiss }
})

/** Runs a request and shows its error as a toast; returns null on failure. */
export async function withToast<T>(request: () => Promise<T>): Promise<T | null> {
  try {
    return await request()
  } catch (error) {
    useToastStore().push('error', errorMessage(error))
    return null
  }
}
