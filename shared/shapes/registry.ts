import { z } from 'zod'
import { angle, type AngleParams } from './angle'
import { DEFAULT_CHORD_TOLERANCE } from './arc'
import { channel, type ChannelParams } from './channel'
import { circle, type CircleParams } from './circle'
import { ShapeError, type ShapeGeometry } from './common'
import { rhs, tube, type RhsParams, type TubeParams } from './hollow'
import { ishape, type IShapeParams } from './ishape'
import { plate, type PlateParams } from './plate'
import { tee, type TeeParams } from './tee'

/** The parametric shape kinds, as used in `POST /api/shapes/:kind`. */
export const SHAPE_KINDS = ['plate', 'circle', 'tube', 'rhs', 'ishape', 'channel', 'angle', 'tee'] as const

/** One of SHAPE_KINDS. */
export type ShapeKind = (typeof SHAPE_KINDS)[number]

/** The parameter object each kind's builder takes (mm; taper in degrees). */
export interface ShapeParamsByKind {
  plate: PlateParams
  circle: CircleParams
  tube: TubeParams
  rhs: RhsParams
  ishape: IShapeParams
  channel: ChannelParams
  angle: AngleParams
  tee: TeeParams
}

/**
 * One parameter of a shape, for the insert form and for validation: `unit` 'mm' or 'deg';
 * `default` prefills the form and replaces an omitted optional value (null: derived from the
 * others, as `help` says); the value must be >= `min` (> when `minExclusive`) and, when `max`
 * is set, <= `max` (< when `maxExclusive`).
 */
export interface ShapeParam<K extends string = string> {
  readonly key: K
  readonly label: string
  /** 'choice': one of `choices` (a number standing for an option, such as an orientation). */
  readonly unit: 'mm' | 'deg' | 'choice'
  readonly choices?: readonly { readonly value: number; readonly label: string }[]
  readonly default: number | null
  readonly min: number
  readonly minExclusive: boolean
  readonly max: number | null
  readonly maxExclusive: boolean
  readonly optional: boolean
  readonly help: string
}

/**
 * A registry entry: the label shown to people, where the shape is placed, its parameters, and
 * `build(params, tol)` returning the geometry in mm (outline CCW, holes CW) with the arcs cut
 * by the chord tolerance `tol` (mm, default 0.05).
 */
export interface ShapeDefinition<P> {
  readonly kind: ShapeKind
  readonly label: string
  readonly placement: string
  readonly params: readonly ShapeParam<Extract<keyof P, string>>[]
  build(params: P, tol?: number): ShapeGeometry
}

const dim = <K extends string>(key: K, label: string, value: number, help: string): ShapeParam<K> => ({
  key, label, unit: 'mm', default: value, min: 0, minExclusive: true, max: null, maxExclusive: false, optional: false, help,
})
const radius = <K extends string>(key: K, label: string, value: number | null, optional: boolean, help: string): ShapeParam<K> => ({
  key, label, unit: 'mm', default: value, min: 0, minExclusive: false, max: null, maxExclusive: false, optional, help,
})
const optionalDim = <K extends string>(key: K, label: string, help: string): ShapeParam<K> => ({
  ...dim(key, label, 0, help), default: null, optional: true,
})
const taper: ShapeParam<'taper'> = {
  key: 'taper', label: 'Flange taper', unit: 'deg', default: 0, min: 0, minExclusive: false, max: 45, maxExclusive: true, optional: true,
  help: 'Slope of the inner flange face; 0 for parallel flanges. With a taper, tf is the thickness at tf_at from the toe (default mid-outstand). 14 % slope ≈ 7.97°, 8 % ≈ 4.57°.',
}
const toe = radius('r2', 'Toe radius', 0, true, 'Radius at the flange toes; 0 for square toes.')

