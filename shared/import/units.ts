import type { LengthUnit } from './types'

/** mm per unit of each import length unit (exact by definition of the inch and foot). */
export const MM_PER_UNIT: Record<LengthUnit, number> = { mm: 1, cm: 10, m: 1000, in: 25.4, ft: 304.8 }

/** The length units an import accepts. */
export const LENGTH_UNITS = Object.keys(MM_PER_UNIT) as LengthUnit[]

/** DXF header $INSUNITS codes Kernwise reads (AutoCAD DXF reference: 1 in, 2 ft, 4 mm, 5 cm, 6 m); others give null. */
export function unitFromInsunits(code: unknown): LengthUnit | null {
  switch (Number(code)) {
    case 1: return 'in'
    case 2: return 'ft'
    case 4: return 'mm'
    case 5: return 'cm'
    case 6: return 'm'
    default: return null
  }
}
