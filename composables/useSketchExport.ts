import { analysisRequestFor } from '#shared/editor/analysis-request'
import { propertiesCsv, vertexStressCsv } from '#shared/export/csv'
import { exportDxf } from '#shared/export/dxf'
import { exportJson } from '#shared/export/json'
import { exportSvg } from '#shared/export/svg'
import type { AnalysisOutput } from '#shared/mechanics/analyze'

/** What the export menu offers. */
export type ExportKind = 'json' | 'dxf' | 'svg' | 'png' | 'properties' | 'vertices'

/**
 * Exports of the open sketch, made in the browser from the document and a fresh full analysis
 * (with the core and the vertex stresses the live view leaves out): each one a file download.
 */
export function useSketchExport() {
  const sketch = useSketchStore()
  const busy = ref(false)

  const baseName = () => (sketch.meta?.title ?? 'sketch').replace(/[^\w.-]+/g, '-').slice(0, 60) || 'sketch'

  async function analysis(): Promise<AnalysisOutput | null> {
    const body = analysisRequestFor(sketch.doc)
    if (!body) {
      useToastStore().push('error', 'Draw or import a part first: there is no section to export.')
      return null
    }
    return withToast(() => $fetch<AnalysisOutput>('/api/analysis', { method: 'POST', body }))
  }

  /** Makes the file of `kind` and hands it to the browser as a download; false when it could not be made. */
  async function run(kind: ExportKind): Promise<boolean> {
    busy.value = true
    try {
      // The unit system with the area and inertia units chosen in the settings bar.
      const system = sketch.settings
      if (kind === 'json') return save(`${baseName()}.kernwise.json`, new Blob([exportJson(sketch.doc)], { type: 'application/json' }))
      if (kind === 'dxf') return save(`${baseName()}.dxf`, new Blob([exportDxf(sketch.doc)], { type: 'application/dxf' }))
      const a = await analysis()
      if (!a) return false
      if (kind === 'properties') return save(`${baseName()}-properties.csv`, new Blob([propertiesCsv(a.properties, system)], { type: 'text/csv' }))
      if (kind === 'vertices') return save(`${baseName()}-vertex-stresses.csv`, new Blob([vertexStressCsv(a, system)], { type: 'text/csv' }))
      const svg = exportSvg(a, sketch.meta?.title ?? 'Sketch', system)
      if (kind === 'svg') return save(`${baseName()}.svg`, new Blob([svg], { type: 'image/svg+xml' }))
      return save(`${baseName()}.png`, await svgToPng(svg, 1200, 800))
    } finally {
      busy.value = false
    }
  }

  return { busy, run }
}

function save(name: string, blob: Blob): true {
  const url = URL.createObjectURL(blob)
  const a = document.createElement('a')
  a.href = url
  a.download = name
  document.body.appendChild(a)
  a.click()
  a.remove()
  setTimeout(() => URL.revokeObjectURL(url), 10_000)
  return true
}

/** Rasterises an SVG string to a PNG of w × h px through an offscreen canvas. */
async function svgToPng(svg: string, w: number, h: number): Promise<Blob> {
  const img = new Image()
  img.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`
  await img.decode()
  const canvas = document.createElement('canvas')
  canvas.width = w
  canvas.height = h
  canvas.getContext('2d')!.drawImage(img, 0, 0, w, h)
  return new Promise((resolve, reject) => canvas.toBlob(b => (b ? resolve(b) : reject(new Error('The PNG could not be made.'))), 'image/png'))
}
