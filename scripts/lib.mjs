// Helpers shared by the start, test and bench scripts.
import { spawn, spawnSync } from 'node:child_process'
import { existsSync, readdirSync, statSync } from 'node:fs'
import { createServer } from 'node:net'
import { join } from 'node:path'
import { fileURLToPath } from 'node:url'

export const root = fileURLToPath(new URL('..', import.meta.url))
const SOURCES = ['app.vue', 'nuxt.config.ts', 'tailwind.config.ts', 'package-lock.json', 'pages', 'components', 'composables', 'stores', 'layouts', 'middleware', 'plugins', 'server', 'shared', 'public', 'fonts', 'assets']

function newest(path) {
  if (!existsSync(path)) return 0
  const st = statSync(path)
  if (!st.isDirectory()) return st.mtimeMs
  let t = st.mtimeMs
  for (const name of readdirSync(path)) t = Math.max(t, newest(join(path, name)))
  return t
}

/** Builds the production server into .output/ unless it is newer than every source file. */
export function buildIfStale({ force = false } = {}) {
  const marker = join(root, '.output', 'nitro.json')
  const built = existsSync(marker) ? statSync(marker).mtimeMs : 0
  const src = Math.max(...SOURCES.map(s => newest(join(root, s))))
  if (!force && (built > src || (built > 0 && process.env.KERNWISE_SKIP_BUILD === '1'))) {
    console.log('[kernwise] .output is up to date; skipping the build')
    return
  }
  console.log('[kernwise] building the production server (about 30 s)...')
  const r = spawnSync(process.execPath, [join(root, 'node_modules/nuxt/bin/nuxt.mjs'), 'build'], { cwd: root, stdio: 'inherit' })
  if (r.status !== 0) {
    console.error('[kernwise] the build failed')
    process.exit(r.status ?? 1)
  }
}

/** A free TCP port on loopback. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const srv = createServer()
    srv.unref()
    srv.on('error', reject)
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address()
      srv.close(() => resolve(port))
    })
  })
}

/** Starts the built server; resolves once /api/health answers ok. */
export async function startServer(env, { quiet = true, nodeArgs = [] } = {}) {
  const child = spawn(process.execPath, [...nodeArgs, join(root, '.output/server/index.mjs')], {
    cwd: root,
    env: { ...process.env, HOST: '127.0.0.1', ...env },
    stdio: quiet ? ['ignore', 'ignore', 'inherit'] : 'inherit',
  })
  const url = `http://127.0.0.1:${env.PORT}`
  const deadline = Date.now() + 60_000
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`)
    try {
      const res = await fetch(`${url}/api/health`)
      if (res.ok) return { child, url }
    } catch { /* not up yet */ }
    await new Promise(r => setTimeout(r, 150))
  }
  child.kill()
  throw new Error('the server did not become healthy within 60 s')
}
