import { defineStore } from 'pinia'
import { ref } from 'vue'

/** Light or dark: the page and the drawing follow it; the choice is kept in this browser (`kw-theme`). */
export const useThemeStore = defineStore('theme', () => {
  const dark = ref(false)

  function apply(): void {
    document.documentElement.classList.toggle('dark', dark.value)
  }

  /** Reads the browser's choice (after mount: the server renders light). */
  function restore(): void {
    dark.value = localStorage.getItem('kw-theme') === 'dark'
    apply()
  }

  function toggle(): void {
    dark.value = !dark.value
    localStorage.setItem('kw-theme', dark.value ? 'dark' : 'light')
    apply()
  }

  return { dark, restore, toggle }
})
