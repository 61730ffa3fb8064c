// API tests run against the built production server: make sure .output/ is current once.
// @ts-expect-error plain ESM helper without types
import { buildIfStale } from '../../scripts/lib.mjs'

export default function setup(): void {
  buildIfStale()
}
