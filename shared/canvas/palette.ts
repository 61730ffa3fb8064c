import { STRESS_COLOURS } from '../stress/scale'

/** The stress field's five stops, compression to tension (see shared/stress/scale). */
export interface FieldColours {
  readonly compression: string
  readonly compressionLight: string
  readonly neutral: string
  readonly tensionLight: string
  readonly tension: string
}

/**
 * Every colour the drawing uses, by role. The layers look colours up here (through
 * useCanvasPalette), never write them, so the light and the dark canvas differ in this file only.
 */
export interface CanvasPalette {
  readonly dark: boolean
  /** Behind the grid. */
  readonly background: string
  readonly gridMinor: string
  readonly gridMajor: string
  readonly axis: string
  /** Lines and text of the drawing itself (outlines, the neutral line, labels). */
  readonly ink: string
  /** Text of secondary labels (dimensions, part names). */
  readonly inkSoft: string
  /** Thin helper lines: dimension lines, the selection box, guides. */
  readonly helper: string
  /** The halo behind canvas text, so a label reads over lines and the field. */
  readonly halo: string
  readonly partFill: string
  readonly partStroke: string
  readonly selectedFill: string
  readonly selectedStroke: string
  readonly fault: string
  /** Openings (voids, notches, cut parts) and the gestures that cut. */
  readonly opening: string
  readonly openingFill: string
  readonly openingFillSelected: string
  readonly warn: string
  readonly accent: string
  readonly accentFill: string
  readonly accentText: string
  /** Fill of a handle knob (vertex, rotation). */
  readonly knob: string
  readonly principal: string
  readonly core: string
  readonly coreFill: string
  readonly isoline: string
  readonly bandEdge: string
  readonly resultantIn: string
  readonly resultantOut: string
  /** Over-strength and overturning notes, the cut line A-B. */
  readonly alarm: string
  readonly onset: string
  readonly lifted: string
  readonly loadFill: string
  readonly loadStroke: string
  readonly torsion: string
  readonly torsionLine: string
  /** 'r, g, b' of the |τ| shading, drawn with an alpha that grows with |τ|. */
  readonly torsionShade: string
  /** The stress field ramp; the legend draws the same one. */
  readonly field: FieldColours
}

/** The light canvas: ink on white (values from tailwind.config.ts so CSS and canvas agree). */
export const LIGHT_CANVAS: CanvasPalette = {
  dark: false,
  background: '#ffffff',
  gridMinor: '#eef1f5',
  gridMajor: '#dfe4eb',
  axis: '#a2adbc',
  ink: '#161b23',
  inkSoft: '#465263',
  helper: '#7c899b',
  halo: '#ffffff',
  partFill: 'rgba(93,106,124,0.16)',
  partStroke: '#343e4d',
  selectedFill: 'rgba(31,158,126,0.22)',
  selectedStroke: '#116652',
  fault: '#c8323a',
  opening: '#8f5300',
  openingFill: 'rgba(143,83,0,0.08)',
  openingFillSelected: 'rgba(143,83,0,0.18)',
  warn: '#c77700',
  accent: '#1f9e7e',
  accentFill: 'rgba(31,158,126,0.12)',
  accentText: '#0b3b31',
  knob: '#ffffff',
  principal: '#148066',
  core: '#116652',
  coreFill: 'rgba(31,158,126,0.16)',
  isoline: 'rgba(22,27,35,0.55)',
  bandEdge: 'rgba(22,27,35,0.35)',
  resultantIn: '#116652',
  resultantOut: '#c8323a',
  alarm: '#95222a',
  onset: '#8a5a00',
  lifted: '#465263',
  loadFill: '#161b23',
  loadStroke: '#ffffff',
  torsion: '#7c3aed',
  torsionLine: '#1f1147',
  torsionShade: '124, 58, 237',
  field: STRESS_COLOURS,
}

/**
 * The dark canvas: the same roles, light ink on near-black, each colour lifted so that it keeps
 * about the contrast against the background that the light one has against white (checked in
 * tests/unit/canvas/palette.test.ts). The field ramp runs from a dark neutral to lighter hues,
 * compression still darker than tension.
 */
export const DARK_CANVAS: CanvasPalette = {
  dark: true,
  background: '#11151b',
  gridMinor: '#1b212a',
  gridMajor: '#262e3a',
  axis: '#566274',
  ink: '#e8ecf1',
  inkSoft: '#b4bfcc',
  helper: '#8d9aac',
  halo: '#11151b',
  partFill: 'rgba(162,173,188,0.16)',
  partStroke: '#c4ccd7',
  selectedFill: 'rgba(63,196,160,0.24)',
  selectedStroke: '#6fd8bb',
  fault: '#f0777e',
  opening: '#e7a64a',
  openingFill: 'rgba(231,166,74,0.10)',
  openingFillSelected: 'rgba(231,166,74,0.22)',
  warn: '#f0a640',
  accent: '#3fc4a0',
  accentFill: 'rgba(63,196,160,0.14)',
  accentText: '#d3f2e8',
  knob: '#11151b',
  principal: '#5fd3b2',
  core: '#5fd3b2',
  coreFill: 'rgba(63,196,160,0.18)',
  isoline: 'rgba(232,236,241,0.55)',
  bandEdge: 'rgba(232,236,241,0.30)',
  resultantIn: '#5fd3b2',
  resultantOut: '#f0777e',
  alarm: '#f59aa0',
  onset: '#f2c46a',
  lifted: '#b4bfcc',
  loadFill: '#e8ecf1',
  loadStroke: '#11151b',
  torsion: '#b99af7',
  torsionLine: '#ece3ff',
  torsionShade: '185, 154, 247',
  field: { compression: '#8a90f0', compressionLight: '#41478c', neutral: '#272c35', tensionLight: '#6e5624', tension: '#f0b94a' },
}

/** The palette of a theme. */
export function canvasPalette(dark: boolean): CanvasPalette {
  return dark ? DARK_CANVAS : LIGHT_CANVAS
}
