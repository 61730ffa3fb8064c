import { analysisRequestFor } from '#shared/editor/analysis-request'
import { propertiesCsv, vertexStressCsv } from '#shared/export/csv'
import { exportDxf } from '#shared/export/dxf'
import { exportJson } from '#shared/export/json'
import { exportSvg, LEGEND_WIDTH, type ExportView } from '#shared/export/svg'
import type { AnalysisOutput } from '#shared/mechanics/analyze'

/** What the export menu offers. */
export type ExportKind = 'json' | 'dxf' | 'svg' | 'png' | 'properties' | 'vertices'

/** What an SVG or PNG shows: the view on screen (its zoom and pan) or the whole section fitted. */
export type ImageArea = 'view' | 'section'

/** Size of an image of the whole section (px). */
export const SECTION_IMAGE = { width: 1200, height: 800 } as const
/** A PNG of the view has this many pixels per screen (CSS) pixel, for print. */
export const PNG_SCALE = 2

/**
 * Exports of the open sketch, made in the browser from the document and a fresh full analysis
 * (with the core and the vertex stresses the live view leaves out): each one a file download.
 * SVG and PNG show the current view (the canvas's zoom and pan, from the viewport store) or the
 * whole section fitted (`area`), with the legend and a scale bar.
 */
export function useSketchExport() {
  const sketch = useSketchStore()
  const viewport = useViewportStore()
  const busy = ref(false)
  const area = useState<ImageArea>('kw-export-area', () => 'view')

  /** The canvas transform and size as they are on screen now (read from the viewport store). */
  const currentView = (): ExportView => ({ zoom: viewport.zoom, panX: viewport.panX, panY: viewport.panY, width: viewport.width, height: viewport.height })

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
      const view = area.value === 'view' ? currentView() : undefined
      const svg = exportSvg(a, sketch.meta?.title ?? 'Sketch', system, SECTION_IMAGE.width, SECTION_IMAGE.height, view)
      if (kind === 'svg') return save(`${baseName()}${view ? '-view' : ''}.svg`, new Blob([svg], { type: 'image/svg+xml' }))
      const size = view ? { w: (Math.round(view.width) + LEGEND_WIDTH) * PNG_SCALE, h: Math.round(view.height) * PNG_SCALE } : { w: SECTION_IMAGE.width, h: SECTION_IMAGE.height }
      return save(`${baseName()}${view ? '-view' : ''}.png`, await svgToPng(svg, size.w, size.h))
    } finally {
      busy.value = false
    }
  }

  /** Size in px of the image `kind` would have now. */
  function imageSize(kind: 'svg' | 'png'): { width: number; height: number } {
    if (area.value === 'section') return { ...SECTION_IMAGE }
    const k = kind === 'png' ? PNG_SCALE : 1
    return { width: (Math.round(viewport.width) + LEGEND_WIDTH) * k, height: Math.round(viewport.height) * k }
  }

  return { busy, run, area, imageSize }
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
