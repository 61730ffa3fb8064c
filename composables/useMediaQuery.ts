/**
 * Whether a CSS media query matches, kept current as the window changes. The server and the first
 * client render answer `initial` (so hydration matches); the real answer follows on mount.
 */
export function useMediaQuery(query: string, initial = false): Ref<boolean> {
  const matches = ref(initial)
  onMounted(() => {
    const mq = window.matchMedia(query)
    const update = () => { matches.value = mq.matches }
    update()
    mq.addEventListener('change', update)
    onBeforeUnmount(() => mq.removeEventListener('change', update))
  })
  return matches
}