/** The parametric shapes by kind: labels, parameters with units and defaults, and builders (mm). */
export const SHAPES: { readonly [K in ShapeKind]: ShapeDefinition<ShapeParamsByKind[K]> } = {
  plate: {
    kind: 'plate', label: 'Plate', placement: 'Centred on the origin.',
    params: [
      dim('b', 'Width', 200, 'Across the plate.'),
      dim('h', 'Thickness', 20, 'Through the plate.'),
      {
        key: 'vertical', label: 'Orientation', unit: 'choice', default: 0, min: 0, minExclusive: false, max: 1, maxExclusive: false, optional: true,
        choices: [{ value: 0, label: 'horizontal' }, { value: 1, label: 'vertical' }],
        help: 'Horizontal: the width runs along x (a flange plate); vertical: along y (a web plate).',
      },
    ],
    build: (p, tol) => plate(p, { tol }),
  },
  circle: {
    kind: 'circle', label: 'Round bar', placement: 'Centre on the origin.',
    params: [dim('d', 'Diameter', 50, 'Outside diameter.')],
    build: (p, tol) => circle(p, { tol }),
  },
  tube: {
    kind: 'tube', label: 'Tube', placement: 'Centre on the origin.',
    params: [dim('d', 'Outside diameter', 168.3, 'Outside diameter.'), dim('t', 'Wall thickness', 8, 'Less than half the diameter.')],
    build: (p, tol) => tube(p, { tol }),
  },
  rhs: {
    kind: 'rhs', label: 'Box tube', placement: 'Centred on the origin.',
    params: [
      dim('b', 'Width', 200, 'Outside width along x.'),
      dim('h', 'Depth', 100, 'Outside depth along y.'),
      dim('t', 'Wall thickness', 8, 'Less than half the smaller side.'),
      radius('ro', 'Outer corner radius', 20, false, 'Cold-formed tubes are often about 2 t to 2.5 t; 0 for sharp corners.'),
      radius('ri', 'Inner corner radius', null, true, 'Leave blank for ro - t (or 0 when ro < t), which keeps the corner wall at t.'),
    ],
    build: (p, tol) => rhs(p, { tol }),
  },
  ishape: {
    kind: 'ishape', label: 'I or H', placement: 'Bounding box centred on the origin; web on the y axis.',
    params: [
      dim('h', 'Depth', 200, 'Overall depth, along y.'),
      dim('b', 'Flange width', 100, 'Width of both flanges unless b_top or b_bot is given.'),
      dim('tw', 'Web thickness', 5.6, 'Less than the flange width.'),
      dim('tf', 'Flange thickness', 8.5, 'Both flanges unless tf_top or tf_bot is given; at mid-outstand for tapered flanges.'),
      radius('r', 'Root radius', 12, false, 'Fillet between web and flanges; 0 for a welded section without fillets.'),
      toe,
      taper,
      radius('tf_at', 'tf measured at', null, true, 'Tapered flanges: distance from the toe at which tf is given. Blank for mid-outstand, (b - tw)/4; European IPN tables give tf at b/4.'),
      optionalDim('b_top', 'Top flange width', 'Plate girders: leave blank to use b.'),
      optionalDim('tf_top', 'Top flange thickness', 'Plate girders: leave blank to use tf.'),
      optionalDim('b_bot', 'Bottom flange width', 'Plate girders: leave blank to use b.'),
      optionalDim('tf_bot', 'Bottom flange thickness', 'Plate girders: leave blank to use tf.'),
    ],
    build: (p, tol) => ishape(p, { tol }),
  },
  channel: {
    kind: 'channel', label: 'Channel', placement: 'Bounding box centred on the origin; back of the web on the left, toes to the right.',
    params: [
      dim('h', 'Depth', 200, 'Overall depth, along y.'),
      dim('b', 'Flange width', 80, 'From the back of the web to the toe.'),
      dim('tw', 'Web thickness', 6, 'Less than the flange width.'),
      dim('tf', 'Flange thickness', 11, 'At mid-outstand for tapered flanges.'),
      radius('r', 'Root radius', 13, false, 'Fillet between web and flanges.'),
      toe,
      taper,
      radius('tf_at', 'tf measured at', null, true, 'Tapered flanges: distance from the toe at which tf is given. Blank for mid-outstand, (b - tw)/2; European UPN tables give tf at b/2.'),
    ],
    build: (p, tol) => channel(p, { tol }),
  },
  angle: {
    kind: 'angle', label: 'Angle', placement: 'Bounding box centred on the origin; heel at bottom left, legs up and to the right.',
    params: [
      dim('h', 'Vertical leg', 100, 'Leg along y, measured from the heel.'),
      dim('b', 'Horizontal leg', 100, 'Leg along x, measured from the heel; equal to h for an equal angle.'),
      dim('t', 'Thickness', 10, 'Both legs; less than the shorter leg.'),
      radius('r', 'Root radius', 12, false, 'Fillet inside the corner.'),
      radius('r2', 'Toe radius', 6, false, 'Radius at both toes; rolled angles are often about r/2. At most t.'),
    ],
    build: (p, tol) => angle(p, { tol }),
  },
  tee: {
    kind: 'tee', label: 'Tee', placement: 'Bounding box centred on the origin; flange on top, stem down.',
    params: [
      dim('h', 'Depth', 100, 'Overall depth including the flange, along y.'),
      dim('b', 'Flange width', 100, 'Along x.'),
      dim('tw', 'Stem thickness', 11, 'Less than the flange width.'),
      dim('tf', 'Flange thickness', 11, 'Less than the depth.'),
      radius('r', 'Root radius', 11, false, 'Fillet between stem and flange.'),
    ],
    build: (p, tol) => tee(p, { tol }),
  },
}

/**
 * The default parameters of a kind (mm, taper in degrees), as the insert form prefills them:
 * every parameter whose default is not null.
 */
