import { describe, expect, it } from 'vitest'
import { allows, cappedAccess, ROLE_CAP } from '../../../shared/team/access'

describe('cappedAccess(access, role)', () => {
  // The rule of the product: the account role caps what a share grants.
  it.each([
    ['edit', 'viewer', 'view'],
    ['comment', 'viewer', 'view'],
    ['edit', 'checker', 'comment'],
    ['view', 'checker', 'view'],
    ['edit', 'engineer', 'edit'],
    ['comment', 'engineer', 'comment'],
    ['edit', 'admin', 'edit'],
  ] as const)('a %s share to a %s account gives %s', (access, role, want) => {
    expect(cappedAccess(access, role)).toBe(want)
  })

  it('the cap of every role is one of the share levels', () => {
    expect(Object.values(ROLE_CAP).every(c => ['view', 'comment', 'edit'].includes(c))).toBe(true)
  })
})

describe('allows(have, need)', () => {
  it.each([
    ['view', 'view', true], ['view', 'comment', false], ['comment', 'view', true], ['comment', 'edit', false],
    ['edit', 'comment', true], ['edit', 'manage', false], ['manage', 'edit', true], [null, 'view', false],
  ] as const)('%s allows %s: %s', (have, need, want) => {
    expect(allows(have, need)).toBe(want)
  })
})
