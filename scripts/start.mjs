// npm start: migrate and seed the demo on an empty database, build if needed, serve on :3000.
import { spawn } from 'node:child_process'
import { join } from 'node:path'
import { buildIfStale, root } from './lib.mjs'

buildIfStale()
const port = process.env.PORT || '3000'
const env = {
  ...process.env,
  PORT: port,
  HOST: process.env.HOST || '0.0.0.0',
  NUXT_DB_PATH: process.env.NUXT_DB_PATH || join(root, '.data/kernwise.sqlite'),
  NUXT_SEED_DEMO: process.env.NUXT_SEED_DEMO ?? 'true',
}
console.log(`[kernwise] serving http://localhost:${port} (database ${env.NUXT_DB_PATH})`)
const child = spawn(process.execPath, [join(root, '.output/server/index.mjs')], { cwd: root, env, stdio: 'inherit' })
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal))
child.on('exit', code => process.exit(code ?? 0))