export function defaultShapeParams<K extends ShapeKind>(kind: K): ShapeParamsByKind[K] {
  const out: Record<string, number> = {}
  for (const p of SHAPES[kind].params as readonly ShapeParam[]) if (p.default !== null) out[p.key] = p.default
  return out as unknown as ShapeParamsByKind[K]
}

/** True when `kind` names a registered shape. */
export function isShapeKind(kind: string): kind is ShapeKind {
  return (SHAPE_KINDS as readonly string[]).includes(kind)
}

/** A validated request for a shape: its kind and parameters (mm, taper in degrees). */
export type ShapeInput = { [K in ShapeKind]: { readonly kind: K; readonly params: ShapeParamsByKind[K] } }[ShapeKind]

/** Outcome of validateShapeParams: the checked input and its geometry (mm), or a ShapeError naming the field. */
export type ShapeValidation =
  | { readonly ok: true; readonly value: ShapeInput; readonly geometry: ShapeGeometry }
  | { readonly ok: false; readonly error: ShapeError }

function paramSchema(p: ShapeParam): z.ZodType<number | null | undefined> {
  const name = `${p.label} (${p.key})`
  if (p.unit === 'choice') {
    const values = (p.choices ?? []).map((c) => c.value)
    const words = (p.choices ?? []).map((c) => `${c.value} (${c.label})`).join(' or ')
    const choice = z.number({ error: `${name} is ${words}.` }).refine((v) => values.includes(v), `${name} is ${words}.`)
    return p.optional ? choice.nullish() : choice
  }
  const unit = p.unit === 'deg' ? '°' : ' mm'
  let s = z.number({ error: (iss) => (iss.input === undefined ? `${name} is required.` : `${name} must be a number in ${p.unit}.`) })
  s = p.minExclusive
    ? s.gt(p.min, { error: `${name} must be greater than ${p.min}${unit}.` })
    : s.gte(p.min, { error: `${name} must be at least ${p.min}${unit}.` })
  if (p.max !== null && p.maxExclusive) s = s.lt(p.max, { error: `${name} must be less than ${p.max}${unit}.` })
  else if (p.max !== null) s = s.lte(p.max, { error: `${name} must be at most ${p.max}${unit}.` })
  return p.optional ? s.nullish() : s
}

/**
 * A zod schema for one kind's parameters (numbers in mm or degrees): unknown keys are refused,
 * optional ones may be omitted or null. It checks types and bounds only; whether the
 * dimensions fit together (tf < h/2, radii...) is checked by validateShapeParams or the builder.
 */
export function shapeParamsSchema(kind: ShapeKind) {
  const def = SHAPES[kind] as ShapeDefinition<unknown>
  const shape: Record<string, z.ZodType<number | null | undefined>> = {}
  for (const p of def.params) shape[p.key] = paramSchema(p)
  const keys = def.params.map((p) => p.key).join(', ')
  return z.strictObject(shape, {
    error: (iss) =>
      iss.code === 'unrecognized_keys'
        ? `Unknown parameter ${iss.keys.map((k) => `"${k}"`).join(', ')} for ${def.label}; expected ${keys}.`
        : `${def.label} parameters must be an object of numbers (${keys}).`,
  })
}

/**
 * Checks the parameters of a shape of kind `kind` (numbers in mm or degrees, e.g. a request body)
 * and builds it with chord tolerance `tol` (mm). Omitted optional parameters take their default.
 * Returns the typed input and the geometry, or a ShapeError whose `field` names the parameter.
 */
export function validateShapeParams(kind: string, input: unknown, tol: number = DEFAULT_CHORD_TOLERANCE): ShapeValidation {
  if (!isShapeKind(kind)) {
    return { ok: false, error: new ShapeError('kind', `Unknown shape kind "${kind}"; expected one of ${SHAPE_KINDS.join(', ')}.`) }
  }
  const parsed = shapeParamsSchema(kind).safeParse(input)
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    const keys = issue?.code === 'unrecognized_keys' ? issue.keys : []
    const field = String(issue?.path[0] ?? keys[0] ?? 'params')
    return { ok: false, error: new ShapeError(field, issue?.message ?? 'Invalid shape parameters.') }
  }
  const params: Record<string, number> = {}
  for (const p of SHAPES[kind].params) {
    const v = parsed.data[p.key]
    if (typeof v === 'number') params[p.key] = v
    else if (p.default !== null) params[p.key] = p.default
  }
  const value = { kind, params } as unknown as ShapeInput
  try {
    return { ok: true, value, geometry: buildShape(value, tol) }
  } catch (e) {
    if (e instanceof ShapeError) return { ok: false, error: e }
    throw e
  }
}

/** Builds a validated shape input (mm) with chord tolerance `tol` (mm): outline CCW, holes CW. */
export function buildShape(input: ShapeInput, tol: number = DEFAULT_CHORD_TOLERANCE): ShapeGeometry {
  const def = SHAPES[input.kind] as ShapeDefinition<ShapeInput['params']>
  return def.build(input.params, tol)
}
