import VueKonva from 'vue-konva'

// Konva only runs in the browser: the stage is rendered client-side.
export default defineNuxtPlugin((nuxtApp) => {
  nuxtApp.vueApp.use(VueKonva)
})
