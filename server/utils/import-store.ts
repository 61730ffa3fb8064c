import { createHash } from 'node:crypto'
import { access, mkdir, readFile, rename, writeFile } from 'node:fs/promises'
import { dirname, join, resolve } from 'node:path'

/** One imported file remembered with a sketch, so the import can be redone. */
export interface StoredImport {
  hash: string
  name: string
  format: 'dxf' | 'csv'
  size: number
  units: string
  at: string
}

/** The folder of imported files: `imports/` beside the database (never a user's file name). */
function importsDir(): string {
  const config = useRuntimeConfig()
  return join(dirname(resolve(String(config.dbPath || '.data/kernwise.sqlite'))), 'imports')
}

const HASH = /^[0-9a-f]{64}$/

/** SHA-256 hex of the file's bytes: its name on disk. */
export function contentHash(bytes: Uint8Array): string {
  return createHash('sha256').update(bytes).digest('hex')
}

/** Writes the file as `imports/<sha256>` (once: the same bytes are the same file) and returns its hash. */
export async function storeImportFile(bytes: Uint8Array): Promise<string> {
  const hash = contentHash(bytes)
  const dir = importsDir()
  await mkdir(dir, { recursive: true })
  const path = join(dir, hash)
  try {
    await access(path)
  } catch {
    const tmp = `${path}.${process.pid}.tmp`
    await writeFile(tmp, bytes)
    await rename(tmp, path)
  }
  return hash
}

/** The bytes of a stored import, or null when there is none with that hash. */
export async function readImportFile(hash: string): Promise<Uint8Array | null> {
  if (!HASH.test(hash)) return null
  try {
    return await readFile(join(importsDir(), hash))
  } catch {
    return null
  }
}

/** The imports remembered with a sketch, newest last. */
export async function sketchImports(sketchId: string): Promise<StoredImport[]> {
  try {
    return JSON.parse(await readFile(join(importsDir(), `sketch-${sketchId}.json`), 'utf8')) as StoredImport[]
  } catch {
    return []
  }
}

/** Remembers an import with a sketch (the last 50 are kept). */
export async function rememberImport(sketchId: string, entry: StoredImport): Promise<void> {
  const list = (await sketchImports(sketchId)).filter(e => e.hash !== entry.hash)
  list.push(entry)
  const path = join(importsDir(), `sketch-${sketchId}.json`)
  const tmp = `${path}.${process.pid}.tmp`
  await writeFile(tmp, JSON.stringify(list.slice(-50)))
  await rename(tmp, path)
}
