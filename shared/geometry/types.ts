/** A point in section coordinates: millimetres, x to the right, y up. */
export type Point = readonly [x: number, y: number]

/** A ring of distinct vertices without a repeated closing vertex. */
export type Ring = readonly Point[]

/** A polygon: the outline ring first (counter-clockwise), then its holes (clockwise). */
export type Polygon = readonly Ring[]

/** A straight line a + b·x + c·y = 0 in section coordinates (mm). */
export interface Line {
  readonly a: number
  readonly b: number
  readonly c: number
}

/** Axis-aligned bounds in mm. */
export interface Bounds {
  readonly minX: number
  readonly minY: number
  readonly maxX: number
  readonly maxY: number
}
