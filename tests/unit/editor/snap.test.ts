import { describe, expect, it } from 'vitest'
import { snapPoint, snapToGrid } from '#shared/editor/snap'
import { niceStep } from '#shared/format/step'

const square = [[0, 0], [100, 0], [100, 100], [0, 100]] as const

describe('snapping', () => {
  it('snapToGrid rounds to the nearest grid step without binary residue', () => {
    expect(snapToGrid(14.9, 10)).toBe(10)
    expect(snapToGrid(0.31, 0.1)).toBe(0.3)
    expect(snapToGrid(-26, 5)).toBe(-25)
  })

  it('snapPoint prefers a vertex within tolerance over the grid', () => {
    const r = snapPoint([98, 103], { grid: 10, rings: [square], tol: 5 })
    expect(r.point).toEqual([100, 100])
    expect(r.cue.kind).toBe('vertex')
  })

  it('snapPoint catches an edge midpoint', () => {
    const r = snapPoint([52, 2], { grid: 0, rings: [square], tol: 5 })
    expect(r.point).toEqual([50, 0])
    expect(r.cue.kind).toBe('midpoint')
  })

  it('snapPoint aligns with a vertex horizontally and takes the grid on the other axis', () => {
    const r = snapPoint([203, 98], { grid: 10, rings: [square], tol: 4 })
    expect(r.point).toEqual([200, 100])
    expect(r.cue).toMatchObject({ kind: 'align', from: { y: [100, 100] } })
  })

  it('snapPoint aligns vertically with a vertex', () => {
    const r = snapPoint([101, 247], { grid: 10, rings: [square], tol: 3 })
    expect(r.point).toEqual([100, 250])
    expect(r.cue).toMatchObject({ kind: 'align', from: { x: [100, 100] } })
  })

  it('snapPoint falls back to the grid, or leaves the point with no grid', () => {
    expect(snapPoint([333, 444], { grid: 10, rings: [square], tol: 2 }).point).toEqual([330, 440])
    expect(snapPoint([333.3, 444.4], { grid: 0, rings: [], tol: 2 })).toEqual({ point: [333.3, 444.4], cue: { kind: 'none', at: [333.3, 444.4] } })
  })

  it('snapPoint skips the dragged vertex', () => {
    const r = snapPoint([99, 99], { grid: 0, rings: [square], tol: 5, skip: new Set(['0:2']) })
    expect(r.cue.kind).not.toBe('vertex')
  })

  it.each([[12, 20], [0.7, 1], [3, 5], [101, 200], [5, 5]])('niceStep(%s) = %s (1-2-5 steps)', (min, step) => {
    expect(niceStep(min)).toBe(step)
  })
})
